// What a curve can sweep and draw for the system at hand, and the defaults a chemist expects (free
// cyanide against total silver; where the metal sits against pH). Pure functions.
import { COUNTER_CHOICES } from '@/components/screens/calculate/speciation-summary';
import { isCation } from '@/components/screens/calculators/frame/solid-choices';
import { type ParamsBase } from '@/components/screens/calculators/frame/types';
import { type SeriesRequest } from '@/lib/calculators/curve-series';

/** A swept input as chosen on screen: "pH" or "total:<component>". */
export type VariableKey = string;

/** The kinds of series, in the order they are offered, with their plain names. */
export const SERIES_KINDS = [
  { kind: 'free', title: 'Free concentration' },
  { kind: 'species', title: 'Concentration of a species' },
  { kind: 'solubility', title: 'Dissolved metal (solubility)' },
  { kind: 'fractions', title: 'Where a metal sits (fractions of its total)' },
  { kind: 'solid', title: 'Amount of a solid present' },
  { kind: 'saturation', title: 'Saturation index of a solid' },
] as const;
export type SeriesKind = (typeof SERIES_KINDS)[number]['kind'];

/** What the system offers: its components, metals, species and solids. */
export type CurveChoices = { components: string[]; metals: string[]; ligands: string[]; species: string[]; solids: string[] };

const COUNTERS = new Set([...COUNTER_CHOICES.map((c) => c.formula), 'NH4+']);

/** The choices of the latest build, or of the chosen ions before the first build. */
export function curveChoices({ built, form }: ParamsBase): CurveChoices {
  const components = built?.problem.components ?? form.chosen;
  return {
    components,
    metals: components.filter((c) => isCation(c) && !COUNTERS.has(c)),
    ligands: components.filter((c) => !isCation(c) && c !== 'H+' && !COUNTERS.has(c)),
    species: (built?.problem.species ?? []).map((s) => s.name).filter((n) => !components.includes(n)),
    solids: (built?.problem.solids ?? []).map((s) => s.name),
  };
}

/** The names a kind of series can take in this system. */
export function namesFor(kind: SeriesKind, c: CurveChoices): string[] {
  switch (kind) {
    case 'free':
      return c.components;
    case 'species':
      return c.species;
    case 'solubility':
    case 'fractions':
      return c.metals;
    default:
      return c.solids;
  }
}

/** A series request from its kind and name. */
export function seriesRequest(kind: SeriesKind, name: string): SeriesRequest {
  return kind === 'species' || kind === 'solid' || kind === 'saturation' ? { kind, name } : { kind, component: name };
}

/** The kind and name of a request, as "kind:name". */
export function seriesKey(s: SeriesRequest): string {
  return `${s.kind}:${'component' in s ? s.component : s.name}`;
}

/** The swept inputs there are: each chosen component's total, and pH. */
export function variableChoices(c: CurveChoices): VariableKey[] {
  return [...c.components.filter((x) => x !== 'H+').map((x) => `total:${x}`), 'pH'];
}

/** The first metal's total, else the first component's, else pH. */
export function defaultVariable(c: CurveChoices): VariableKey {
  const first = c.metals[0] ?? c.components.find((x) => x !== 'H+');
  return first ? `total:${first}` : 'pH';
}

/** The series drawn until the person picks: free ligand against a metal total, else where the metal sits. */
export function defaultSeries(variable: VariableKey, c: CurveChoices): SeriesRequest[] {
  const swept = variable.startsWith('total:') ? variable.slice(6) : null;
  const metal = c.metals[0];
  if (swept && c.metals.includes(swept)) {
    const ligand = c.ligands.find((l) => l !== swept);
    return [ligand ? { kind: 'free', component: ligand } : { kind: 'solubility', component: swept }];
  }
  if (metal) return [{ kind: 'fractions', component: metal }];
  const any = c.components.find((x) => x !== swept);
  return any ? [{ kind: 'free', component: any }] : [];
}

/** The requests that name something this system has. */
export function validSeries(list: readonly SeriesRequest[], c: CurveChoices): SeriesRequest[] {
  return list.filter((s) => namesFor(s.kind, c).includes('component' in s ? s.component : s.name));
}
