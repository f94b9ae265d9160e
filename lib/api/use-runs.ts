import useSWR, { useSWRConfig } from 'swr';
import useSWRMutation from 'swr/mutation';

import { apiFetch, apiSend, noContent, type ApiError } from '@/lib/api/fetcher';
import { keys } from '@/lib/api/keys';
import { runListSchema, runSchema, type Run, type RunInput, type RunSummary } from '@/shared/constants';

/** Filters of the runs list as sent to the server (ids, a calculator key, dates YYYY-MM-DD); empty values are left out. */
export type RunFilter = Partial<Record<'bath' | 'calculator' | 'author' | 'from' | 'to', string>>;

/** Saved runs for a filter, newest first (GET /api/runs?bath=&calculator=&author=&from=&to=); null fetches nothing. */
export function useRuns(filter: RunFilter | null = {}) {
  return useSWR<RunSummary[], ApiError>(
    filter ? keys.runsQuery(filter) : null,
    (path: string) => apiFetch(path, runListSchema),
    // Keep the last rows on screen while a changed filter loads, instead of flashing a spinner.
    { keepPreviousData: true },
  );
}

/** One saved run with its inputs, stored result and the constant versions it used (GET /api/runs/:id). */
export function useRun(id: string) {
  return useSWR<Run, ApiError>(keys.run(id), (path: string) => apiFetch(path, runSchema));
}

/**
 * Saves a run (POST /api/runs; chemists and technicians). The server builds and solves again and its
 * result is the one kept; the reply goes straight into the run's cache and the list is fetched again.
 */
export function useSaveRun() {
  const { mutate } = useSWRConfig();
  return useSWRMutation<Run, ApiError, string, RunInput>(keys.runs, async (path, { arg }) => {
    const run = await apiSend('POST', path, runSchema, arg);
    void mutate(keys.run(run.id), run, { revalidate: false });
    return run;
  });
}

/** Whether an SWR key is a runs list (any filter), not one run. */
function isRunsList(key: unknown): boolean {
  return typeof key === 'string' && (key === keys.runs || key.startsWith(`${keys.runs}?`));
}

/**
 * Deletes run `id` (DELETE /api/runs/:id; its author or an admin, 204) and fetches every runs list
 * again. The run itself is not asked for again: it would answer 404 while its screen is closing.
 */
export function useDeleteRun(id: string) {
  const { mutate } = useSWRConfig();
  return useSWRMutation<undefined, ApiError, string, void>(keys.run(id), (path) => apiSend('DELETE', path, noContent), {
    revalidate: false,
    onSuccess: () => void mutate(isRunsList),
  });
}
