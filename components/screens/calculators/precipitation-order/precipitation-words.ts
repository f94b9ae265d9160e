// Precipitation order for people: the order as numbered sentences, the thresholds table, the chart's
// points and the CSV. Pure functions over the JSON-safe PrecipitationOrderResult (a missing number is null).
import { formatNumber } from '@/components/screens/calculate/speciation-summary';
import { csvName, tableCsv } from '@/components/screens/calculators/frame/csv';
import { type TextFile } from '@/components/screens/calculators/frame/types';
import { type ChartSeries } from '@/components/screens/calculators/curves/curve-model';
import { type PrecipitationOrderResult, type SolidThreshold } from '@/lib/calculators/precipitation-order';
import { formatSignificant } from '@/lib/units';
import { type ProblemJson } from '@/shared/constants';

/** Whether a stored output looks like a precipitation order result. */
export function isPrecipitationResult(output: unknown): output is PrecipitationOrderResult {
  return typeof output === 'object' && output !== null && 'precipitant' in output && Array.isArray((output as { thresholds?: unknown }).thresholds);
}

function num(x: unknown): number | null {
  return typeof x === 'number' && Number.isFinite(x) ? x : null;
}

/** The ions whose fate the result follows, in the order they first appear. */
export function cationsOf(r: PrecipitationOrderResult): string[] {
  const seen: string[] = [];
  for (const t of r.thresholds) for (const l of t.left ?? []) if (!seen.includes(l.component)) seen.push(l.component);
  return seen;
}

/** "AgI" from "AgI(s)". */
function bare(solid: string): string {
  return solid.replace(/\(s\)$/, '');
}

/** What is left of each ion at a threshold, in words: "Ag+ 1.20 × 10⁻⁶ mol/L (< 0.01 %)". */
function leftWords(t: SolidThreshold): string {
  return (t.left ?? [])
    .map((l) => {
      const pct = num(l.fraction);
      const share = pct === null ? '' : pct * 100 < 0.01 && pct > 0 ? ' (< 0.01 % of it)' : ` (${formatNumber(pct * 100)} % of it)`;
      return `${l.component} ${formatNumber(num(l.molPerL))} mol/L${share}`;
    })
    .join(', ');
}

/** One line of the numbered order. */
export type OrderItem = { key: string; text: string; then: string | null };

/** The order as sentences: where each solid starts, and what is left dissolved of each ion when the next one starts. */
export function orderItems(r: PrecipitationOrderResult, maxMolPerL: number | null): OrderItem[] {
  const p = r.precipitant;
  const ts = r.thresholds;
  return ts.map((t, i) => {
    const next = ts[i + 1];
    let text: string;
    if (t.outcome === 'already') text = `${t.solid} is already saturated at the start (free ${p} ${formatNumber(num(t.precipitantFreeMolPerL))} mol/L).`;
    else if (t.outcome === 'not_reached') text = `${t.solid} does not start${maxMolPerL ? ` up to ${formatNumber(maxMolPerL)} mol/L` : ' within the range searched'} of ${p}.`;
    else text = `${t.solid} starts at ${formatNumber(num(t.precipitantFreeMolPerL))} mol/L free ${p} (${formatNumber(num(t.precipitantTotalMolPerL))} mol/L ${p} in total).`;
    let then: string | null = null;
    if (t.outcome !== 'not_reached') {
      const at = next && next.outcome !== 'not_reached' ? next : null;
      const words = leftWords(at ?? t);
      if (words) then = at ? `When ${bare(at.solid)} starts, left dissolved: ${words}.` : `Left dissolved there: ${words}.`;
    }
    return { key: `${i}:${t.solid}`, text, then };
  });
}

/** One row of the thresholds table (mol/L; null: not known). */
export type ThresholdRow = { key: string; order: number; solid: string; outcome: SolidThreshold['outcome']; total: number | null; free: number | null; left: Record<string, number | null> };

/** The thresholds as rows, in the order the solids appear. */
export function thresholdRows(r: PrecipitationOrderResult): ThresholdRow[] {
  return r.thresholds.map((t, i) => ({
    key: `${i}:${t.solid}`,
    order: i + 1,
    solid: t.solid,
    outcome: t.outcome,
    total: num(t.precipitantTotalMolPerL),
    free: num(t.precipitantFreeMolPerL),
    left: Object.fromEntries((t.left ?? []).map((l) => [l.component, num(l.molPerL)])),
  }));
}

/** What the chart draws: free precipitant on x (log) and each ion left dissolved on y (log), from the start to each threshold. */
export type OrderChart = { xs: number[]; series: ChartSeries[] };

/**
 * Points of the chart: each threshold reached (free precipitant, what is left of each ion), and a
 * starting point a decade below the first, where nothing has come out yet (every ion at its total).
 */
export function orderChart(problem: ProblemJson | null | undefined, r: PrecipitationOrderResult): OrderChart {
  const cations = cationsOf(r);
  const points = r.thresholds
    .filter((t) => t.outcome !== 'not_reached' && (num(t.precipitantFreeMolPerL) ?? 0) > 0)
    .map((t) => ({ x: t.precipitantFreeMolPerL as number, left: Object.fromEntries((t.left ?? []).map((l) => [l.component, num(l.molPerL)])) }))
    .sort((a, b) => a.x - b.x);
  const first = r.thresholds[0];
  const totals = problem?.totals ?? {};
  if (points.length > 0 && first?.outcome === 'reached') {
    const start = Object.fromEntries(cations.map((c) => [c, num(totals[c])]));
    points.unshift({ x: (points[0] as { x: number }).x / 10, left: start });
  }
  return {
    xs: points.map((p) => p.x),
    series: cations.map((c) => ({ key: c, label: `${c} dissolved`, values: points.map((p) => p.left[c] ?? null) })),
  };
}

/** The calculator's message with its numbers written as people read them ("8.30e-15" → "8.30 × 10⁻¹⁵"). */
export function readableVerdict(message: string): string {
  return message.replace(/(-?\d+(?:\.\d+)?)e([-+]?\d+)/g, (whole, mantissa: string, exp: string) => {
    const value = Number(`${mantissa}e${exp}`);
    return Number.isFinite(value) ? formatSignificant(value, Math.max(1, mantissa.replace(/[-.]/g, '').replace(/^0+/, '').length || 1)) : whole;
  });
}

/** The thresholds table as CSV. */
export function precipitationCsv(r: PrecipitationOrderResult): TextFile {
  const cations = cationsOf(r);
  const rows = thresholdRows(r).map((row) => [row.order, row.solid, row.outcome, row.total, row.free, ...cations.map((c) => row.left[c] ?? null)]);
  const text = tableCsv(['order', 'solid', 'outcome', `${r.precipitant} total at threshold (mol/L)`, `free ${r.precipitant} at threshold (mol/L)`, ...cations.map((c) => `${c} left dissolved (mol/L)`)], rows);
  return { filename: csvName('precipitation-order', r.precipitant), text };
}
