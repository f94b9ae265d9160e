import useSWRInfinite from 'swr/infinite';

import { apiFetch, type ApiError } from '@/lib/api/fetcher';
import { keys } from '@/lib/api/keys';
import { auditPageSchema, type AuditPage } from '@/shared/auth';

/** Entries per page of the activity list. */
export const AUDIT_PAGE_SIZE = 50;

/** The audit log newest first, a page at a time; `loadMore` asks for the page before the last one. */
export function useAudit() {
  const { data, error, isLoading, isValidating, size, setSize, mutate } = useSWRInfinite<AuditPage, ApiError>(
    (index, previous: AuditPage | null) => {
      if (index === 0) return keys.audit(AUDIT_PAGE_SIZE);
      if (!previous || previous.nextBefore === null) return null;
      return keys.audit(AUDIT_PAGE_SIZE, previous.nextBefore);
    },
    (path: string) => apiFetch(path, auditPageSchema),
    { revalidateFirstPage: false },
  );
  const entries = data?.flatMap((page) => page.entries) ?? [];
  const last = data?.[data.length - 1];
  const hasMore = !!last && last.nextBefore !== null;
  const loadingMore = size > 0 && !!data && data.length < size && !error;
  return {
    entries,
    error,
    isLoading,
    isValidating,
    hasMore,
    loadingMore,
    loadMore: () => void setSize(size + 1),
    retry: () => void mutate(),
  };
}
