import { type SWRConfiguration } from 'swr';

import { isClientError } from '@/lib/api/fetcher';

const MAX_RETRIES = 3;

/** App-wide SWR settings: 4xx answers are final, other failures retry with backoff a few times. */
export const swrOptions: SWRConfiguration = {
  errorRetryCount: MAX_RETRIES,
  onErrorRetry: (error, _key, _config, revalidate, { retryCount }) => {
    if (isClientError(error)) return;
    if (retryCount > MAX_RETRIES) return;
    const delay = Math.min(2_000 * 2 ** (retryCount - 1), 30_000);
    setTimeout(() => void revalidate({ retryCount }), delay);
  },
};
