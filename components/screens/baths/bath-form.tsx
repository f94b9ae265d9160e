import { StyleSheet, View } from 'react-native';

import { fieldName } from '@/components/screens/baths/bath-form-texts';
import { MakeUpLines, ProcessChips, Section } from '@/components/screens/baths/bath-form-parts';
import { TargetFields, UnitFields } from '@/components/screens/baths/bath-units-fields';
import { type BathFormState } from '@/components/screens/baths/use-bath-form';
import { ChoiceChips } from '@/components/screens/calculate/choice-chips';
import { Half, Pair } from '@/components/screens/library/form-parts';
import { space } from '@/components/theme/tokens';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { TextField } from '@/components/ui/text-field';

const VOLUME_CHOICES = [
  { value: 'L', label: 'L', hint: 'litres' },
  { value: 'gal', label: 'US gal', hint: 'US gallons' },
] as const;

/** "Check name, tank volume." with any message for the form as a whole before it. */
function summary(form: BathFormState): string | undefined {
  const wrong = [...new Set(Object.keys(form.errors.fields).map(fieldName))];
  if (wrong.length === 0) return form.errors.form;
  const fields = `Check ${wrong.join(', ')}.`;
  if (!form.errors.form) return fields;
  return /[.!?]$/.test(form.errors.form) ? `${form.errors.form} ${fields}` : `${form.errors.form}. ${fields}`;
}

function BathFields({ form }: { form: BathFormState }) {
  const { texts, errors, set } = form;
  const submit = () => void form.submit();
  return (
    <Section title="The bath">
      <TextField
        label="Name"
        value={texts.name}
        onChangeText={set('name')}
        error={errors.fields.name}
        hint="What the shop calls it, e.g. Silver line 2"
        autoCapitalize="sentences"
        onSubmit={submit}
      />
      <ProcessChips form={form} />
      <Pair>
        <Half>
          <TextField
            label={`Tank volume (${texts.volumeUnit === 'gal' ? 'US gal' : 'L'})`}
            value={texts.volume}
            onChangeText={set('volume')}
            error={errors.fields.volume}
            inputMode="decimal"
            onSubmit={submit}
          />
        </Half>
        <Half>
          <ChoiceChips label="Volume unit" options={VOLUME_CHOICES} value={texts.volumeUnit} onChange={form.setVolumeUnit} />
        </Half>
      </Pair>
      <TextField
        label="Temperature (°C)"
        value={texts.temperatureC}
        onChangeText={set('temperatureC')}
        error={errors.fields.temperatureC}
        hint="Working temperature; optional"
        inputMode="decimal"
        onSubmit={submit}
      />
    </Section>
  );
}

type Props = { form: BathFormState; busy: boolean; saveLabel: string };

/** Every field of a bath record in titled parts, with Save at the end and the mistakes listed just above it. */
export function BathForm({ form, busy, saveLabel }: Props) {
  const { texts, errors, set } = form;
  const problem = summary(form);
  return (
    <View style={styles.form} testID="bath-form">
      <BathFields form={form} />
      <Section title="Make-up">
        <MakeUpLines form={form} />
      </Section>
      <Section title="Units">
        <UnitFields form={form} />
      </Section>
      <Section title="Target ranges">
        {form.note ? <Notice kind="info" message={form.note} /> : null}
        <TargetFields form={form} />
      </Section>
      <Section title="Site and notes">
        <TextField
          label="Site"
          value={texts.site}
          onChangeText={set('site')}
          error={errors.fields.site}
          hint="Where the tank stands; optional"
          autoCapitalize="sentences"
        />
        <TextField
          label="Notes"
          value={texts.notes}
          onChangeText={set('notes')}
          error={errors.fields.notes}
          hint="Anything the next person should know; optional"
          autoCapitalize="sentences"
        />
      </Section>
      {problem ? <Notice kind="error" message={problem} /> : null}
      <Button label={saveLabel} busyLabel="Saving…" busy={busy} variant="primary" onPress={() => void form.submit()} />
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.lg, maxWidth: 720, alignSelf: 'stretch' },
});
