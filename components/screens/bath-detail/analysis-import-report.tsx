import { StyleSheet, View } from 'react-native';

import { ProblemsTable, ReportCount } from '@/components/screens/csv-report/report-parts';
import { space } from '@/components/theme/tokens';
import { Notice } from '@/components/ui/notice';
import { ThemedText } from '@/components/ui/themed-text';
import { type AnalysisImportOutcome } from '@/lib/api/use-bath-detail';

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
  return (
    <View style={styles.stack} testID="analysis-import-report">
      <ThemedText variant="label" accessibilityRole="header" aria-level={3}>
        Upload report
      </ThemedText>
      <Notice kind={head.kind} message={head.text} testID="analysis-import-headline" />
      <View style={styles.counts}>
        <ReportCount label="Rows read" value={report.rows} minWidth={96} />
        <ReportCount label="Analyses added" value={report.created} minWidth={96} />
        <ReportCount label="Rejected" value={report.rejected} minWidth={96} />
      </View>
      <ProblemsTable problems={report.problems} testID="analysis-import-problems" />
    </View>
  );
}

const styles = StyleSheet.create({
  stack: { gap: space.sm },
  counts: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
});
