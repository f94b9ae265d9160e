import { ForgotPasswordScreen } from '@/components/screens/auth/forgot-password-screen';

/** /forgot-password: ask for a reset link by e-mail. */
export default ForgotPasswordScreen;
