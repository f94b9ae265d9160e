// The safety desk: the thresholds the hazard rules use (safety officers change them; each change
// is a new version) and the reviews of flagged runs and baths. Safety officers sign off with
// conditions or send back with a note, never on their own work; the submitter can resubmit after
// a send-back. Each step is audited and mailed. Route list: shared/safety.ts.
import { and, desc, eq, sql } from 'drizzle-orm';
import { type Request, type Response, Router } from 'express';
import { z } from 'zod';

import { runReleases, safetyReviewEvents, safetyReviews } from '@/db/schema';
import { allow, requireUser, signedIn } from '@/server/auth/access';
import type { AuthContext } from '@/server/auth/context';
import { writeAudit } from '@/server/audit';
import { HttpError } from '@/server/http-error';
import { lockLiveRun } from '@/server/library/runs-routes';
import { output } from '@/server/output';
import { mailDecision, mailWaiting } from '@/server/safety/notify';
import {
  addThresholds,
  currentThresholds,
  reviewDetail,
  reviewSummaries,
  runSafety,
  thresholdsHistory,
} from '@/server/safety/store';
import type { Tx } from '@/server/library/store';
import type { User } from '@/shared/auth';
import {
  releaseSchema,
  resubmitSchema,
  reviewListSchema,
  reviewQuerySchema,
  reviewSchema,
  safetyStateSchema,
  sendBackSchema,
  signOffSchema,
  thresholdsInputSchema,
  thresholdsVersionSchema,
} from '@/shared/safety';

const idParam = z.string().uuid();

function reviewId(req: Request): string {
  const parsed = idParam.safeParse(req.params.id);
  if (!parsed.success) throw new HttpError(404, 'not_found', `No safety review with id ${String(req.params.id)}.`);
  return parsed.data;
}

const canSeeAll = (user: User) => user.roles.includes('safety') || user.roles.includes('admin');

/** Locks a review for a decision; refuses one's own work and one that is not in the wanted state. */
async function lockForDecision(tx: Tx, id: string, user: User, wanted: 'pending' | 'sent_back'): Promise<void> {
  const [row] = await tx.select().from(safetyReviews).where(eq(safetyReviews.id, id)).for('update');
  if (!row) throw new HttpError(404, 'not_found', `No safety review with id ${id}.`);
  if (wanted === 'pending') {
    if (row.submittedBy === user.id) throw new HttpError(403, 'forbidden', 'You cannot review your own work; another safety officer must sign it off or send it back.');
    if (row.status !== 'pending') throw new HttpError(409, 'conflict', `This review is already ${row.status === 'signed_off' ? 'signed off' : 'sent back'}; it can be decided again only after it is resubmitted.`);
  } else {
    if (row.submittedBy !== user.id) throw new HttpError(403, 'forbidden', 'Only the person who submitted this work can resubmit it.');
    if (row.status !== 'sent_back') throw new HttpError(409, 'conflict', 'Only work the safety desk sent back can be resubmitted.');
  }
}

/** One step of a review: the status it must be in, what its row becomes, and the event and audit that record it. */
interface ReviewStep {
  from: 'pending' | 'sent_back';
  set: Pick<typeof safetyReviews.$inferInsert, 'status' | 'decidedBy' | 'decidedAt' | 'conditions' | 'note'>;
  action: 'signed_off' | 'sent_back' | 'resubmitted';
  /** The event's note (null for none). */
  note: string | null;
  payload: Record<string, unknown>;
}

/** Takes a review one step in `tx`: checked and locked, its row moved, the event and the audit written; returns it as it now stands. */
async function stepReview(tx: Tx, id: string, user: User, step: ReviewStep) {
  await lockForDecision(tx, id, user, step.from);
  await tx.update(safetyReviews).set(step.set).where(eq(safetyReviews.id, id));
  await tx.insert(safetyReviewEvents).values({ reviewId: id, action: step.action, actorId: user.id, note: step.note });
  await writeAudit(tx, { actor: user.id, action: `safety.${step.action}`, subject: `review:${id}`, payload: step.payload });
  return (await reviewDetail(tx, id)).review;
}

/** Thresholds, the desk's reviews and run releases. */
export function safetyRouter(ctx: AuthContext): Router {
  const router = Router();
  const db = ctx.db;

  router.get('/safety/thresholds', signedIn, async (_req: Request, res: Response) => {
    const [current] = await thresholdsHistory(db);
    if (!current) throw new Error('no hazard thresholds stored (migration 0010 inserts version 1)');
    res.json(output(thresholdsVersionSchema, current));
  });

  router.get('/safety/thresholds/history', signedIn, async (_req: Request, res: Response) => {
    res.json(output(z.array(thresholdsVersionSchema), await thresholdsHistory(db)));
  });

  router.post('/safety/thresholds', allow('safety'), async (req: Request, res: Response) => {
    const user = requireUser(res);
    const input = thresholdsInputSchema.parse(req.body);
    const version = await db.transaction((tx) => addThresholds(tx, user, input.values, input.note));
    const created = (await thresholdsHistory(db)).find((t) => t.version === version);
    if (!created) throw new Error(`thresholds version ${version} not found after insert`);
    res.status(201).json(output(thresholdsVersionSchema, created));
  });

  router.get('/safety/reviews', signedIn, async (req: Request, res: Response) => {
    const user = requireUser(res);
    const q = reviewQuerySchema.parse(req.query);
    const where = [];
    if (q.status !== 'all') where.push(eq(safetyReviews.status, q.status));
    // A run deleted while it waited needs no decision; the other lists still show it, marked deleted.
    if (q.status === 'pending') where.push(sql`not exists (select 1 from runs r where r.id = ${safetyReviews.runId} and r.deleted_at is not null)`);
    if (!canSeeAll(user)) where.push(eq(safetyReviews.submittedBy, user.id));
    const rows = await db
      .select()
      .from(safetyReviews)
      .where(where.length ? and(...where) : undefined)
      .orderBy(q.status === 'pending' ? safetyReviews.submittedAt : desc(safetyReviews.submittedAt))
      .limit(300);
    res.json(output(reviewListSchema, await reviewSummaries(db, rows)));
  });

  router.get('/safety/reviews/:id', signedIn, async (req: Request, res: Response) => {
    const user = requireUser(res);
    const { review } = await reviewDetail(db, reviewId(req));
    if (!canSeeAll(user) && review.submittedBy.id !== user.id) throw new HttpError(403, 'forbidden', 'Only the safety desk, admins and the person who submitted it can open this review.');
    res.json(output(reviewSchema, review));
  });

  router.post('/safety/reviews/:id/sign-off', allow('safety'), async (req: Request, res: Response) => {
    const user = requireUser(res);
    const id = reviewId(req);
    const input = signOffSchema.parse(req.body ?? {});
    const conditions = input.conditions.trim();
    const review = await db.transaction((tx) =>
      stepReview(tx, id, user, {
        from: 'pending',
        set: { status: 'signed_off', decidedBy: user.id, decidedAt: new Date(), conditions, note: null },
        action: 'signed_off',
        note: conditions || null,
        payload: { conditions },
      }),
    );
    await mailDecision(ctx, req, review);
    res.json(output(reviewSchema, review));
  });

  router.post('/safety/reviews/:id/send-back', allow('safety'), async (req: Request, res: Response) => {
    const user = requireUser(res);
    const id = reviewId(req);
    const input = sendBackSchema.parse(req.body ?? {});
    const review = await db.transaction((tx) =>
      stepReview(tx, id, user, {
        from: 'pending',
        set: { status: 'sent_back', decidedBy: user.id, decidedAt: new Date(), conditions: null, note: input.note },
        action: 'sent_back',
        note: input.note,
        payload: { note: input.note },
      }),
    );
    await mailDecision(ctx, req, review);
    res.json(output(reviewSchema, review));
  });

  router.post('/safety/reviews/:id/resubmit', signedIn, async (req: Request, res: Response) => {
    const user = requireUser(res);
    const id = reviewId(req);
    const input = resubmitSchema.parse(req.body ?? {});
    const review = await db.transaction((tx) =>
      stepReview(tx, id, user, {
        from: 'sent_back',
        set: { status: 'pending', decidedBy: null, decidedAt: null, conditions: null, note: input.note },
        action: 'resubmitted',
        note: input.note,
        payload: { note: input.note },
      }),
    );
    await mailWaiting(ctx, req, id, { resubmitted: true, note: input.note });
    res.json(output(reviewSchema, review));
  });

  router.post('/runs/:id/release', signedIn, async (req: Request, res: Response) => {
    const user = requireUser(res);
    const input = releaseSchema.parse(req.body ?? {});
    const state = await db.transaction(async (tx) => {
      const row = await lockLiveRun(tx, req.params.id);
      if (row.authorId !== user.id && !user.roles.includes('admin')) throw new HttpError(403, 'forbidden', 'Only the author of a run, or an admin, can release it.');
      const [already] = await tx.select().from(runReleases).where(eq(runReleases.runId, row.id));
      if (already) throw new HttpError(409, 'conflict', 'This run is already released.');
      const thresholds = await currentThresholds(tx);
      const safety = await runSafety(tx, row, thresholds.values);
      if (safety.flagged && safety.review?.status !== 'signed_off') {
        const why = safety.review?.status === 'sent_back' ? 'the safety desk sent it back; change what it asks and resubmit it' : 'it is waiting for the safety desk';
        throw new HttpError(409, 'sign_off_required', `This run was flagged by the hazard rules and cannot be released until the safety desk signs it off (${why}).`, [
          { path: 'review', message: safety.review ? safety.review.status : 'no review' },
        ]);
      }
      await tx.insert(runReleases).values({ runId: row.id, releasedBy: user.id, note: input.note });
      await writeAudit(tx, { actor: user.id, action: 'run.released', subject: `run:${row.id}`, payload: { note: input.note, flagged: safety.flagged, review: safety.review?.id ?? null } });
      return runSafety(tx, row, thresholds.values);
    });
    res.json(output(safetyStateSchema, state));
  });

  return router;
}

