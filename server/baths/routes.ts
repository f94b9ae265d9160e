// Baths and their analysis log. Chemists and technicians create and edit baths and log analyses;
// every signed-in role reads; admins archive and restore. Nothing is deleted; every change is in
// the audit log with what it changed.
import { randomUUID } from 'node:crypto';

import { asc, count, desc, eq, max } from 'drizzle-orm';
import { type Request, type Response, Router } from 'express';

import { analyses, baths, type BathRow } from '@/db/schema';
import { allow, requireUser, signedIn } from '@/server/auth/access';
import type { AuthContext } from '@/server/auth/context';
import { writeAudit } from '@/server/audit';
import { analysisColumns } from '@/server/baths/analysis-values';
import { analysesImportRouter } from '@/server/baths/analyses-import';
import { attachmentsRouter } from '@/server/baths/attachments';
import { bathColumns, bathOf, findBath, namesOf, outOfRange, toAnalysis, toBath, valuesOf } from '@/server/baths/store';
import { HttpError } from '@/server/http-error';
import type { Tx } from '@/server/library/store';
import { output } from '@/server/output';
import { mailWaiting } from '@/server/safety/notify';
import { bathSafety, checkBath, currentThresholds, latestReviewsOfBaths, safeBathHazards } from '@/server/safety/store';
import { briefHazards } from '@/shared/safety';
import {
  analysisInputSchema,
  analysisListSchema,
  analysisSchema,
  bathListSchema,
  bathSchema,
  bathInputSchema,
  bathPatchSchema,
  bathQuerySchema,
  type Bath,
  type BathSummary,
  PROCESS_INFO,
} from '@/shared/baths';

const DAY_MS = 24 * 3600 * 1000;

/** Whole calendar days (UTC) from one moment to a later one: yesterday evening to this morning is 1. */
function calendarDaysBetween(from: number, to: number): number {
  return Math.max(0, Math.floor(to / DAY_MS) - Math.floor(from / DAY_MS));
}

/** Fields that differ between two rows, for the audit log. */
function changes(before: BathRow, after: Partial<BathRow>): Record<string, { from: unknown; to: unknown }> {
  const out: Record<string, { from: unknown; to: unknown }> = {};
  for (const [k, v] of Object.entries(after)) {
    const old = (before as Record<string, unknown>)[k];
    if (JSON.stringify(old) !== JSON.stringify(v)) out[k] = { from: old, to: v };
  }
  return out;
}

/**
 * After a bath is stored or changed: the hazard check (which may open a review), and the bath with
 * its hazards and latest review as the answer gives it.
 */
async function checkedBath(tx: Tx, row: BathRow, userId: string): Promise<{ bath: Bath; opened: string | null }> {
  const bath = await bathOf(tx, row);
  const { hazards, opened } = await checkBath(tx, bath, userId);
  return { bath: { ...bath, safety: await bathSafety(tx, bath, hazards) }, opened };
}

/** Baths, analyses, the analysis CSV upload and attachments. */
export function bathsRouter(ctx: AuthContext, uploadsDir: string): Router {
  const router = Router();
  const db = ctx.db;

  router.get('/baths', signedIn, async (req: Request, res: Response) => {
    const query = bathQuerySchema.parse(req.query);
    const rows = await db
      .select()
      .from(baths)
      .where(query.status === 'all' ? undefined : eq(baths.status, query.status))
      .orderBy(asc(baths.name));
    const q = query.q?.toLowerCase();
    const picked = rows.filter(
      (r) => (!query.process || r.process === query.process) && (!q || [r.name, r.site, r.notes, PROCESS_INFO[r.process as keyof typeof PROCESS_INFO]?.label ?? ''].some((t) => t.toLowerCase().includes(q))),
    );
    const names = await namesOf(db, picked.flatMap((r) => [r.ownerId, r.createdBy]));
    const stats = await db
      .select({ bathId: analyses.bathId, n: count(), last: max(analyses.sampledAt) })
      .from(analyses)
      .groupBy(analyses.bathId);
    const latest = await db
      .selectDistinctOn([analyses.bathId])
      .from(analyses)
      .orderBy(analyses.bathId, desc(analyses.sampledAt), desc(analyses.createdAt));
    const statBy = new Map(stats.map((s) => [s.bathId, s]));
    const latestBy = new Map(latest.map((a) => [a.bathId, a]));
    const now = Date.now();
    const thresholds = (await currentThresholds(db)).values;
    const reviews = await latestReviewsOfBaths(db, picked.map((r) => r.id));
    const list: BathSummary[] = picked.map((r) => {
      const bath = toBath(r, names);
      const stat = statBy.get(r.id);
      const last = latestBy.get(r.id);
      const lastAt = stat?.last ? new Date(stat.last) : null;
      return {
        ...bath,
        analysisCount: Number(stat?.n ?? 0),
        lastAnalysisAt: lastAt?.toISOString() ?? null,
        lastAnalysisAgeDays: lastAt ? calendarDaysBetween(lastAt.getTime(), now) : null,
        outOfRange: last ? outOfRange(bath, valuesOf(last)) : [],
        // The rules read the latest analysis only (lib/baths/prefill.ts).
        hazards: briefHazards(safeBathHazards(bath, last ? [toAnalysis(last, bath, names)] : [], thresholds)),
        review: reviews.get(r.id) ?? null,
      };
    });
    res.json(output(bathListSchema, list));
  });

  router.post('/baths', allow('chemist', 'technician'), async (req: Request, res: Response) => {
    const user = requireUser(res);
    const input = bathInputSchema.parse(req.body);
    const { bath, opened } = await db.transaction(async (tx) => {
      const columns = await bathColumns(tx, input, user.id);
      const [row] = await tx.insert(baths).values({ id: randomUUID(), ...columns, createdBy: user.id }).returning();
      if (!row) throw new Error('bath not stored');
      await writeAudit(tx, { actor: user.id, action: 'bath.created', subject: `bath:${row.id}`, payload: { name: row.name, process: row.process } });
      return checkedBath(tx, row, user.id);
    });
    if (opened) await mailWaiting(ctx, req, opened);
    res.status(201).json(output(bathSchema, bath));
  });

  router.get('/baths/:id', signedIn, async (req: Request, res: Response) => {
    const bath = await bathOf(db, await findBath(db, req.params.id));
    res.json(output(bathSchema, { ...bath, safety: await bathSafety(db, bath) }));
  });

  router.patch('/baths/:id', allow('chemist', 'technician'), async (req: Request, res: Response) => {
    const user = requireUser(res);
    const parsed = bathPatchSchema.parse(req.body);
    // zod fills defaults into absent fields: keep only what the request named, so a PATCH of the
    // name leaves the targets, make-up and notes as they are.
    const given = new Set(Object.keys((req.body ?? {}) as object));
    const patch = Object.fromEntries(Object.entries(parsed).filter(([k]) => given.has(k)));
    const { bath, opened } = await db.transaction(async (tx) => {
      const before = await findBath(tx, req.params.id, true);
      if (before.status === 'archived') throw new HttpError(409, 'conflict', 'This bath is archived; an admin can restore it before it is edited.');
      const current = toBath(before, new Map());
      const merged = bathInputSchema.parse({
        name: current.name,
        process: current.process,
        volume: current.volume,
        volumeUnit: current.volumeUnit,
        temperatureC: current.temperatureC,
        makeUp: current.makeUp,
        metalUnit: current.metalUnit,
        ligandUnit: current.ligandUnit,
        // A new process brings its own ligand salt unless one is given.
        ligandAs: patch.process !== undefined && patch.process !== current.process ? undefined : current.ligandAs,
        targets: current.targets,
        site: current.site,
        ownerId: current.owner.id,
        notes: current.notes,
        ...patch,
      });
      const columns = await bathColumns(tx, merged, before.ownerId);
      const diff = changes(before, columns);
      const [row] = await tx.update(baths).set({ ...columns, updatedAt: new Date() }).where(eq(baths.id, before.id)).returning();
      if (!row) throw new Error('bath not updated');
      if (Object.keys(diff).length > 0) await writeAudit(tx, { actor: user.id, action: 'bath.updated', subject: `bath:${row.id}`, payload: { name: row.name, changes: diff } });
      return checkedBath(tx, row, user.id);
    });
    if (opened) await mailWaiting(ctx, req, opened);
    res.json(output(bathSchema, bath));
  });

  for (const [path, to] of [
    ['archive', 'archived'],
    ['restore', 'active'],
  ] as const) {
    router.post(`/baths/:id/${path}`, allow('admin'), async (req: Request, res: Response) => {
      const user = requireUser(res);
      const bath = await db.transaction(async (tx) => {
        const before = await findBath(tx, req.params.id, true);
        if (before.status === to) throw new HttpError(409, 'conflict', `This bath is already ${to === 'archived' ? 'archived' : 'active'}.`);
        const archived = to === 'archived';
        const [row] = await tx
          .update(baths)
          .set({ status: to, archivedAt: archived ? new Date() : null, archivedBy: archived ? user.id : null, updatedAt: new Date() })
          .where(eq(baths.id, before.id))
          .returning();
        if (!row) throw new Error('bath not updated');
        await writeAudit(tx, { actor: user.id, action: archived ? 'bath.archived' : 'bath.restored', subject: `bath:${row.id}`, payload: { name: row.name } });
        return bathOf(tx, row);
      });
      res.json(output(bathSchema, bath));
    });
  }

  router.get('/baths/:id/analyses', signedIn, async (req: Request, res: Response) => {
    const row = await findBath(db, req.params.id);
    const list = await db.select().from(analyses).where(eq(analyses.bathId, row.id)).orderBy(asc(analyses.sampledAt), asc(analyses.createdAt));
    const names = await namesOf(db, [row.ownerId, row.createdBy, ...list.map((a) => a.enteredBy)]);
    const bath = toBath(row, names);
    res.json(output(analysisListSchema, list.map((a) => toAnalysis(a, bath, names))));
  });

  router.post('/baths/:id/analyses', allow('chemist', 'technician'), async (req: Request, res: Response) => {
    const user = requireUser(res);
    const input = analysisInputSchema.parse(req.body);
    const { analysis, opened } = await db.transaction(async (tx) => {
      const row = await findBath(tx, req.params.id);
      if (row.status === 'archived') throw new HttpError(409, 'conflict', 'This bath is archived; analyses are no longer logged on it.');
      const bath = await bathOf(tx, row);
      const made = analysisColumns(bath, input);
      if ('problems' in made) {
        const first = made.problems[0] as { path: string; message: string };
        throw new HttpError(400, 'validation_failed', `${first.path}: ${first.message}`, made.problems);
      }
      const [stored] = await tx
        .insert(analyses)
        .values({ id: randomUUID(), bathId: row.id, ...made.columns, source: 'manual', enteredBy: user.id })
        .returning();
      if (!stored) throw new Error('analysis not stored');
      await writeAudit(tx, { actor: user.id, action: 'analysis.added', subject: `bath:${row.id}`, payload: { analysis: stored.id, sampledAt: stored.sampledAt.toISOString(), entered: stored.entered } });
      const { opened } = await checkBath(tx, bath, user.id);
      return { analysis: toAnalysis(stored, bath, new Map([[user.id, user.name]])), opened };
    });
    if (opened) await mailWaiting(ctx, req, opened);
    res.status(201).json(output(analysisSchema, analysis));
  });

  router.use(analysesImportRouter(ctx));
  router.use(attachmentsRouter(ctx, uploadsDir));

  return router;
}
