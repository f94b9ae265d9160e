import { type StatusKind } from '@/components/ui/status-dot';
import { KIND_LABELS, type ConstantKind, type ConstantStatus, type ConstantSummary } from '@/shared/constants';

/** A filter choice: the formula the server filters on, the short label on the chip, and a name for screen readers. */
export type SpeciesChoice = { formula: string; label: string; name: string };

/** Metal ions offered as filters, with their oxidation state as the label ("Ag+" is shown as Ag(I)). */
export const METAL_CHOICES: readonly SpeciesChoice[] = [
  { formula: 'Ag+', label: 'Ag(I)', name: 'silver(I)' },
  { formula: 'Cu+', label: 'Cu(I)', name: 'copper(I)' },
  { formula: 'Cu+2', label: 'Cu(II)', name: 'copper(II)' },
  { formula: 'Au+', label: 'Au(I)', name: 'gold(I)' },
  { formula: 'Zn+2', label: 'Zn(II)', name: 'zinc(II)' },
  { formula: 'Cd+2', label: 'Cd(II)', name: 'cadmium(II)' },
  { formula: 'Ni+2', label: 'Ni(II)', name: 'nickel(II)' },
  { formula: 'Pb+2', label: 'Pb(II)', name: 'lead(II)' },
];

/** Ligands offered as filters, written as in reactions. */
export const LIGAND_CHOICES: readonly SpeciesChoice[] = [
  { formula: 'NH3', label: 'NH3', name: 'ammonia' },
  { formula: 'CN-', label: 'CN-', name: 'cyanide' },
  { formula: 'S2O3-2', label: 'S2O3-2', name: 'thiosulfate' },
  { formula: 'SCN-', label: 'SCN-', name: 'thiocyanate' },
  { formula: 'Cl-', label: 'Cl-', name: 'chloride' },
  { formula: 'Br-', label: 'Br-', name: 'bromide' },
  { formula: 'I-', label: 'I-', name: 'iodide' },
  { formula: 'OH-', label: 'OH-', name: 'hydroxide' },
];

/** The status filters of the list; "current" is approved plus drafts waiting for review. */
export const STATUS_FILTERS = [
  { value: 'approved', label: 'Approved' },
  { value: 'current', label: 'Approved and waiting' },
  { value: 'draft', label: 'Drafts' },
  { value: 'retired', label: 'Retired' },
  { value: 'rejected', label: 'Rejected' },
  { value: 'all', label: 'All versions' },
] as const;
/** One of the list's status filters, as sent in the query. */
export type StatusFilter = (typeof STATUS_FILTERS)[number]['value'];

/** Each status of a version in words, with the colour family of its pill. */
export const STATUS_WORDS: Record<ConstantStatus, { label: string; kind: StatusKind }> = {
  draft: { label: 'Draft, waiting for review', kind: 'warn' },
  approved: { label: 'Approved', kind: 'ok' },
  rejected: { label: 'Rejected', kind: 'bad' },
  retired: { label: 'Retired', kind: 'unknown' },
};

/** A short status word for compact rows. */
export function statusShort(status: ConstantStatus): string {
  return status === 'draft' ? 'Draft' : STATUS_WORDS[status].label;
}

/** A log10 value with two decimals (log values are not significant-figure quantities). */
export function formatLog(value: number): string {
  return value.toFixed(2);
}

/** "log β" for a cumulative formation constant, "log Ksp" for a solubility product, and so on. */
export function logSymbol(kind: ConstantKind): string {
  return `log ${KIND_LABELS[kind].short}`;
}

/** "log β = 7.05 ± 0.05": the value with its uncertainty when known. */
export function valueText(c: Pick<ConstantSummary, 'kind' | 'logValue' | 'uncertainty'>): string {
  const pm = c.uncertainty == null ? '' : ` ± ${formatLog(c.uncertainty)}`;
  return `${logSymbol(c.kind)} = ${formatLog(c.logValue)}${pm}`;
}

/** "25 °C, I = 0.1 mol/L, NaClO4": the conditions the value was measured at. */
export function conditionsText(c: Pick<ConstantSummary, 'temperatureC' | 'ionicStrength' | 'medium'>): string {
  const medium = c.medium.trim();
  // "I → 0 (extrapolated)" already says what I = 0 would.
  if (c.ionicStrength === 0 && /^I\s*(→|->)\s*0/.test(medium)) return `${c.temperatureC} °C, ${medium}`;
  return `${c.temperatureC} °C, I = ${c.ionicStrength} mol/L${medium === '' ? '' : `, ${medium}`}`;
}

const dayFormat = new Intl.DateTimeFormat(undefined, { dateStyle: 'medium' });

/** A server timestamp as a local date without the time, for table cells. */
export function formatDay(iso: string): string {
  const date = new Date(iso);
  return Number.isNaN(date.getTime()) ? iso : dayFormat.format(date);
}

/** The detail page of one version. */
export function constantHref(id: number) {
  return `/library/constant/${id}` as const;
}
