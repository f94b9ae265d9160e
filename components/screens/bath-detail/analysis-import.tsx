import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { AnalysisCsvHelp } from '@/components/screens/bath-detail/analysis-csv-help';
import { AnalysisImportReportCard } from '@/components/screens/bath-detail/analysis-import-report';
import { ChoiceChips } from '@/components/screens/calculate/choice-chips';
import { formatBytes } from '@/components/screens/library/import-form';
import { useCsvPicker, type PickedFile } from '@/components/screens/library/import-picker';
import { space } from '@/components/theme/tokens';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { ThemedText } from '@/components/ui/themed-text';
import {
  analysisImportFormData,
  useImportAnalyses,
  type AnalysisImportMode,
  type AnalysisImportOutcome,
} from '@/lib/api/use-bath-detail';
import { ANALYSIS_IMPORT_MAX_BYTES, type Bath } from '@/shared/baths';

const MODE_OPTIONS = [
  { value: 'all', label: 'Only if every row is valid', hint: 'Writes nothing when any row has a problem' },
  { value: 'valid', label: 'Import the valid rows, skip the rest', hint: 'Rows with a problem are reported and left out' },
] as const;

/** Why a file cannot be sent, or null when it can (the server checks again). */
function tooBig(file: PickedFile): string | null {
  if (file.size === null || file.size <= ANALYSIS_IMPORT_MAX_BYTES) return null;
  return `${file.name} is ${formatBytes(file.size)}; the largest file the upload takes is ${formatBytes(ANALYSIS_IMPORT_MAX_BYTES)}. Split it into smaller files.`;
}

/** Upload a CSV of analyses for this bath: what the file holds, the file, what to do with bad rows, and the report. */
export function AnalysisImport({ bath }: { bath: Bath }) {
  const pick = useCsvPicker();
  const { trigger, isMutating } = useImportAnalyses(bath.id);
  const [file, setFile] = useState<PickedFile | null>(null);
  const [mode, setMode] = useState<AnalysisImportMode>('all');
  const [outcome, setOutcome] = useState<AnalysisImportOutcome | null>(null);
  const [error, setError] = useState<string | null>(null);
  const fileProblem = file ? tooBig(file) : null;

  const choose = async () => {
    setError(null);
    try {
      const picked = await pick();
      if (picked) {
        setFile(picked);
        setOutcome(null);
      }
    } catch (cause) {
      setError(cause instanceof Error ? cause.message : 'The file could not be opened.');
    }
  };

  const upload = async () => {
    if (!file || fileProblem || isMutating) return;
    setError(null);
    setOutcome(null);
    try {
      setOutcome(await trigger(analysisImportFormData(file.part, file.name, mode)));
    } catch (cause) {
      setError(cause instanceof Error ? cause.message : 'The upload did not work.');
    }
  };

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
      <ChoiceChips<AnalysisImportMode> label="If some rows have problems" options={MODE_OPTIONS} value={mode} onChange={setMode} disabled={isMutating} />
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
