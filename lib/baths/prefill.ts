// A calculator's system from a bath: its metal and ligand, totals from the latest analysis, its pH
// and temperature. What had to be estimated is said in `notes`, so the screen can show it.
import type { Analysis, Bath } from '@/shared/baths';
import type { SystemRequest } from '@/shared/constants';

/** Ligand held per metal in the complex a bath of this metal and ligand mostly carries (common practice). */
const LIGAND_PER_METAL: Record<string, number> = {
  'Ag+|CN-': 2,
  'Au+|CN-': 2,
  'Cu+|CN-': 3,
  'Zn+2|CN-': 4,
  'Ag+|S2O3-2': 2,
  'Ag+|NH3': 2,
  'Cu+2|NH3': 4,
};

/** The counter-ion a bath's ligand salt brings, per ligand (K+ from KCN, Na+ from NaCN or Na2S2O3). */
function counterIon(ligandAs: string): { ion: string; perLigand: number } | null {
  if (/^K/.test(ligandAs)) return { ion: 'K+', perLigand: 1 };
  if (/^Na2S2O3/.test(ligandAs)) return { ion: 'Na+', perLigand: 2 };
  if (/^Na/.test(ligandAs)) return { ion: 'Na+', perLigand: 1 };
  return null;
}

export interface BathPrefill {
  system: SystemRequest;
  /** What was estimated or left out, in words. */
  notes: string[];
  /** The analysis used (null: none yet; totals are then zero and must be entered). */
  analysis: Analysis | null;
}

/** The newest analysis by sampling time. */
export function latestAnalysis(analyses: readonly Analysis[]): Analysis | null {
  let best: Analysis | null = null;
  for (const a of analyses) if (!best || a.sampledAt > best.sampledAt || (a.sampledAt === best.sampledAt && a.createdAt > best.createdAt)) best = a;
  return best;
}

/** The system request for a bath as its latest analysis found it. */
export function prefillFromBath(bath: Bath, analyses: readonly Analysis[]): BathPrefill {
  const notes: string[] = [];
  const latest = latestAnalysis(analyses);
  const metal = latest?.values.metal ?? 0;
  const perMetal = LIGAND_PER_METAL[`${bath.metal}|${bath.ligand}`] ?? 2;
  let ligandTotal = latest?.values.totalLigand ?? null;
  if (ligandTotal === null) {
    const free = latest?.values.freeLigand ?? 0;
    ligandTotal = free + perMetal * metal;
    if (latest?.values.freeLigand != null) {
      notes.push(`Total ${bath.ligand} estimated as free + ${perMetal} per ${bath.metal} (no total was analysed).`);
    }
  }
  const totals: Record<string, number> = { [bath.metal]: metal, [bath.ligand]: ligandTotal };
  const ligands = [bath.ligand];
  if (bath.extras.includes('bromide')) {
    // A fixer always carries the halide it dissolves (AgBr for fixer loading), even when the
    // analysis did not measure bromide: then it starts at 0 and the calculator adds what dissolves.
    ligands.push('Br-');
    const bromide = latest?.values.bromide ?? null;
    totals['Br-'] = bromide ?? 0;
    if (latest && bromide === null) notes.push('No bromide was analysed: taken as 0.');
  }
  const counterIons: string[] = [];
  const counter = counterIon(bath.ligandAs);
  if (counter) {
    counterIons.push(counter.ion);
    totals[counter.ion] = counter.perLigand * ligandTotal;
    notes.push(`${counter.ion} taken as ${counter.perLigand} per ${bath.ligand} from ${bath.ligandAs}, for the ionic strength.`);
  }
  if (!latest) notes.push('This bath has no analyses yet: enter the totals.');
  const pH = latest?.values.pH ?? undefined;
  if (pH === undefined) notes.push('No pH was analysed: enter one, or protonation and hydroxide are left out.');
  return {
    system: {
      metals: [bath.metal],
      ligands,
      counterIons,
      totals,
      ...(pH !== undefined ? { pH } : {}),
      activity: 'davies',
      temperatureC: bath.temperatureC ?? 25,
    },
    notes,
    analysis: latest,
  };
}
