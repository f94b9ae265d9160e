import { Stack } from 'expo-router';

/** Library keeps its own stack so detail routes can be pushed inside the tab later. */
export default function LibraryLayout() {
  return <Stack screenOptions={{ headerShown: false }} />;
}
