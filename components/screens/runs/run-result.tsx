import { StyleSheet, View } from 'react-native';

import { runParams } from '@/components/screens/calculate/run-inputs';
import { CALCULATOR_LABELS } from '@/components/screens/calculate/run-words';
import { resultViewFor } from '@/components/screens/calculators/result-views';
import { space } from '@/components/theme/tokens';
import { ThemedText } from '@/components/ui/themed-text';
import { type Run } from '@/shared/constants';

/**
 * A saved run's result: the calculator's own view of its stored output. Runs saved before the
 * calculators kept an output have only the bath's equilibrium, so they show its tables instead.
 */
export function RunResult({ run, print = false }: { run: Run; print?: boolean }) {
  const stored = run.output !== null && run.output !== undefined;
  const ResultView = resultViewFor(stored ? run.calculator : 'speciation');
  return (
    <View style={styles.block}>
      <ThemedText variant="title" accessibilityRole="header" aria-level={2}>
        Result
      </ThemedText>
      {!stored && run.calculator !== 'speciation' ? (
        <ThemedText variant="caption" tone="textMuted" testID="no-output">
          {`This run was saved before the ${CALCULATOR_LABELS[run.calculator].toLowerCase()} calculator kept its own result: the bath's equilibrium is shown.`}
        </ThemedText>
      ) : null}
      <ResultView problem={run.problem} result={run.result} output={stored ? run.output : null} params={runParams(run.inputs)} print={print} />
    </View>
  );
}

const styles = StyleSheet.create({
  block: { gap: space.md, minWidth: 0 },
});
