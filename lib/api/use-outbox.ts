import useSWR from 'swr';

import { apiFetch, type ApiError } from '@/lib/api/fetcher';
import { keys } from '@/lib/api/keys';
import { outboxSchema, type OutboxMessage } from '@/shared/auth';

/** Mail the local fake SMTP server caught, newest first (admins, development only). */
export function useOutbox() {
  return useSWR<OutboxMessage[], ApiError>(keys.outbox, (path: string) => apiFetch(path, outboxSchema));
}
