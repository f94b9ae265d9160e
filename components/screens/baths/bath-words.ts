// Words for baths shared by the list and the form: process names, what a process holds, ages and flags.
import { type StatusKind } from '@/components/ui/status-dot';
import { quantityLabel } from '@/lib/baths/quantities';
import { PROCESS_INFO, PROCESSES, type BathSummary, type Process } from '@/shared/baths';

/** Days after which a bath's last analysis counts as stale (the list says so in words). */
export const STALE_AFTER_DAYS = 14;

/** The bath list's status filters; "active" is what the list opens on. */
export const BATH_STATUS_FILTERS = [
  { value: 'active', label: 'Active' },
  { value: 'archived', label: 'Archived' },
  { value: 'all', label: 'All' },
] as const;
/** One of the list's status filters, as sent in the query. */
export type BathStatusFilter = (typeof BATH_STATUS_FILTERS)[number]['value'];

/** Processes in the order the chips show them, with their labels. */
export const PROCESS_CHOICES: readonly { value: Process; label: string }[] = PROCESSES.map((p) => ({
  value: p,
  label: PROCESS_INFO[p].label,
}));

const METAL_NAMES: Record<string, string> = {
  'Ag+': 'Silver',
  'Au+': 'Gold',
  'Cu+': 'Copper(I)',
  'Cu+2': 'Copper(II)',
  'Zn+2': 'Zinc',
};

const LIGAND_NAMES: Record<string, string> = {
  'CN-': 'cyanide',
  'S2O3-2': 'thiosulfate',
  NH3: 'ammonia',
};

/** "Silver (Ag+) held by cyanide (CN-)": the metal and ligand a process implies. */
export function holdsText(process: Process): string {
  const { metal, ligand } = PROCESS_INFO[process];
  return `${METAL_NAMES[metal] ?? metal} (${metal}) held by ${LIGAND_NAMES[ligand] ?? ligand} (${ligand})`;
}

const numberFormat = new Intl.NumberFormat('en', { maximumFractionDigits: 3 });

/** "120 L" or "40 US gal". */
export function volumeText(volume: number, unit: 'L' | 'gal'): string {
  return `${numberFormat.format(volume)} ${unit === 'gal' ? 'US gal' : 'L'}`;
}

/** "Analysed today", "Analysed 3 days ago", "No analyses yet". */
export function analysedText(bath: Pick<BathSummary, 'lastAnalysisAgeDays' | 'analysisCount'>): string {
  const days = bath.lastAnalysisAgeDays;
  if (days == null || bath.analysisCount === 0) return 'No analyses yet';
  if (days <= 0) return 'Analysed today';
  if (days === 1) return 'Analysed yesterday';
  return `Analysed ${days} days ago`;
}

/** Whether the last analysis is older than STALE_AFTER_DAYS. */
export function isStale(bath: Pick<BathSummary, 'lastAnalysisAgeDays'>): boolean {
  return bath.lastAnalysisAgeDays != null && bath.lastAnalysisAgeDays > STALE_AFTER_DAYS;
}

/** Whether any target range has an end set. */
function hasTargets(bath: Pick<BathSummary, 'targets'>): boolean {
  return Object.values(bath.targets).some((r) => r.min !== null || r.max !== null);
}

/** One at-a-glance flag of a bath: its words and its colour family (the words carry the meaning). */
export type BathFlag = { label: string; kind: StatusKind };

/** The bath's state in flags beside analysedText: archived, stale, values out of range or all within targets. */
export function bathFlags(bath: BathSummary): BathFlag[] {
  const flags: BathFlag[] = [];
  if (bath.status === 'archived') flags.push({ label: 'Archived', kind: 'unknown' });
  if (bath.analysisCount === 0 || bath.lastAnalysisAgeDays == null) return flags;
  if (isStale(bath)) flags.push({ label: `Stale (over ${STALE_AFTER_DAYS} days)`, kind: 'warn' });
  for (const o of bath.outOfRange) {
    flags.push({ label: `${quantityLabel(o.quantity, bath)} ${o.side === 'below' ? 'low' : 'high'}`, kind: 'bad' });
  }
  if (bath.outOfRange.length === 0 && hasTargets(bath)) flags.push({ label: 'Within targets', kind: 'ok' });
  return flags;
}

/** The detail screen of one bath. */
export function bathHref(id: string) {
  return `/baths/${encodeURIComponent(id)}` as const;
}

/** The edit form of one bath. */
export function bathEditHref(id: string) {
  return `/baths/edit/${encodeURIComponent(id)}` as const;
}
