import { StyleSheet, View } from 'react-native';

import { CautionNote } from '@/components/screens/calculate/caution-note';
import { ConstantsUsed } from '@/components/screens/calculate/constants-used';
import { RunInputs } from '@/components/screens/calculate/run-inputs';
import { CALCULATOR_LABELS, runStatus, runTitle } from '@/components/screens/calculate/run-words';
import { ModelNotes } from '@/components/screens/runs/model-notes';
import { RunActions } from '@/components/screens/runs/run-actions';
import { RunResult } from '@/components/screens/runs/run-result';
import { RunSafety } from '@/components/screens/runs/run-safety';
import { RunVerdict } from '@/components/screens/runs/run-verdict';
import { space } from '@/components/theme/tokens';
import { useIsWide } from '@/components/theme/use-is-wide';
import { Card } from '@/components/ui/card';
import { ErrorState } from '@/components/ui/error-state';
import { formatWhen } from '@/components/ui/format-date';
import { LoadingState } from '@/components/ui/loading-state';
import { ScreenContainer } from '@/components/ui/screen-container';
import { StatusPill } from '@/components/ui/status-dot';
import { TextLink } from '@/components/ui/text-link';
import { ThemedText } from '@/components/ui/themed-text';
import { isClientError } from '@/lib/api/fetcher';
import { useMe } from '@/lib/api/use-me';
import { useRun } from '@/lib/api/use-runs';
import { type Run } from '@/shared/constants';

const BACK = { href: '/calculate/runs', label: 'Saved runs' } as const;

function RunHead({ run }: { run: Run }) {
  const status = runStatus(run.status);
  return (
    <View style={styles.head}>
      <ThemedText variant="label" weight="regular" tone="textMuted">
        {`${CALCULATOR_LABELS[run.calculator]} · by ${run.author.name} · ${formatWhen(run.createdAt)} · engine ${run.engineVersion}`}
      </ThemedText>
      {run.bath ? (
        <View style={styles.bath}>
          <ThemedText variant="label" weight="regular" tone="textMuted">
            Bath:
          </ThemedText>
          <TextLink href={`/baths/${encodeURIComponent(run.bath.id)}`} label={run.bath.name} accessibilityLabel={`Bath ${run.bath.name}`} hint="Opens the bath's record" />
        </View>
      ) : null}
      <View style={styles.pills}>
        <StatusPill kind={status.kind} label={status.label} />
        {run.usesDrafts ? <StatusPill kind="warn" label="Uses drafts" /> : null}
        {run.safety.released ? <StatusPill kind="ok" label="Released" /> : <StatusPill kind="unknown" label="Not released" />}
      </View>
      {run.usesDrafts ? <CautionNote message="This run used draft values that had not been reviewed when it was saved." /> : null}
    </View>
  );
}

function RunBody({ run }: { run: Run }) {
  const wide = useIsWide();
  const me = useMe().data;
  return (
    <>
      <RunHead run={run} />
      <RunVerdict verdict={run.verdict} />
      <RunSafety run={run} me={me} />
      <RunActions run={run} me={me} />
      <View style={wide ? styles.row : styles.stack}>
        <Card style={[styles.card, wide && styles.inputs]}>
          <RunInputs inputs={run.inputs} calculator={run.calculator} />
        </Card>
        <View style={[styles.stack, wide && styles.results]}>
          <RunResult run={run} />
        </View>
      </View>
      <ModelNotes run={run} />
      <ConstantsUsed
        constants={run.constants}
        note="The versions this run used, kept as they were. When a value has since been replaced, the run still shows the one it used."
      />
    </>
  );
}

/** One saved run: who and when, its verdict, inputs, the calculator's stored result, model notes and the constant versions it used. */
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
  bath: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.xs },
  pills: { flexDirection: 'row', flexWrap: 'wrap', gap: space.xs },
  row: { flexDirection: 'row', alignItems: 'flex-start', gap: space.xl },
  stack: { gap: space.md, minWidth: 0 },
  card: { gap: space.sm, minWidth: 0 },
  inputs: { flex: 1 },
  results: { flex: 1.4 },
});
