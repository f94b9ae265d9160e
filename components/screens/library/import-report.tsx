import { StyleSheet, View } from 'react-native';

import { ProblemsTable, ReportCount } from '@/components/screens/csv-report/report-parts';
import { space } from '@/components/theme/tokens';
import { Card } from '@/components/ui/card';
import { Notice } from '@/components/ui/notice';
import { TextLink } from '@/components/ui/text-link';
import { ThemedText } from '@/components/ui/themed-text';
import { type ImportOutcome } from '@/lib/api/use-import';

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
  return (
    <Card style={styles.card} testID="import-report">
      <ThemedText variant="title" accessibilityRole="header" aria-level={2}>
        Import report
      </ThemedText>
      <Notice kind={head.kind} message={head.text} testID="import-headline" />
      <View style={styles.counts}>
        <ReportCount label="Rows read" value={report.rows} />
        <ReportCount label="Drafts created" value={report.created} />
        <ReportCount label="Unchanged" value={report.unchanged} />
        <ReportCount label="Rejected" value={report.rejected} />
      </View>
      {report.created > 0 ? <TextLink href="/library/review" label="Open the review queue" /> : null}
      <ProblemsTable problems={report.problems} testID="import-problems" heading="body" />
    </Card>
  );
}

const styles = StyleSheet.create({
  card: { gap: space.md },
  counts: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
});
