// CSV upload of analyses (titration or assay results) onto one bath: every row is checked and
// reported by row and column; with mode "all" nothing is written unless every row is valid, with
// mode "valid" the valid rows are written. A row already in the log (same time, analyst and
// values) is reported rather than written twice.
import { randomUUID } from 'node:crypto';

import { eq } from 'drizzle-orm';
import { type Request, type Response, Router } from 'express';

import { analyses } from '@/db/schema';
import { allow, requireUser } from '@/server/auth/access';
import type { AuthContext } from '@/server/auth/context';
import { writeAudit } from '@/server/audit';
import { analysisColumns } from '@/server/baths/analysis-values';
import { bathOf, findBath } from '@/server/baths/store';
import { HttpError } from '@/server/http-error';
import { parseCsv, refusedUpload, uploadMode } from '@/server/library/csv';
import { output } from '@/server/output';
import { mailWaiting } from '@/server/safety/notify';
import { checkBath } from '@/server/safety/store';
import { receiveOneFile } from '@/server/upload';
import {
  ANALYSIS_CSV_REQUIRED,
  ANALYSIS_IMPORT_MAX_BYTES,
  ANALYSIS_IMPORT_MAX_ROWS,
  type AnalysisImportReport,
  analysisImportReportSchema,
  analysisInputSchema,
  BATH_UNITS,
  type BathUnit,
} from '@/shared/baths';

type Problem = AnalysisImportReport['problems'][number];



// Ways shops write the units; matched case-insensitively after trimming.
const UNIT_WORDS: Record<string, BathUnit> = {
  m: 'mol/L',
  'mol/l': 'mol/L',
  mm: 'mmol/L',
  'mmol/l': 'mmol/L',
  'g/l': 'g/L',
  'mg/l': 'mg/L',
  ppm: 'mg/L',
  'troy oz/gal': 'troy oz/gal',
  'toz/gal': 'troy oz/gal',
  'ozt/gal': 'troy oz/gal',
  'oz/gal': 'oz/gal',
};

const QUANTITY_COLUMNS = [
  ['metal', 'metal'],
  ['freeLigand', 'free_ligand'],
  ['totalLigand', 'total_ligand'],
  ['carbonate', 'carbonate'],
  ['bromide', 'bromide'],
] as const;

const PATH_COLUMN: Record<string, string> = {
  sampledAt: 'sampled_at',
  analyst: 'analyst',
  metal: 'metal',
  freeLigand: 'free_ligand',
  totalLigand: 'total_ligand',
  pH: 'ph',
  carbonate: 'carbonate',
  bromide: 'bromide',
  notes: 'notes',
};

function columnOf(path: string, body: Record<string, unknown>): string | null {
  const [head, tail] = path.split('.');
  const col = PATH_COLUMN[head ?? ''] ?? null;
  if (col && tail === 'unit') return `${col}_unit`;
  void body;
  return col;
}

function numberOrText(text: string): number | string {
  const t = text.trim().replace(/^(\d+),(\d+)$/, '$1.$2');
  return /^[-+]?(\d+\.?\d*|\.\d+)([eE][-+]?\d+)?$/.test(t) ? Number(t) : text.trim();
}

/** One row as an analysis body, or a problem about a unit. */
function rowToInput(get: (col: string) => string, problems: Problem[], line: number): Record<string, unknown> {
  const body: Record<string, unknown> = { sampledAt: get('sampled_at').trim(), analyst: get('analyst'), notes: get('notes') };
  for (const [field, col] of QUANTITY_COLUMNS) {
    const raw = get(col).trim();
    if (raw === '') continue;
    const unitText = get(`${col}_unit`).trim();
    let unit: BathUnit | undefined;
    if (unitText !== '') {
      unit = (BATH_UNITS as readonly string[]).includes(unitText) ? (unitText as BathUnit) : UNIT_WORDS[unitText.toLowerCase()];
      if (!unit) problems.push({ row: line, column: `${col}_unit`, message: `"${unitText}" is not a unit here; use ${BATH_UNITS.join(', ')}` });
    }
    body[field] = unit ? { value: numberOrText(raw), unit } : { value: numberOrText(raw) };
  }
  const ph = get('ph').trim();
  if (ph !== '') body.pH = numberOrText(ph);
  return body;
}

function messageFor(issue: { code: string; message: string; path: PropertyKey[] }, body: Record<string, unknown>): string {
  const [head, tail] = issue.path.map(String);
  const given = tail === 'value' ? (body[head ?? ''] as { value?: unknown } | undefined)?.value : body[head ?? ''];
  if (issue.code === 'invalid_type' && typeof given === 'string') return `"${given}" is not a number`;
  return issue.message;
}

/** POST /baths/:id/analyses/import: multipart with `file` (CSV) and `mode` ("all" or "valid"). */
export function analysesImportRouter(ctx: AuthContext): Router {
  const router = Router();
  router.post('/baths/:id/analyses/import', allow('chemist', 'technician'), receiveOneFile(ANALYSIS_IMPORT_MAX_BYTES, 'split it into smaller files'), async (req: Request, res: Response) => {
    const user = requireUser(res);
    const mode = uploadMode(req.body, 'import the valid rows');
    const file = req.file;
    if (!file) throw new HttpError(400, 'validation_failed', 'file: choose a CSV file of analyses (field "file")', [{ path: 'file', message: 'choose a CSV file' }]);
    if (!/\.(csv|txt)$/i.test(file.originalname) || file.buffer.includes(0)) {
      throw new HttpError(415, 'validation_failed', `file: "${file.originalname}" is not a CSV file; save the sheet as CSV (comma-separated) first`, [{ path: 'file', message: 'not a CSV file' }]);
    }
    const csv = parseCsv(new TextDecoder('utf-8').decode(file.buffer));
    if (csv.records.length > ANALYSIS_IMPORT_MAX_ROWS) {
      throw new HttpError(400, 'validation_failed', `file: it has ${csv.records.length} rows; upload at most ${ANALYSIS_IMPORT_MAX_ROWS} at a time`, [{ path: 'file', message: `at most ${ANALYSIS_IMPORT_MAX_ROWS} rows` }]);
    }
    let opened: string | null = null;
    const report = await ctx.db.transaction(async (tx): Promise<AnalysisImportReport> => {
      const row = await findBath(tx, req.params.id, true);
      if (row.status === 'archived') throw new HttpError(409, 'conflict', 'This bath is archived; analyses are no longer logged on it.');
      const bath = await bathOf(tx, row);
      const problems: Problem[] = csv.errors.map((e) => ({ row: e.line, column: null, message: `the file cannot be read here: ${e.message}` }));
      const missing = ANALYSIS_CSV_REQUIRED.filter((c) => !csv.header.includes(c));
      if (missing.length > 0) problems.push({ row: 1, column: null, message: `the header row lacks the column${missing.length > 1 ? 's' : ''} ${missing.join(', ')}` });
      if (csv.records.length === 0 && problems.length === 0) {
        throw new HttpError(400, 'validation_failed', 'file: the file has a header but no data rows', [{ path: 'file', message: 'no data rows' }]);
      }
      const existing = await tx.select().from(analyses).where(eq(analyses.bathId, row.id));
      const seen = new Set(existing.map((a) => fingerprint(a)));
      const planned: { line: number; columns: Exclude<ReturnType<typeof analysisColumns>, { problems: unknown }>['columns'] }[] = [];
      if (missing.length === 0) {
        for (const { line, cells } of csv.records) {
          if (cells.length !== csv.header.length) {
            problems.push({ row: line, column: null, message: `has ${cells.length} cells but the header has ${csv.header.length}` });
            continue;
          }
          const get = (col: string) => {
            const i = csv.header.indexOf(col);
            return i < 0 ? '' : (cells[i] ?? '');
          };
          const before = problems.length;
          const body = rowToInput(get, problems, line);
          const parsed = analysisInputSchema.safeParse(body);
          if (!parsed.success) {
            for (const issue of parsed.error.issues) problems.push({ row: line, column: columnOf(issue.path.map(String).join('.'), body), message: messageFor(issue, body) });
            continue;
          }
          if (problems.length > before) continue;
          const made = analysisColumns(bath, parsed.data);
          if ('problems' in made) {
            for (const p of made.problems) problems.push({ row: line, column: columnOf(p.path, body), message: p.message });
            continue;
          }
          const key = fingerprint(made.columns);
          if (seen.has(key)) {
            problems.push({ row: line, column: null, message: 'this analysis is already in the log (same time, analyst and results)' });
            continue;
          }
          seen.add(key);
          planned.push({ line, columns: made.columns });
        }
      }
      const rejected = new Set(problems.map((p) => p.row)).size;
      const base = { mode, rows: csv.records.length, rejected, problems: problems.sort((a, b) => a.row - b.row) };
      if (problems.length > 0 && mode === 'all') return { ...base, created: 0, written: false, analysisIds: [] };
      const ids: string[] = [];
      for (const p of planned) {
        const id = randomUUID();
        await tx.insert(analyses).values({ id, bathId: row.id, ...p.columns, source: 'csv', enteredBy: user.id });
        ids.push(id);
      }
      if (ids.length > 0) {
        await writeAudit(tx, { actor: user.id, action: 'analyses.imported', subject: `bath:${row.id}`, payload: { file: file.originalname, rows: csv.records.length, created: ids.length, rejected } });
        ({ opened } = await checkBath(tx, bath, user.id));
      }
      return { ...base, created: ids.length, written: ids.length > 0, analysisIds: ids };
    });
    if (!report.written && report.problems.length > 0 && mode === 'all') {
      throw refusedUpload(report);
    }
    if (opened) await mailWaiting(ctx, req, opened);
    res.json(output(analysisImportReportSchema, report));
  });
  return router;
}

/** Same sampling minute, analyst and stored values. */
function fingerprint(a: { sampledAt: Date; analyst: string; metalMolL: number | null; freeLigandMolL: number | null; totalLigandMolL: number | null; ph: number | null; carbonateMolL: number | null; bromideMolL: number | null }): string {
  const r = (v: number | null) => (v === null ? '-' : v.toPrecision(6));
  return [Math.floor(a.sampledAt.getTime() / 60000), a.analyst.trim().toLowerCase(), r(a.metalMolL), r(a.freeLigandMolL), r(a.totalLigandMolL), r(a.ph), r(a.carbonateMolL), r(a.bromideMolL)].join('|');
}
