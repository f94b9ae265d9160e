import { useLocalSearchParams } from 'expo-router';

import { RunScreen } from '@/components/screens/calculate/run-screen';

/** /calculate/runs/:id: one saved run with the constant versions it used. */
export default function RunRoute() {
  const { id } = useLocalSearchParams<{ id: string }>();
  return <RunScreen id={id ?? ''} />;
}
