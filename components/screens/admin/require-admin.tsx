import { type ReactNode } from 'react';

import { ShieldIcon } from '@/components/shell/icons';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { TextLink } from '@/components/ui/text-link';
import { useMe } from '@/lib/api/use-me';
import { hasRole } from '@/shared/auth';

/** Title of the state shown to people without the admin role. */
export const NEEDS_ADMIN = 'Needs the admin role';

/** Renders its children only for admins; others see why not. The server checks the role again on every request. */
export function RequireAdmin({ children }: { children: ReactNode }) {
  const { data: me, error, mutate } = useMe();
  if (!me) {
    return error ? (
      <ErrorState message={error.message} onRetry={() => void mutate()} />
    ) : (
      <LoadingState label="Checking your roles…" />
    );
  }
  if (!hasRole(me, 'admin')) {
    return (
      <EmptyState
        Icon={ShieldIcon}
        title={NEEDS_ADMIN}
        body="This page is for the team's admins. Ask one of them if you need something changed here."
      >
        <TextLink href="/account" label="Back to your account" />
      </EmptyState>
    );
  }
  return children;
}
