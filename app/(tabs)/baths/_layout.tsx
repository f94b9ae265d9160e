import { Stack } from 'expo-router';

/** Baths keeps its own stack so detail routes can be pushed inside the tab later. */
export default function BathsLayout() {
  return <Stack screenOptions={{ headerShown: false }} />;
}
