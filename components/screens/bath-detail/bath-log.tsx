import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { AnalysesTable } from '@/components/screens/bath-detail/analyses-table';
import { BathTrends } from '@/components/screens/bath-detail/bath-trends';
import { loggedQuantities, newestFirst } from '@/components/screens/bath-detail/bath-words';
import { TrayIcon } from '@/components/shell/icons';
import { space } from '@/components/theme/tokens';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { ThemedText } from '@/components/ui/themed-text';
import { useAnalyses } from '@/lib/api/use-bath-detail';
import { type Analysis, type Bath, type Quantity } from '@/shared/baths';

/** Analyses listed before "Show all" (the newest ones). */
export const FIRST_ROWS = 10;

function Heading({ children }: { children: string }) {
  return (
    <ThemedText variant="title" accessibilityRole="header" aria-level={2}>
      {children}
    </ThemedText>
  );
}

function LogTable({ bath, analyses, quantities }: { bath: Bath; analyses: readonly Analysis[]; quantities: readonly Quantity[] }) {
  const [all, setAll] = useState(false);
  const sorted = newestFirst(analyses);
  const rows = all ? sorted : sorted.slice(0, FIRST_ROWS);
  return (
    <Card style={styles.card}>
      <Heading>Analyses</Heading>
      <ThemedText variant="caption" tone="textMuted">
        {`Newest first, in the bath's units. ${analyses.length} in all.`}
      </ThemedText>
      <AnalysesTable bath={bath} analyses={rows} quantities={quantities} />
      {analyses.length > FIRST_ROWS ? (
        <Button
          label={all ? `Show the newest ${FIRST_ROWS}` : `Show all ${analyses.length} analyses`}
          accessibilityHint={all ? 'Shortens the list' : 'Lists every analysis of this bath'}
          onPress={() => setAll((v) => !v)}
        />
      ) : null}
    </Card>
  );
}

/** The bath's trends and analysis log: charts beside the table when wide, the chosen chart above the table on a phone. */
export function BathLog({ bath, wide, canWrite }: { bath: Bath; wide: boolean; canWrite: boolean }) {
  const { data, error, mutate } = useAnalyses(bath.id);
  if (!data) {
    return error ? (
      <ErrorState message={error.message} onRetry={() => void mutate()} />
    ) : (
      <LoadingState label="Loading the analyses…" />
    );
  }
  if (data.length === 0) {
    return (
      <EmptyState
        Icon={TrayIcon}
        title="No analyses yet"
        body={`${canWrite ? 'Add the first analysis below, or upload a CSV file of past results. ' : ''}Once analyses are logged, their trends appear here against the target ranges.`}
      />
    );
  }
  const quantities = loggedQuantities(bath, data);
  return (
    <View style={wide ? styles.panes : styles.stack} testID="bath-log">
      <Card style={[styles.card, wide && styles.charts]}>
        <Heading>Trends</Heading>
        <BathTrends bath={bath} analyses={data} quantities={quantities} oneAtATime={!wide} />
      </Card>
      <View style={wide ? styles.table : styles.stack}>
        <LogTable bath={bath} analyses={data} quantities={quantities} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  stack: { gap: space.lg, minWidth: 0 },
  panes: { flexDirection: 'row', alignItems: 'flex-start', gap: space.lg },
  card: { gap: space.md, minWidth: 0 },
  charts: { flex: 3 },
  table: { flex: 2, minWidth: 0 },
});
