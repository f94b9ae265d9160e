import { StyleSheet, View } from 'react-native';

import { ChoiceChips } from '@/components/screens/calculate/choice-chips';
import { ImportReportCard } from '@/components/screens/library/import-report';
import { formatBytes, type UploadMode, useCsvUpload } from '@/components/screens/csv-report/use-csv-upload';
import { space } from '@/components/theme/tokens';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { Notice } from '@/components/ui/notice';
import { ThemedText } from '@/components/ui/themed-text';
import { importFormData, useImportConstants, type ImportOutcome } from '@/lib/api/use-import';
import { IMPORT_MAX_BYTES } from '@/shared/constants';

const MODE_OPTIONS = [
  { value: 'all', label: 'Only if every row is valid', hint: 'Writes nothing when any row has a problem' },
  { value: 'valid', label: 'Import the valid rows as drafts, skip the rest', hint: 'Rows with a problem are reported and left out' },
] as const;

/** Choose a CSV file, choose what to do with bad rows, upload it and read the report. */
export function ImportForm() {
  const { trigger, isMutating } = useImportConstants();
  const { file, mode, setMode, outcome, error, fileProblem, choose, upload: send } = useCsvUpload<ImportOutcome>({
    maxBytes: IMPORT_MAX_BYTES,
    what: 'the import',
    failed: 'The import did not work.',
    send: (picked, m) => trigger(importFormData(picked.part, picked.name, m)),
  });
  const upload = () => send(isMutating);

  return (
    <View style={styles.stack}>
      <Card style={styles.card} testID="import-form">
        <ThemedText variant="title" accessibilityRole="header" aria-level={2}>
          Import a file
        </ThemedText>
        <Button label={file ? 'Choose another file' : 'Choose a CSV file'} onPress={() => void choose()} disabled={isMutating} />
        {file ? (
          <ThemedText variant="label" weight="regular" testID="picked-file" selectable>
            {`${file.name} · ${file.size === null ? 'size unknown' : formatBytes(file.size)}`}
          </ThemedText>
        ) : (
          <ThemedText variant="label" weight="regular" tone="textMuted">
            No file chosen yet.
          </ThemedText>
        )}
        {fileProblem ? <Notice kind="error" message={fileProblem} /> : null}
        <ChoiceChips<UploadMode> label="If some rows have problems" options={MODE_OPTIONS} value={mode} onChange={setMode} disabled={isMutating} />
        {error ? <Notice kind="error" message={error} /> : null}
        <Button
          label="Import"
          busyLabel="Importing…"
          busy={isMutating}
          disabled={!file || !!fileProblem}
          variant="primary"
          accessibilityHint="Sends the file; every row written becomes a draft for review"
          onPress={() => void upload()}
        />
      </Card>
      {outcome ? <ImportReportCard outcome={outcome} /> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  stack: { gap: space.lg },
  card: { gap: space.md },
});
