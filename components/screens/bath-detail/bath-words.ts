// Words and numbers of the bath detail screen: which quantities a bath logs, values in its units,
// target ranges as text, and sampling dates.
import { against, quantityLabel, shown, unitOf } from '@/lib/baths/quantities';
import { type Analysis, type Bath, type Quantity, type Range } from '@/shared/baths';

/** Quantities that have a target range on a bath. */
export const TARGETED = ['metal', 'freeLigand', 'pH'] as const;

/** The quantities a bath logs, in reading order: metal, free ligand, total ligand (once any is logged), pH, the process's extras. */
export function loggedQuantities(bath: Pick<Bath, 'extras'>, analyses: readonly Analysis[] = []): Quantity[] {
  const total = analyses.some((a) => a.values.totalLigand !== null);
  return ['metal', 'freeLigand', ...(total ? (['totalLigand'] as const) : []), 'pH', ...bath.extras];
}

/** The target range of a quantity, or undefined for quantities without one (total ligand, extras). */
export function targetOf(bath: Pick<Bath, 'targets'>, quantity: Quantity): Range | undefined {
  return (TARGETED as readonly Quantity[]).includes(quantity) ? bath.targets[quantity as (typeof TARGETED)[number]] : undefined;
}

/** A stored value in the bath's units, or null when it is missing or cannot be converted. */
export function shownValue(bath: Bath, quantity: Quantity, stored: number | null): number | null {
  if (stored === null) return null;
  try {
    const v = shown(bath, quantity, stored);
    return Number.isFinite(v) ? v : null;
  } catch {
    return null;
  }
}

/** The word beside a value outside its range. */
export function sideWord(side: 'below' | 'above'): 'low' | 'high' {
  return side === 'below' ? 'low' : 'high';
}

/** Where a shown value lies against the quantity's target range. */
export function sideOfValue(bath: Bath, quantity: Quantity, value: number): 'inside' | 'below' | 'above' {
  return against(targetOf(bath, quantity), value);
}

function plain(n: number): string {
  return String(n);
}

/** A range as text: "28–36 g/L", "at least 28 g/L", "at most 36 g/L", or "not set". */
export function rangeText(range: Range | undefined, unit: string | null): string {
  const u = unit ? ` ${unit}` : '';
  if (!range || (range.min === null && range.max === null)) return 'not set';
  if (range.min !== null && range.max !== null) return `${plain(range.min)}–${plain(range.max)}${u}`;
  if (range.min !== null) return `at least ${plain(range.min)}${u}`;
  return `at most ${plain(range.max as number)}${u}`;
}

/** "Ag metal 28–36 g/L" for each targeted quantity. */
export function targetLines(bath: Bath): { quantity: Quantity; label: string; text: string }[] {
  return TARGETED.map((q) => ({ quantity: q, label: quantityLabel(q, bath), text: rangeText(bath.targets[q], unitOf(bath, q)) }));
}

const MIDNIGHT_UTC = /^(\d{4}-\d{2}-\d{2})(T00:00(:00(\.0+)?)?(Z|[+-]00:?00))?$/;

/** A sampling time as a day ("2026-03-04"), with the local time when one was given ("2026-03-04 14:30"). */
export function sampleDay(iso: string): string {
  const dateOnly = MIDNIGHT_UTC.exec(iso);
  if (dateOnly) return dateOnly[1] as string;
  const d = new Date(iso);
  if (Number.isNaN(d.getTime())) return iso;
  const pad = (n: number) => String(n).padStart(2, '0');
  return `${d.getFullYear()}-${pad(d.getMonth() + 1)}-${pad(d.getDate())} ${pad(d.getHours())}:${pad(d.getMinutes())}`;
}

/** Today as YYYY-MM-DD in the person's own time zone (the default sampling date). */
export function todayText(now: Date = new Date()): string {
  const pad = (n: number) => String(n).padStart(2, '0');
  return `${now.getFullYear()}-${pad(now.getMonth() + 1)}-${pad(now.getDate())}`;
}

/** Analyses newest first (by sampling time, then by entry). */
export function newestFirst(analyses: readonly Analysis[]): Analysis[] {
  return [...analyses].sort((a, b) => Date.parse(b.sampledAt) - Date.parse(a.sampledAt) || b.createdAt.localeCompare(a.createdAt));
}
