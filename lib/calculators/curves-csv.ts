// A curve as CSV: a header row with units in the names, one row per point, numbers to 6
// significant figures. A value that is not finite (the saturation index of a solid whose ion is
// absent, -Infinity) is written as an empty cell: spreadsheets read it as "no value".
import type { Curve } from './curves';

/** Significant figures written for each number. */
export const CSV_SIGNIFICANT = 6;

function cell(text: string): string {
  return /[",\r\n]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}

function num(x: number): string {
  return Number.isFinite(x) ? String(Number(x.toPrecision(CSV_SIGNIFICANT))) : '';
}

/** The curve as CSV text (RFC 4180 quoting, "\n" line ends, header first). */
export function curvesToCsv(curve: Curve): string {
  const header = [`${curve.axis.label} (${curve.axis.unit})`, 'status', ...curve.series.map((s) => `${s.label} (${s.unit})`)];
  const rows = curve.points.map((p) => [num(p.x), p.status, ...p.values.map(num)]);
  return [header.map(cell), ...rows.map((r) => r.map(cell))].map((r) => r.join(',')).join('\n') + '\n';
}
