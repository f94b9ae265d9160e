import { z } from 'zod';
import { StyleSheet, View } from 'react-native';

import { CALCULATOR_LABELS, paramFacts, type Fact } from '@/components/screens/calculate/run-words';
import { space } from '@/components/theme/tokens';
import { ThemedText } from '@/components/ui/themed-text';
import { type CalculatorKey } from '@/shared/calculators';
import { systemRequestSchema } from '@/shared/constants';

/** The system request a run was saved with; the stored inputs may hold it whole or under "system". */
export function runSystem(inputs: Record<string, unknown>) {
  const nested = inputs.system;
  const candidate = typeof nested === 'object' && nested !== null && !Array.isArray(nested) ? nested : inputs;
  const parsed = systemRequestSchema.safeParse(candidate);
  return parsed.success ? parsed.data : null;
}

/** The calculator's parameters a run was saved with ({} for runs saved before calculators had any). */
export function runParams(inputs: Record<string, unknown>): Record<string, unknown> {
  const params = inputs.params;
  return typeof params === 'object' && params !== null && !Array.isArray(params) ? (params as Record<string, unknown>) : {};
}

type System = z.infer<typeof systemRequestSchema>;

function list(items: readonly string[], none: string): string {
  return items.length === 0 ? none : items.join(', ');
}

function facts(s: System): Fact[] {
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

function Lines({ items }: { items: readonly Fact[] }) {
  return items.map(([label, value]) => (
    <ThemedText key={label} variant="label" weight="regular" selectable>
      <ThemedText variant="label" tone="textMuted">{`${label}: `}</ThemedText>
      {value}
    </ThemedText>
  ));
}

// NOTE: inputs saved in a shape this screen does not know are shown as they were stored.
function AsStored({ value }: { value: unknown }) {
  return (
    <ThemedText variant="caption" selectable>
      {JSON.stringify(value, null, 2)}
    </ThemedText>
  );
}

function Settings({ calculator, params }: { calculator: CalculatorKey; params: Record<string, unknown> }) {
  const described = paramFacts(calculator, params);
  return (
    <View style={[styles.section, styles.settings]} testID="run-params">
      <ThemedText variant="body" weight="bold" accessibilityRole="header" aria-level={3}>
        {`${CALCULATOR_LABELS[calculator]} settings`}
      </ThemedText>
      {described === null ? (
        <AsStored value={params} />
      ) : described.length === 0 ? (
        <ThemedText variant="label" weight="regular" tone="textMuted">
          None beyond the system.
        </ThemedText>
      ) : (
        <Lines items={described} />
      )}
    </View>
  );
}

type Props = { inputs: Record<string, unknown>; calculator?: CalculatorKey };

/** What a saved run was asked: the ions, totals, pH and choices, then the calculator's own settings, in words. */
export function RunInputs({ inputs, calculator }: Props) {
  const system = runSystem(inputs);
  return (
    <View style={styles.section} testID="run-inputs">
      <ThemedText variant="title" accessibilityRole="header" aria-level={2}>
        Inputs
      </ThemedText>
      {system ? <Lines items={facts(system)} /> : <AsStored value={inputs} />}
      {calculator && system ? <Settings calculator={calculator} params={runParams(inputs)} /> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  section: { gap: space.xs },
  settings: { marginTop: space.sm },
});
