import { Stack } from 'expo-router';

/** Safety keeps its own stack: the desk, a review, and the thresholds. */
export default function SafetyLayout() {
  return <Stack screenOptions={{ headerShown: false }} />;
}
