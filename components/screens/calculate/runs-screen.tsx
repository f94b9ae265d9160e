import { StyleSheet, View } from 'react-native';

import { RunFilters } from '@/components/screens/runs/run-filters';
import { RunRow } from '@/components/screens/runs/run-row';
import { activeFilterCount, useRunFilter, type RunListState } from '@/components/screens/runs/use-run-filter';
import { FlaskIcon } from '@/components/shell/icons';
import { space } from '@/components/theme/tokens';
import { useIsWide } from '@/components/theme/use-is-wide';
import { Button } from '@/components/ui/button';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { ScreenContainer } from '@/components/ui/screen-container';
import { TextLink } from '@/components/ui/text-link';
import { ThemedText } from '@/components/ui/themed-text';
import { useMe } from '@/lib/api/use-me';
import { useRuns } from '@/lib/api/use-runs';

type ResultsProps = { state: RunListState; wide: boolean; list: ReturnType<typeof useRuns>; onClear: () => void };

function Results({ state, wide, list, onClear }: ResultsProps) {
  const { data, error, isLoading, mutate } = list;
  if (error) return <ErrorState message={error.message} onRetry={() => void mutate()} />;
  // With keepPreviousData the last rows stay while a changed filter loads; the spinner is for the first load only.
  if (!data) return <LoadingState label="Loading saved runs…" />;
  if (data.length === 0) {
    return activeFilterCount(state) > 0 ? (
      <EmptyState Icon={FlaskIcon} title="No runs match" body="No saved run fits these filters.">
        <Button label="Clear filters" onPress={onClear} />
      </EmptyState>
    ) : (
      <EmptyState Icon={FlaskIcon} title="No saved runs yet" body="Work something out with a calculator and press Save run: it is kept here with the constant versions it used.">
        <TextLink href="/calculate" label="Open the calculators" />
      </EmptyState>
    );
  }
  const newestFirst = [...data].sort((a, b) => b.createdAt.localeCompare(a.createdAt));
  return (
    <View style={styles.list}>
      <ThemedText variant="label" weight="regular" tone="textMuted" accessibilityLiveRegion="polite">
        {isLoading ? 'Updating the list…' : data.length === 1 ? '1 run' : `${data.length} runs`}
      </ThemedText>
      <View style={styles.list} role="list" aria-label="Saved runs">
        {newestFirst.map((run) => (
          <RunRow key={run.id} run={run} wide={wide} />
        ))}
      </View>
    </View>
  );
}

/** Saved runs of every calculator, newest first, filtered by who, bath, calculator and date; each opens its stored inputs and result. */
export function RunsScreen() {
  const me = useMe().data;
  const wide = useIsWide();
  const { state, filter, problems, update, clear } = useRunFilter(me?.id);
  const list = useRuns(filter);
  // A person or bath named by id in the link gets its name from the runs listed.
  const author = state.author;
  const names = {
    person: typeof author === 'object' ? list.data?.find((r) => r.author.id === author.id)?.author.name : undefined,
    bath: state.bath ? list.data?.find((r) => r.bath?.id === state.bath)?.bath?.name : undefined,
  };
  return (
    <ScreenContainer title="Saved runs" subtitle="Every saved calculation, newest first." back={{ href: '/calculate', label: 'Calculate' }}>
      <RunFilters state={state} problems={problems} onChange={update} onClear={clear} wide={wide} names={names} />
      <Results state={state} wide={wide} list={list} onClear={clear} />
    </ScreenContainer>
  );
}

const styles = StyleSheet.create({
  list: { gap: space.sm },
});
