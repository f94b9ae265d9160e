import { type FileKinds, type PickedFile, useFilePicker } from '@/components/ui/file-picker';

export type { PickedFile } from '@/components/ui/file-picker';

/** CSV files: by ending and type in the browser; on a phone under their usual types, and plain text. */
const CSV_KINDS: FileKinds = { accept: '.csv,text/csv', types: ['text/csv', 'text/comma-separated-values', 'text/plain'], fallbackType: 'text/csv' };

/** Opens the file chooser for one CSV file; resolves null when the person cancels. */
export function useCsvPicker(): () => Promise<PickedFile | null> {
  return useFilePicker(CSV_KINDS);
}
