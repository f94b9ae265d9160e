import { useLocalSearchParams } from 'expo-router';

import { SignInScreen } from '@/components/screens/auth/sign-in-screen';

/** /sign-in?next=/baths: sign in, then go on to `next`. */
export default function SignInRoute() {
  const { next } = useLocalSearchParams<{ next?: string }>();
  return <SignInScreen next={next} />;
}
