import useSWR from 'swr';
import useSWRMutation from 'swr/mutation';

import { apiFetch, apiSend, noContent, type ApiError } from '@/lib/api/fetcher';
import { keys } from '@/lib/api/keys';
import {
  invitationSchema,
  invitationsSchema,
  peopleSchema,
  personSchema,
  type Invitation,
  type InviteInput,
  type Person,
  type UpdatePersonInput,
} from '@/shared/auth';

/** Everyone on the team (admins only). */
export function usePeople() {
  return useSWR<Person[], ApiError>(keys.people, (path: string) => apiFetch(path, peopleSchema));
}

/** Changes one person's roles or active flag; the reply replaces that person in the cached list. */
export function useUpdatePerson() {
  return useSWRMutation<Person, ApiError, string, { id: string; patch: UpdatePersonInput }, Person[]>(
    keys.people,
    (_key, { arg }) => apiSend('PATCH', keys.person(arg.id), personSchema, arg.patch),
    {
      populateCache: (person, list) => (list ?? []).map((p) => (p.id === person.id ? person : p)),
      revalidate: false,
    },
  );
}

/** Invitations not yet accepted (admins only). */
export function useInvitations() {
  return useSWR<Invitation[], ApiError>(keys.invitations, (path: string) => apiFetch(path, invitationsSchema));
}

/** Invites someone by e-mail with roles; the list is fetched again afterwards. */
export function useInvite() {
  return useSWRMutation<Invitation, ApiError, string, InviteInput>(keys.invitations, (path, { arg }) =>
    apiSend('POST', path, invitationSchema, arg),
  );
}

/** Sends an invitation again with a new link (the old link stops working). */
export function useResendInvitation() {
  return useSWRMutation<Invitation, ApiError, string, string>(keys.invitations, (_key, { arg: id }) =>
    apiSend('POST', keys.invitationResend(id), invitationSchema),
  );
}

/** Withdraws a pending invitation. */
export function useWithdrawInvitation() {
  return useSWRMutation<undefined, ApiError, string, string>(keys.invitations, (_key, { arg: id }) =>
    apiSend('DELETE', keys.invitation(id), noContent),
  );
}
