import { ActivityScreen } from '@/components/screens/activity/activity-screen';

/** /account/activity: the audit log (admins). */
export default ActivityScreen;
