import { Pressable, StyleSheet, View } from 'react-native';

import { type ListState } from '@/components/screens/library/use-library-filter';
import { conditionsText, constantHref, formatDay, formatLog, logSymbol, statusShort } from '@/components/screens/library/words';
import { space } from '@/components/theme/tokens';
import { useTheme } from '@/components/theme/use-theme';
import { Card } from '@/components/ui/card';
import { TextLink } from '@/components/ui/text-link';
import { ThemedText } from '@/components/ui/themed-text';
import { useFocusVisible } from '@/components/ui/use-focus-visible';
import { KIND_LABELS, type ConstantSort, type ConstantSummary } from '@/shared/constants';

type Column = { key: string; label: string; sort?: ConstantSort; flex: number };

const COLUMNS: readonly Column[] = [
  { key: 'reaction', label: 'Reaction', sort: 'reaction', flex: 3 },
  { key: 'defines', label: 'Defines', sort: 'defines', flex: 1.4 },
  { key: 'kind', label: 'Kind', sort: 'kind', flex: 1.4 },
  { key: 'log', label: 'Log value', sort: 'logValue', flex: 1.1 },
  { key: 'conditions', label: 'Conditions', flex: 1.5 },
  { key: 'status', label: 'Status', sort: 'status', flex: 1.2 },
  { key: 'proposed', label: 'Proposed', sort: 'proposedAt', flex: 1.2 },
];

type SortProps = { state: Pick<ListState, 'sort' | 'dir'>; onSort: (sort: ConstantSort) => void };

function SortHeader({ column, state, onSort }: SortProps & { column: Column & { sort: ConstantSort } }) {
  const { palette } = useTheme();
  const focus = useFocusVisible();
  const active = state.sort === column.sort;
  const order = state.dir === 'asc' ? 'ascending' : 'descending';
  // NOTE: aria-sort is passed through by react-native-web but is not in React Native's prop types.
  const sortAttr = { 'aria-sort': active ? order : 'none' } as object;
  return (
    <View role="columnheader" style={[styles.cell, { flex: column.flex }]} {...sortAttr}>
      <Pressable
        accessibilityRole="button"
        accessibilityLabel={`Sort by ${column.label.toLowerCase()}${active ? `, sorted ${order}` : ''}`}
        onPress={() => onSort(column.sort)}
        onFocus={focus.onFocus}
        onBlur={focus.onBlur}
        style={[styles.sortButton, focus.ring(palette.primary)]}
      >
        <ThemedText variant="caption" weight="semibold" tone={active ? 'primary' : 'textMuted'}>
          {`${column.label}${active ? (state.dir === 'asc' ? ' ▲' : ' ▼') : ''}`}
        </ThemedText>
      </Pressable>
    </View>
  );
}

function Row({ c }: { c: ConstantSummary }) {
  const { palette } = useTheme();
  const cells: Record<string, string> = {
    defines: c.defines,
    kind: KIND_LABELS[c.kind].label,
    log: `${logSymbol(c.kind)} ${formatLog(c.logValue)}${c.uncertainty == null ? '' : ` ± ${formatLog(c.uncertainty)}`}`,
    conditions: conditionsText(c),
    status: `${statusShort(c.status)} · v${c.version}`,
    proposed: formatDay(c.proposedAt),
  };
  return (
    <View role="row" style={[styles.row, { borderTopColor: palette.border }]} testID={`constant-${c.id}`}>
      {COLUMNS.map((col) => (
        <View key={col.key} role="cell" style={[styles.cell, { flex: col.flex }]}>
          {col.key === 'reaction' ? (
            <TextLink href={constantHref(c.id)} label={c.reaction} accessibilityLabel={`${c.reaction}, version ${c.version}`} />
          ) : (
            <ThemedText variant="label" weight="regular">
              {cells[col.key]}
            </ThemedText>
          )}
        </View>
      ))}
    </View>
  );
}

/** The library as a table with sortable column headers (wide screens). */
export function ConstantTable({ constants, state, onSort }: SortProps & { constants: ConstantSummary[] }) {
  return (
    <Card style={styles.table} role="table" aria-label="Constants">
      <View role="row" style={styles.head}>
        {COLUMNS.map((col) =>
          col.sort ? (
            <SortHeader key={col.key} column={{ ...col, sort: col.sort }} state={state} onSort={onSort} />
          ) : (
            <View key={col.key} role="columnheader" style={[styles.cell, { flex: col.flex }]}>
              <ThemedText variant="caption" weight="semibold" tone="textMuted" style={styles.plainHead}>
                {col.label}
              </ThemedText>
            </View>
          ),
        )}
      </View>
      {constants.map((c) => (
        <Row key={c.id} c={c} />
      ))}
    </Card>
  );
}

const styles = StyleSheet.create({
  table: { gap: 0, paddingVertical: space.sm },
  head: { flexDirection: 'row', gap: space.md, paddingBottom: space.xs },
  row: { flexDirection: 'row', gap: space.md, borderTopWidth: 1, paddingVertical: space.sm, alignItems: 'flex-start' },
  cell: { minWidth: 0 },
  sortButton: { alignSelf: 'flex-start', paddingVertical: space.xs, borderRadius: 2 },
  plainHead: { paddingVertical: space.xs },
});
