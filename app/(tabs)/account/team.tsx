import { TeamScreen } from '@/components/screens/team/team-screen';

/** /account/team: people, roles and invitations (admins). */
export default TeamScreen;
