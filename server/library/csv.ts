// CSV in and out for the library (RFC 4180: commas, double quotes, CRLF between records).
import Papa from 'papaparse';

type Cell = string | number | null | undefined;

function cell(v: Cell): string {
  if (v === null || v === undefined) return '';
  const text = String(v);
  // Quote when needed; a leading = + - @ is prefixed with ' so spreadsheets do not run it as a formula.
  const safe = /^[=+@\t\r]/.test(text) || (/^-/.test(text) && !/^-?\d/.test(text)) ? `'${text}` : text;
  return /[",\r\n]/.test(safe) || safe !== safe.trim() ? `"${safe.replace(/"/g, '""')}"` : safe;
}

/** A CSV document: a header row of `columns`, then one record per row. */
export function toCsv(columns: readonly string[], rows: readonly Record<string, Cell>[]): string {
  const lines = [columns.join(','), ...rows.map((r) => columns.map((c) => cell(r[c])).join(','))];
  return `${lines.join('\r\n')}\r\n`;
}

/** A parsed CSV: header names (trimmed, lower case) and records with their 1-based line numbers. */
export interface ParsedCsv {
  header: string[];
  records: { line: number; cells: string[] }[];
  /** Problems of the file itself (unclosed quotes and the like), by line. */
  errors: { line: number; message: string }[];
}

/** Reads CSV text; blank lines are skipped; a BOM is dropped. */
export function parseCsv(text: string): ParsedCsv {
  const body = text.replace(/^\uFEFF/, '');
  const result = Papa.parse<string[]>(body, { skipEmptyLines: false, delimiter: ',' });
  const rows = result.data;
  const errors = result.errors.map((e) => ({ line: (e.row ?? 0) + 1, message: e.message }));
  const header = (rows[0] ?? []).map((h) => h.trim().toLowerCase());
  const records: ParsedCsv['records'] = [];
  for (let i = 1; i < rows.length; i++) {
    const cells = rows[i] as string[];
    if (cells.every((c) => c.trim() === '')) continue;
    records.push({ line: i + 1, cells });
  }
  return { header, records, errors };
}
