import { StyleSheet } from 'react-native';

import { Half, KindChips, Pair, ReadOnly } from '@/components/screens/library/form-parts';
import { FIELD_NAMES, FORM_FIELDS, type ConstantFormState } from '@/components/screens/library/use-constant-form';
import { logSymbol } from '@/components/screens/library/words';
import { space } from '@/components/theme/tokens';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { Notice } from '@/components/ui/notice';
import { TextField } from '@/components/ui/text-field';
import { KIND_LABELS, type ConstantSummary } from '@/shared/constants';

function summary(form: ConstantFormState): string | undefined {
  const wrong = FORM_FIELDS.filter((f) => form.errors.fields[f]).map((f) => FIELD_NAMES[f]);
  if (wrong.length === 0) return form.errors.form;
  const fields = `Check ${wrong.join(', ')}.`;
  return form.errors.form ? `${form.errors.form} ${fields}` : fields;
}

type Props = { form: ConstantFormState; base?: ConstantSummary; busy: boolean };

/** The fields of a proposal, or of a revision when `base` is given (its kind and reaction cannot change). */
export function ConstantForm({ form, base, busy }: Props) {
  const { texts, errors, set } = form;
  const submit = () => void form.submit();
  const problem = summary(form);
  const kind = base?.kind ?? texts.kind;
  return (
    <Card style={styles.card} testID="constant-form">
      {problem ? <Notice kind="error" message={problem} /> : null}
      {base ? (
        <>
          <ReadOnly label="Reaction" value={base.reaction} />
          <ReadOnly label="Kind of constant" value={KIND_LABELS[base.kind].label} />
        </>
      ) : (
        <>
          <KindChips form={form} />
          <TextField
            label="Reaction"
            value={texts.reaction}
            onChangeText={set('reaction')}
            error={errors.fields.reaction}
            hint={'Charges after the formula, " + " with spaces between species, e.g. Ag+ + 2 NH3 = Ag(NH3)2+'}
          />
        </>
      )}
      <Pair>
        <Half>
          <TextField
            label="Log value"
            value={texts.logValue}
            onChangeText={set('logValue')}
            error={errors.fields.logValue}
            hint={kind ? `${logSymbol(kind)}, base-10` : 'The base-10 logarithm of the constant'}
            onSubmit={submit}
          />
        </Half>
        <Half>
          <TextField
            label="Uncertainty (± log units)"
            value={texts.uncertainty}
            onChangeText={set('uncertainty')}
            error={errors.fields.uncertainty}
            hint="Optional"
            inputMode="decimal"
            onSubmit={submit}
          />
        </Half>
      </Pair>
      <Pair>
        <Half>
          <TextField
            label="Temperature (°C)"
            value={texts.temperatureC}
            onChangeText={set('temperatureC')}
            error={errors.fields.temperatureC}
            hint="25 °C when left empty"
            inputMode="decimal"
            onSubmit={submit}
          />
        </Half>
        <Half>
          <TextField
            label="Ionic strength (mol/L)"
            value={texts.ionicStrength}
            onChangeText={set('ionicStrength')}
            error={errors.fields.ionicStrength}
            hint="0 (infinite dilution) when left empty"
            inputMode="decimal"
            onSubmit={submit}
          />
        </Half>
      </Pair>
      <Pair>
        <Half>
          <TextField
            label="Medium"
            value={texts.medium}
            onChangeText={set('medium')}
            error={errors.fields.medium}
            hint="Background electrolyte, e.g. 0.1 M NaClO4; optional"
            onSubmit={submit}
          />
        </Half>
        <Half>
          <TextField
            label="Enthalpy of reaction (kJ/mol)"
            value={texts.enthalpyKjMol}
            onChangeText={set('enthalpyKjMol')}
            error={errors.fields.enthalpyKjMol}
            hint="ΔH if the source gives it, for temperature corrections; optional"
            onSubmit={submit}
          />
        </Half>
      </Pair>
      <TextField
        label="Source"
        value={texts.source}
        onChangeText={set('source')}
        error={errors.fields.source}
        hint="Handbook, table, edition or year; say 'from memory' if it is"
        autoCapitalize="sentences"
        onSubmit={submit}
      />
      <TextField
        label={base ? 'What changed and why' : 'Note (optional)'}
        value={texts.note}
        onChangeText={set('note')}
        error={errors.fields.note}
        hint={base ? 'The reviewer reads this first' : 'Anything the reviewer should know'}
        autoCapitalize="sentences"
        onSubmit={submit}
      />
      <Button label="Send for review" busyLabel="Sending…" busy={busy} variant="primary" onPress={submit} />
    </Card>
  );
}

const styles = StyleSheet.create({
  card: { gap: space.md, maxWidth: 720 },
});
