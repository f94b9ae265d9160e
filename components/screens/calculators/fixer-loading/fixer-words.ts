// Fixer loading for people: the verdict, the table of silver now and capacity, and its CSV. Pure
// functions over the JSON-safe FixerLoadingResult (a missing number is null).
import { formatNumber } from '@/components/screens/calculate/speciation-summary';
import { csvName, tableCsv } from '@/components/screens/calculators/frame/csv';
import { type TextFile } from '@/components/screens/calculators/frame/types';
import { type FixerLoadingResult } from '@/lib/calculators/fixer-loading';

/** Silver halides a fixer dissolves, with the halide each one needs among the ligands. */
export const FIXER_SOLIDS = [
  { solid: 'AgBr(s)', halide: 'Br-', name: 'Silver bromide' },
  { solid: 'AgCl(s)', halide: 'Cl-', name: 'Silver chloride' },
  { solid: 'AgI(s)', halide: 'I-', name: 'Silver iodide' },
] as const;

/** Whether a stored output looks like a fixer loading result. */
export function isFixerResult(output: unknown): output is FixerLoadingResult {
  return typeof output === 'object' && output !== null && 'loadingPercent' in output && 'silverNow' in output && 'capacity' in output;
}

/** The loading as a share, 0..100 (null when it is not a number). */
export function loadingShare(r: FixerLoadingResult): number | null {
  const p = r.loadingPercent as number | null;
  return typeof p === 'number' && Number.isFinite(p) ? Math.max(0, Math.min(100, p)) : null;
}

function solidWord(r: FixerLoadingResult): string {
  return (r.headroom?.solid ?? 'AgBr(s)').replace(/\(s\)$/, '');
}

/** "Loaded to 38.2 % of capacity: 4.51 g/L silver held; it takes 7.30 g/L more as AgBr before the solid persists." */
export function fixerVerdict(r: FixerLoadingResult, fallback: string): string {
  const share = loadingShare(r);
  const held = formatNumber(r.silverNow?.gramsPerL);
  if (r.outcome === 'already_saturated') return `The fixer is saturated: ${held} g/L silver held, and it takes no more ${solidWord(r)}.`;
  if (r.outcome !== 'headroom' || share === null) return fallback;
  return `Loaded to ${formatNumber(share)} % of capacity: ${held} g/L silver held; it takes ${formatNumber(r.capacity?.gramsPerL)} g/L more as ${solidWord(r)} before the solid persists.`;
}

/** One row of the loading table: g/L and mol/L of silver (null: not known). */
export type FixerRow = { key: string; label: string; gramsPerL: number | null; molPerL: number | null };

function num(x: unknown): number | null {
  return typeof x === 'number' && Number.isFinite(x) ? x : null;
}

/** Silver now, the capacity left and the whole capacity, as silver. */
export function fixerRows(r: FixerLoadingResult): FixerRow[] {
  const nowG = num(r.silverNow?.gramsPerL);
  const nowM = num(r.silverNow?.molPerL);
  const moreG = num(r.capacity?.gramsPerL);
  const moreM = num(r.capacity?.molPerL);
  const sum = (a: number | null, b: number | null) => (a === null || b === null ? null : a + b);
  return [
    { key: 'now', label: 'Silver held now', gramsPerL: nowG, molPerL: nowM },
    { key: 'more', label: 'Silver it can still take', gramsPerL: moreG, molPerL: moreM },
    { key: 'capacity', label: 'Capacity for silver', gramsPerL: sum(nowG, moreG), molPerL: sum(nowM, moreM) },
  ];
}

/** The table as CSV, with the loading and the halide it can still take. */
export function fixerCsv(r: FixerLoadingResult): TextFile {
  const rows = fixerRows(r).map((row) => [row.label, row.gramsPerL, row.molPerL]);
  const text = tableCsv(
    ['quantity', 'silver (g/L)', 'silver (mol/L)'],
    [...rows, [`${solidWord(r)} it can still take (g/L)`, num(r.capacity?.solidGramsPerL), null], ['loading (% of capacity)', loadingShare(r), null]],
  );
  return { filename: csvName('fixer-loading', solidWord(r)), text };
}
