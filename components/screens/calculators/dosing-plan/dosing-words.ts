// A dosing plan for people: the state after each step as table rows, the cyanide-and-acid caution,
// the verdict and the CSV. Pure functions over the JSON-safe DosingPlanResult and the params as sent.
import { COUNTER_CHOICES, formatNumber } from '@/components/screens/calculate/speciation-summary';
import { csvName, tableCsv } from '@/components/screens/calculators/frame/csv';
import { type TextFile } from '@/components/screens/calculators/frame/types';
import { isCation } from '@/components/screens/calculators/frame/solid-choices';
import { dissolved } from '@/components/screens/calculators/headroom/headroom-words';
import { type DosingPlanResult, type DosingState } from '@/lib/calculators/dosing-plan';
import { convertVolume } from '@/lib/units';
import { type ProblemJson, type SolveResultJson } from '@/shared/constants';

import { addsAcid, CYANIDE_ACID_CAUTION, CYANIDE_PH_CAUTION } from './reagent-stoich';
import { type TankUnit } from './use-bath-volume';

/** Whether a stored output looks like a dosing plan result. */
export function isDosingResult(output: unknown): output is DosingPlanResult {
  return typeof output === 'object' && output !== null && Array.isArray((output as { states?: unknown }).states);
}

function num(x: unknown): number | null {
  return typeof x === 'number' && Number.isFinite(x) ? x : null;
}

/** The volume unit the plan was entered in (L unless gal was chosen). */
export function unitOf(params: Record<string, unknown>): TankUnit {
  return params.volumeUnit === 'gal' ? 'gal' : 'L';
}

/** Litres in `unit`, for display; null when not a number. */
export function litresIn(litres: unknown, unit: TankUnit): number | null {
  const l = num(litres);
  if (l === null) return null;
  return unit === 'L' ? l : convertVolume(l, 'L', 'gal').toNumber();
}

/** "1,200" for 1200: thousands grouped when the number is written out in full. */
export function grouped(text: string): string {
  return /^-?\d{4,}(\.\d+)?$/.test(text) ? text.replace(/^(-?\d+)/, (whole) => whole.replace(/\B(?=(\d{3})+$)/g, ',')) : text;
}

/** A volume's number for people, to 4 figures without trailing zeros: "1,200", "378.5". */
export function volumeNumber(v: number | null): string {
  if (v === null) return '—';
  return Math.abs(v) >= 1e-3 && Math.abs(v) < 1e9 ? grouped(String(Number(v.toPrecision(4)))) : formatNumber(v, 4);
}

/** A volume for people: "1,200 L". */
export function volumeText(litres: unknown, unit: TankUnit): string {
  const v = litresIn(litres, unit);
  return v === null ? '—' : `${volumeNumber(v)} ${unit}`;
}

/** Ligands (not metals, H+ or counter-ions) and metals of the system, for the free and dissolved columns. */
export function ligandsAndMetals(problem: ProblemJson): { ligands: string[]; metals: string[] } {
  const counter = (c: string) => COUNTER_CHOICES.some((x) => x.formula === c) || c === 'NH4+';
  const metals = problem.components.filter((c) => isCation(c) && !counter(c));
  const ligands = problem.components.filter((c) => c !== 'H+' && !isCation(c) && !counter(c));
  return { ligands, metals };
}

/** One step as sent (the params keep the steps as the person made them). */
type SentStep = { kind?: unknown; label?: unknown; reagent?: unknown; stoich?: unknown; pH?: unknown };

function sentSteps(params: Record<string, unknown>): SentStep[] {
  return Array.isArray(params.steps) ? (params.steps as SentStep[]).filter((s) => typeof s === 'object' && s !== null) : [];
}

/** A caution on one step (1-based): the sentence, and its words without the step. */
export type StepCaution = { step: number; text: string; words: string };

/**
 * Cautions by step number (1-based) for a system holding cyanide: a step that adds acid (brings H+),
 * and a pH set point below the pH before it (acid is what lowers it). `startPH`: the pH at the start, if known.
 */
export function acidCautions(components: readonly string[], steps: readonly SentStep[], startPH: number | null = null): StepCaution[] {
  if (!components.includes('CN-')) return [];
  let pH = startPH;
  return steps.flatMap((s, i) => {
    if (s.kind === 'set-ph' && typeof s.pH === 'number') {
      const lower = pH !== null && s.pH < pH;
      pH = s.pH;
      return lower ? [{ step: i + 1, text: `Step ${i + 1} (pH ${s.pH}) ${CYANIDE_PH_CAUTION}`, words: CYANIDE_PH_CAUTION }] : [];
    }
    if (s.kind !== 'add' || typeof s.reagent !== 'string') return [];
    const stoich = typeof s.stoich === 'object' && s.stoich !== null ? (s.stoich as Record<string, number>) : {};
    return addsAcid(s.reagent, stoich) ? [{ step: i + 1, text: `Step ${i + 1} (${s.reagent}) ${CYANIDE_ACID_CAUTION}`, words: CYANIDE_ACID_CAUTION }] : [];
  });
}

/** One row of the plan table. */
export type DosingRow = {
  key: string;
  step: string;
  volume: number | null;
  pH: number | null;
  free: Record<string, number | null>;
  metal: Record<string, number | null>;
  solids: string;
  notes: string;
};

function pHOf(s: DosingState): number | null {
  const set = num(s.pH?.pH);
  if (set !== null) return set;
  const h = num(s.fixed?.['H+']);
  return h !== null && h > 0 ? -Math.log10(h) : null;
}

function solidsWords(s: DosingState): string {
  const present = Object.entries((s.result?.solids ?? {}) as Record<string, number | null>).filter(([, v]) => typeof v === 'number' && v > 0).map(([k]) => k);
  const appeared = s.index === 0 ? [] : (s.appeared ?? []);
  const parts = [
    ...appeared.map((x) => `${x} appears`),
    ...(s.dissolved ?? []).map((x) => `${x} dissolves`),
    ...present.filter((x) => !appeared.includes(x)).map((x) => `${x} present`),
  ];
  return parts.length > 0 ? parts.join('; ') : 'none';
}

function stepName(s: DosingState, sent: SentStep | undefined): string {
  if (s.index === 0) return 'Start';
  const label = typeof sent?.label === 'string' && sent.label.trim() !== '' ? sent.label : s.label;
  return `${s.index}. ${label.charAt(0).toUpperCase()}${label.slice(1)}`;
}

/** The cautions of a plan as worked out: its steps, from the pH the vessel started at. */
export function planCautions(problem: ProblemJson, r: DosingPlanResult, params: Record<string, unknown>): StepCaution[] {
  const start = r.states[0];
  return acidCautions(problem.components, sentSteps(params), start ? pHOf(start) : null);
}

/** A state's notes, leaving out those of the same kind (the words before the first colon) as the state before: a repeated note is shown once. */
function newNotes(s: DosingState, before: DosingState | undefined): string[] {
  const kind = (w: string) => w.split(':')[0] ?? w;
  const seen = new Set((before?.warnings ?? []).map(kind));
  return (s.warnings ?? []).filter((w) => !seen.has(kind(w)));
}

/** The state before the first step and after each one. */
export function dosingRows(problem: ProblemJson, r: DosingPlanResult, params: Record<string, unknown>): DosingRow[] {
  const { ligands, metals } = ligandsAndMetals(problem);
  const steps = sentSteps(params);
  const cautions = planCautions(problem, r, params);
  return r.states.map((s, i) => {
    const result = s.result as unknown as SolveResultJson | undefined;
    const caution = cautions.find((c) => c.step === s.index);
    const notes = [...(caution ? [`Caution: this step ${caution.words}`] : []), ...(s.status !== 'converged' ? ['Did not fully settle.'] : []), ...newNotes(s, r.states[i - 1])];
    return {
      key: String(s.index),
      step: stepName(s, steps[s.index - 1]),
      volume: num(s.volumeL),
      pH: pHOf(s),
      free: Object.fromEntries(ligands.map((c) => [c, num(result?.free?.[c])])),
      metal: Object.fromEntries(metals.map((c) => [c, dissolved(problem, result, c)])),
      solids: solidsWords(s),
      notes: notes.join(' ') || '—',
    };
  });
}

/** "After 3 steps: 1,200 L, with AgCN(s) as solid." and the caution when a step adds acid to cyanide. */
export function dosingVerdict(problem: ProblemJson, r: DosingPlanResult, params: Record<string, unknown>, fallback: string): string {
  const last = r.states[r.states.length - 1];
  if (!last) return fallback;
  const n = r.states.length - 1;
  const solids = Object.entries((last.result?.solids ?? {}) as Record<string, number | null>).filter(([, v]) => typeof v === 'number' && v > 0).map(([k]) => k);
  const cautions = planCautions(problem, r, params);
  const numbers = cautions.map((c) => String(c.step));
  const which = numbers.length === 1 ? `step ${numbers[0]} adds` : `steps ${numbers.slice(0, -1).join(', ')} and ${numbers[numbers.length - 1]} add`;
  const warn = cautions.length > 0 ? ` Caution: ${which} acid to a cyanide bath: hydrogen cyanide gas can be released — follow the SDS and local codes.` : '';
  return `After ${n} step${n === 1 ? '' : 's'}: ${volumeText(last.volumeL, unitOf(params))}${solids.length ? `, with ${solids.join(', ')} as solid` : ', nothing solid'}.${warn}`;
}

/** The plan table as CSV (volumes in litres, concentrations in mol/L). */
export function dosingCsv(problem: ProblemJson, r: DosingPlanResult, params: Record<string, unknown>): TextFile {
  const { ligands, metals } = ligandsAndMetals(problem);
  const rows = dosingRows(problem, r, params).map((row) => [row.step, row.volume, row.pH, ...ligands.map((c) => row.free[c] ?? null), ...metals.map((c) => row.metal[c] ?? null), row.solids, row.notes]);
  const header = ['step', 'volume (L)', 'pH', ...ligands.map((c) => `free ${c} (mol/L)`), ...metals.map((c) => `dissolved ${c} (mol/L)`), 'solids', 'notes'];
  return { filename: csvName('dosing-plan'), text: tableCsv(header, rows) };
}
