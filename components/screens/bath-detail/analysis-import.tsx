import { StyleSheet, View } from 'react-native';

import { AnalysisCsvHelp } from '@/components/screens/bath-detail/analysis-csv-help';
import { AnalysisImportReportCard } from '@/components/screens/bath-detail/analysis-import-report';
import { ChoiceChips } from '@/components/screens/calculate/choice-chips';
import { formatBytes, type UploadMode, useCsvUpload } from '@/components/screens/csv-report/use-csv-upload';
import { space } from '@/components/theme/tokens';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { ThemedText } from '@/components/ui/themed-text';
import {
  analysisImportFormData,
  useImportAnalyses,
  type AnalysisImportOutcome,
} from '@/lib/api/use-bath-detail';
import { ANALYSIS_IMPORT_MAX_BYTES, type Bath } from '@/shared/baths';

const MODE_OPTIONS = [
  { value: 'all', label: 'Only if every row is valid', hint: 'Writes nothing when any row has a problem' },
  { value: 'valid', label: 'Import the valid rows, skip the rest', hint: 'Rows with a problem are reported and left out' },
] as const;

/** Upload a CSV of analyses for this bath: what the file holds, the file, what to do with bad rows, and the report. */
export function AnalysisImport({ bath }: { bath: Bath }) {
  const { trigger, isMutating } = useImportAnalyses(bath.id);
  const { file, mode, setMode, outcome, error, fileProblem, choose, upload: send } = useCsvUpload<AnalysisImportOutcome>({
    maxBytes: ANALYSIS_IMPORT_MAX_BYTES,
    what: 'the upload',
    failed: 'The upload did not work.',
    send: (picked, m) => trigger(analysisImportFormData(picked.part, picked.name, m)),
  });
  const upload = () => send(isMutating);

  return (
    <View style={styles.stack} testID="analysis-import">
      <AnalysisCsvHelp bath={bath} />
      <Button label={file ? 'Choose another file' : 'Choose a CSV file'} onPress={() => void choose()} disabled={isMutating} />
      {file ? (
        <ThemedText variant="label" weight="regular" testID="analysis-picked-file" selectable>
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
        label="Upload the analyses"
        busyLabel="Uploading…"
        busy={isMutating}
        disabled={!file || !!fileProblem}
        variant="primary"
        accessibilityHint="Sends the file; each valid line becomes an analysis in this bath's log"
        onPress={() => void upload()}
      />
      {outcome ? <AnalysisImportReportCard outcome={outcome} /> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  stack: { gap: space.md },
});
