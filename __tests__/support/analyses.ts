import type { Analysis } from '@/shared/baths';

/** A manual analysis sampled at `sampledAt` (also its id), with only the given values measured. */
export function analysis(sampledAt: string, values: Partial<Analysis['values']>): Analysis {
  return {
    id: sampledAt,
    bathId: 'b',
    sampledAt,
    analyst: 'A',
    values: { metal: null, freeLigand: null, totalLigand: null, pH: null, carbonate: null, bromide: null, ...values },
    entered: {},
    notes: '',
    source: 'manual',
    enteredBy: { id: 'u', name: 'U' },
    createdAt: sampledAt,
    outOfRange: [],
  };
}
