import { StyleSheet, View } from 'react-native';

import { BathFlags } from '@/components/screens/baths/bath-card';
import { analysedText, bathHref, volumeText } from '@/components/screens/baths/bath-words';
import { space } from '@/components/theme/tokens';
import { useTheme } from '@/components/theme/use-theme';
import { Card } from '@/components/ui/card';
import { TextLink } from '@/components/ui/text-link';
import { ThemedText } from '@/components/ui/themed-text';
import { PROCESS_INFO, type BathSummary } from '@/shared/baths';

type Column = { key: string; label: string; flex: number };

const COLUMNS: readonly Column[] = [
  { key: 'name', label: 'Name', flex: 2 },
  { key: 'process', label: 'Process', flex: 1.6 },
  { key: 'site', label: 'Site', flex: 1.2 },
  { key: 'volume', label: 'Volume', flex: 1 },
  { key: 'analysed', label: 'Last analysis', flex: 1.3 },
  { key: 'state', label: 'State', flex: 2 },
];

function Cell({ column, bath }: { column: Column; bath: BathSummary }) {
  switch (column.key) {
    case 'name':
      return <TextLink href={bathHref(bath.id)} label={bath.name} />;
    case 'state':
      return <BathFlags bath={bath} />;
    default: {
      const text: Record<string, string> = {
        process: PROCESS_INFO[bath.process].label,
        site: bath.site.trim() || '—',
        volume: volumeText(bath.volume, bath.volumeUnit),
        analysed: analysedText(bath),
      };
      return (
        <ThemedText variant="label" weight="regular">
          {text[column.key]}
        </ThemedText>
      );
    }
  }
}

function Row({ bath }: { bath: BathSummary }) {
  const { palette } = useTheme();
  return (
    <View role="row" style={[styles.row, { borderTopColor: palette.border }]} testID={`bath-${bath.id}`}>
      {COLUMNS.map((col) => (
        <View key={col.key} role="cell" style={[styles.cell, { flex: col.flex }]}>
          <Cell column={col} bath={bath} />
        </View>
      ))}
    </View>
  );
}

/** The bath list as a table (wide screens): name link, process, site, volume, last analysis, state. */
export function BathTable({ baths }: { baths: BathSummary[] }) {
  return (
    <Card style={styles.table} role="table" aria-label="Baths">
      <View role="row" style={styles.head}>
        {COLUMNS.map((col) => (
          <View key={col.key} role="columnheader" style={[styles.cell, { flex: col.flex }]}>
            <ThemedText variant="caption" weight="semibold" tone="textMuted" style={styles.headText}>
              {col.label}
            </ThemedText>
          </View>
        ))}
      </View>
      {baths.map((b) => (
        <Row key={b.id} bath={b} />
      ))}
    </Card>
  );
}

const styles = StyleSheet.create({
  table: { gap: 0, paddingVertical: space.sm },
  head: { flexDirection: 'row', gap: space.md, paddingBottom: space.xs },
  row: { flexDirection: 'row', gap: space.md, borderTopWidth: 1, paddingVertical: space.sm, alignItems: 'flex-start' },
  cell: { minWidth: 0 },
  headText: { paddingVertical: space.xs },
});
