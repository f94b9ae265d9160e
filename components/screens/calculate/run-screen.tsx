import { StyleSheet, View } from 'react-native';

import { CautionNote } from '@/components/screens/calculate/caution-note';
import { ConstantsUsed } from '@/components/screens/calculate/constants-used';
import { RunInputs, runSystem } from '@/components/screens/calculate/run-inputs';
import { CALCULATOR_LABELS, runStatus, runTitle } from '@/components/screens/calculate/run-words';
import { METAL_CHOICES } from '@/components/screens/calculate/speciation-summary';
import { SpeciationResult } from '@/components/screens/calculate/speciation-result';
import { space } from '@/components/theme/tokens';
import { useIsWide } from '@/components/theme/use-is-wide';
import { Card } from '@/components/ui/card';
import { ErrorState } from '@/components/ui/error-state';
import { formatWhen } from '@/components/ui/format-date';
import { LoadingState } from '@/components/ui/loading-state';
import { ScreenContainer } from '@/components/ui/screen-container';
import { StatusPill } from '@/components/ui/status-dot';
import { ThemedText } from '@/components/ui/themed-text';
import { isClientError } from '@/lib/api/fetcher';
import { useRun } from '@/lib/api/use-runs';
import { type Run } from '@/shared/constants';

const BACK = { href: '/calculate/runs', label: 'Saved runs' } as const;

function RunBody({ run }: { run: Run }) {
  const wide = useIsWide();
  const status = runStatus(run.status);
  const metals = runSystem(run.inputs)?.metals ?? run.problem.components.filter((c) => METAL_CHOICES.some((m) => m.formula === c));
  return (
    <>
      <View style={styles.head}>
        <ThemedText variant="label" weight="regular" tone="textMuted">
          {`${CALCULATOR_LABELS[run.calculator]} · by ${run.author.name} · ${formatWhen(run.createdAt)} · engine ${run.engineVersion}`}
        </ThemedText>
        <View style={styles.pills}>
          <StatusPill kind={status.kind} label={status.label} />
          {run.usesDrafts ? <StatusPill kind="warn" label="Uses drafts" /> : null}
        </View>
        {run.usesDrafts ? <CautionNote message="This run used draft values that had not been reviewed when it was saved." /> : null}
        {run.warnings.map((w) => (
          <CautionNote key={w} message={w} />
        ))}
      </View>
      <View style={wide ? styles.row : styles.stack}>
        <Card style={[styles.card, wide && styles.inputs]}>
          <RunInputs inputs={run.inputs} />
        </Card>
        <View style={[styles.stack, wide && styles.results]}>
          <ThemedText variant="title" accessibilityRole="header" aria-level={2}>
            Result
          </ThemedText>
          <SpeciationResult problem={run.problem} result={run.result} metals={metals} />
        </View>
      </View>
      <ConstantsUsed
        constants={run.constants}
        note="The versions this run used, kept as they were. When a value has since been replaced, the run still shows the one it used."
      />
    </>
  );
}

/** One saved run: who and when, its inputs, the stored result and the constant versions it used. */
export function RunScreen({ id }: { id: string }) {
  const { data, error, isLoading, mutate } = useRun(id);
  let body;
  if (error) body = <ErrorState message={error.message} onRetry={isClientError(error) ? undefined : () => void mutate()} />;
  else if (isLoading || !data) body = <LoadingState label="Loading the run…" />;
  else body = <RunBody run={data} />;
  return (
    <ScreenContainer title={data ? runTitle(data) : 'Saved run'} back={BACK}>
      {body}
    </ScreenContainer>
  );
}

const styles = StyleSheet.create({
  head: { gap: space.sm },
  pills: { flexDirection: 'row', flexWrap: 'wrap', gap: space.xs },
  row: { flexDirection: 'row', alignItems: 'flex-start', gap: space.xl },
  stack: { gap: space.md, minWidth: 0 },
  card: { gap: space.sm, minWidth: 0 },
  inputs: { flex: 1 },
  results: { flex: 1.4 },
});
