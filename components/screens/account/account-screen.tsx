import { AdminCard } from '@/components/screens/account/admin-card';
import { InstallationCard } from '@/components/screens/account/installation-card';
import { PasswordCard } from '@/components/screens/account/password-card';
import { ProfileCard } from '@/components/screens/account/profile-card';
import { SessionsCard } from '@/components/screens/account/sessions-card';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { ScreenContainer } from '@/components/ui/screen-container';
import { useMe } from '@/lib/api/use-me';
import { hasRole } from '@/shared/auth';

/** Account section: who you are, your password and sessions, admin links, and what this installation runs. */
export function AccountScreen() {
  const { data: me, error, mutate } = useMe();
  return (
    <ScreenContainer title="Account">
      {me ? (
        <>
          <ProfileCard key={me.id} user={me} />
          {hasRole(me, 'admin') ? <AdminCard /> : null}
          <PasswordCard />
          <SessionsCard />
        </>
      ) : error ? (
        <ErrorState message={error.message} onRetry={() => void mutate()} />
      ) : (
        <LoadingState label="Loading your account…" />
      )}
      <InstallationCard />
    </ScreenContainer>
  );
}
