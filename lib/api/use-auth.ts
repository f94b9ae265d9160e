import useSWR, { useSWRConfig } from 'swr';
import useSWRMutation from 'swr/mutation';
import { useCallback } from 'react';

import { apiFetch, apiSend, type ApiError } from '@/lib/api/fetcher';
import { keys } from '@/lib/api/keys';
import {
  authOptionsSchema,
  invitationInfoSchema,
  resetRequestedSchema,
  tokenInfoSchema,
  userSchema,
  type AuthOptions,
  type InvitationInfo,
  type SignInInput,
  type TokenInfo,
  type User,
} from '@/shared/auth';

/** Puts a freshly signed-in user into the cache so the auth gate opens without another request. */
function useRemember() {
  const { mutate } = useSWRConfig();
  return useCallback((user: User) => mutate(keys.me, user, { revalidate: false }), [mutate]);
}

/** Signs in with e-mail and password (POST /api/auth/sign-in) and remembers the user. */
export function useSignIn() {
  const remember = useRemember();
  return useSWRMutation<User, ApiError, string, SignInInput>(keys.signIn, async (path, { arg }) => {
    const user = await apiSend('POST', path, userSchema, arg);
    await remember(user);
    return user;
  });
}

/** Asks for a password-reset mail; the server answers the same for any address. */
export function useRequestPasswordReset() {
  return useSWRMutation<{ message: string }, ApiError, string, { email: string }>(
    keys.passwordResets,
    (path, { arg }) => apiSend('POST', path, resetRequestedSchema, arg),
  );
}

/** What a reset link is for (its e-mail), or a 410 error when used or expired; null skips the request. */
export function usePasswordResetToken(token: string | null) {
  return useSWR<TokenInfo, ApiError>(token ? keys.passwordReset(token) : null, (path: string) =>
    apiFetch(path, tokenInfoSchema),
  );
}

/** Sets a new password through a reset link; the server signs the person in. */
export function useSetNewPassword(token: string) {
  const remember = useRemember();
  return useSWRMutation<User, ApiError, string, { password: string }>(
    `${keys.passwordReset(token)}#set`,
    async (_key, { arg }) => {
      const user = await apiSend('POST', keys.passwordReset(token), userSchema, arg);
      await remember(user);
      return user;
    },
  );
}

/** Who invited whom with which roles, or a 410 error when used or expired; null skips the request. */
export function useInvitationToken(token: string | null) {
  return useSWR<InvitationInfo, ApiError>(token ? keys.invitationToken(token) : null, (path: string) =>
    apiFetch(path, invitationInfoSchema),
  );
}

/** Accepts an invitation with a name and password; the server signs the new person in. */
export function useAcceptInvitation(token: string) {
  const remember = useRemember();
  return useSWRMutation<User, ApiError, string, { name: string; password: string }>(
    `${keys.invitationToken(token)}#accept`,
    async (_key, { arg }) => {
      const user = await apiSend('POST', keys.invitationToken(token), userSchema, arg);
      await remember(user);
      return user;
    },
  );
}

/** Public switches of this installation (whether the dev outbox exists). */
export function useAuthOptions() {
  return useSWR<AuthOptions, ApiError>(keys.authOptions, (path: string) => apiFetch(path, authOptionsSchema));
}
