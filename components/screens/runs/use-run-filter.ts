import { useLocalSearchParams } from 'expo-router';
import { useEffect, useState } from 'react';

import { type RunFilter } from '@/lib/api/use-runs';
import { CALCULATOR_KEYS, type CalculatorKey } from '@/shared/calculators';

/** Whose runs: everyone's, the signed-in person's, or one other person's (by id, from a link). */
export type AuthorChoice = 'everyone' | 'mine' | { id: string };

/** What the runs list filters on; dates are typed as YYYY-MM-DD and sent once they read as a date. */
export type RunListState = { bath: string; calculator: CalculatorKey | ''; author: AuthorChoice; from: string; to: string };

/** The list as it opens: every run of the team. */
export const DEFAULT_RUN_LIST: RunListState = { bath: '', calculator: '', author: 'everyone', from: '', to: '' };

/** Milliseconds after the last keystroke in a date field before it is checked and sent. */
const DATE_DELAY_MS = 400;

const DATE_SHAPE = /^\d{4}-\d{2}-\d{2}$/;

/** What is wrong with a typed date, or undefined when it is empty or a real calendar date. */
export function dateProblem(text: string): string | undefined {
  const t = text.trim();
  if (t === '') return undefined;
  const ok = DATE_SHAPE.test(t) && !Number.isNaN(Date.parse(`${t}T00:00:00Z`)) && new Date(`${t}T00:00:00Z`).toISOString().slice(0, 10) === t;
  return ok ? undefined : 'Write the date as YYYY-MM-DD, for example 2026-03-01.';
}

function param(value: string | string[] | undefined): string {
  return typeof value === 'string' ? value.trim() : '';
}

function authorFrom(value: string): AuthorChoice {
  if (value === '' || value === 'everyone') return 'everyone';
  return value === 'mine' || value === 'me' ? 'mine' : { id: value };
}

/** The opening state from the link's query (/calculate/runs?calculator=headroom&author=mine&from=2026-03-01). */
function fromParams(params: Record<string, string | string[] | undefined>): RunListState {
  const calculator = param(params.calculator);
  return {
    bath: param(params.bath),
    calculator: (CALCULATOR_KEYS as readonly string[]).includes(calculator) ? (calculator as CalculatorKey) : '',
    author: authorFrom(param(params.author)),
    from: param(params.from),
    to: param(params.to),
  };
}

/** How many filters narrow the list beyond the opening view. */
export function activeFilterCount(state: RunListState): number {
  return [state.bath, state.calculator, state.author !== 'everyone', state.from.trim(), state.to.trim()].filter(Boolean).length;
}

/** Problems with the typed dates, as shown under their fields (after typing stops). */
export type DateProblems = { from?: string; to?: string };

function checkDates(from: string, to: string): DateProblems {
  const problems: DateProblems = { from: dateProblem(from), to: dateProblem(to) };
  if (!problems.from && !problems.to && from.trim() && to.trim() && to.trim() < from.trim()) {
    problems.to = 'The end date is before the start date.';
  }
  return problems;
}

/**
 * Filter state of the runs list, started from the link's query. `me` is the signed-in person's id:
 * "Mine" waits for it (null filter) rather than asking for everyone's runs first.
 */
export function useRunFilter(me: string | undefined) {
  const params = useLocalSearchParams();
  const [state, setState] = useState<RunListState>(() => fromParams(params));
  const [dates, setDates] = useState({ from: state.from, to: state.to });

  useEffect(() => {
    const timer = setTimeout(() => setDates({ from: state.from, to: state.to }), DATE_DELAY_MS);
    return () => clearTimeout(timer);
  }, [state.from, state.to]);

  const problems = checkDates(dates.from, dates.to);
  const author = state.author === 'everyone' ? undefined : state.author === 'mine' ? me : state.author.id;
  const waiting = state.author === 'mine' && !me;
  const filter: RunFilter | null = waiting
    ? null
    : {
        bath: state.bath || undefined,
        calculator: state.calculator || undefined,
        author,
        from: problems.from ? undefined : dates.from.trim() || undefined,
        to: problems.to ? undefined : dates.to.trim() || undefined,
      };
  // A link naming the signed-in person's own id shows as "Mine".
  const shown: RunListState = typeof state.author === 'object' && state.author.id === me ? { ...state, author: 'mine' } : state;
  return {
    state: shown,
    filter,
    problems,
    update: (patch: Partial<RunListState>) => setState((now) => ({ ...now, ...patch })),
    clear: () => {
      setState(DEFAULT_RUN_LIST);
      setDates({ from: '', to: '' });
    },
  };
}
