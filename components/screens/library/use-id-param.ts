import { useLocalSearchParams } from 'expo-router';

/** The route's numeric `id` parameter, or null when it is not a positive whole number. */
export function useIdParam(): number | null {
  const { id } = useLocalSearchParams<{ id?: string }>();
  const n = typeof id === 'string' && /^\d+$/.test(id) ? Number(id) : NaN;
  return Number.isSafeInteger(n) && n > 0 ? n : null;
}
