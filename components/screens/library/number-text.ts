// Numbers in the constant forms are typed as text; this turns them into numbers (or null / undefined) for the schema.

/** What an empty field means: null (optional, no value), undefined (the schema's default applies), or required. */
export type EmptyMeans = 'null' | 'default' | 'required';

const NUMBER = /^[+-]?(\d+([.,]\d*)?|[.,]\d+)(e[+-]?\d+)?$/i;

/** Message beside a field whose text is not a number. */
export const NOT_A_NUMBER = 'Enter a number';

/**
 * Reads a typed number: "7.05", "-5,4" (a decimal comma), "−12.1" (a typographic minus), "1e-3".
 * Returns `bad: true` for anything else, so the field can say "Enter a number".
 */
export function readNumber(text: string, empty: EmptyMeans): { value: number | null | undefined; bad: boolean } {
  const trimmed = text.trim().replace(/^\u2212/, '-');
  if (trimmed === '') return { value: empty === 'null' ? null : undefined, bad: false };
  if (!NUMBER.test(trimmed)) return { value: undefined, bad: true };
  const value = Number(trimmed.replace(',', '.'));
  return Number.isFinite(value) ? { value, bad: false } : { value: undefined, bad: true };
}

/** A stored number as field text ("" for none). */
export function numberText(value: number | null | undefined): string {
  return value == null ? '' : String(value);
}
