// The frame every calculator screen shares. A calculator supplies its parameters and their fields;
// the frame does the rest: start from a bath, the solution's inputs, Calculate (sticky on a phone),
// building the system from the library, running the calculator in the browser with the function the
// server runs, the verdict, the calculator's result view, model notes, CSV and saving the run.
//
// Use (every prop is documented on CalculatorFrameProps in frame/types.ts):
//   <CalculatorFrame
//     calculator="headroom"
//     params={({ built, form }) => ({ ok: true, params: { solid: 'AgCN(s)' } })}  // or { ok: false, errors: { solid: 'Choose a solid' } }
//     paramFields={['solid', 'metal']}                 // the fields that show errors beside them
//     renderParams={(ctx) => <MyFields built={ctx.built} errors={ctx.errors} disabled={ctx.disabled} />}
//     display={{ unit }}                              // reading choices: to the view and the saved params, never stale
//     verdict={(run) => run.verdict}  csv={(output) => ({ filename, text })}  live={false}
//   />
// Register the calculator's result view in result-views.tsx; the frame shows it under the verdict.
// `?bath=<id>` in the route starts from that bath.
import { useLocalSearchParams } from 'expo-router';
import { StyleSheet, View } from 'react-native';

import { SolidsChoice } from '@/components/screens/calculate/solids-choice';
import { SystemForm } from '@/components/screens/calculate/system-form';
import { useSystemForm } from '@/components/screens/calculate/use-system-form';
import { space } from '@/components/theme/tokens';
import { useIsWide } from '@/components/theme/use-is-wide';
import { Card } from '@/components/ui/card';
import { Notice } from '@/components/ui/notice';
import { ScreenContainer } from '@/components/ui/screen-container';
import { ThemedText } from '@/components/ui/themed-text';
import { useMe } from '@/lib/api/use-me';
import { hasRole } from '@/shared/auth';
import { CALCULATOR_LABELS } from '@/shared/calculators';

import { BathPicker } from './frame/bath-picker';
import { CalculateBar, STICKY_BAR_SPACE } from './frame/calculate-bar';
import { ResultPanel } from './frame/result-panel';
import { SaveCalculationCard } from './frame/save-calculation-card';
import { type CalculatorFrameProps } from './frame/types';
import { useBathStart } from './frame/use-bath-start';
import { useCalculation } from './frame/use-calculation';

export type { CalculatorFrameProps, FrameOutcome, ParamsBase, ParamsCheck, ParamsSlotContext, CalculationRunner, RunnerInput, TextFile } from './frame/types';

function useBathParam(): string | null {
  const { bath } = useLocalSearchParams<{ bath?: string }>();
  return typeof bath === 'string' && bath.trim() !== '' ? bath : null;
}

/** A calculator screen: inputs on the left (bath, solution, the calculator's fields), results on the right; stacked on a phone. */
export function CalculatorFrame(props: CalculatorFrameProps) {
  const { calculator, renderParams } = props;
  const form = useSystemForm();
  const start = useBathStart(form, useBathParam());
  const calc = useCalculation(form, start.bathId, props);
  const me = useMe().data;
  const wide = useIsWide();
  const label = CALCULATOR_LABELS[calculator];
  const busy = calc.running;
  const top = [form.errors.form, calc.top].filter(Boolean).join('; ');
  const available = calc.built?.availableSolids ?? [];

  const bar = <CalculateBar onCalculate={calc.calculate} onCancel={calc.cancel} running={busy} progress={calc.progress} sticky={!wide} />;
  const inputs = (
    <View style={[styles.column, wide && styles.inputs]}>
      <Card style={styles.card} testID="calculator-inputs">
        <ThemedText variant="title" accessibilityRole="header" aria-level={2}>
          The solution
        </ThemedText>
        <BathPicker start={start} disabled={busy} />
        {top ? <Notice kind="error" message={top} testID="calculator-error" /> : null}
        <SystemForm form={form} disabled={busy} onSubmit={calc.calculate} />
        <SolidsChoice available={available} chosen={form.solids} disabled={busy} onToggle={(name) => form.toggleSolid(name, available)} />
      </Card>
      <Card style={styles.card} testID="calculator-params">
        <ThemedText variant="title" accessibilityRole="header" aria-level={2}>
          {`${label.label}: what to work out`}
        </ThemedText>
        {renderParams({ ...calc.base, errors: calc.paramErrors, disabled: busy, submit: calc.calculate })}
      </Card>
      {wide ? bar : null}
    </View>
  );
  const canSave = hasRole(me, 'chemist', 'technician');
  const results = (
    <View style={[styles.column, wide && styles.results]}>
      <ResultPanel outcome={calc.outcome} stale={calc.stale} running={busy} failed={calc.failed} calculator={calculator} verdict={props.verdict} csv={props.csv} display={props.display} emptyHint={props.emptyHint} />
      {canSave ? (
        <SaveCalculationCard calculation={calc} disabled={busy} bathName={start.bath?.name} />
      ) : me ? (
        <ThemedText variant="caption" tone="textMuted">
          Saving runs is for chemists and technicians.
        </ThemedText>
      ) : null}
    </View>
  );
  return (
    <View style={styles.root}>
      <ScreenContainer title={label.label} subtitle={`${label.does}.`} back={{ href: '/calculate', label: 'Calculate' }}>
        <View style={wide ? styles.row : styles.stack}>
          {inputs}
          {results}
        </View>
        {wide ? null : <View style={styles.spacer} />}
      </ScreenContainer>
      {wide ? null : bar}
    </View>
  );
}

const styles = StyleSheet.create({
  root: { flex: 1 },
  row: { flexDirection: 'row', alignItems: 'flex-start', gap: space.xl },
  stack: { gap: space.xl },
  column: { gap: space.lg, minWidth: 0 },
  inputs: { flex: 1 },
  results: { flex: 1.3 },
  card: { gap: space.md },
  spacer: { height: STICKY_BAR_SPACE },
});
