import { OutboxScreen } from '@/components/screens/outbox/outbox-screen';

/** /account/outbox: mail caught by the development server (admins). */
export default OutboxScreen;
