import { useRouter } from 'expo-router';
import { StyleSheet, View } from 'react-native';

import { BathCard } from '@/components/screens/baths/bath-card';
import { BathFilters } from '@/components/screens/baths/bath-filters';
import { BathTable } from '@/components/screens/baths/bath-table';
import { isNarrowed, useBathFilter, type BathListState } from '@/components/screens/baths/use-bath-filter';
import { BathIcon } from '@/components/shell/icons';
import { space } from '@/components/theme/tokens';
import { useIsWide } from '@/components/theme/use-is-wide';
import { Button } from '@/components/ui/button';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { ScreenContainer } from '@/components/ui/screen-container';
import { ThemedText } from '@/components/ui/themed-text';
import { useBaths } from '@/lib/api/use-baths';
import { useMe } from '@/lib/api/use-me';
import { hasRole } from '@/shared/auth';

type ResultsProps = {
  state: BathListState;
  wide: boolean;
  canAdd: boolean;
  list: ReturnType<typeof useBaths>;
  onClear: () => void;
};

function Results({ state, wide, canAdd, list, onClear }: ResultsProps) {
  const { data, error, isLoading, mutate } = list;
  if (error) return <ErrorState message={error.message} onRetry={() => void mutate()} />;
  // With keepPreviousData the last rows stay while a changed filter loads; the spinner is for the first load only.
  if (!data) return <LoadingState label="Loading baths…" />;
  if (data.length === 0) {
    return isNarrowed(state) ? (
      <EmptyState Icon={BathIcon} title="No baths match" body="No bath fits this search and these filters.">
        <Button label="Clear filters" accessibilityLabel="Clear search and filters" onPress={onClear} />
      </EmptyState>
    ) : (
      <EmptyState
        Icon={BathIcon}
        title="No baths recorded yet"
        body={`A bath record holds one solution's process, volume and make-up, the ranges you aim to keep it in, and its log of analyses. Chemists and technicians can add one${canAdd ? ' with New bath' : ''}.`}
      />
    );
  }
  return (
    <View style={styles.results}>
      <ThemedText variant="label" weight="regular" tone="textMuted" accessibilityLiveRegion="polite">
        {isLoading ? 'Updating the list…' : data.length === 1 ? '1 bath' : `${data.length} baths`}
      </ThemedText>
      {wide ? <BathTable baths={data} /> : data.map((b) => <BathCard key={b.id} bath={b} />)}
    </View>
  );
}

/** The bath list: search, process and status filters, cards on a phone and a table when wide. */
export function BathsScreen() {
  const router = useRouter();
  const me = useMe().data;
  const wide = useIsWide();
  const { state, filter, update, clear } = useBathFilter();
  const list = useBaths(filter);
  const canAdd = hasRole(me, 'chemist', 'technician');
  return (
    <ScreenContainer title="Baths" subtitle="Records of the working solutions you keep in service.">
      {canAdd ? (
        <Button label="New bath" variant="primary" onPress={() => router.push('/baths/new')} />
      ) : null}
      <BathFilters state={state} onChange={update} onClear={clear} wide={wide} />
      <Results state={state} wide={wide} canAdd={canAdd} list={list} onClear={clear} />
    </ScreenContainer>
  );
}

const styles = StyleSheet.create({
  results: { gap: space.sm },
});
