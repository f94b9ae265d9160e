import { type ReactNode } from 'react';

import { ShieldIcon } from '@/components/shell/icons';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { TextLink } from '@/components/ui/text-link';
import { useMe } from '@/lib/api/use-me';
import { hasRole, ROLE_LABELS, type Role, type User } from '@/shared/auth';

type Props = { role: Role; why: string; children: (me: User) => ReactNode };

/** Renders its children only for people with `role`; others read why not. The server checks the role again. */
export function RequireRole({ role, why, children }: Props) {
  const { data: me, error, mutate } = useMe();
  if (!me) {
    return error ? (
      <ErrorState message={error.message} onRetry={() => void mutate()} />
    ) : (
      <LoadingState label="Checking your roles…" />
    );
  }
  if (!hasRole(me, role)) {
    return (
      <EmptyState Icon={ShieldIcon} title={`Needs the ${ROLE_LABELS[role].label.toLowerCase()} role`} body={why}>
        <TextLink href="/library" label="Back to the library" />
      </EmptyState>
    );
  }
  return children(me);
}
