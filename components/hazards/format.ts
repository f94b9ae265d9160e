// Words and numbers for showing hazards, shared so the banner, the chips and the printed section
// never disagree on how a number or a review reads.
import { formatWhen } from '@/components/ui/format-date';
import { formatSignificant } from '@/lib/units';
import {
  REVIEW_STATUS_LABELS,
  type Evidence,
  type GhsStatement,
  type Hazard,
  type HazardSeverity,
  type ReviewSummary,
} from '@/shared/safety';

/** Significant figures for evidence numbers: they come from thresholds and a model, not a balance. */
export const EVIDENCE_SIGNIFICANT = 3;

/** The unit the rules use for a share of a whole (0 to 1); shown as percent. */
export const FRACTION_UNIT = 'fraction';

/** Severity in words; colour is never the only sign of it. */
export const SEVERITY_WORDS: Record<HazardSeverity, string> = { danger: 'Danger', caution: 'Caution' };

function formatNumber(value: number): string {
  // NOTE: formatSignificant reads numbers through decimal.js, which refuses NaN and Infinity.
  if (!Number.isFinite(value)) return 'not known';
  return formatSignificant(value, EVIDENCE_SIGNIFICANT);
}

/**
 * An evidence value with its unit, for display: numbers at 3 significant figures (exponent form
 * below 0.001 and from 10⁶), a `fraction` as percent, true/false as yes/no, null as "not known".
 */
export function formatEvidenceValue(value: Evidence['value'], unit?: string): string {
  if (value === null) return 'not known';
  if (typeof value === 'boolean') return value ? 'yes' : 'no';
  if (typeof value === 'string') return unit ? `${value} ${unit}` : value;
  if (unit === FRACTION_UNIT) return Number.isFinite(value) ? `${formatNumber(value * 100)} %` : 'not known';
  const text = formatNumber(value);
  return unit && Number.isFinite(value) ? `${text} ${unit}` : text;
}

/** The most serious severity among hazards (danger over caution); null for none. */
export function worstSeverity(hazards: readonly Hazard[]): HazardSeverity | null {
  if (hazards.length === 0) return null;
  return hazards.some((h) => h.severity === 'danger') ? 'danger' : 'caution';
}

/** A GHS statement as one line: its code, then its wording ending in a full stop ("H300 Fatal if swallowed."). */
export function ghsLine(statement: GhsStatement): string {
  const text = statement.text.trim();
  return `${statement.code} ${text}${/[.!?]$/.test(text) ? '' : '.'}`;
}

/** A review's standing in sentences, shared by the banner and the printed section. */
export type ReviewLines = {
  /** "Safety desk: Signed off"; "Waiting for the safety desk" (which names the desk already). */
  status: string;
  /** "Decided by Sam Reyes, 4 Mar 2026, 10:12"; null while nobody has decided. */
  decided: string | null;
  /** "Conditions: ..." for a sign-off ("No conditions were set." when empty); "Note: ..." otherwise; null for none. */
  detail: string | null;
};

/** The lines that describe a review: status, who decided and when, and its conditions or note. */
export function reviewLines(review: ReviewSummary): ReviewLines {
  const label = REVIEW_STATUS_LABELS[review.status];
  const status = review.status === 'pending' ? label : `Safety desk: ${label}`;
  const when = review.decidedAt ? `, ${formatWhen(review.decidedAt)}` : '';
  const decided = review.decidedBy ? `Decided by ${review.decidedBy.name}${when}` : null;
  let detail: string | null = null;
  if (review.status === 'signed_off') {
    detail = review.conditions?.trim() ? `Conditions: ${review.conditions.trim()}` : 'No conditions were set.';
  } else if (review.note?.trim()) {
    detail = `Note: ${review.note.trim()}`;
  }
  return { status, decided, detail };
}
