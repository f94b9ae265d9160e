import { StyleSheet, View } from 'react-native';

import { space } from '@/components/theme/tokens';
import { useIsWide } from '@/components/theme/use-is-wide';
import { useTheme } from '@/components/theme/use-theme';
import { ThemedText } from '@/components/ui/themed-text';

/** One column: its heading, relative width on wide screens, and the text of a row's cell. */
export type Column<T> = { key: string; label: string; flex?: number; align?: 'left' | 'right'; cell: (row: T) => string };

type Props<T> = {
  /** The table's accessible name ("Species"). */
  label: string;
  columns: readonly Column<T>[];
  rows: readonly T[];
  rowKey: (row: T) => string;
  testID?: string;
};

function Stacked<T>({ columns, row }: { columns: readonly Column<T>[]; row: T }) {
  const [first, ...rest] = columns;
  return (
    <>
      {first ? (
        <ThemedText variant="label" selectable>
          {first.cell(row)}
        </ThemedText>
      ) : null}
      {rest.map((col) => (
        <ThemedText key={col.key} variant="caption" selectable>
          <ThemedText variant="caption" tone="textMuted">{`${col.label}: `}</ThemedText>
          {col.cell(row)}
        </ThemedText>
      ))}
    </>
  );
}

/**
 * A table on a wide screen; on a phone each row becomes a small stacked block ("Label: value" lines)
 * so nothing runs off the side at 360 px.
 */
export function DataTable<T>({ label, columns, rows, rowKey, testID }: Props<T>) {
  const { palette } = useTheme();
  const wide = useIsWide();
  if (!wide) {
    return (
      <View style={styles.list} role="list" aria-label={label} testID={testID}>
        {rows.map((row) => (
          <View key={rowKey(row)} role="listitem" style={[styles.block, { borderTopColor: palette.border }]} testID={testID ? `${testID}-${rowKey(row)}` : undefined}>
            <Stacked columns={columns} row={row} />
          </View>
        ))}
      </View>
    );
  }
  return (
    <View role="table" aria-label={label} testID={testID}>
      <View role="row" style={styles.row}>
        {columns.map((col) => (
          <ThemedText key={col.key} role="columnheader" variant="caption" weight="semibold" tone="textMuted" style={[{ flex: col.flex ?? 1 }, styles.cell, col.align === 'right' && styles.right]}>
            {col.label}
          </ThemedText>
        ))}
      </View>
      {rows.map((row) => (
        <View key={rowKey(row)} role="row" style={[styles.row, styles.body, { borderTopColor: palette.border }]} testID={testID ? `${testID}-${rowKey(row)}` : undefined}>
          {columns.map((col) => (
            <ThemedText key={col.key} role="cell" variant="label" weight="regular" selectable style={[{ flex: col.flex ?? 1 }, styles.cell, col.align === 'right' && styles.right]}>
              {col.cell(row)}
            </ThemedText>
          ))}
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: 0 },
  block: { borderTopWidth: 1, paddingVertical: space.sm, gap: space.xxs },
  row: { flexDirection: 'row', gap: space.md, paddingVertical: space.xs },
  body: { borderTopWidth: 1, paddingVertical: space.sm },
  cell: { minWidth: 0 },
  right: { textAlign: 'right' },
});
