import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { ChoiceChips } from '@/components/screens/calculate/choice-chips';
import { ImportReportCard } from '@/components/screens/library/import-report';
import { useCsvPicker, type PickedFile } from '@/components/screens/library/import-picker';
import { space } from '@/components/theme/tokens';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { Notice } from '@/components/ui/notice';
import { ThemedText } from '@/components/ui/themed-text';
import { formatSignificant } from '@/lib/units';
import { importFormData, useImportConstants, type ImportOutcome } from '@/lib/api/use-import';
import { IMPORT_MAX_BYTES, type ImportMode } from '@/shared/constants';

const MODE_OPTIONS = [
  { value: 'all', label: 'Only if every row is valid', hint: 'Writes nothing when any row has a problem' },
  { value: 'valid', label: 'Import the valid rows as drafts, skip the rest', hint: 'Rows with a problem are reported and left out' },
] as const;

/** A size in bytes as people read it (1 kB = 1000 bytes, as the limit is written). */
export function formatBytes(bytes: number): string {
  if (bytes < 1000) return `${bytes} bytes`;
  if (bytes < 1_000_000) return `${formatSignificant(bytes / 1000, 3)} kB`;
  return `${formatSignificant(bytes / 1_000_000, 3)} MB`;
}

/** Why a file cannot be sent, or null when it can (the server checks again). */
function tooBig(file: PickedFile): string | null {
  if (file.size === null || file.size <= IMPORT_MAX_BYTES) return null;
  return `${file.name} is ${formatBytes(file.size)}; the largest file the import takes is ${formatBytes(IMPORT_MAX_BYTES)}. Split it into smaller files.`;
}

/** Choose a CSV file, choose what to do with bad rows, upload it and read the report. */
export function ImportForm() {
  const pick = useCsvPicker();
  const { trigger, isMutating } = useImportConstants();
  const [file, setFile] = useState<PickedFile | null>(null);
  const [mode, setMode] = useState<ImportMode>('all');
  const [outcome, setOutcome] = useState<ImportOutcome | null>(null);
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
      setOutcome(await trigger(importFormData(file.part, file.name, mode)));
    } catch (cause) {
      setError(cause instanceof Error ? cause.message : 'The import did not work.');
    }
  };

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
        <ChoiceChips<ImportMode> label="If some rows have problems" options={MODE_OPTIONS} value={mode} onChange={setMode} disabled={isMutating} />
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
