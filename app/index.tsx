import { Redirect } from 'expo-router';

/** The app opens on the bath list. */
export default function Index() {
  return <Redirect href="/baths" />;
}
