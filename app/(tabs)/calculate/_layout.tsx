import { Stack } from 'expo-router';

/** Calculate keeps its own stack so detail routes can be pushed inside the tab later. */
export default function CalculateLayout() {
  return <Stack screenOptions={{ headerShown: false }} />;
}
