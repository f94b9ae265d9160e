import { useEffect, useState } from 'react';

import { type SystemForm } from '@/components/screens/calculate/use-system-form';
import { useAnalyses } from '@/lib/api/use-bath-detail';
import { useBath } from '@/lib/api/use-baths';
import { prefillFromBath, type BathPrefill } from '@/lib/baths/prefill';
import { type Bath } from '@/shared/baths';

/** The bath a calculation starts from: which one, its record once fetched, and what the prefill estimated. */
export type BathStart = {
  bathId: string | null;
  bath: Bath | null;
  /** The prefill applied to the form (null until the bath and its analyses have arrived). */
  prefill: BathPrefill | null;
  loading: boolean;
  /** Why the bath could not be read, in words. */
  error: string | null;
  /** Starts from bath `id`, or from nothing (null); the form is filled once the bath has arrived. */
  pick: (id: string | null) => void;
};

/**
 * Fetches the picked bath and its analyses and fills the system form from the latest analysis
 * (prefillFromBath), once per pick. `initialId` is the `?bath=` of the route.
 */
export function useBathStart(form: SystemForm, initialId: string | null): BathStart {
  const [bathId, setBathId] = useState<string | null>(initialId);
  const [prefill, setPrefill] = useState<BathPrefill | null>(null);
  const [appliedFor, setAppliedFor] = useState<string | null>(null);
  const bath = useBath(bathId);
  const analyses = useAnalyses(bathId);
  const { load } = form;

  useEffect(() => {
    if (!bathId || appliedFor === bathId || !bath.data || !analyses.data || bath.data.id !== bathId) return;
    const next = prefillFromBath(bath.data, analyses.data);
    setAppliedFor(bathId);
    setPrefill(next);
    load(next.system);
  }, [bathId, appliedFor, bath.data, analyses.data, load]);

  const failure = bath.error ?? analyses.error;
  return {
    bathId,
    bath: bathId && bath.data?.id === bathId ? bath.data : null,
    prefill: bathId && appliedFor === bathId ? prefill : null,
    loading: !!bathId && appliedFor !== bathId && !failure,
    error: bathId && failure ? failure.message : null,
    pick: (id) => {
      setBathId(id);
      setPrefill(null);
      setAppliedFor(null);
    },
  };
}
