import { Stack } from 'expo-router';

/** Safety keeps its own stack so detail routes can be pushed inside the tab later. */
export default function SafetyLayout() {
  return <Stack screenOptions={{ headerShown: false }} />;
}
