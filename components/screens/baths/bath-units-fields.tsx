import { StyleSheet, View } from 'react-native';

import { ligandChoices, type TargetName } from '@/components/screens/baths/bath-form-texts';
import { GroupMessage } from '@/components/screens/baths/bath-form-parts';
import { type BathFormState } from '@/components/screens/baths/use-bath-form';
import { ChoiceChips } from '@/components/screens/calculate/choice-chips';
import { Half, Pair, ReadOnly } from '@/components/screens/library/form-parts';
import { space } from '@/components/theme/tokens';
import { TextField } from '@/components/ui/text-field';
import { ThemedText } from '@/components/ui/themed-text';
import { quantityLabel } from '@/lib/baths/quantities';
import { CONCENTRATION_UNITS } from '@/lib/units';
import { BATH_UNITS, PROCESS_INFO, type BathUnit } from '@/shared/baths';

const UNIT_OPTIONS = BATH_UNITS.map((u) => ({
  value: u,
  label: u,
  hint: CONCENTRATION_UNITS.find((c) => c.id === u)?.description,
}));

/** The units the metal and the ligand are shown and entered in, and the salt the ligand is stated as. */
export function UnitFields({ form }: { form: BathFormState }) {
  const { texts, errors } = form;
  const salts = ligandChoices(texts.process);
  return (
    <View style={styles.group}>
      <ThemedText variant="caption" tone="textMuted">
        troy oz/gal is how precious-metal shops state metal; oz/gal is for salts such as free cyanide. Mass units count the
        metal as the element and the ligand as the salt it is stated as.
      </ThemedText>
      <ChoiceChips<BathUnit> label="Metal shown in" options={UNIT_OPTIONS} value={texts.metalUnit} onChange={form.setMetalUnit} />
      <GroupMessage error={errors.fields.metalUnit} />
      <ChoiceChips<BathUnit> label="Ligand shown in" options={UNIT_OPTIONS} value={texts.ligandUnit} onChange={form.setLigandUnit} />
      <GroupMessage error={errors.fields.ligandUnit} />
      {salts.length > 1 ? (
        <ChoiceChips<string>
          label="Free and total ligand stated as"
          options={salts.map((s) => ({ value: s, label: s }))}
          value={texts.ligandAs}
          onChange={form.setLigandAs}
        />
      ) : salts.length === 1 ? (
        <ReadOnly label="Free and total ligand stated as" value={salts[0] ?? ''} />
      ) : (
        <ReadOnly label="Free and total ligand stated as" value="Choose a process first" />
      )}
      <GroupMessage error={errors.fields.ligandAs} hint={salts.length > 1 ? 'The salt the free and total ligand are reported as; usually the one the bath is made up with.' : undefined} />
    </View>
  );
}

function rangeLabels(form: BathFormState): Record<TargetName, string> {
  const { process, ligandAs, metalUnit, ligandUnit } = form.texts;
  const bath = process ? { metal: PROCESS_INFO[process].metal, ligandAs: ligandAs || PROCESS_INFO[process].ligandAs, carbonateAs: null } : undefined;
  return {
    metal: `${quantityLabel('metal', bath)}, %s (${metalUnit})`,
    freeLigand: `${quantityLabel('freeLigand', bath)}, %s (${ligandUnit})`,
    pH: 'pH, %s',
  };
}

/** Low and high ends of the metal, free ligand and pH ranges, in the units chosen above; either end may stay empty. */
export function TargetFields({ form }: { form: BathFormState }) {
  const labels = rangeLabels(form);
  const submit = () => void form.submit();
  return (
    <View style={styles.group}>
      <ThemedText variant="caption" tone="textMuted">
        Leave an end empty for no limit. The list flags the latest analysis when it falls outside a range.
      </ThemedText>
      {(['metal', 'freeLigand', 'pH'] as const).map((name) => (
        <Pair key={name}>
          {(['min', 'max'] as const).map((end) => (
            <Half key={end}>
              <TextField
                label={labels[name].replace('%s', end === 'min' ? 'low' : 'high')}
                value={form.texts.targets[name][end]}
                onChangeText={form.setTarget(name, end)}
                error={form.errors.fields[`targets.${name}.${end}`]}
                inputMode="decimal"
                onSubmit={submit}
              />
            </Half>
          ))}
        </Pair>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  group: { gap: space.sm },
});
