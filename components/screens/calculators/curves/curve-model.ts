// What a curve chart draws, worked out apart from the drawing: the axes (linear or log) with their
// ticks and labels, the pixel maps, each series as a path broken at the points that cannot be drawn
// (did not settle, not a number, or not above 0 on a log axis), and the sentence for screen readers.
import { linear, niceTicks, stepDecimals } from '@/components/charts/scale';
import { formatSignificant } from '@/lib/units';

/** How an axis maps values: evenly, or by powers of ten. */
export type AxisScale = 'linear' | 'log';

/** One line: its values in the order of the x values (null: no value there). */
export type ChartSeries = { key: string; label: string; values: readonly (number | null)[] };

/** Ticks of one axis, in data units, with their labels, and the domain drawn. */
export type AxisTicks = { ticks: number[]; labels: string[]; min: number; max: number };

/** Pixel sizes of the chart's frame (px). */
export const CURVE_FRAME = { top: 12, right: 16, bottom: 44, tickGap: 6, charWidth: 6.6, minLeft: 36 } as const;

const SUPERSCRIPT = '⁰¹²³⁴⁵⁶⁷⁸⁹';

/** 10 to a whole power as written on an axis: "10⁻³". */
export function powerOfTen(k: number): string {
  const digits = String(Math.abs(k))
    .split('')
    .map((d) => SUPERSCRIPT[Number(d)])
    .join('');
  return `10${k < 0 ? '⁻' : ''}${digits}`;
}

/** Whether a value can be drawn on an axis of this scale. */
export function drawable(v: number | null | undefined, scale: AxisScale): v is number {
  return typeof v === 'number' && Number.isFinite(v) && (scale === 'linear' || v > 0);
}

/** Ticks for lo..hi: round numbers on a linear axis, whole decades (every second or more when many) on a log axis. */
export function axisTicks(lo: number, hi: number, scale: AxisScale, most = 6): AxisTicks {
  if (scale === 'log') {
    let a = Math.floor(Math.log10(lo) + 1e-9);
    let b = Math.ceil(Math.log10(hi) - 1e-9);
    if (b <= a) {
      a -= 1;
      b += 1;
    }
    const step = Math.max(1, Math.ceil((b - a) / most));
    a = Math.floor(a / step) * step;
    b = Math.ceil(b / step) * step;
    const ticks: number[] = [];
    for (let k = a; k <= b; k += step) ticks.push(10 ** k);
    return { ticks, labels: ticks.map((t) => powerOfTen(Math.round(Math.log10(t)))), min: 10 ** a, max: 10 ** b };
  }
  const t = niceTicks(lo, hi, most);
  const decimals = stepDecimals(t.step);
  const plain = Math.max(Math.abs(t.min), Math.abs(t.max)) < 1e6 && (t.step >= 1e-3 || t.step === 0);
  const labels = t.ticks.map((v) => (plain ? v.toFixed(decimals) : formatSignificant(v, 2)));
  return { ticks: t.ticks, labels, min: t.min, max: t.max };
}

/** Ticks of an x axis that must keep to the swept range: those inside it, or the two ends when too few fall inside. */
export function xAxisTicks(lo: number, hi: number, scale: AxisScale, most: number): AxisTicks {
  const all = axisTicks(lo, hi, scale, most);
  const eps = (hi - lo) * 1e-9;
  const inside = all.ticks.map((t, i) => ({ t, label: all.labels[i] as string })).filter(({ t }) => t >= lo - eps && t <= hi + eps);
  if (inside.length >= 2) return { ticks: inside.map((x) => x.t), labels: inside.map((x) => x.label), min: lo, max: hi };
  return { ticks: [lo, hi], labels: [lo, hi].map((v) => formatSignificant(v, 3)), min: lo, max: hi };
}

/** Axes and pixel maps of one chart. */
export type CurveGeometry = {
  x: (v: number) => number;
  y: (v: number) => number;
  xTicks: AxisTicks;
  yTicks: AxisTicks;
  left: number;
  right: number;
  top: number;
  bottom: number;
};

/** What a chart is laid out from: the x values, the scales, the size in px and the y values to cover. */
export type GeometryInput = { xs: readonly number[]; xScale: AxisScale; yScale: AxisScale; width: number; height: number; yDomain: [number, number] };

function scaled(scale: AxisScale) {
  return scale === 'log' ? (v: number) => Math.log10(v) : (v: number) => v;
}

/** The y range the drawable values cover, or null when there is nothing to draw. */
export function valueRange(series: readonly ChartSeries[], scale: AxisScale, keep: readonly boolean[]): [number, number] | null {
  let lo = Number.POSITIVE_INFINITY;
  let hi = Number.NEGATIVE_INFINITY;
  for (const s of series) {
    s.values.forEach((v, i) => {
      if (keep[i] && drawable(v, scale)) {
        lo = Math.min(lo, v);
        hi = Math.max(hi, v);
      }
    });
  }
  return lo <= hi ? [lo, hi] : null;
}

/** Lays a chart out: the x axis spans the sweep exactly, the y axis the values (or a fixed domain) on round ticks. */
export function curveGeometry({ xs, xScale, yScale, width, height, yDomain }: GeometryInput): CurveGeometry {
  const xLo = Math.min(...xs);
  const xHi = Math.max(...xs);
  const yTicks = axisTicks(yDomain[0], yDomain[1], yScale);
  const labelWidth = Math.max(...yTicks.labels.map((l) => l.length)) * CURVE_FRAME.charWidth;
  const left = Math.max(CURVE_FRAME.minLeft, Math.ceil(labelWidth + CURVE_FRAME.tickGap * 2));
  const right = Math.max(left + 40, width - CURVE_FRAME.right);
  const top = CURVE_FRAME.top;
  const bottom = height - CURVE_FRAME.bottom;
  const xTicks = xAxisTicks(xLo, xHi, xScale, Math.max(2, Math.floor((right - left) / 70)));
  const fx = scaled(xScale);
  const fy = scaled(yScale);
  const mapX = linear(fx(xLo), fx(xHi), left, right);
  const mapY = linear(fy(yTicks.min), fy(yTicks.max), bottom, top);
  return { x: (v) => mapX(fx(v)), y: (v) => mapY(fy(v)), xTicks, yTicks, left, right, top, bottom };
}

/** The SVG path of one series: pieces joined where neighbouring points can both be drawn, single points as short marks. */
export function seriesPath(xs: readonly number[], values: readonly (number | null)[], keep: readonly boolean[], g: Pick<CurveGeometry, 'x' | 'y'>, xScale: AxisScale, yScale: AxisScale): string {
  const parts: string[] = [];
  let open = false;
  xs.forEach((x, i) => {
    const v = values[i];
    if (!keep[i] || !drawable(v, yScale) || !drawable(x, xScale)) {
      open = false;
      return;
    }
    const px = g.x(x).toFixed(1);
    const py = g.y(v).toFixed(1);
    const nextOk = i + 1 < xs.length && keep[i + 1] && drawable(values[i + 1], yScale);
    if (!open && !nextOk) parts.push(`M${px} ${py}h0.1`);
    else parts.push(`${open ? 'L' : 'M'}${px} ${py}`);
    open = true;
  });
  return parts.join('');
}

function valueText(v: number | null | undefined): string {
  return typeof v === 'number' && Number.isFinite(v) ? formatSignificant(v, 3) : 'no value';
}

/** The chart in one sentence: what against what, the range, each series' first and last values, and the gaps. */
export function curveSummary(title: string, xTitle: string, xs: readonly number[], series: readonly ChartSeries[], keep: readonly boolean[]): string {
  const shown = series.slice(0, 4).map((s) => {
    const kept = s.values.filter((_, i) => keep[i]);
    return `${s.label} from ${valueText(kept[0])} to ${valueText(kept[kept.length - 1])}`;
  });
  const more = series.length > 4 ? `, and ${series.length - 4} more` : '';
  const gaps = keep.filter((k) => !k).length;
  const gapText = gaps > 0 ? `; ${gaps} point${gaps === 1 ? '' : 's'} did not settle and ${gaps === 1 ? 'is' : 'are'} left out` : '';
  const first = xs[0];
  const last = xs[xs.length - 1];
  return `${title} against ${xTitle}, ${xs.length} points from ${valueText(first)} to ${valueText(last)}: ${shown.join('; ')}${more}${gapText}.`;
}
