import { type ReactNode } from 'react';

import { ShieldIcon } from '@/components/shell/icons';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { TextLink } from '@/components/ui/text-link';
import { useMe } from '@/lib/api/use-me';
import { hasRole } from '@/shared/auth';

type Props = { why: string; children: () => ReactNode };

/** Renders its children only for chemists and technicians; others read why not. The server checks the roles again. */
export function RequireBathRole({ why, children }: Props) {
  const { data: me, error, mutate } = useMe();
  if (!me) {
    return error ? (
      <ErrorState message={error.message} onRetry={() => void mutate()} />
    ) : (
      <LoadingState label="Checking your roles…" />
    );
  }
  if (!hasRole(me, 'chemist', 'technician')) {
    return (
      <EmptyState Icon={ShieldIcon} title="Needs the chemist or technician role" body={why}>
        <TextLink href="/baths" label="Back to the baths" />
      </EmptyState>
    );
  }
  return children();
}
