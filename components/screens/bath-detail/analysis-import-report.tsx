import { StyleSheet, View } from 'react-native';

import { DataTable, type Column } from '@/components/screens/calculate/data-table';
import { radius, space } from '@/components/theme/tokens';
import { useTheme } from '@/components/theme/use-theme';
import { Notice } from '@/components/ui/notice';
import { ThemedText } from '@/components/ui/themed-text';
import { sentence } from '@/lib/api/form-errors';
import { type AnalysisImportOutcome } from '@/lib/api/use-bath-detail';
import { type AnalysisImportReport } from '@/shared/baths';

type Problem = AnalysisImportReport['problems'][number];

const PROBLEM_COLUMNS: readonly Column<Problem>[] = [
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

function headline({ report, refused, message }: AnalysisImportOutcome): { kind: 'error' | 'success' | 'info'; text: string } {
  if (refused) {
    const why = message ? ` ${message.replace(/\.?$/, '.')}` : '';
    return { kind: 'error', text: `Nothing was written: some lines have problems.${why} Fix them and upload again, or choose to import only the valid rows.` };
  }
  if (report.created > 0) {
    const skipped = report.rejected > 0 ? ` ${report.rejected} line${report.rejected === 1 ? ' was' : 's were'} skipped.` : '';
    return { kind: 'success', text: `${report.created} ${report.created === 1 ? 'analysis' : 'analyses'} added to the log.${skipped}` };
  }
  return { kind: 'info', text: 'Nothing was written: the file held no analysis that could be added.' };
}

/** The server's answer to an analyses upload: what was written, the counts, and each problem by file line. */
export function AnalysisImportReportCard({ outcome }: { outcome: AnalysisImportOutcome }) {
  const { report } = outcome;
  const head = headline(outcome);
  const problems = [...report.problems].sort((a, b) => a.row - b.row);
  return (
    <View style={styles.stack} testID="analysis-import-report">
      <ThemedText variant="label" accessibilityRole="header" aria-level={3}>
        Upload report
      </ThemedText>
      <Notice kind={head.kind} message={head.text} testID="analysis-import-headline" />
      <View style={styles.counts}>
        <Count label="Rows read" value={report.rows} />
        <Count label="Analyses added" value={report.created} />
        <Count label="Rejected" value={report.rejected} />
      </View>
      {problems.length > 0 ? (
        <>
          <ThemedText variant="label" accessibilityRole="header" aria-level={3}>
            Problems
          </ThemedText>
          <ThemedText variant="caption" tone="textMuted">
            Line numbers are lines of the file; the header is line 1.
          </ThemedText>
          <DataTable label="Problems" columns={PROBLEM_COLUMNS} rows={problems} rowKey={(p) => `${p.row}-${p.column ?? ''}-${p.message}`} testID="analysis-import-problems" />
        </>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  stack: { gap: space.sm },
  counts: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  count: { minWidth: 96, flexGrow: 1, flexBasis: 96, borderWidth: 1, borderRadius: radius.md, padding: space.sm, gap: space.xxs },
});
