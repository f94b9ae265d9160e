import { InstallationCard } from '@/components/screens/account/installation-card';
import { PersonIcon } from '@/components/shell/icons';
import { EmptyState } from '@/components/ui/empty-state';
import { ScreenContainer } from '@/components/ui/screen-container';

/** Account section: nobody can sign in yet; shows what this installation is running instead. */
export function AccountScreen() {
  return (
    <ScreenContainer title="Account">
      <EmptyState
        Icon={PersonIcon}
        title="Not signed in"
        body="Team sign-in is not set up in this build."
      />
      <InstallationCard />
    </ScreenContainer>
  );
}
