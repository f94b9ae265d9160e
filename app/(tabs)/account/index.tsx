import { AccountScreen } from '@/components/screens/account/account-screen';

/** /account: the Account section's landing screen. */
export default AccountScreen;
