// CSV in and out for the library (RFC 4180: commas, double quotes, CRLF between records).
import Papa from 'papaparse';

import { HttpError } from '@/server/http-error';

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

/** How an upload treats bad rows: "all" writes nothing unless every row is valid, "valid" writes the valid ones. */
export type UploadMode = 'all' | 'valid';

/** The upload's `mode` field (default "all"); a 400 naming the field for anything else. */
export function uploadMode(body: unknown, validMeans: string): UploadMode {
  const raw = (body as { mode?: unknown } | undefined)?.mode;
  const text = typeof raw === 'string' && raw !== '' ? raw : 'all';
  if (text !== 'all' && text !== 'valid') {
    throw new HttpError(400, 'validation_failed', `mode: must be "all" (nothing unless every row is valid) or "valid" (${validMeans})`, [{ path: 'mode', message: 'must be all or valid' }]);
  }
  return text;
}

/** The 422 for an upload in mode "all" that wrote nothing because of bad rows, with the report as details. */
export function refusedUpload(report: { rejected: number; problems: readonly { row: number; column: string | null; message: string }[] }): HttpError {
  const first = report.problems[0] as { row: number; column: string | null; message: string };
  return new HttpError(
    422,
    'validation_failed',
    `Nothing was imported: ${report.rejected} row${report.rejected === 1 ? ' has' : 's have'} a problem (first: row ${first.row}${first.column ? `, ${first.column}` : ''}: ${first.message}).`,
    report,
  );
}
