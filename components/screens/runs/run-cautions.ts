// Which of the Safety section's standing cautions a saved run's chemistry calls for. The text is the
// Safety screen's own (components/screens/safety/cautions.ts); nothing here adds a safety claim.
import { runParams, runSystem } from '@/components/screens/calculate/run-inputs';
import { STANDING_CAUTIONS, type CautionSpec } from '@/components/screens/safety/cautions';
import { type Run } from '@/shared/constants';

function keysOf(value: unknown): string[] {
  return typeof value === 'object' && value !== null && !Array.isArray(value) ? Object.keys(value) : [];
}

/** Every formula a run names: its components and chosen ions, and what its reagents or salts bring. */
export function runFormulas(run: Pick<Run, 'problem' | 'inputs'>): Set<string> {
  const system = runSystem(run.inputs);
  const params = runParams(run.inputs);
  const steps = Array.isArray(params.steps) ? (params.steps as unknown[]) : [];
  const salt = params.salt as { stoich?: unknown } | undefined;
  return new Set([
    ...run.problem.components,
    ...(system ? [...system.metals, ...system.ligands, ...system.counterIons, ...Object.keys(system.totals)] : []),
    ...steps.flatMap((s) => keysOf((s as { stoich?: unknown } | null)?.stoich)),
    ...keysOf(salt?.stoich),
    ...(typeof params.precipitant === 'string' ? [params.precipitant] : []),
  ]);
}

/** The standing cautions for these formulas: cyanide (CN-), ammonia with silver (NH3 and Ag+), thiosulfate (S2O3-2). */
export function cautionsFor(formulas: ReadonlySet<string>): CautionSpec[] {
  const wanted = new Set<string>();
  if (formulas.has('CN-')) wanted.add('cyanide-acid');
  if (formulas.has('NH3') && formulas.has('Ag+')) wanted.add('ammoniacal-silver');
  if (formulas.has('S2O3-2')) wanted.add('acid-fixer');
  return STANDING_CAUTIONS.filter((c) => wanted.has(c.key));
}
