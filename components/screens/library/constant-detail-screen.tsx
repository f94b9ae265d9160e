import { StyleSheet, View } from 'react-native';

import { ConstantActions } from '@/components/screens/library/constant-actions';
import { ConstantFacts, ConstantPeople } from '@/components/screens/library/constant-facts';
import { MissingConstant } from '@/components/screens/library/missing-constant';
import { useIdParam } from '@/components/screens/library/use-id-param';
import { VersionHistory } from '@/components/screens/library/version-history';
import { space } from '@/components/theme/tokens';
import { useIsWide } from '@/components/theme/use-is-wide';
import { LoadingState } from '@/components/ui/loading-state';
import { ScreenContainer } from '@/components/ui/screen-container';
import { useConstant } from '@/lib/api/use-library';
import { useMe } from '@/lib/api/use-me';
import { KIND_LABELS } from '@/shared/constants';

/** One version of a constant: its value and basis, its review, what you may do with it, and the lineage's versions. */
export function ConstantDetailScreen() {
  const id = useIdParam();
  const { data, error, isLoading, mutate } = useConstant(id);
  const me = useMe().data;
  const wide = useIsWide();
  const back = { href: '/library', label: 'Library' } as const;

  if (id === null || error || isLoading || !data) {
    return (
      <ScreenContainer title="Constant" back={back}>
        {id !== null && !error ? (
          <LoadingState label="Loading the constant…" />
        ) : (
          <MissingConstant error={error} onRetry={() => void mutate()} />
        )}
      </ScreenContainer>
    );
  }

  const c = data.constant;
  return (
    <ScreenContainer title={c.reaction} subtitle={`${KIND_LABELS[c.kind].label} · version ${c.version}`} back={back}>
      <View style={wide ? styles.panes : styles.stack}>
        <View style={wide ? styles.main : styles.stack}>
          <ConstantFacts c={c} />
          <ConstantPeople c={c} />
        </View>
        <View style={wide ? styles.side : styles.stack}>
          <ConstantActions key={c.id} c={c} me={me} isLatest={data.history[0]?.id === c.id} />
          <VersionHistory history={data.history} shownId={c.id} />
        </View>
      </View>
    </ScreenContainer>
  );
}

const styles = StyleSheet.create({
  stack: { gap: space.lg },
  panes: { flexDirection: 'row', alignItems: 'flex-start', gap: space.xl },
  main: { flex: 3, minWidth: 0, gap: space.lg },
  side: { flex: 2, minWidth: 0, gap: space.lg },
});
