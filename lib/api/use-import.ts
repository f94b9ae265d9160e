import { useSWRConfig } from 'swr';
import useSWRMutation from 'swr/mutation';

import { ApiError, apiFetch } from '@/lib/api/fetcher';
import { keys } from '@/lib/api/keys';
import { importReportSchema, type ImportMode, type ImportReport } from '@/shared/constants';

/**
 * The file part of the upload: a File or Blob on the web; on phones the picked file's local
 * address, name and type (React Native's FormData reads the file from the uri itself).
 */
export type UploadFile = Blob | { uri: string; name: string; type: string };

/** What an import came back with: the report, and whether the server refused to write anything. */
export type ImportOutcome = { report: ImportReport; refused: boolean; message?: string };

/** The multipart body of POST /api/constants/import: fields `file` and `mode`. */
export function importFormData(file: UploadFile, name: string, mode: ImportMode): FormData {
  const form = new FormData();
  // NOTE: React Native's FormData takes a {uri, name, type} object where the web takes a Blob; the DOM typing knows only the Blob.
  if (file instanceof Blob) form.append('file', file, name);
  else form.append('file', file as unknown as Blob);
  form.append('mode', mode);
  return form;
}

/**
 * Sends a CSV to the library. A 422 validation_failed whose details are a report (mode "all" with a bad
 * row) is an answer, not a failure: it comes back with refused = true and nothing was written.
 */
export async function uploadImport(form: FormData): Promise<ImportOutcome> {
  try {
    // No Content-Type header: the runtime writes multipart/form-data with its boundary.
    const report = await apiFetch(keys.constantsImport, importReportSchema, { method: 'POST', body: form });
    return { report, refused: false };
  } catch (error) {
    if (error instanceof ApiError && error.status === 422 && error.code === 'validation_failed') {
      const report = importReportSchema.safeParse(error.details);
      if (report.success) return { report: report.data, refused: true, message: error.message };
    }
    throw error;
  }
}

/** Imports a CSV of constants as drafts (chemists); afterwards every cached library list is fetched again. */
export function useImportConstants() {
  const { mutate } = useSWRConfig();
  return useSWRMutation<ImportOutcome, ApiError, string, FormData>(keys.constantsImport, async (_path, { arg }) => {
    const outcome = await uploadImport(arg);
    if (outcome.report.written) {
      void mutate((key) => typeof key === 'string' && key.startsWith(keys.proposals) && key !== keys.constantsImport);
    }
    return outcome;
  });
}
