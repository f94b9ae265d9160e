// Axis arithmetic for the charts: nice value ticks, calendar date ticks and linear maps. Pure functions.

/** One day in milliseconds. */
export const DAY_MS = 86_400_000;

const MONTHS = ['Jan', 'Feb', 'Mar', 'Apr', 'May', 'Jun', 'Jul', 'Aug', 'Sep', 'Oct', 'Nov', 'Dec'] as const;

/** Steps a value axis may take, per power of ten. */
const NICE_STEPS = [1, 2, 2.5, 5] as const;

/** Value ticks and the domain they span: the domain always starts and ends on a tick. */
export type ValueTicks = { ticks: number[]; min: number; max: number; step: number };

/** Digits after the point a tick step needs (0.25 needs 2, 5 needs 0). */
export function stepDecimals(step: number): number {
  for (let d = 0; d <= 12; d += 1) {
    const scaled = step * 10 ** d;
    if (Math.abs(scaled - Math.round(scaled)) < 1e-9 * Math.max(1, scaled)) return d;
  }
  return 12;
}

function ticksFor(lo: number, hi: number, step: number): ValueTicks {
  const min = Math.floor(lo / step + 1e-9) * step;
  let max = Math.ceil(hi / step - 1e-9) * step;
  if (max - min < step * 2 - 1e-9) max = min + step * 2;
  const count = Math.round((max - min) / step) + 1;
  const decimals = stepDecimals(step);
  // Rounded to the step's digits so 0.1 + 0.2 shows as 0.3, not 0.30000000000000004.
  const ticks = Array.from({ length: count }, (_, i) => Number((min + i * step).toFixed(decimals)));
  return { ticks, min: ticks[0] ?? min, max: ticks[ticks.length - 1] ?? max, step };
}

/**
 * Between 3 and `most` (default 6) ticks on round numbers (1, 2, 2.5 or 5 times a power of ten)
 * covering lo..hi; a flat range (lo = hi) is widened around the value first.
 */
export function niceTicks(lo: number, hi: number, most = 6): ValueTicks {
  let a = Math.min(lo, hi);
  let b = Math.max(lo, hi);
  if (!Number.isFinite(a) || !Number.isFinite(b)) return ticksFor(0, 1, 0.5);
  if (b - a < 1e-12 * Math.max(1, Math.abs(a))) {
    const pad = Math.abs(a) > 0 ? Math.abs(a) * 0.1 : 1;
    a -= pad;
    b += pad;
  }
  const start = Math.floor(Math.log10((b - a) / most)) - 1;
  for (let power = start; power < start + 6; power += 1) {
    for (const m of NICE_STEPS) {
      const step = m * 10 ** power;
      const t = ticksFor(a, b, step);
      if (t.ticks.length <= most) return t;
    }
  }
  return ticksFor(a, b, 10 ** (start + 6));
}

/** A linear map from one interval onto another (a flat domain maps to the middle of the range). */
export function linear(d0: number, d1: number, r0: number, r1: number): (v: number) => number {
  if (d1 === d0) return () => (r0 + r1) / 2;
  const k = (r1 - r0) / (d1 - d0);
  return (v) => r0 + (v - d0) * k;
}

/** A UTC day as "Mar 4". Sampling dates are calendar days, so the charts read them in UTC. */
export function monthDay(ms: number): string {
  const d = new Date(ms);
  return `${MONTHS[d.getUTCMonth()]} ${d.getUTCDate()}`;
}

/** The years a time span covers, as "2026" or "2025–2026". */
export function yearSpan(fromMs: number, toMs: number): string {
  const a = new Date(fromMs).getUTCFullYear();
  const b = new Date(toMs).getUTCFullYear();
  return a === b ? String(a) : `${a}–${b}`;
}

function monthTicks(from: number, to: number, months: number): number[] {
  const d = new Date(from);
  // Months counted from year 0, so a step of 3 lands on Jan, Apr, Jul and Oct.
  let index = d.getUTCFullYear() * 12 + d.getUTCMonth();
  index = Math.ceil(index / months) * months;
  const out: number[] = [];
  for (let guard = 0; guard < 400; guard += 1, index += months) {
    const t = Date.UTC(Math.floor(index / 12), index % 12, 1);
    if (t > to) break;
    if (t >= from) out.push(t);
  }
  return out;
}

/** Date ticks at UTC midnights (days, weeks, then firsts of months) inside from..to, at most `most`. */
export function dateTicks(from: number, to: number, most: number): number[] {
  const limit = Math.max(2, most);
  for (const days of [1, 2, 7, 14]) {
    const first = Math.ceil(from / DAY_MS) * DAY_MS;
    const count = Math.floor((to - first) / (days * DAY_MS)) + 1;
    if (count <= limit) {
      return Array.from({ length: Math.max(0, count) }, (_, i) => first + i * days * DAY_MS).filter((t) => t <= to);
    }
  }
  for (const months of [1, 2, 3, 6, 12, 24, 60]) {
    const ticks = monthTicks(from, to, months);
    if (ticks.length <= limit) return ticks;
  }
  return [from, to];
}
