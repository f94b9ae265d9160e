import { z } from 'zod';
import { StyleSheet, View } from 'react-native';

import { space } from '@/components/theme/tokens';
import { ThemedText } from '@/components/ui/themed-text';
import { systemRequestSchema } from '@/shared/constants';

/** The system request a run was saved with; the stored inputs may hold it whole or under "system". */
export function runSystem(inputs: Record<string, unknown>) {
  const nested = inputs.system;
  const candidate = typeof nested === 'object' && nested !== null && !Array.isArray(nested) ? nested : inputs;
  const parsed = systemRequestSchema.safeParse(candidate);
  return parsed.success ? parsed.data : null;
}

type System = z.infer<typeof systemRequestSchema>;

function list(items: readonly string[], none: string): string {
  return items.length === 0 ? none : items.join(', ');
}

function facts(s: System): [string, string][] {
  const totals = Object.entries(s.totals).map(([f, v]) => `${f} ${v} mol/L`);
  return [
    ['Metal ions', list(s.metals, 'none')],
    ['Ligands', list(s.ligands, 'none')],
    ['Counter-ions', list(s.counterIons, 'none')],
    ['Totals', list(totals, 'none given')],
    ['pH', s.pH === undefined ? 'not given' : String(s.pH)],
    ['Activity', s.activity === 'davies' ? 'Davies' : 'Ideal'],
    ['Temperature', `${s.temperatureC} °C`],
    ['Constants', s.includeDrafts ? 'Drafts waiting for review were allowed' : 'Approved values only'],
    ['Solids allowed', s.solids === undefined ? 'Every solid the ions can form' : list(s.solids, 'none')],
  ];
}

/** What a saved run was asked: the ions, totals, pH and choices, in words. */
export function RunInputs({ inputs }: { inputs: Record<string, unknown> }) {
  const system = runSystem(inputs);
  return (
    <View style={styles.section} testID="run-inputs">
      <ThemedText variant="title" accessibilityRole="header" aria-level={2}>
        Inputs
      </ThemedText>
      {system ? (
        facts(system).map(([label, value]) => (
          <ThemedText key={label} variant="label" weight="regular" selectable>
            <ThemedText variant="label" tone="textMuted">{`${label}: `}</ThemedText>
            {value}
          </ThemedText>
        ))
      ) : (
        // NOTE: inputs saved in a shape this screen does not know are shown as they were stored.
        <ThemedText variant="caption" selectable>
          {JSON.stringify(inputs, null, 2)}
        </ThemedText>
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  section: { gap: space.xs },
});
