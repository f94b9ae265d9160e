import useSWR from 'swr';

import { apiFetch, type ApiError } from '@/lib/api/fetcher';
import { keys } from '@/lib/api/keys';
import { healthSchema, type Health } from '@/shared/health';

/** How often the server status is re-checked while a screen shows it. */
export const HEALTH_REFRESH_MS = 30_000;

/** Server and database status from /api/health, refreshed in the background. */
export function useHealth() {
  const { data, error, isLoading, mutate } = useSWR<Health, ApiError>(
    keys.health,
    // 503 still carries the report: the server is up and says its database is down.
    (path: string) => apiFetch(path, healthSchema, undefined, { dataStatuses: [503] }),
    { refreshInterval: HEALTH_REFRESH_MS },
  );
  return { data, error, isLoading, mutate };
}
