import { useCallback } from 'react';
import useSWR, { useSWRConfig } from 'swr';
import useSWRMutation from 'swr/mutation';

import { apiFetch, apiSend, type ApiError } from '@/lib/api/fetcher';
import { keys } from '@/lib/api/keys';
import {
  constantDetailSchema,
  constantListSchema,
  constantSummarySchema,
  speciesListSchema,
  type ConstantDetail,
  type ConstantSummary,
  type ProposalInput,
  type RevisionInput,
  type ReviewInput,
  type Species,
} from '@/shared/constants';

/** Filters of the library list as sent to the server; empty values are left out of the path. */
export type ConstantFilter = Partial<Record<'q' | 'metal' | 'ligand' | 'kind' | 'status' | 'sort' | 'dir', string>>;

const LIST_PREFIX = '/api/constants';

/** Fetches every cached library list and detail again, since one decision changes several of them. */
export function useRevalidateConstants() {
  const { mutate } = useSWRConfig();
  return useCallback(
    () => mutate((key) => typeof key === 'string' && key.startsWith(LIST_PREFIX)),
    [mutate],
  );
}

/** The species catalogue (metals, ligands, complexes, solids). */
export function useSpecies() {
  return useSWR<Species[], ApiError>(keys.species, (path: string) => apiFetch(path, speciesListSchema));
}

/** The library list for a filter; pass null to fetch nothing (for example without the right role). */
export function useConstants(filter: ConstantFilter | null) {
  return useSWR<ConstantSummary[], ApiError>(
    filter ? keys.constants(filter) : null,
    (path: string) => apiFetch(path, constantListSchema),
    // Keep the last rows on screen while a changed filter loads, instead of flashing a spinner.
    { keepPreviousData: true },
  );
}

/** The review queue: drafts waiting for a decision, oldest first (one key, shared by the queue and its count). */
export const REVIEW_QUEUE: ConstantFilter = { status: 'draft', sort: 'proposedAt', dir: 'asc' };

/** Drafts waiting for review; pass false to fetch nothing (people who cannot review). */
export function useReviewQueue(enabled: boolean) {
  return useConstants(enabled ? REVIEW_QUEUE : null);
}

/** One version with its lineage's history; pass null to fetch nothing. */
export function useConstant(id: number | null) {
  return useSWR<ConstantDetail, ApiError>(id == null ? null : keys.constant(id), (path: string) =>
    apiFetch(path, constantDetailSchema),
  );
}

/** Proposes a new constant (a draft of a new lineage); the lists are fetched again afterwards. */
export function useProposeConstant() {
  const revalidate = useRevalidateConstants();
  return useSWRMutation<ConstantSummary, ApiError, string, ProposalInput>(
    keys.proposals,
    (path, { arg }) => apiSend('POST', path, constantSummarySchema, arg),
    { revalidate: false, onSuccess: () => void revalidate() },
  );
}

/** Proposes a revision of version `id` (a draft replacing it). */
export function useReviseConstant(id: number) {
  const revalidate = useRevalidateConstants();
  return useSWRMutation<ConstantSummary, ApiError, string, RevisionInput>(
    keys.constantRevisions(id),
    (path, { arg }) => apiSend('POST', path, constantSummarySchema, arg),
    { revalidate: false, onSuccess: () => void revalidate() },
  );
}

/** Approves or rejects draft `id` with a note (reviewers; never one's own proposal). */
export function useReviewConstant(id: number) {
  const revalidate = useRevalidateConstants();
  return useSWRMutation<ConstantSummary, ApiError, string, ReviewInput>(
    keys.constantReview(id),
    (path, { arg }) => apiSend('POST', path, constantSummarySchema, arg),
    { revalidate: false, onSuccess: () => void revalidate() },
  );
}

/** Retires approved version `id` with a note saying why (reviewers). */
export function useRetireConstant(id: number) {
  const revalidate = useRevalidateConstants();
  return useSWRMutation<ConstantSummary, ApiError, string, { note: string }>(
    keys.constantRetire(id),
    (path, { arg }) => apiSend('POST', path, constantSummarySchema, arg),
    { revalidate: false, onSuccess: () => void revalidate() },
  );
}
