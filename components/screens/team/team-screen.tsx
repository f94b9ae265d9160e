import { RequireAdmin } from '@/components/screens/admin/require-admin';
import { InvitationsSection } from '@/components/screens/team/invitations-section';
import { InviteCard } from '@/components/screens/team/invite-card';
import { PeopleSection } from '@/components/screens/team/people-section';
import { ScreenContainer } from '@/components/ui/screen-container';

/** Team admin: people and their roles, inviting, and invitations still waiting (admins only). */
export function TeamScreen() {
  return (
    <ScreenContainer title="Team" subtitle="Who can sign in and what each person may do." back={{ href: '/account', label: 'Account' }}>
      <RequireAdmin>
        <PeopleSection />
        <InviteCard />
        <InvitationsSection />
      </RequireAdmin>
    </ScreenContainer>
  );
}
