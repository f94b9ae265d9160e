import { Stack } from 'expo-router';

/** Account keeps its own stack so detail routes can be pushed inside the tab later. */
export default function AccountLayout() {
  return <Stack screenOptions={{ headerShown: false }} />;
}
