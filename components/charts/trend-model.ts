// What a trend chart draws, worked out apart from the drawing: points in time order with their side
// of the target range, the axes' ticks, the pixel maps and the sentence read to screen readers.
import { DAY_MS, dateTicks, linear, niceTicks, stepDecimals, type ValueTicks } from '@/components/charts/scale';
import { type MarkKind } from '@/components/charts/marks';
import { formatSignificant } from '@/lib/units';

/** One value at one time: `at` as epoch milliseconds or an ISO 8601 text. */
export type TrendPoint = { at: number | string; value: number; key?: string };

/** A target range; either end may be open (null). */
export type TrendBand = { min: number | null; max: number | null };

/** A point ready to draw: time in ms, value, and where it lies against the band. */
export type PlacedPoint = { t: number; value: number; kind: MarkKind; key: string };

/** Pixel sizes of the chart's frame (px). */
export const FRAME = { top: 26, right: 14, bottom: 42, tickGap: 6, charWidth: 6.6, pad: 8 } as const;

function timeOf(at: number | string): number {
  return typeof at === 'number' ? at : Date.parse(at);
}

/** Where a value lies against a band ("inside" when there is no band). */
export function sideOf(band: TrendBand | null | undefined, value: number): MarkKind {
  if (!band) return 'inside';
  const eps = 1e-9 * Math.max(1, Math.abs(value));
  if (band.min !== null && value < band.min - eps) return 'below';
  if (band.max !== null && value > band.max + eps) return 'above';
  return 'inside';
}

/** The points that can be drawn (finite time and value), oldest first, each with its side of the band. */
export function placePoints(points: readonly TrendPoint[], band?: TrendBand | null): PlacedPoint[] {
  return points
    .map((p, i) => ({ t: timeOf(p.at), value: p.value, kind: sideOf(band, p.value), key: p.key ?? String(i) }))
    .filter((p) => Number.isFinite(p.t) && Number.isFinite(p.value))
    .sort((a, b) => a.t - b.t);
}

/** A value with its unit as people read it (3 significant figures). */
export function withUnit(value: number, unit: string | null): string {
  const text = formatSignificant(value, 3);
  return unit ? `${text} ${unit}` : text;
}

/** An axis or column title with its unit: "Free KCN (g/L)", or "Carbonate (as K2CO3), g/L" when the title has brackets already. */
export function axisTitle(title: string, unit: string | null): string {
  if (!unit) return title;
  return title.includes('(') ? `${title}, ${unit}` : `${title} (${unit})`;
}

/** The chart in one sentence: "Free KCN over 16 analyses, 3 outside the target range; latest 28.1 g/L". */
export function trendSummary(title: string, unit: string | null, placed: readonly PlacedPoint[], band?: TrendBand | null): string {
  const last = placed[placed.length - 1];
  if (!last) return `${title}: no results yet`;
  const n = placed.length;
  const over = `${title} over ${n} ${n === 1 ? 'analysis' : 'analyses'}`;
  const hasBand = !!band && (band.min !== null || band.max !== null);
  const outside = placed.filter((p) => p.kind !== 'inside').length;
  const range = hasBand ? `, ${outside} outside the target range` : ', no target range set';
  const lastSide = last.kind === 'below' ? ' (low)' : last.kind === 'above' ? ' (high)' : '';
  return `${over}${range}; latest ${withUnit(last.value, unit)}${lastSide}`;
}

/** Axes and pixel maps for a chart `width` × `height` px. */
export type TrendGeometry = {
  x: (t: number) => number;
  y: (v: number) => number;
  yTicks: ValueTicks;
  yLabels: string[];
  xTicks: number[];
  left: number;
  right: number;
  top: number;
  bottom: number;
};

/** Lays the chart out: the value domain covers the points and the band's closed ends, on nice ticks. */
export function trendGeometry(placed: readonly PlacedPoint[], band: TrendBand | null | undefined, width: number, height: number): TrendGeometry {
  const values = placed.map((p) => p.value);
  if (band?.min != null) values.push(band.min);
  if (band?.max != null) values.push(band.max);
  const lo = Math.min(...values);
  const hi = Math.max(...values);
  // A little room so a band edge or an extreme point does not sit on the frame.
  const room = (hi - lo) * 0.02;
  const yTicks = niceTicks(lo - room, hi + room, 6);
  const decimals = stepDecimals(yTicks.step);
  const yLabels = yTicks.ticks.map((v) => v.toFixed(decimals));
  const labelWidth = Math.max(...yLabels.map((l) => l.length)) * FRAME.charWidth;
  const left = Math.ceil(labelWidth + FRAME.tickGap * 2);
  const right = Math.max(left + 40, width - FRAME.right);
  const top = FRAME.top;
  const bottom = height - FRAME.bottom;

  const first = placed[0]?.t ?? 0;
  const last = placed[placed.length - 1]?.t ?? first;
  // One point, or all on one day: a day either side so the point sits in the middle.
  const [t0, t1] = last - first < DAY_MS ? [first - DAY_MS, last + DAY_MS] : [first, last];
  const x = linear(t0, t1, left + FRAME.pad, right - FRAME.pad);
  const y = linear(yTicks.min, yTicks.max, bottom, top);
  const xTicks = dateTicks(t0, t1, Math.floor((right - left) / 64));
  return { x, y, yTicks, yLabels, xTicks, left, right, top, bottom };
}

/** The SVG path joining the points in time order. */
export function linePath(placed: readonly PlacedPoint[], g: Pick<TrendGeometry, 'x' | 'y'>): string {
  return placed.map((p, i) => `${i === 0 ? 'M' : 'L'}${g.x(p.t).toFixed(1)} ${g.y(p.value).toFixed(1)}`).join('');
}
