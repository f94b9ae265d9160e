import useSWR, { useSWRConfig } from 'swr';
import useSWRMutation from 'swr/mutation';
import { useCallback } from 'react';

import { apiFetch, apiSend, noContent, type ApiError } from '@/lib/api/fetcher';
import { keys } from '@/lib/api/keys';
import { userSchema, type User } from '@/shared/auth';

/** The signed-in person from GET /api/me; a 401 error means nobody is signed in. */
export function useMe() {
  const { data, error, isLoading, mutate } = useSWR<User, ApiError>(keys.me, (path: string) =>
    apiFetch(path, userSchema),
  );
  return { data, error, isLoading, mutate };
}

/** Renames the signed-in person (PATCH /api/me); the reply replaces the cached user. */
export function useUpdateMe() {
  return useSWRMutation<User, ApiError, string, { name: string }, User>(
    keys.me,
    (path, { arg }) => apiSend('PATCH', path, userSchema, arg),
    { populateCache: true, revalidate: false },
  );
}

/** Changes the password (POST /api/me/password); the server ends every other session. */
export function useChangePassword() {
  return useSWRMutation<User, ApiError, string, { currentPassword: string; newPassword: string }>(
    keys.mePassword,
    (path, { arg }) => apiSend('POST', path, userSchema, arg),
  );
}

/** Forgets everything cached for the last person, so the next one starts clean. */
export function useClearCache() {
  const { mutate } = useSWRConfig();
  return useCallback(() => mutate(() => true, undefined, { revalidate: false }), [mutate]);
}

/** Ends this session (POST /api/auth/sign-out). */
export function useSignOut() {
  return useSWRMutation<undefined, ApiError, string, void>(keys.signOut, (path) =>
    apiSend('POST', path, noContent),
  );
}

/** Ends every session of the signed-in person, this one included. */
export function useSignOutEverywhere() {
  return useSWRMutation<undefined, ApiError, string, void>(keys.signOutEverywhere, (path) =>
    apiSend('POST', path, noContent),
  );
}
