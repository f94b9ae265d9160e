// The pieces every CSV upload report shows: a count in a small box, and the problems by file line
// (the constants import and the analysis upload share them).
import { StyleSheet, View } from 'react-native';

import { DataTable, type Column } from '@/components/screens/calculate/data-table';
import { radius, space } from '@/components/theme/tokens';
import { useTheme } from '@/components/theme/use-theme';
import { ThemedText } from '@/components/ui/themed-text';
import { sentence } from '@/lib/api/form-errors';

/** One problem of an upload: the file line (header = 1), the column or null for the whole line, and what is wrong. */
export type FileProblem = { row: number; column: string | null; message: string };

const PROBLEM_COLUMNS: readonly Column<FileProblem>[] = [
  { key: 'row', label: 'Line', flex: 0.6, cell: (p) => `Line ${p.row}` },
  { key: 'column', label: 'Column', flex: 1, cell: (p) => p.column ?? 'whole line' },
  { key: 'message', label: 'What is wrong', flex: 3, cell: (p) => sentence(p.message) },
];

/** A number with its label in a small box; `minWidth` sets how many fit on a row. */
export function ReportCount({ label, value, minWidth = 120 }: { label: string; value: number; minWidth?: number }) {
  const { palette } = useTheme();
  return (
    <View style={[styles.count, { borderColor: palette.border, minWidth, flexBasis: minWidth }]} accessible accessibilityLabel={`${label}: ${value}`}>
      <ThemedText variant="title">{String(value)}</ThemedText>
      <ThemedText variant="caption" tone="textMuted">
        {label}
      </ThemedText>
    </View>
  );
}

/** The problems of an upload, sorted by line, under a "Problems" heading; nothing when there are none. */
export function ProblemsTable({ problems, testID, heading = 'label' }: { problems: readonly FileProblem[]; testID: string; heading?: 'label' | 'body' }) {
  if (problems.length === 0) return null;
  const sorted = [...problems].sort((a, b) => a.row - b.row);
  return (
    <>
      <ThemedText variant={heading} weight={heading === 'body' ? 'bold' : undefined} accessibilityRole="header" aria-level={3}>
        Problems
      </ThemedText>
      <ThemedText variant="caption" tone="textMuted">
        Line numbers are lines of the file; the header is line 1.
      </ThemedText>
      <DataTable label="Problems" columns={PROBLEM_COLUMNS} rows={sorted} rowKey={(p) => `${p.row}-${p.column ?? ''}-${p.message}`} testID={testID} />
    </>
  );
}

const styles = StyleSheet.create({
  count: { flexGrow: 1, borderWidth: 1, borderRadius: radius.md, padding: space.sm, gap: space.xxs },
});
