import { z } from 'zod';
import useSWR, { useSWRConfig } from 'swr';
import useSWRMutation from 'swr/mutation';

import { apiFetch, apiSend, type ApiError } from '@/lib/api/fetcher';
import { keys } from '@/lib/api/keys';
import {
  DEFAULT_THRESHOLDS,
  type HazardThresholds,
  type Review,
  reviewListSchema,
  reviewSchema,
  type ReviewSummary,
  safetyStateSchema,
  type SafetyState,
  type ThresholdsInput,
  thresholdsVersionSchema,
  type ThresholdsVersion,
} from '@/shared/safety';

/** The thresholds in force (GET /api/safety/thresholds). */
export function useThresholds() {
  return useSWR<ThresholdsVersion, ApiError>(keys.thresholds, (path: string) => apiFetch(path, thresholdsVersionSchema));
}

/**
 * The thresholds the hazard rules use on this screen: the shop's once loaded, the built-in
 * defaults until then (or when they cannot be read), with which one it is.
 */
export function useThresholdValues(): { values: HazardThresholds; version: number | null } {
  const { data } = useThresholds();
  return data ? { values: data.values, version: data.version } : { values: DEFAULT_THRESHOLDS, version: null };
}

/** Every thresholds version, newest first. */
export function useThresholdsHistory() {
  return useSWR<ThresholdsVersion[], ApiError>(keys.thresholdsHistory, (path: string) => apiFetch(path, z.array(thresholdsVersionSchema)));
}

/** Stores new thresholds (safety role); both thresholds keys are fetched again. */
export function useSaveThresholds() {
  const { mutate } = useSWRConfig();
  return useSWRMutation<ThresholdsVersion, ApiError, string, ThresholdsInput>(keys.thresholds, (path, { arg }) => apiSend('POST', path, thresholdsVersionSchema, arg), {
    onSuccess: (saved) => {
      void mutate(keys.thresholds, saved, { revalidate: false });
      void mutate(keys.thresholdsHistory);
    },
  });
}

/** Reviews on the desk with a status ('pending', 'signed_off', 'sent_back' or 'all'). */
export function useReviews(status: string) {
  return useSWR<ReviewSummary[], ApiError>(keys.reviews(status), (path: string) => apiFetch(path, reviewListSchema), { keepPreviousData: true });
}

/** One review with its hazards and events. */
export function useReview(id: string | null) {
  return useSWR<Review, ApiError>(id ? keys.review(id) : null, (path: string) => apiFetch(path, reviewSchema));
}

const isSafetyKey = (key: unknown) => typeof key === 'string' && (key.startsWith('/api/safety/reviews') || key.startsWith('/api/runs') || key.startsWith('/api/baths'));

/** Signs off, sends back or resubmits review `id`; every review, run and bath list is fetched again. */
export function useReviewAction(id: string, action: 'sign-off' | 'send-back' | 'resubmit') {
  const { mutate } = useSWRConfig();
  return useSWRMutation<Review, ApiError, string, { conditions?: string; note?: string }>(keys.reviewAction(id, action), (path, { arg }) => apiSend('POST', path, reviewSchema, arg), {
    onSuccess: (review) => {
      void mutate(keys.review(id), review, { revalidate: false });
      void mutate((key: unknown) => isSafetyKey(key) && key !== keys.review(id));
    },
  });
}

/** Releases run `id` (its author or an admin); refused with sign_off_required while a flagged run is not signed off. */
export function useReleaseRun(id: string) {
  const { mutate } = useSWRConfig();
  return useSWRMutation<SafetyState, ApiError, string, { note?: string }>(keys.runRelease(id), (path, { arg }) => apiSend('POST', path, safetyStateSchema, arg), {
    onSuccess: () => {
      void mutate((key: unknown) => typeof key === 'string' && key.startsWith('/api/runs'));
    },
  });
}
