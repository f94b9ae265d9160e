// A small table as CSV for the calculators' downloads: RFC 4180 quoting, "\n" line ends, numbers to
// 6 significant figures, and an empty cell for anything that is not a finite number.
import { CSV_SIGNIFICANT } from '@/lib/calculators/curves-csv';

/** One cell: text as is, a number to CSV_SIGNIFICANT figures, empty for null or a number that is not finite. */
export type CsvCell = string | number | null | undefined;

function cell(value: CsvCell): string {
  if (typeof value === 'number') return Number.isFinite(value) ? String(Number(value.toPrecision(CSV_SIGNIFICANT))) : '';
  const text = value ?? '';
  return /[",\r\n]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}

/** The header and rows as CSV text. */
export function tableCsv(header: readonly string[], rows: readonly (readonly CsvCell[])[]): string {
  return [header, ...rows].map((r) => r.map(cell).join(',')).join('\n') + '\n';
}

/** A file name from words: "headroom-agcn-s.csv". */
export function csvName(...words: string[]): string {
  const slug = words
    .join('-')
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '');
  return `${slug || 'result'}.csv`;
}
