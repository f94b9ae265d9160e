import useSWR, { useSWRConfig } from 'swr';
import useSWRMutation from 'swr/mutation';

import { apiFetch, apiSend, type ApiError } from '@/lib/api/fetcher';
import { keys } from '@/lib/api/keys';
import { runListSchema, runSchema, type Run, type RunInput, type RunSummary } from '@/shared/constants';

/** Saved runs, newest first (GET /api/runs). */
export function useRuns() {
  return useSWR<RunSummary[], ApiError>(keys.runs, (path: string) => apiFetch(path, runListSchema));
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
