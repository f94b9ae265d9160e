import { StyleSheet, View } from 'react-native';

import { ConstantCard } from '@/components/screens/library/constant-card';
import { ConstantTable } from '@/components/screens/library/constant-table';
import { LibraryActions } from '@/components/screens/library/library-actions';
import { LibraryFilters } from '@/components/screens/library/library-filters';
import { activeFilters, useLibraryFilter, type ListState } from '@/components/screens/library/use-library-filter';
import { BooksIcon } from '@/components/shell/icons';
import { space } from '@/components/theme/tokens';
import { useIsWide } from '@/components/theme/use-is-wide';
import { Button } from '@/components/ui/button';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { ScreenContainer } from '@/components/ui/screen-container';
import { ThemedText } from '@/components/ui/themed-text';
import { useConstants } from '@/lib/api/use-library';
import { useMe } from '@/lib/api/use-me';
import { type ConstantSort } from '@/shared/constants';

type ResultsProps = {
  state: ListState;
  wide: boolean;
  list: ReturnType<typeof useConstants>;
  onSort: (sort: ConstantSort) => void;
  onClear: () => void;
};

function Results({ state, wide, list, onSort, onClear }: ResultsProps) {
  const { data, error, isLoading, mutate } = list;
  if (error) return <ErrorState message={error.message} onRetry={() => void mutate()} />;
  // With keepPreviousData the last rows stay while a changed filter loads; the spinner is for the first load only.
  if (!data) return <LoadingState label="Loading constants…" />;
  if (data.length === 0) {
    const narrowed = activeFilters(state) > 0 || state.q.trim() !== '';
    return narrowed ? (
      <EmptyState Icon={BooksIcon} title="No constants match" body="Nothing in the library fits this search and these filters.">
        <Button label="Clear filters" accessibilityLabel="Clear search and filters" onPress={onClear} />
      </EmptyState>
    ) : (
      <EmptyState
        Icon={BooksIcon}
        title="No constants yet"
        body="Nothing has been approved yet. Chemists propose constants (one by one or from a CSV file) and a reviewer approves them before any calculation uses them."
      />
    );
  }
  return (
    <View style={styles.results}>
      <ThemedText variant="label" weight="regular" tone="textMuted" accessibilityLiveRegion="polite">
        {isLoading ? 'Updating the list…' : data.length === 1 ? '1 constant' : `${data.length} constants`}
      </ThemedText>
      {wide ? (
        <ConstantTable constants={data} state={state} onSort={onSort} />
      ) : (
        data.map((c) => <ConstantCard key={c.id} c={c} />)
      )}
    </View>
  );
}

/** The constants library: search, filters, a sortable table (cards on a phone), and the ways in to propose and review. */
export function LibraryScreen() {
  const me = useMe().data;
  const wide = useIsWide();
  const { state, filter, update, clear } = useLibraryFilter();
  const list = useConstants(filter);
  const onSort = (sort: ConstantSort) =>
    update(sort === state.sort ? { dir: state.dir === 'asc' ? 'desc' : 'asc' } : { sort, dir: 'asc' });
  return (
    <ScreenContainer
      title="Library"
      subtitle="Equilibrium constants with their sources and every version; only approved values feed calculations."
    >
      <LibraryActions me={me} filter={filter} />
      <LibraryFilters state={state} onChange={update} onClear={clear} wide={wide} />
      <Results state={state} wide={wide} list={list} onSort={onSort} onClear={clear} />
    </ScreenContainer>
  );
}

const styles = StyleSheet.create({
  results: { gap: space.sm },
});
