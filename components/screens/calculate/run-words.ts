import { z } from 'zod';

import { type StatusKind } from '@/components/ui/status-dot';
import { dosingStepSchema, PARAMS_SCHEMAS, seriesRequestSchema } from '@/shared/calculations';
import { CALCULATOR_LABELS as LABELS, type CalculatorKey } from '@/shared/calculators';
import { type RunSummary } from '@/shared/constants';

/** Plain names of the calculators a run can come from. */
export const CALCULATOR_LABELS: Record<RunSummary['calculator'], string> = Object.fromEntries(
  Object.entries(LABELS).map(([k, v]) => [k, v.label]),
) as Record<RunSummary['calculator'], string>;

/** A run's solver status in words and colour. */
export function runStatus(status: RunSummary['status']): { label: string; kind: StatusKind } {
  return status === 'converged' ? { label: 'Settled', kind: 'ok' } : { label: 'Did not settle', kind: 'bad' };
}

/** The title to show: the run's own, or a stand-in when it was saved without one. */
export function runTitle(run: Pick<RunSummary, 'title'>): string {
  return run.title.trim() === '' ? 'Untitled run' : run.title;
}

/** One line of a run's inputs: what it is and its value, in words. */
export type Fact = [label: string, value: string];

type Params<K extends CalculatorKey> = z.output<(typeof PARAMS_SCHEMAS)[K]>;

/** "1 CN-, 1 Na+": what one mole of a reagent or salt brings. */
function bringsText(stoich: Record<string, number>): string {
  return Object.entries(stoich)
    .map(([formula, n]) => `${n} ${formula}`)
    .join(', ');
}

function seriesText(s: z.output<typeof seriesRequestSchema>): string {
  switch (s.kind) {
    case 'free':
      return `free ${s.component}`;
    case 'species':
      return s.name;
    case 'fractions':
      return `shares of ${s.component}${s.species?.length ? ` (${s.species.join(', ')})` : ''}`;
    case 'solubility':
      return `solubility of ${s.component}`;
    case 'solid':
      return `${s.name} present`;
    case 'saturation':
      return `saturation index of ${s.name}`;
  }
}

function stepText(s: z.output<typeof dosingStepSchema>): string {
  const named = s.label ? `${s.label}: ` : '';
  switch (s.kind) {
    case 'add':
      return `${named}add ${s.mol} mol of ${s.reagent} (one mole brings ${bringsText(s.stoich)})${s.volumeL ? ` in ${s.volumeL} L of liquid` : ''}`;
    case 'set-ph':
      return `${named}set the pH to ${s.pH}`;
    case 'dilute':
      if (s.addWaterL) return `${named}add ${s.addWaterL} L of water`;
      return s.toVolumeL ? `${named}dilute to ${s.toVolumeL} L` : `${named}dilute`;
  }
}

const DESCRIBE: { [K in CalculatorKey]: (p: Params<K>) => Fact[] } = {
  headroom: (p) => [
    ['Solid', p.solid],
    ['Metal counted', p.metal ?? 'the first metal in the solid'],
  ],
  fixer_loading: (p) => [
    ['Silver halide', p.solid],
    ['Silver as', p.silver],
  ],
  speciation: () => [],
  curves: (p) => [
    ['Varied', p.variable.kind === 'pH' ? 'pH' : `total ${p.variable.component} (mol/L)`],
    ['Range', `${p.from} to ${p.to}, ${p.points} points, ${p.spacing === 'log' ? 'log' : 'even'} spacing`],
    ['Drawn', p.series.map(seriesText).join('; ')],
  ],
  precipitation_order: (p) => [
    ['Precipitant', p.precipitant],
    ['Metal ions', p.cations.join(', ')],
    ['Most precipitant considered', p.maxPrecipitantMolPerL === undefined ? 'no limit given' : `${p.maxPrecipitantMolPerL} mol/L`],
  ],
  dosing_plan: (p) => [['Starting volume', `${p.volumeL} L`], ...p.steps.map((s, i): Fact => [`Step ${i + 1}`, stepText(s)])],
  make_up: (p) => [
    ['Tank volume', `${p.volume.value} ${p.volume.unit === 'gal' ? 'US gal' : 'L'}`],
    ['Salt', `${p.salt.name}${p.salt.formula ? ` (${p.salt.formula})` : ''}; one mole brings ${bringsText(p.salt.stoich)}`],
    [
      'Target',
      p.target.kind === 'free'
        ? `free ${p.target.component} of ${p.target.molPerL} mol/L`
        : `headroom of ${p.target.molPerL} mol/L for ${p.target.solid}`,
    ],
    ['Mass shown in', p.massUnit],
  ],
};

/** A calculator's parameters in words; null when they are not in a shape this app knows (shown as stored). */
export function paramFacts<K extends CalculatorKey>(calculator: K, params: unknown): Fact[] | null {
  const parsed = PARAMS_SCHEMAS[calculator].safeParse(params ?? {});
  return parsed.success ? DESCRIBE[calculator](parsed.data as Params<K>) : null;
}
