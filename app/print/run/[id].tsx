import { useLocalSearchParams } from 'expo-router';

import { RunPrintScreen } from '@/components/screens/runs/run-print-screen';

/** /print/run/:id: one saved run as a page for the browser's print. */
export default function PrintRunRoute() {
  const { id } = useLocalSearchParams<{ id: string }>();
  return <RunPrintScreen id={id ?? ''} />;
}
