import { useMemo } from 'react';
import { StyleSheet, View } from 'react-native';

import { HazardBanner } from '@/components/hazards/hazard-banner';
import { useCalculationHazards } from '@/components/hazards/use-calculation-hazards';

import { CautionNote } from '@/components/screens/calculate/caution-note';
import { resultViewFor } from '@/components/screens/calculators/result-views';
import { space } from '@/components/theme/tokens';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { ThemedText } from '@/components/ui/themed-text';

import { downloadText } from './download-text';
import { ModelNotes } from './model-notes';
import { type CalculatorFrameProps, type FrameOutcome } from './types';

type Props = Pick<CalculatorFrameProps, 'calculator' | 'verdict' | 'csv' | 'emptyHint' | 'display'> & {
  outcome: FrameOutcome | null;
  stale: boolean;
  running: boolean;
  /** The last calculation was refused: say so here too, since on a phone the marked fields may be far above. */
  failed: boolean;
};

/** A verdict as words only: a calculator that yields NaN somewhere must not show it. */
function clean(text: string): string {
  return text.replace(/\bNaN\b/g, '—').replace(/\b(-?)Infinity\b/g, '—');
}

function Answer({ outcome, calculator, verdict, csv, display }: Omit<Props, 'outcome' | 'stale' | 'running' | 'emptyHint' | 'failed'> & { outcome: FrameOutcome }) {
  const { run } = outcome;
  const View_ = resultViewFor(calculator);
  const file = csv ? csv(run.result, outcome) : null;
  const line = clean(verdict ? verdict(run, outcome) : run.verdict);
  return (
    <>
      {run.status !== 'converged' ? (
        <Notice kind="error" testID="not-settled" message="The calculation did not fully settle: read these numbers with care, and see the cautions under Model notes." />
      ) : null}
      <ThemedText variant="title" weight="semibold" testID="calculator-verdict" accessibilityLiveRegion="polite">
        {line}
      </ThemedText>
      {outcome.bath ? <View_ problem={outcome.built.problem} result={outcome.bath} output={run.result} params={{ ...outcome.params, ...display }} /> : null}
      {file ? (
        <Button label="Download CSV" accessibilityLabel={`Download the result as CSV (${file.filename})`} onPress={() => downloadText(file)} testID="download-csv" />
      ) : null}
    </>
  );
}

/** The result column: the verdict first and large, the calculator's own view, the CSV download and the model notes. */
export function ResultPanel({ outcome, stale, running, failed, emptyHint, ...rest }: Props) {
  const shown = useMemo(
    () => (outcome ? { calculator: rest.calculator, request: outcome.request, problem: outcome.built.problem, params: outcome.params, result: outcome.run.result } : null),
    [outcome, rest.calculator],
  );
  const hazards = useCalculationHazards(shown);
  if (!outcome) {
    return (
      <View style={styles.panel} testID="calculator-result">
        {failed ? <Notice kind="error" testID="calculation-refused" message="Nothing was worked out: see the marked inputs above." /> : null}
        <ThemedText variant="body" tone="textMuted">
          {running ? 'Calculating…' : (emptyHint ?? 'Describe the solution, fill in the fields, then press Calculate.')}
        </ThemedText>
      </View>
    );
  }
  return (
    <View style={styles.panel} testID="calculator-result">
      <ThemedText variant="label" tone="textMuted" accessibilityRole="header" aria-level={2}>
        Result
      </ThemedText>
      {stale ? <CautionNote testID="stale" message="The inputs changed since this result was worked out. Press Calculate again." /> : null}
      <HazardBanner hazards={hazards} compact />
      {hazards.some((h) => h.flag) ? (
        <ThemedText variant="caption" tone="textMuted" testID="flag-explained">
          Saved as a run, this goes to the safety desk and cannot be released until a safety officer signs it off.
        </ThemedText>
      ) : null}
      <Answer outcome={outcome} {...rest} />
      <ModelNotes outcome={outcome} />
    </View>
  );
}

const styles = StyleSheet.create({
  panel: { gap: space.md, minWidth: 0 },
});
