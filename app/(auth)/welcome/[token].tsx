import { useLocalSearchParams } from 'expo-router';

import { WelcomeScreen } from '@/components/screens/auth/welcome-screen';

/** /welcome/:token: the target of a mailed invitation. */
export default function WelcomeRoute() {
  const { token } = useLocalSearchParams<{ token: string }>();
  return <WelcomeScreen token={token ?? ''} />;
}
