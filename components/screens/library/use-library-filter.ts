import { useLocalSearchParams } from 'expo-router';
import { useEffect, useState } from 'react';

import { STATUS_FILTERS, type StatusFilter } from '@/components/screens/library/words';
import { type ConstantFilter } from '@/lib/api/use-library';
import { CONSTANT_KINDS, SORT_KEYS, type ConstantKind, type ConstantSort } from '@/shared/constants';

/** What the list screen filters and sorts on; the search text is sent a moment after typing stops. */
export type ListState = {
  q: string;
  metal?: string;
  ligand?: string;
  kind?: ConstantKind;
  status: StatusFilter;
  sort: ConstantSort;
  dir: 'asc' | 'desc';
};

/** The list as it opens: the approved library, by reaction. */
export const DEFAULT_LIST: ListState = { q: '', status: 'approved', sort: 'reaction', dir: 'asc' };

/** Milliseconds after the last keystroke before the search is sent. */
const SEARCH_DELAY_MS = 300;

function pick<T extends string>(value: unknown, allowed: readonly T[]): T | undefined {
  return typeof value === 'string' && (allowed as readonly string[]).includes(value) ? (value as T) : undefined;
}

function fromParams(params: Record<string, string | string[] | undefined>): ListState {
  const text = (key: string) => (typeof params[key] === 'string' ? (params[key] as string) : undefined);
  return {
    q: text('q') ?? '',
    metal: text('metal') || undefined,
    ligand: text('ligand') || undefined,
    kind: pick(params.kind, CONSTANT_KINDS),
    status: pick(params.status, STATUS_FILTERS.map((s) => s.value)) ?? DEFAULT_LIST.status,
    sort: pick(params.sort, SORT_KEYS) ?? DEFAULT_LIST.sort,
    dir: pick(params.dir, ['asc', 'desc'] as const) ?? DEFAULT_LIST.dir,
  };
}

/** How many filters narrow the list beyond the default (for the phone's "Filters (2)" button). */
export function activeFilters(state: ListState): number {
  return [state.metal, state.ligand, state.kind, state.status !== DEFAULT_LIST.status ? state.status : undefined].filter(Boolean)
    .length;
}

/** Filter and sort state of the library list, started from the link's query (/library?status=draft). */
export function useLibraryFilter() {
  const params = useLocalSearchParams();
  const [state, setState] = useState<ListState>(() => fromParams(params));
  const [q, setQ] = useState(state.q.trim());

  useEffect(() => {
    const timer = setTimeout(() => setQ(state.q.trim()), SEARCH_DELAY_MS);
    return () => clearTimeout(timer);
  }, [state.q]);

  const filter: ConstantFilter = {
    q: q || undefined,
    metal: state.metal,
    ligand: state.ligand,
    kind: state.kind,
    status: state.status,
    sort: state.sort,
    dir: state.dir,
  };
  return {
    state,
    filter,
    update: (patch: Partial<ListState>) => setState((now) => ({ ...now, ...patch })),
    clear: () => setState({ ...DEFAULT_LIST, sort: state.sort, dir: state.dir }),
  };
}
