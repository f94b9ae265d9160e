import { StyleSheet, View } from 'react-native';

import { DataTable, type Column } from '@/components/screens/calculate/data-table';
import { radius, space } from '@/components/theme/tokens';
import { useTheme } from '@/components/theme/use-theme';
import { Card } from '@/components/ui/card';
import { Notice } from '@/components/ui/notice';
import { TextLink } from '@/components/ui/text-link';
import { ThemedText } from '@/components/ui/themed-text';
import { sentence } from '@/lib/api/form-errors';
import { type ImportOutcome } from '@/lib/api/use-import';
import { type ImportProblem } from '@/shared/constants';

const PROBLEM_COLUMNS: readonly Column<ImportProblem>[] = [
  { key: 'row', label: 'Line', flex: 0.6, cell: (p) => `Line ${p.row}` },
  { key: 'column', label: 'Column', flex: 1, cell: (p) => p.column ?? 'whole line' },
  { key: 'message', label: 'What is wrong', flex: 3, cell: (p) => sentence(p.message) },
];

function Count({ label, value }: { label: string; value: number }) {
  const { palette } = useTheme();
  return (
    <View style={[styles.count, { borderColor: palette.border }]} accessible accessibilityLabel={`${label}: ${value}`}>
      <ThemedText variant="title">{String(value)}</ThemedText>
      <ThemedText variant="caption" tone="textMuted">
        {label}
      </ThemedText>
    </View>
  );
}

function headline({ report, refused, message }: ImportOutcome): { kind: 'error' | 'success' | 'info'; text: string } {
  if (refused) {
    const why = message ? ` ${message.replace(/\.?$/, '.')}` : '';
    return { kind: 'error', text: `Nothing was written: some lines have problems.${why} Fix them and import again, or choose to import only the valid rows.` };
  }
  if (report.created > 0) {
    return { kind: 'success', text: `${report.created} draft${report.created === 1 ? '' : 's'} created, waiting for review.` };
  }
  return { kind: 'info', text: 'Nothing was written: no line held a new or changed value.' };
}

/** The server's answer to an import: what was written, the counts, and each problem by file line. */
export function ImportReportCard({ outcome }: { outcome: ImportOutcome }) {
  const { report } = outcome;
  const head = headline(outcome);
  // Problems sorted by line so the table reads like the file.
  const problems = [...report.problems].sort((a, b) => a.row - b.row);
  return (
    <Card style={styles.card} testID="import-report">
      <ThemedText variant="title" accessibilityRole="header" aria-level={2}>
        Import report
      </ThemedText>
      <Notice kind={head.kind} message={head.text} testID="import-headline" />
      <View style={styles.counts}>
        <Count label="Rows read" value={report.rows} />
        <Count label="Drafts created" value={report.created} />
        <Count label="Unchanged" value={report.unchanged} />
        <Count label="Rejected" value={report.rejected} />
      </View>
      {report.created > 0 ? <TextLink href="/library/review" label="Open the review queue" /> : null}
      {problems.length > 0 ? (
        <>
          <ThemedText variant="body" weight="bold" accessibilityRole="header" aria-level={3}>
            Problems
          </ThemedText>
          <ThemedText variant="caption" tone="textMuted">
            Line numbers are lines of the file; the header is line 1.
          </ThemedText>
          <DataTable label="Problems" columns={PROBLEM_COLUMNS} rows={problems} rowKey={(p) => `${p.row}-${p.column ?? ''}-${p.message}`} testID="import-problems" />
        </>
      ) : null}
    </Card>
  );
}

const styles = StyleSheet.create({
  card: { gap: space.md },
  counts: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  count: { minWidth: 120, flexGrow: 1, flexBasis: 120, borderWidth: 1, borderRadius: radius.md, padding: space.sm, gap: space.xxs },
});
