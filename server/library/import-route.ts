// CSV import of constants: every row is checked (columns, numbers, reaction, catalogue, what the
// library already holds) and reported by row and column. Valid rows become drafts for review:
// a new constant, or a revision when the reaction is already in the library with other values.
// Rows identical to the approved version are left alone. With mode "all" nothing is written
// unless every row is valid; with mode "valid" the valid rows are written and the rest reported.
import { sql } from 'drizzle-orm';
import { type Request, type Response, Router } from 'express';
import type { ZodError } from 'zod';

import { checkReaction, type CheckedReaction, ReactionError } from '@/lib/library/reaction';
import { allow, requireUser } from '@/server/auth/access';
import type { AuthContext } from '@/server/auth/context';
import { writeAudit } from '@/server/audit';
import { HttpError } from '@/server/http-error';
import { parseCsv, refusedUpload, uploadMode } from '@/server/library/csv';
import { insertVersion, type LibrarySnapshot, PROPOSAL_LOCK_KEY, readLibrary, type Tx } from '@/server/library/store';
import { receiveOneFile } from '@/server/upload';
import {
  CONSTANT_KINDS,
  type ConstantKind,
  CSV_REQUIRED,
  IMPORT_MAX_BYTES,
  IMPORT_MAX_ROWS,
  type ImportProblem,
  type ImportReport,
  proposalSchema,
} from '@/shared/constants';

const KIND_WORDS: Record<string, ConstantKind> = {
  ksp: 'solubility_product',
  'solubility product': 'solubility_product',
  beta: 'cumulative_formation',
  cumulative: 'cumulative_formation',
  'cumulative formation': 'cumulative_formation',
  stepwise: 'stepwise_formation',
  'stepwise formation': 'stepwise_formation',
};

const FIELD_COLUMN: Record<string, string> = {
  kind: 'kind',
  reaction: 'reaction',
  logValue: 'log_value',
  uncertainty: 'uncertainty',
  temperatureC: 'temperature_c',
  ionicStrength: 'ionic_strength',
  medium: 'medium',
  enthalpyKjMol: 'enthalpy_kj_mol',
  source: 'source',
  note: 'note',
};

const CSV_TYPES = new Set(['text/csv', 'text/plain', 'application/csv', 'application/vnd.ms-excel', 'text/comma-separated-values', 'application/octet-stream']);



/** Undoes the apostrophe the export puts before a cell a spreadsheet would run as a formula. */
function unescapeCell(v: string): string {
  return /^'[=+\-@]/.test(v) ? v.slice(1) : v;
}

function numberCell(v: string | undefined): number | null | string {
  const t = (v ?? '').trim();
  if (t === '') return null;
  const n = Number(t);
  return Number.isFinite(n) && /^[-+]?(\d+\.?\d*|\.\d+)([eE][-+]?\d+)?$/.test(t) ? n : t;
}

/** One CSV row as a proposal body (numbers as numbers, blanks as absent), or the problems found. */
function rowToProposal(get: (col: string) => string | undefined): Record<string, unknown> {
  const kindText = (get('kind') ?? '').trim();
  const kind = (CONSTANT_KINDS as readonly string[]).includes(kindText) ? kindText : (KIND_WORDS[kindText.toLowerCase()] ?? kindText);
  const body: Record<string, unknown> = { kind, reaction: get('reaction') ?? '', source: get('source') ?? '' };
  const numbers: [string, string][] = [
    ['logValue', 'log_value'],
    ['uncertainty', 'uncertainty'],
    ['temperatureC', 'temperature_c'],
    ['ionicStrength', 'ionic_strength'],
    ['enthalpyKjMol', 'enthalpy_kj_mol'],
  ];
  for (const [field, col] of numbers) {
    const v = numberCell(get(col));
    if (v !== null) body[field] = v;
    else if (field === 'logValue') body[field] = undefined;
  }
  const medium = get('medium');
  if (medium !== undefined) body.medium = medium;
  const note = get('note');
  if (note !== undefined) body.note = note;
  return body;
}

function zodProblems(line: number, err: ZodError, body: Record<string, unknown>): ImportProblem[] {
  return err.issues.map((i) => {
    const field = String(i.path[0] ?? '');
    const column = FIELD_COLUMN[field] ?? null;
    const given = body[field];
    const message = i.code === 'invalid_type' && typeof given === 'string' && field !== 'kind' ? `"${given}" is not a number` : i.message;
    return { row: line, column, message: column === 'kind' ? `must be one of ${CONSTANT_KINDS.join(', ')} (or Ksp, beta, stepwise)` : message };
  });
}

type Planned = { line: number; kind: ConstantKind; reaction: CheckedReaction; values: ReturnType<typeof proposalSchema.parse>; replaces: { id: number; lineageId: string; version: number } | null };

function same(a: number | null, b: number | null | undefined): boolean {
  return (a ?? null) === (b ?? null);
}

/** Decides per row: a new draft, a revision, unchanged, or a problem. */
function planRows(text: string, snap: LibrarySnapshot): { rows: number; plans: Planned[]; unchanged: number; problems: ImportProblem[] } {
  const csv = parseCsv(text);
  const problems: ImportProblem[] = csv.errors.map((e) => ({ row: e.line, column: null, message: `the file cannot be read here: ${e.message}` }));
  const missing = CSV_REQUIRED.filter((c) => !csv.header.includes(c));
  if (missing.length > 0) {
    return { rows: csv.records.length, plans: [], unchanged: 0, problems: [{ row: 1, column: null, message: `the header row lacks the column${missing.length > 1 ? 's' : ''} ${missing.join(', ')}` }] };
  }
  if (csv.records.length > IMPORT_MAX_ROWS) {
    throw new HttpError(400, 'validation_failed', `file: it has ${csv.records.length} rows; import at most ${IMPORT_MAX_ROWS} at a time`, [{ path: 'file', message: `at most ${IMPORT_MAX_ROWS} rows` }]);
  }
  const known = new Set(snap.speciesByFormula.keys());
  const byKey = new Map<string, typeof snap.rows>();
  for (const r of snap.rows) byKey.set(r.reactionKey, [...(byKey.get(r.reactionKey) ?? []), r]);
  const approvedDefiner = new Map(snap.rows.filter((r) => r.status === 'approved').map((r) => [r.definesSpeciesId, r]));
  const seenKeys = new Map<string, number>();
  const plans: Planned[] = [];
  let unchanged = 0;
  for (const { line, cells } of csv.records) {
    const get = (col: string) => {
      const i = csv.header.indexOf(col);
      return i < 0 ? undefined : unescapeCell(cells[i] ?? '');
    };
    if (cells.length !== csv.header.length) {
      problems.push({ row: line, column: null, message: `has ${cells.length} cells but the header has ${csv.header.length}` });
      continue;
    }
    const body = rowToProposal(get);
    const parsed = proposalSchema.safeParse(body);
    if (!parsed.success) {
      problems.push(...zodProblems(line, parsed.error, body));
      continue;
    }
    const values = parsed.data;
    let reaction: CheckedReaction;
    try {
      reaction = checkReaction(values.kind, values.reaction);
    } catch (e) {
      if (!(e instanceof ReactionError)) throw e;
      problems.push({ row: line, column: e.field, message: e.message });
      continue;
    }
    const unknown = reaction.terms.map((t) => t.species).filter((f) => f !== reaction.defines && !known.has(f));
    if (unknown.length > 0) {
      problems.push({ row: line, column: 'reaction', message: `${unknown.join(', ')} ${unknown.length > 1 ? 'are' : 'is'} not in the species catalogue (nor defined by an earlier row)` });
      continue;
    }
    const earlier = seenKeys.get(reaction.key);
    if (earlier !== undefined) {
      problems.push({ row: line, column: 'reaction', message: `the same reaction is already on row ${earlier}` });
      continue;
    }
    seenKeys.set(reaction.key, line);
    const lineage = byKey.get(reaction.key) ?? [];
    const approved = lineage.find((r) => r.status === 'approved');
    const draft = lineage.find((r) => r.status === 'draft');
    if (approved && approved.kind !== values.kind) {
      problems.push({ row: line, column: 'kind', message: `this reaction is in the library as ${approved.kind}; a revision keeps the kind` });
      continue;
    }
    if (
      approved &&
      approved.logValue === values.logValue &&
      same(approved.uncertainty, values.uncertainty) &&
      approved.temperatureC === values.temperatureC &&
      approved.ionicStrength === values.ionicStrength &&
      approved.medium === values.medium &&
      same(approved.enthalpyKjMol, values.enthalpyKjMol) &&
      approved.source === values.source
    ) {
      unchanged++;
      continue;
    }
    if (draft) {
      problems.push({ row: line, column: 'reaction', message: `a draft of this reaction (version ${draft.version}) is already waiting for review` });
      continue;
    }
    let replaces: Planned['replaces'] = null;
    if (lineage.length > 0) {
      const base = approved ?? lineage.reduce((a, b) => (b.version > a.version ? b : a));
      const newest = Math.max(...lineage.map((r) => r.version));
      replaces = { id: base.id, lineageId: base.lineageId, version: newest + 1 };
    } else {
      const definedId = snap.speciesByFormula.get(reaction.defines)?.id;
      const holder = definedId === undefined ? undefined : approvedDefiner.get(definedId);
      if (holder) {
        problems.push({ row: line, column: 'reaction', message: `${reaction.defines} is already defined by the approved constant "${holder.reaction}"; revise that one instead` });
        continue;
      }
    }
    known.add(reaction.defines);
    plans.push({ line, kind: values.kind, reaction, values, replaces });
  }
  return { rows: csv.records.length, plans, unchanged, problems: problems.sort((a, b) => a.row - b.row) };
}

async function writePlans(tx: Tx, plans: Planned[], userId: string): Promise<number[]> {
  const ids: number[] = [];
  for (const p of plans) {
    const v = p.values;
    const row = await insertVersion(tx, {
      ...v,
      uncertainty: v.uncertainty ?? null,
      enthalpyKjMol: v.enthalpyKjMol ?? null,
      kind: p.kind,
      checked: p.reaction,
      status: 'draft',
      proposedBy: userId,
      ...(p.replaces ? { lineageId: p.replaces.lineageId, version: p.replaces.version, replacesId: p.replaces.id } : {}),
    });
    ids.push(row.id);
  }
  return ids;
}

/** POST /constants/import: multipart with `file` (CSV) and `mode` ("all" or "valid"). */
export function importRouter(ctx: AuthContext): Router {
  const router = Router();
  router.post('/constants/import', allow('chemist'), receiveOneFile(IMPORT_MAX_BYTES, 'split it into smaller files'), async (req: Request, res: Response) => {
    const user = requireUser(res);
    const mode = uploadMode(req.body, 'import the valid rows as drafts');
    const file = req.file;
    if (!file) throw new HttpError(400, 'validation_failed', 'file: choose a CSV file to import (field "file")', [{ path: 'file', message: 'choose a CSV file' }]);
    const typeOk = CSV_TYPES.has(file.mimetype) || /\.csv$/i.test(file.originalname);
    if (!typeOk || !/\.(csv|txt)$/i.test(file.originalname) || file.buffer.includes(0)) {
      throw new HttpError(415, 'validation_failed', `file: "${file.originalname}" is not a CSV file; export the sheet as CSV (comma-separated) first`, [{ path: 'file', message: 'not a CSV file' }]);
    }
    const text = new TextDecoder('utf-8', { fatal: false }).decode(file.buffer);
    const report = await ctx.db.transaction(async (tx): Promise<ImportReport> => {
      await tx.execute(sql`select pg_advisory_xact_lock(${PROPOSAL_LOCK_KEY})`);
      const snap = await readLibrary(tx);
      const { rows, plans, unchanged, problems } = planRows(text, snap);
      if (rows === 0 && problems.length === 0) {
        throw new HttpError(400, 'validation_failed', 'file: the file has a header but no data rows', [{ path: 'file', message: 'no data rows' }]);
      }
      const rejectedRows = new Set(problems.map((p) => p.row)).size;
      const base = { mode, rows, unchanged, rejected: rejectedRows, problems };
      if (problems.length > 0 && mode === 'all') return { ...base, created: 0, written: false, draftIds: [] };
      const draftIds = await writePlans(tx, plans, user.id);
      if (draftIds.length > 0) {
        await writeAudit(tx, {
          actor: user.id,
          action: 'constants.imported',
          subject: 'library',
          payload: { file: file.originalname, rows, created: draftIds.length, unchanged, rejected: rejectedRows, draftIds },
        });
      }
      return { ...base, created: draftIds.length, written: draftIds.length > 0, draftIds };
    });
    if (!report.written && report.problems.length > 0 && mode === 'all') {
      throw refusedUpload(report);
    }
    res.json(report);
  });
  return router;
}
