import { useCallback } from 'react';
import useSWR, { useSWRConfig } from 'swr';
import useSWRMutation from 'swr/mutation';

import { apiFetch, apiSend, type ApiError } from '@/lib/api/fetcher';
import { keys } from '@/lib/api/keys';
import { bathListSchema, bathSchema, type Bath, type BathInput, type BathSummary } from '@/shared/baths';

/** Filters of the bath list as sent to the server; empty values are left out of the path. */
export type BathFilter = Partial<Record<'q' | 'process' | 'status', string>>;

const PREFIX = '/api/baths';

/** Fetches every cached bath list, bath, analysis log and attachment list again, since one write can change several. */
export function useRevalidateBaths() {
  const { mutate } = useSWRConfig();
  return useCallback(() => mutate((key) => typeof key === 'string' && key.startsWith(PREFIX)), [mutate]);
}

/** The bath list for a filter; pass null to fetch nothing. */
export function useBaths(filter: BathFilter | null) {
  return useSWR<BathSummary[], ApiError>(
    filter ? keys.baths(filter) : null,
    (path: string) => apiFetch(path, bathListSchema),
    // Keep the last rows on screen while a changed filter loads, instead of flashing a spinner.
    { keepPreviousData: true },
  );
}

/** One bath; pass null to fetch nothing (for example a route without an id). */
export function useBath(id: string | null) {
  return useSWR<Bath, ApiError>(id == null ? null : keys.bath(id), (path: string) => apiFetch(path, bathSchema));
}

/** Records a new bath (chemists and technicians); the reply is the bath with its id. */
export function useCreateBath() {
  const revalidate = useRevalidateBaths();
  return useSWRMutation<Bath, ApiError, string, BathInput>(
    keys.bathsCreate,
    (path, { arg }) => apiSend('POST', path, bathSchema, arg),
    { revalidate: false, onSuccess: () => void revalidate() },
  );
}

/** Changes bath `id` (any subset of the fields). */
export function useUpdateBath(id: string) {
  const revalidate = useRevalidateBaths();
  return useSWRMutation<Bath, ApiError, string, Partial<BathInput>>(
    keys.bath(id),
    (path, { arg }) => apiSend('PATCH', path, bathSchema, arg),
    { revalidate: false, onSuccess: () => void revalidate() },
  );
}

/** Takes bath `id` out of service (admins); it stays on record and can be restored. */
export function useArchiveBath(id: string) {
  const revalidate = useRevalidateBaths();
  return useSWRMutation<Bath, ApiError, string, void>(
    keys.bathArchive(id),
    (path) => apiSend('POST', path, bathSchema),
    { revalidate: false, onSuccess: () => void revalidate() },
  );
}

/** Puts archived bath `id` back in service (admins). */
export function useRestoreBath(id: string) {
  const revalidate = useRevalidateBaths();
  return useSWRMutation<Bath, ApiError, string, void>(
    keys.bathRestore(id),
    (path) => apiSend('POST', path, bathSchema),
    { revalidate: false, onSuccess: () => void revalidate() },
  );
}
