import { and, eq, ne, sql } from 'drizzle-orm';
import { type Request, type Response, Router } from 'express';
import { z } from 'zod';

import { constants, type ConstantRow, users } from '@/db/schema';
import { checkReaction, type CheckedReaction, ReactionError } from '@/lib/library/reaction';
import { allow, requireUser, signedIn } from '@/server/auth/access';
import { type AuthContext, trySend } from '@/server/auth/context';
import { writeAudit } from '@/server/audit';
import { HttpError } from '@/server/http-error';
import { toCsv } from '@/server/library/csv';
import { importRouter } from '@/server/library/import-route';
import { reviewOutcomeMail } from '@/server/library/mail';
import {
  filterSummaries,
  insertVersion,
  PROPOSAL_LOCK_KEY,
  readLibrary,
  summaries,
  toSpecies,
  type Tx,
} from '@/server/library/store';
import {
  type ConstantDetail,
  constantQuerySchema,
  type ConstantSummary,
  CSV_COLUMNS,
  proposalSchema,
  retireSchema,
  revisionSchema,
  reviewSchema,
} from '@/shared/constants';

// Ids are PostgreSQL integers: a larger number names no constant (and must not reach the query).
const idParam = z.coerce.number().int().positive().max(2_147_483_647);

function parseId(req: Request): number {
  const parsed = idParam.safeParse(req.params.id);
  if (!parsed.success) throw new HttpError(404, 'not_found', `No constant with id ${String(req.params.id)}.`);
  return parsed.data;
}

/** A reaction problem as the one validation error shape, naming the field. */
function reactionFailure(e: ReactionError): HttpError {
  return new HttpError(400, 'validation_failed', `${e.field}: ${e.message}`, [{ path: e.field, message: e.message }]);
}

function checked(kind: Parameters<typeof checkReaction>[0], text: string): CheckedReaction {
  try {
    return checkReaction(kind, text);
  } catch (e) {
    if (e instanceof ReactionError) throw reactionFailure(e);
    throw e;
  }
}

/** One version as the API shows it, read inside the transaction that changed it. */
async function summaryOf(tx: Tx, id: number): Promise<ConstantSummary> {
  const snap = await readLibrary(tx);
  const found = summaries(snap).find((c) => c.id === id);
  if (!found) throw new HttpError(404, 'not_found', `No constant with id ${id}.`);
  return found;
}

async function lockRow(tx: Tx, id: number): Promise<ConstantRow> {
  const [row] = await tx.select().from(constants).where(eq(constants.id, id)).for('update');
  if (!row) throw new HttpError(404, 'not_found', `No constant with id ${id}.`);
  return row;
}

function versionText(row: Pick<ConstantRow, 'version' | 'status'>): string {
  return `version ${row.version}, ${row.status}`;
}

/** The constants library: species, versions, proposals, review and retirement, CSV in and out. */
export function libraryRouter(ctx: AuthContext): Router {
  const router = Router();
  const db = ctx.db;

  router.get('/species', signedIn, async (req: Request, res: Response) => {
    const q = typeof req.query.q === 'string' ? req.query.q.trim().toLowerCase() : '';
    const snap = await readLibrary(db);
    const list = [...snap.speciesById.values()]
      .filter((s) => !q || [s.formula, s.name, ...s.aliases].some((t) => t.toLowerCase().includes(q)))
      .sort((a, b) => a.role.localeCompare(b.role) || a.formula.localeCompare(b.formula))
      .map(toSpecies);
    res.json(list);
  });

  router.get('/constants', signedIn, async (req: Request, res: Response) => {
    const query = constantQuerySchema.parse(req.query);
    const snap = await readLibrary(db);
    res.json(filterSummaries(summaries(snap), query, snap));
  });

  router.get('/constants/export.csv', signedIn, async (req: Request, res: Response) => {
    const query = constantQuerySchema.parse(req.query);
    const snap = await readLibrary(db);
    const rows = filterSummaries(summaries(snap), query, snap).map((c) => ({
      kind: c.kind,
      reaction: c.reaction,
      log_value: c.logValue,
      uncertainty: c.uncertainty,
      temperature_c: c.temperatureC,
      ionic_strength: c.ionicStrength,
      medium: c.medium,
      enthalpy_kj_mol: c.enthalpyKjMol,
      source: c.source,
      note: c.note,
      status: c.status,
      version: c.version,
      id: c.id,
      lineage_id: c.lineageId,
    }));
    const stamp = new Date().toISOString().slice(0, 10);
    res.setHeader('Content-Type', 'text/csv; charset=utf-8');
    res.setHeader('Content-Disposition', `attachment; filename="ligandry-constants-${query.status}-${stamp}.csv"`);
    res.send(toCsv(CSV_COLUMNS, rows));
  });

  router.use(importRouter(ctx));

  router.get('/constants/:id', signedIn, async (req: Request, res: Response) => {
    const id = parseId(req);
    const snap = await readLibrary(db);
    const all = summaries(snap);
    const constant = all.find((c) => c.id === id);
    if (!constant) throw new HttpError(404, 'not_found', `No constant with id ${id}.`);
    const history = all.filter((c) => c.lineageId === constant.lineageId).sort((a, b) => b.version - a.version);
    const detail: ConstantDetail = { constant, history };
    res.json(detail);
  });

  router.post('/constants', allow('chemist'), async (req: Request, res: Response) => {
    const user = requireUser(res);
    const input = proposalSchema.parse(req.body);
    const reaction = checked(input.kind, input.reaction);
    const summary = await db.transaction(async (tx) => {
      // One proposal at a time, so two people cannot both add the same reaction.
      await tx.execute(sql`select pg_advisory_xact_lock(${PROPOSAL_LOCK_KEY})`);
      const same = await tx.select().from(constants).where(eq(constants.reactionKey, reaction.key));
      const live = same.find((r) => r.status === 'approved' || r.status === 'draft');
      if (live) {
        throw new HttpError(409, 'conflict', `This reaction is already in the library (${versionText(live)}): propose a revision of it instead.`, { id: live.id });
      }
      let row: ConstantRow;
      try {
        row = await insertVersion(tx, { ...input, uncertainty: input.uncertainty ?? null, enthalpyKjMol: input.enthalpyKjMol ?? null, checked: reaction, status: 'draft', proposedBy: user.id });
      } catch (e) {
        if (e instanceof ReactionError) throw reactionFailure(e);
        throw e;
      }
      const holder = await tx
        .select()
        .from(constants)
        .where(and(eq(constants.definesSpeciesId, row.definesSpeciesId), eq(constants.status, 'approved')));
      const approved = holder[0];
      if (approved) {
        throw new HttpError(
          409,
          'conflict',
          `${reaction.defines} is already defined by the approved constant "${approved.reaction}" (version ${approved.version}): revise that one, or have it retired first.`,
          { id: approved.id },
        );
      }
      await writeAudit(tx, { actor: user.id, action: 'constant.proposed', subject: `constant:${row.id}`, payload: { reaction: row.reaction, kind: row.kind, logValue: row.logValue, source: row.source } });
      return summaryOf(tx, row.id);
    });
    res.status(201).json(summary);
  });

  router.post('/constants/:id/revisions', allow('chemist'), async (req: Request, res: Response) => {
    const user = requireUser(res);
    const id = parseId(req);
    const input = revisionSchema.parse(req.body);
    const summary = await db.transaction(async (tx) => {
      const target = await lockRow(tx, id);
      const lineage = await tx.select().from(constants).where(eq(constants.lineageId, target.lineageId)).for('update');
      const approved = lineage.find((r) => r.status === 'approved');
      const newest = lineage.reduce((a, b) => (b.version > a.version ? b : a));
      if (approved ? approved.id !== target.id : newest.id !== target.id) {
        const which = approved ? `the approved version ${approved.version}` : `the newest version ${newest.version}`;
        throw new HttpError(409, 'conflict', `Revise ${which} of this constant, not version ${target.version}.`, { id: (approved ?? newest).id });
      }
      const pending = lineage.find((r) => r.status === 'draft');
      if (pending) {
        throw new HttpError(409, 'conflict', `A revision (version ${pending.version}) is already waiting for review.`, { id: pending.id });
      }
      const checkedReaction = checked(target.kind as never, target.reaction);
      const row = await insertVersion(tx, {
        ...input,
        uncertainty: input.uncertainty ?? null,
        enthalpyKjMol: input.enthalpyKjMol ?? null,
        kind: target.kind as never,
        checked: checkedReaction,
        status: 'draft',
        lineageId: target.lineageId,
        version: newest.version + 1,
        replacesId: target.id,
        proposedBy: user.id,
      });
      await writeAudit(tx, {
        actor: user.id,
        action: 'constant.revision_proposed',
        subject: `constant:${row.id}`,
        payload: { reaction: row.reaction, replaces: target.id, from: target.logValue, to: row.logValue, source: row.source },
      });
      return summaryOf(tx, row.id);
    });
    res.status(201).json(summary);
  });

  router.post('/constants/:id/review', allow('reviewer'), async (req: Request, res: Response) => {
    const user = requireUser(res);
    const id = parseId(req);
    const input = reviewSchema.parse(req.body);
    const { summary, proposer } = await db.transaction(async (tx) => {
      const target = await lockRow(tx, id);
      if (target.status !== 'draft') {
        throw new HttpError(409, 'conflict', `Only drafts are reviewed; this is ${versionText(target)}.`);
      }
      if (target.proposedBy === user.id) {
        throw new HttpError(403, 'forbidden', 'You proposed this value: another reviewer must approve or reject it.');
      }
      const now = new Date();
      if (input.decision === 'approve') {
        const lineageApproved = await tx
          .select()
          .from(constants)
          .where(and(eq(constants.lineageId, target.lineageId), eq(constants.status, 'approved'), ne(constants.id, target.id)))
          .for('update');
        for (const old of lineageApproved) {
          await tx
            .update(constants)
            .set({ status: 'retired', retiredBy: user.id, retiredAt: now, retireNote: `Replaced by version ${target.version}.` })
            .where(eq(constants.id, old.id));
          await writeAudit(tx, { actor: user.id, action: 'constant.retired', subject: `constant:${old.id}`, payload: { reaction: old.reaction, replacedBy: target.id } });
        }
        const [other] = await tx
          .select()
          .from(constants)
          .where(and(eq(constants.definesSpeciesId, target.definesSpeciesId), eq(constants.status, 'approved')));
        if (other) {
          throw new HttpError(
            409,
            'conflict',
            `The same species is already defined by the approved constant "${other.reaction}" (version ${other.version}); retire it before approving this one.`,
            { id: other.id },
          );
        }
      }
      const status = input.decision === 'approve' ? 'approved' : 'rejected';
      await tx.update(constants).set({ status, reviewedBy: user.id, reviewedAt: now, reviewNote: input.note }).where(eq(constants.id, id));
      await writeAudit(tx, {
        actor: user.id,
        action: input.decision === 'approve' ? 'constant.approved' : 'constant.rejected',
        subject: `constant:${id}`,
        payload: { reaction: target.reaction, version: target.version, logValue: target.logValue, note: input.note },
      });
      const person = target.proposedBy ? (await tx.select().from(users).where(eq(users.id, target.proposedBy)))[0] : undefined;
      return { summary: await summaryOf(tx, id), proposer: person };
    });
    if (proposer) {
      await trySend(
        ctx,
        reviewOutcomeMail({ to: proposer.email, name: proposer.name, reviewer: user.name, summary, link: `${ctx.publicUrl(req)}/library/constant/${summary.id}` }),
        'constant review outcome',
      );
    }
    res.json(summary);
  });

  router.post('/constants/:id/retire', allow('reviewer'), async (req: Request, res: Response) => {
    const user = requireUser(res);
    const id = parseId(req);
    const input = retireSchema.parse(req.body);
    const summary = await db.transaction(async (tx) => {
      const target = await lockRow(tx, id);
      if (target.status !== 'approved') throw new HttpError(409, 'conflict', `Only an approved version can be retired; this is ${versionText(target)}.`);
      await tx.update(constants).set({ status: 'retired', retiredBy: user.id, retiredAt: new Date(), retireNote: input.note }).where(eq(constants.id, id));
      await writeAudit(tx, { actor: user.id, action: 'constant.retired', subject: `constant:${id}`, payload: { reaction: target.reaction, version: target.version, note: input.note } });
      return summaryOf(tx, id);
    });
    res.json(summary);
  });

  return router;
}
