import { useLocalSearchParams } from 'expo-router';
import { useEffect, useState } from 'react';

import { BATH_STATUS_FILTERS, type BathStatusFilter } from '@/components/screens/baths/bath-words';
import { type BathFilter } from '@/lib/api/use-baths';
import { PROCESSES, type Process } from '@/shared/baths';

/** What the bath list filters on; the search text is sent a moment after typing stops. */
export type BathListState = { q: string; process?: Process; status: BathStatusFilter };

/** The list as it opens: baths in service. */
export const DEFAULT_BATH_LIST: BathListState = { q: '', status: 'active' };

/** Milliseconds after the last keystroke before the search is sent. */
const SEARCH_DELAY_MS = 300;

function pick<T extends string>(value: unknown, allowed: readonly T[]): T | undefined {
  return typeof value === 'string' && (allowed as readonly string[]).includes(value) ? (value as T) : undefined;
}

/** Whether the list is narrowed beyond its opening view (so an empty answer means "no match", not "none yet"). */
export function isNarrowed(state: BathListState): boolean {
  return state.q.trim() !== '' || state.process !== undefined || state.status !== DEFAULT_BATH_LIST.status;
}

/** Filter state of the bath list, started from the link's query (/baths?status=archived). */
export function useBathFilter() {
  const params = useLocalSearchParams();
  const [state, setState] = useState<BathListState>(() => ({
    q: typeof params.q === 'string' ? params.q : '',
    process: pick(params.process, PROCESSES),
    status: pick(params.status, BATH_STATUS_FILTERS.map((s) => s.value)) ?? DEFAULT_BATH_LIST.status,
  }));
  const [q, setQ] = useState(state.q.trim());

  useEffect(() => {
    const timer = setTimeout(() => setQ(state.q.trim()), SEARCH_DELAY_MS);
    return () => clearTimeout(timer);
  }, [state.q]);

  const filter: BathFilter = { q: q || undefined, process: state.process, status: state.status };
  return {
    state,
    filter,
    update: (patch: Partial<BathListState>) => setState((now) => ({ ...now, ...patch })),
    clear: () => setState(DEFAULT_BATH_LIST),
  };
}
