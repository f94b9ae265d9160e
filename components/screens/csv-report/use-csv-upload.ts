import { useState } from 'react';

import { useCsvPicker, type PickedFile } from '@/components/screens/library/import-picker';
import { formatSignificant } from '@/lib/units';

/** A size in bytes as people read it (1 kB = 1000 bytes, as the limit is written). */
export function formatBytes(bytes: number): string {
  if (bytes < 1000) return `${bytes} bytes`;
  if (bytes < 1_000_000) return `${formatSignificant(bytes / 1000, 3)} kB`;
  return `${formatSignificant(bytes / 1_000_000, 3)} MB`;
}

/** What to do with bad rows: nothing unless all are valid, or only the valid ones. */
export type UploadMode = 'all' | 'valid';

type Options<O> = {
  /** Largest file the server takes, bytes. */
  maxBytes: number;
  /** Words for the thing that takes the file, in "the largest file the … takes". */
  what: string;
  /** Said when the upload fails for a reason of its own. */
  failed: string;
  /** Sends the file; resolves to the server's outcome. */
  send: (file: PickedFile, mode: UploadMode) => Promise<O>;
};

/** The state of a CSV upload form: the picked file and its size check, the mode, sending, the outcome or error. */
export function useCsvUpload<O>({ maxBytes, what, failed, send }: Options<O>) {
  const pick = useCsvPicker();
  const [file, setFile] = useState<PickedFile | null>(null);
  const [mode, setMode] = useState<UploadMode>('all');
  const [outcome, setOutcome] = useState<O | null>(null);
  const [error, setError] = useState<string | null>(null);
  const fileProblem =
    file && file.size !== null && file.size > maxBytes
      ? `${file.name} is ${formatBytes(file.size)}; the largest file ${what} takes is ${formatBytes(maxBytes)}. Split it into smaller files.`
      : null;

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

  const upload = async (busy: boolean) => {
    if (!file || fileProblem || busy) return;
    setError(null);
    setOutcome(null);
    try {
      setOutcome(await send(file, mode));
    } catch (cause) {
      setError(cause instanceof Error ? cause.message : failed);
    }
  };

  return { file, mode, setMode, outcome, error, fileProblem, choose, upload };
}
