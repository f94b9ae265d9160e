import { useState } from 'react';

import { useUpdatePerson } from '@/lib/api/use-team';
import { ROLES, type Person, type Role } from '@/shared/auth';

/** A message under one person: what went wrong (the server's words) or what was saved. */
export type PersonMessage = { kind: 'error' | 'success'; text: string };

function sameRoles(a: readonly Role[], b: readonly Role[]): boolean {
  return a.length === b.length && a.every((r) => b.includes(r));
}

/** Draft roles, the pending confirmation and the last message for one person on the team screen. */
export function usePersonEdit(person: Person) {
  const { trigger, isMutating } = useUpdatePerson();
  const [roles, setRoles] = useState<Role[]>(person.roles);
  const [confirming, setConfirming] = useState(false);
  const [message, setMessage] = useState<PersonMessage | null>(null);

  const send = async (patch: { roles?: Role[]; active?: boolean }, done: string) => {
    setMessage(null);
    try {
      const saved = await trigger({ id: person.id, patch });
      setRoles(saved.roles);
      setMessage({ kind: 'success', text: done });
    } catch (error) {
      setMessage({ kind: 'error', text: error instanceof Error ? error.message : 'That did not work.' });
    }
  };

  return {
    roles,
    busy: isMutating,
    dirty: !sameRoles(roles, person.roles),
    confirming,
    message,
    toggle: (role: Role) => {
      setMessage(null);
      setRoles((now) => ROLES.filter((r) => (r === role ? !now.includes(r) : now.includes(r))));
    },
    undo: () => {
      setRoles(person.roles);
      setMessage(null);
    },
    saveRoles: () => {
      if (roles.length === 0) {
        setMessage({ kind: 'error', text: 'Keep at least one role.' });
        return;
      }
      void send({ roles }, 'Roles saved');
    },
    askActive: () => setConfirming(true),
    cancel: () => setConfirming(false),
    confirmActive: () => {
      setConfirming(false);
      void send(
        { active: !person.active },
        person.active ? `${person.name} is deactivated and signed out` : `${person.name} can sign in again`,
      );
    },
  };
}

/** The state and actions usePersonEdit hands to a row or card. */
export type PersonEdit = ReturnType<typeof usePersonEdit>;
