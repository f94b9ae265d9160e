import { useCallback } from 'react';
import useSWR, { useSWRConfig } from 'swr';
import useSWRMutation from 'swr/mutation';

import { ApiError, apiFetch, apiSend } from '@/lib/api/fetcher';
import { keys } from '@/lib/api/keys';
import { type UploadFile } from '@/lib/api/use-import';
import {
  analysisImportReportSchema,
  analysisListSchema,
  analysisSchema,
  attachmentListSchema,
  attachmentSchema,
  type Analysis,
  type AnalysisImportReport,
  type AnalysisInput,
  type Attachment,
} from '@/shared/baths';

/** What to do with an analyses file that has bad rows: write nothing ("all") or write the good ones ("valid"). */
export type AnalysisImportMode = AnalysisImportReport['mode'];

/** What an analyses import came back with: the report, and whether the server refused to write anything. */
export type AnalysisImportOutcome = { report: AnalysisImportReport; refused: boolean; message?: string };

const BATH_LIST = keys.baths();

/** Whether an SWR key is one of the bath lists (any filter), whose counts and latest values an analysis changes. */
function isBathList(key: unknown): boolean {
  return typeof key === 'string' && (key === BATH_LIST || key.startsWith(`${BATH_LIST}?`));
}

/** Whether an SWR key lists safety reviews (a new analysis can open one). */
function isReviewList(key: unknown): boolean {
  return typeof key === 'string' && key.startsWith('/api/safety/reviews?');
}

/**
 * Fetches a bath's analyses, the bath itself (its hazards follow the latest analysis), every
 * cached bath list and the safety desk's lists again, after analyses were written.
 */
export function useRevalidateAnalyses(bathId: string) {
  const { mutate } = useSWRConfig();
  return useCallback(
    () => Promise.all([mutate(keys.analyses(bathId)), mutate(keys.bath(bathId)), mutate(isBathList), mutate(isReviewList)]),
    [mutate, bathId],
  );
}

/** A bath's analyses, oldest first as the server sends them; pass null to fetch nothing. */
export function useAnalyses(bathId: string | null) {
  return useSWR<Analysis[], ApiError>(bathId ? keys.analyses(bathId) : null, (path: string) =>
    apiFetch(path, analysisListSchema),
  );
}

/** Logs one analysis (chemists, technicians); the analyses and the bath lists are fetched again. */
export function useAddAnalysis(bathId: string) {
  const revalidate = useRevalidateAnalyses(bathId);
  return useSWRMutation<Analysis, ApiError, string, AnalysisInput>(
    keys.analyses(bathId),
    (path, { arg }) => apiSend('POST', path, analysisSchema, arg),
    { revalidate: false, onSuccess: () => void revalidate() },
  );
}

/** Appends a file part: a Blob on the web, React Native's {uri, name, type} elsewhere. */
function appendFile(form: FormData, file: UploadFile, name: string): void {
  // NOTE: React Native's FormData takes a {uri, name, type} object where the web takes a Blob; the DOM typing knows only the Blob.
  if (file instanceof Blob) form.append('file', file, name);
  else form.append('file', file as unknown as Blob);
}

/** The multipart body of POST /api/baths/:id/analyses/import: fields `file` and `mode`. */
export function analysisImportFormData(file: UploadFile, name: string, mode: AnalysisImportMode): FormData {
  const form = new FormData();
  appendFile(form, file, name);
  form.append('mode', mode);
  return form;
}

/**
 * Sends a CSV of analyses. A 422 validation_failed whose details are a report (mode "all" with a bad
 * row) is an answer, not a failure: it comes back with refused = true and nothing was written.
 */
async function uploadAnalyses(path: string, form: FormData): Promise<AnalysisImportOutcome> {
  try {
    // No Content-Type header: the runtime writes multipart/form-data with its boundary.
    const report = await apiFetch(path, analysisImportReportSchema, { method: 'POST', body: form });
    return { report, refused: false };
  } catch (error) {
    if (error instanceof ApiError && error.status === 422 && error.code === 'validation_failed') {
      const report = analysisImportReportSchema.safeParse(error.details);
      if (report.success) return { report: report.data, refused: true, message: error.message };
    }
    throw error;
  }
}

/** Imports analyses from a CSV file (chemists, technicians); after a write the analyses and lists are fetched again. */
export function useImportAnalyses(bathId: string) {
  const revalidate = useRevalidateAnalyses(bathId);
  return useSWRMutation<AnalysisImportOutcome, ApiError, string, FormData>(
    keys.analysesImport(bathId),
    async (path, { arg }) => {
      const outcome = await uploadAnalyses(path, arg);
      if (outcome.report.written) void revalidate();
      return outcome;
    },
  );
}

/** A bath's attachments, newest first; pass null to fetch nothing. */
export function useAttachments(bathId: string | null) {
  return useSWR<Attachment[], ApiError>(bathId ? keys.attachments(bathId) : null, (path: string) =>
    apiFetch(path, attachmentListSchema),
  );
}

/** The multipart body of POST /api/baths/:id/attachments: fields `file` and `title`. */
export function attachmentFormData(file: UploadFile, name: string, title: string): FormData {
  const form = new FormData();
  appendFile(form, file, name);
  form.append('title', title);
  return form;
}

/** Uploads a PDF, PNG or JPEG to a bath (chemists, technicians); the list is fetched again afterwards. */
export function useUploadAttachment(bathId: string) {
  const { mutate } = useSWRConfig();
  return useSWRMutation<Attachment, ApiError, string, FormData>(
    keys.attachments(bathId),
    (path, { arg }) => apiFetch(path, attachmentSchema, { method: 'POST', body: arg }),
    { revalidate: false, onSuccess: () => void mutate(keys.attachments(bathId)) },
  );
}
