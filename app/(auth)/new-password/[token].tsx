import { useLocalSearchParams } from 'expo-router';

import { NewPasswordScreen } from '@/components/screens/auth/new-password-screen';

/** /new-password/:token: the target of a mailed reset link. */
export default function NewPasswordRoute() {
  const { token } = useLocalSearchParams<{ token: string }>();
  return <NewPasswordScreen token={token ?? ''} />;
}
