import { StyleSheet, View } from 'react-native';

import { CautionNote } from '@/components/screens/calculate/caution-note';
import { ChoiceChips } from '@/components/screens/calculate/choice-chips';
import { COUNTER_CHOICES, LIGAND_CHOICES, METAL_CHOICES, type ComponentChoice } from '@/components/screens/calculate/speciation-summary';
import { type ActivityChoice, type ComponentGroup, type SystemForm, TOTAL_UNITS, type TotalUnit } from '@/components/screens/calculate/use-system-form';
import { space } from '@/components/theme/tokens';
import { ToggleChip } from '@/components/ui/chip';
import { TextField } from '@/components/ui/text-field';
import { ThemedText } from '@/components/ui/themed-text';

const ACTIVITY_OPTIONS = [
  { value: 'davies', label: 'Davies', hint: 'Corrects activities for ionic strength; fine up to about 0.5 mol/L' },
  { value: 'ideal', label: 'Ideal', hint: 'Treats activities as equal to concentrations' },
] as const;

type GroupProps = { form: SystemForm; group: ComponentGroup; title: string; choices: readonly ComponentChoice[]; disabled: boolean };

function ComponentChips({ form, group, title, choices, disabled }: GroupProps) {
  const error = form.errors.fields[group];
  return (
    <View style={styles.group} role="group" aria-label={title}>
      <ThemedText variant="label">{title}</ThemedText>
      <View style={styles.chips}>
        {choices.map((c) => (
          <ToggleChip
            key={c.formula}
            label={c.formula}
            accessibilityLabel={`${c.name} (${c.formula})`}
            checked={form.groups[group].includes(c.formula)}
            disabled={disabled}
            onToggle={() => form.toggle(group, c.formula)}
          />
        ))}
      </View>
      {error ? (
        <ThemedText variant="label" weight="regular" tone="danger" accessibilityLiveRegion="polite">
          {error}
        </ThemedText>
      ) : null}
    </View>
  );
}

/** The system builder's inputs: ions, a total for each, pH, activity model and whether drafts count. */
export function SystemForm({ form, disabled, onSubmit }: { form: SystemForm; disabled: boolean; onSubmit: () => void }) {
  return (
    <View style={styles.form}>
      <ComponentChips form={form} group="metals" title="Metal ions" choices={METAL_CHOICES} disabled={disabled} />
      <ComponentChips form={form} group="ligands" title="Ligands" choices={LIGAND_CHOICES} disabled={disabled} />
      <ComponentChips form={form} group="counterIons" title="Counter-ions" choices={COUNTER_CHOICES} disabled={disabled} />
      {form.chosen.length > 0 ? (
        <View style={styles.group}>
          <ThemedText variant="label" accessibilityRole="header" aria-level={3}>
            Totals
          </ThemedText>
          <ThemedText variant="caption" tone="textMuted">
            Analytical concentration of each chosen ion, free and bound together, in mol/L.
          </ThemedText>
          {form.chosen.map((formula) => (
            <View key={formula} style={styles.total}>
              <TextField
                label={`Total ${formula} (${form.totalUnits[formula] ?? 'mol/L'})`}
                value={form.totals[formula] ?? ''}
                onChangeText={(text) => form.setTotal(formula, text)}
                onSubmit={onSubmit}
                error={form.errors.fields[`totals.${formula}`]}
                inputMode="decimal"
              />
              <ChoiceChips<TotalUnit>
                label={`Unit of the ${formula} total`}
                options={TOTAL_UNITS.map((u) => ({ value: u, label: u, hint: u === 'mol/L' || u === 'mmol/L' ? undefined : `mass of ${formula.replace(/[+-]\d*$/, '')} per volume` }))}
                value={form.totalUnits[formula] ?? 'mol/L'}
                onChange={(u) => form.setTotalUnit(formula, u)}
                disabled={disabled}
              />
            </View>
          ))}
        </View>
      ) : null}
      <TextField
        label="pH (optional, measured)"
        value={form.pH}
        onChangeText={form.setPH}
        onSubmit={onSubmit}
        error={form.errors.fields.pH}
        hint="Leave empty to leave pH out of the calculation."
        inputMode="decimal"
      />
      <TextField
        label="Temperature (°C)"
        value={form.temperature}
        onChangeText={form.setTemperature}
        onSubmit={onSubmit}
        error={form.errors.fields.temperatureC}
        hint="Constants with a known enthalpy are corrected to it (van 't Hoff); the others are used as measured, and the result says which."
        inputMode="decimal"
      />
      <ChoiceChips<ActivityChoice> label="Activity" options={ACTIVITY_OPTIONS} value={form.activity} onChange={form.setActivity} disabled={disabled} />
      <View style={styles.group}>
        <ToggleChip
          label="Use drafts waiting for review"
          checked={form.includeDrafts}
          disabled={disabled}
          hint="Uses proposed values that no reviewer has approved yet, in place of the approved ones"
          onToggle={() => form.setIncludeDrafts(!form.includeDrafts)}
        />
        {form.includeDrafts ? (
          <CautionNote
            testID="drafts-warning"
            message="Drafts have not been reviewed. A result that uses them is marked as such; do not use it to run a bath."
          />
        ) : null}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  total: { gap: space.xs },
  form: { gap: space.lg },
  group: { gap: space.xs },
  chips: { flexDirection: 'row', flexWrap: 'wrap', gap: space.xs },
});
