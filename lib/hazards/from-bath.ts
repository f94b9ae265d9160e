// The hazard situation of a bath: totals and pH from its latest analysis (the same prefill the
// calculators start from) and the salts it is made up with. No solve: the HCN share then comes
// from the pH and pKa 9.21.
import { prefillFromBath } from '@/lib/baths/prefill';
import { PROCESS_INFO, type Analysis, type Bath, type Process } from '@/shared/baths';
import type { Hazard, HazardThresholds } from '@/shared/safety';

import { evaluateHazards } from './rules';
import type { HazardSituation } from './types';

const named = (v: unknown): string | null => (typeof v === 'string' && v.trim() !== '' ? v.trim() : null);

/** Salts the bath names: its make-up lines, then the salt its ligand is stated as (the bath's, else the process default). */
function bathReagents(bath: Bath): string[] {
  const makeUp = Array.isArray(bath.makeUp) ? bath.makeUp.map((l) => named(l?.salt)) : [];
  const ligandAs = named(bath.ligandAs) ?? named(PROCESS_INFO[bath.process as Process]?.ligandAs);
  return [...new Set([...makeUp, ligandAs].filter((s): s is string => s !== null))];
}

/** What the rules look at for a bath as its latest analysis found it. */
export function bathSituation(bath: Bath, analyses: readonly Analysis[]): HazardSituation {
  const { system } = prefillFromBath(bath, Array.isArray(analyses) ? analyses : []);
  return { totals: system.totals ?? {}, pH: system.pH ?? null, solution: null, reagents: bathReagents(bath) };
}

/** The hazards of a bath under the shop's thresholds, in HAZARD_RULES order. */
export function bathHazards(bath: Bath, analyses: readonly Analysis[], thresholds: HazardThresholds): Hazard[] {
  return evaluateHazards(bathSituation(bath, analyses), thresholds);
}
