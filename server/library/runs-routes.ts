// Calculations and saved runs. The server builds the system from the library and runs the
// calculator again when a run is saved, so the stored result is authoritative; a run keeps the
// exact constant versions it used, whatever the library does later. POST /solve takes a problem
// in the general form, as the command line does.
import { randomUUID } from 'node:crypto';

import { and, desc, eq, gte, isNull, lt, type SQL } from 'drizzle-orm';
import { type Request, type Response, Router } from 'express';
import { z } from 'zod';

import { baths, constants, runConstants, runs, type RunRow, users } from '@/db/schema';
import { CalculatorInputError } from '@/lib/calculators/errors';
import { type CalculationRun, jsonSafe, runCalculation } from '@/lib/calculators/run-calculation';
import { ENGINE_VERSION, EngineInputError, type Problem, solve } from '@/lib/engine';
import { BuildError, type BuildOutput, completeBuild } from '@/lib/library/build';
import { solveBuilt } from '@/lib/library/solve-built';
import { allow, requireUser, signedIn } from '@/server/auth/access';
import type { AuthContext } from '@/server/auth/context';
import { writeAudit } from '@/server/audit';
import { HttpError } from '@/server/http-error';
import { libraryForBuild, selectionFor, type Tx } from '@/server/library/store';
import { output } from '@/server/output';
import { readRevisions, type Revisions } from '@/server/revisions';
import { mailWaiting } from '@/server/safety/notify';
import { currentThresholds, openReview, releasedRuns, reviewsOfRuns, runHazards, runSafety } from '@/server/safety/store';
import { calculationHazards, isFlagged, solutionOf } from '@/lib/hazards';
import { briefHazards, type HazardThresholds, type ReviewStatus } from '@/shared/safety';
import { calculationOutcomeSchema, calculationRequestSchema, type CalculatorKey, PARAMS_SCHEMAS } from '@/shared/calculations';
import {
  type ConstantStatus,
  type ConstantUse,
  type Run,
  runInputSchema,
  runListSchema,
  runQuerySchema,
  runSchema,
  type RunSummary,
  systemRequestSchema,
  type SolveResultJson,
} from '@/shared/constants';

const RUN_LIST_LIMIT = 200;
const SOLVE_BATCH_LIMIT = 100;
const runIdParam = z.string().uuid();

function unprocessable(field: string, message: string): HttpError {
  return new HttpError(422, 'validation_failed', `${field}: ${message}`, [{ path: field, message }]);
}

/** Builds from the library as it is now in `tx`; a selection it cannot build is a 422 naming the field. */
export async function buildFromLibrary(tx: Tx, request: z.output<typeof systemRequestSchema>, known?: Revisions): Promise<BuildOutput> {
  const library = await libraryForBuild(tx, known);
  try {
    return completeBuild(selectionFor(library, request), request);
  } catch (e) {
    if (e instanceof BuildError) throw unprocessable(e.field, e.message);
    throw e;
  }
}

/** Solves a built system as the bath stands; engine input problems come back as 422 naming the field. */
function solveOrExplain(built: BuildOutput, pH: number | undefined): SolveResultJson {
  try {
    const result = solveBuilt(built.problem, pH);
    return jsonSafe({ ...result, warnings: [...built.warnings, ...result.warnings] }) as SolveResultJson;
  } catch (e) {
    if (e instanceof CalculatorInputError) throw unprocessable(e.field, e.message);
    throw e;
  }
}

/** Runs a calculator on a built system; its input problems are 422s under params (or system). */
function calculate(calculator: CalculatorKey, rawParams: unknown, built: BuildOutput, pH: number | undefined): CalculationRun {
  const params = PARAMS_SCHEMAS[calculator].parse(rawParams);
  try {
    const run = runCalculation(calculator, built.problem, pH, params as never);
    return { ...run, warnings: [...built.warnings, ...run.warnings] };
  } catch (e) {
    if (e instanceof CalculatorInputError) {
      const field = /^(totals|fixed|components|species|solids|state|system|pH)\b/.test(e.field) ? `system.${e.field.replace(/^(state|system)\./, '')}` : `params.${e.field}`;
      throw unprocessable(field, e.message);
    }
    throw e;
  }
}

type ListSafety = { thresholds: HazardThresholds; review: { id: string; status: string } | null; released: boolean };

function summaryOf(row: RunRow, authorName: string, bathName: string | null, safety: ListSafety): RunSummary {
  return {
    id: row.id,
    title: row.title,
    calculator: row.calculator as RunSummary['calculator'],
    author: { id: row.authorId, name: authorName },
    createdAt: row.createdAt.toISOString(),
    status: row.status as RunSummary['status'],
    usesDrafts: row.usesDrafts,
    verdict: row.verdict,
    bath: row.bathId ? { id: row.bathId, name: bathName ?? 'Unknown bath' } : null,
    hazards: briefHazards(runHazards(row, safety.thresholds)),
    review: safety.review ? { id: safety.review.id, status: safety.review.status as ReviewStatus } : null,
    released: safety.released,
  };
}

/** A run with, for each constant it used, what has become of that lineage since. */
async function runDetail(tx: Tx, row: RunRow, authorName: string, bathName: string | null): Promise<Run> {
  const used = row.constantsUsed as ConstantUse[];
  const now = used.length ? await tx.select().from(constants) : [];
  const byId = new Map(now.map((c) => [c.id, c]));
  const approvedByLineage = new Map(now.filter((c) => c.status === 'approved').map((c) => [c.lineageId, c]));
  const thresholds = (await currentThresholds(tx)).values;
  const safety = await runSafety(tx, row, thresholds);
  return {
    ...summaryOf(row, authorName, bathName, { thresholds, review: safety.review, released: safety.released !== null }),
    safety,
    inputs: row.inputs as Record<string, unknown>,
    problem: row.problem as Run['problem'],
    engineVersion: row.engineVersion,
    result: row.result as SolveResultJson,
    warnings: row.warnings as string[],
    output: row.output ?? null,
    constants: used.map((c) => {
      const current = approvedByLineage.get(c.lineageId);
      return {
        ...c,
        statusNow: (byId.get(c.id)?.status ?? c.status) as ConstantStatus,
        supersededBy: current && current.id !== c.id ? { id: current.id, version: current.version, logValue: current.logValue } : null,
      };
    }),
  };
}

async function nameOf(tx: Tx, userId: string): Promise<string> {
  const [u] = await tx.select({ name: users.name }).from(users).where(eq(users.id, userId));
  return u?.name ?? 'Unknown';
}

async function bathNameOf(tx: Tx, bathId: string | null): Promise<string | null> {
  if (!bathId) return null;
  const [b] = await tx.select({ name: baths.name }).from(baths).where(eq(baths.id, bathId));
  return b?.name ?? null;
}

/** Locks run `rawId` for a change in `tx`; 404 when the id is malformed, unknown or deleted. */
export async function lockLiveRun(tx: Tx, rawId: unknown): Promise<RunRow> {
  const parsed = runIdParam.safeParse(rawId);
  if (!parsed.success) throw new HttpError(404, 'not_found', `No run with id ${String(rawId)}.`);
  const [row] = await tx
    .select()
    .from(runs)
    .where(and(eq(runs.id, parsed.data), isNull(runs.deletedAt)))
    .for('update');
  if (!row) throw new HttpError(404, 'not_found', `No run with id ${parsed.data}.`);
  return row;
}

/** Engine input problems as 400s naming the field of the problem. */
function solveProblem(problem: unknown, prefix: string): unknown {
  try {
    return jsonSafe(solve(problem as Problem));
  } catch (e) {
    if (e instanceof EngineInputError) {
      const field = `${prefix}${e.field}`;
      const message = e.message.slice(e.field.length + 2);
      throw new HttpError(400, 'validation_failed', `${field}: ${message}`, [{ path: field, message }]);
    }
    throw e;
  }
}

/** Builds, calculates and stores a run in `tx` (the route and the demo seed both use it). */
export async function saveRun(tx: Tx, user: { id: string; name: string }, input: z.output<typeof runInputSchema>): Promise<Run> {
  const bathName = await bathNameOf(tx, input.bathId ?? null);
  if (input.bathId && bathName === null) throw unprocessable('bathId', 'there is no such bath');
  const revisions = await readRevisions(tx);
  const built = await buildFromLibrary(tx, input.system, revisions);
  const result = solveOrExplain(built, input.system.pH);
  const outcome = calculate(input.calculator, input.params, built, input.system.pH);
  const thresholds = await currentThresholds(tx, revisions);
  const hazards = calculationHazards(
    { calculator: input.calculator, system: input.system, params: input.params, problem: built.problem, outcome: { result: outcome.result }, base: solutionOf(result) },
    thresholds.values,
  );
  const id = randomUUID();
  const [row] = await tx
    .insert(runs)
    .values({
      id,
      title: input.title,
      calculator: input.calculator,
      inputs: { system: input.system, params: input.params, ...(input.bathId ? { bathId: input.bathId } : {}) },
      problem: built.problem,
      result,
      warnings: built.warnings,
      constantsUsed: built.constants,
      engineVersion: ENGINE_VERSION,
      status: outcome.status === 'converged' && result.status === 'converged' ? 'converged' : 'not_converged',
      usesDrafts: built.drafts.length > 0,
      authorId: user.id,
      bathId: input.bathId ?? null,
      verdict: outcome.verdict,
      output: outcome.result ?? null,
      hazards,
      thresholdsVersion: thresholds.version,
    })
    .returning();
  if (!row) throw new Error('run not stored');
  if (built.constants.length > 0) await tx.insert(runConstants).values(built.constants.map((c) => ({ runId: id, constantId: c.id })));
  await writeAudit(tx, {
    actor: user.id,
    action: 'run.saved',
    subject: `run:${id}`,
    payload: {
      calculator: input.calculator,
      bath: input.bathId ?? null,
      constants: built.constants.map((c) => c.id),
      drafts: built.drafts.map((c) => c.id),
      status: row.status,
      hazards: hazards.map((h) => h.rule),
    },
  });
  // Flagged work goes to the safety desk in the same transaction.
  if (isFlagged(hazards)) await openReview(tx, { subject: { kind: 'run', runId: id }, hazards, thresholdsVersion: thresholds.version, submittedBy: user.id });
  return runDetail(tx, row, user.name, bathName);
}

/** POST /solve, POST /calculations, POST /systems/build, and saved runs. */
export function runsRouter(ctx: AuthContext): Router {
  const router = Router();
  const db = ctx.db;

  router.post('/solve', signedIn, (req: Request, res: Response) => {
    const body: unknown = req.body;
    if (Array.isArray(body)) {
      if (body.length === 0 || body.length > SOLVE_BATCH_LIMIT) {
        throw new HttpError(400, 'validation_failed', `problems: send 1 to ${SOLVE_BATCH_LIMIT} problems in the array`, [{ path: '', message: `send 1 to ${SOLVE_BATCH_LIMIT} problems` }]);
      }
      res.json(body.map((p, i) => solveProblem(p, `${i}.`)));
      return;
    }
    if (typeof body !== 'object' || body === null) {
      throw new HttpError(400, 'validation_failed', 'problem: send a problem in the general form: {components, totals, fixed, species, solids, activity}', [{ path: '', message: 'send a problem object' }]);
    }
    res.json(solveProblem(body, ''));
  });

  router.post('/systems/build', signedIn, async (req: Request, res: Response) => {
    const request = systemRequestSchema.parse(req.body);
    res.json(await buildFromLibrary(db, request));
  });

  router.post('/calculations', signedIn, async (req: Request, res: Response) => {
    const request = calculationRequestSchema.parse(req.body);
    // One query for both the library's revision and the thresholds in force.
    const revisions = await readRevisions(db);
    const built = await buildFromLibrary(db, request.system, revisions);
    const run = calculate(request.calculator, request.params, built, request.system.pH);
    const thresholds = await currentThresholds(db, revisions);
    const hazards = calculationHazards({ calculator: request.calculator, system: request.system, params: request.params, problem: built.problem, outcome: { result: run.result } }, thresholds.values);
    res.json(output(calculationOutcomeSchema, { ...run, hazards }));
  });

  router.post('/runs', allow('chemist', 'technician'), async (req: Request, res: Response) => {
    const user = requireUser(res);
    const input = runInputSchema.parse(req.body);
    const run = await db.transaction((tx) => saveRun(tx, user, input));
    if (run.safety.review?.status === 'pending') await mailWaiting(ctx, req, run.safety.review.id);
    res.status(201).json(output(runSchema, run));
  });

  router.get('/runs', signedIn, async (req: Request, res: Response) => {
    const q = runQuerySchema.parse(req.query);
    const where: SQL[] = [isNull(runs.deletedAt)];
    if (q.bath) where.push(eq(runs.bathId, q.bath));
    if (q.calculator) where.push(eq(runs.calculator, q.calculator));
    if (q.author) where.push(eq(runs.authorId, q.author));
    if (q.from) where.push(gte(runs.createdAt, new Date(`${q.from}T00:00:00Z`)));
    if (q.to) where.push(lt(runs.createdAt, new Date(new Date(`${q.to}T00:00:00Z`).getTime() + 86_400_000)));
    const rows = await db
      .select({ run: runs, name: users.name, bathName: baths.name })
      .from(runs)
      .innerJoin(users, eq(users.id, runs.authorId))
      .leftJoin(baths, eq(baths.id, runs.bathId))
      .where(and(...where))
      .orderBy(desc(runs.createdAt))
      .limit(RUN_LIST_LIMIT);
    const ids = rows.map((r) => r.run.id);
    const [thresholds, reviews, released] = [await currentThresholds(db), await reviewsOfRuns(db, ids), await releasedRuns(db, ids)];
    res.json(
      output(
        runListSchema,
        rows.map((r) => summaryOf(r.run, r.name, r.bathName, { thresholds: thresholds.values, review: reviews.get(r.run.id) ?? null, released: released.has(r.run.id) })),
      ),
    );
  });

  router.get('/runs/:id', signedIn, async (req: Request, res: Response) => {
    const parsed = runIdParam.safeParse(req.params.id);
    if (!parsed.success) throw new HttpError(404, 'not_found', `No run with id ${String(req.params.id)}.`);
    const [row] = await db
      .select()
      .from(runs)
      .where(and(eq(runs.id, parsed.data), isNull(runs.deletedAt)));
    if (!row) throw new HttpError(404, 'not_found', `No run with id ${parsed.data}.`);
    res.json(output(runSchema, await runDetail(db, row, await nameOf(db, row.authorId), await bathNameOf(db, row.bathId))));
  });

  router.delete('/runs/:id', signedIn, async (req: Request, res: Response) => {
    const user = requireUser(res);
    await db.transaction(async (tx) => {
      const row = await lockLiveRun(tx, req.params.id);
      if (row.authorId !== user.id && !user.roles.includes('admin')) {
        throw new HttpError(403, 'forbidden', 'Only the author of a run, or an admin, can delete it.');
      }
      await tx.update(runs).set({ deletedAt: new Date(), deletedBy: user.id }).where(eq(runs.id, row.id));
      await writeAudit(tx, { actor: user.id, action: 'run.deleted', subject: `run:${row.id}`, payload: { title: row.title, calculator: row.calculator } });
    });
    res.status(204).end();
  });

  return router;
}
