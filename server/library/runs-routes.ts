// Building a system from the library, and saved runs: the server builds and solves again when a
// run is saved, so the stored result is authoritative; a run keeps the exact constant versions it
// used, whatever the library does later.
import { randomUUID } from 'node:crypto';

import { and, desc, eq, isNull } from 'drizzle-orm';
import { type Request, type Response, Router } from 'express';
import { z } from 'zod';

import { constants, runConstants, runs, type RunRow, users } from '@/db/schema';
import { CalculatorInputError } from '@/lib/calculators/errors';
import { ENGINE_VERSION } from '@/lib/engine';
import { BuildError, buildSystem, type BuildOutput } from '@/lib/library/build';
import { solveBuilt } from '@/lib/library/solve-built';
import { allow, requireUser, signedIn } from '@/server/auth/access';
import type { AuthContext } from '@/server/auth/context';
import { writeAudit } from '@/server/audit';
import { HttpError } from '@/server/http-error';
import { catalogueOf, libraryConstants, readLibrary, type Tx } from '@/server/library/store';
import {
  type ConstantStatus,
  type ConstantUse,
  type Run,
  runInputSchema,
  type RunSummary,
  systemRequestSchema,
  type SolveResultJson,
  type SystemRequest,
} from '@/shared/constants';

const RUN_LIST_LIMIT = 200;
const runIdParam = z.string().uuid();

/** Builds from the library as it is now in `tx`; a selection it cannot build is a 422 naming the field. */
export async function buildFromLibrary(tx: Tx, request: z.output<typeof systemRequestSchema>): Promise<BuildOutput> {
  const snap = await readLibrary(tx);
  try {
    return buildSystem(catalogueOf(snap), libraryConstants(snap), request);
  } catch (e) {
    if (e instanceof BuildError) throw new HttpError(422, 'validation_failed', `${e.field}: ${e.message}`, [{ path: e.field, message: e.message }]);
    throw e;
  }
}

/** Solves a built system; engine input problems come back as 422 naming the field. */
function solveOrExplain(built: BuildOutput, pH: number | undefined): SolveResultJson {
  try {
    const result = solveBuilt(built.problem, pH);
    return { ...result, warnings: [...built.warnings, ...result.warnings] };
  } catch (e) {
    if (e instanceof CalculatorInputError) throw new HttpError(422, 'validation_failed', `${e.field}: ${e.message}`, [{ path: e.field, message: e.message }]);
    throw e;
  }
}

function summaryOf(row: RunRow, authorName: string): RunSummary {
  return {
    id: row.id,
    title: row.title,
    calculator: row.calculator as RunSummary['calculator'],
    author: { id: row.authorId, name: authorName },
    createdAt: row.createdAt.toISOString(),
    status: row.status as RunSummary['status'],
    usesDrafts: row.usesDrafts,
  };
}

/** A run with, for each constant it used, what has become of that lineage since. */
async function runDetail(tx: Tx, row: RunRow, authorName: string): Promise<Run> {
  const used = row.constantsUsed as ConstantUse[];
  const lineageIds = [...new Set(used.map((c) => c.lineageId))];
  const now = lineageIds.length ? await tx.select().from(constants) : [];
  const byId = new Map(now.map((c) => [c.id, c]));
  const approvedByLineage = new Map(now.filter((c) => c.status === 'approved').map((c) => [c.lineageId, c]));
  return {
    ...summaryOf(row, authorName),
    inputs: row.inputs as Record<string, unknown>,
    problem: row.problem as Run['problem'],
    engineVersion: row.engineVersion,
    result: row.result as SolveResultJson,
    warnings: row.warnings as string[],
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

async function authorName(tx: Tx, id: string): Promise<string> {
  const [u] = await tx.select({ name: users.name }).from(users).where(eq(users.id, id));
  return u?.name ?? 'Unknown';
}

/** POST /systems/build, and saved runs. */
export function runsRouter(ctx: AuthContext): Router {
  const router = Router();
  const db = ctx.db;

  router.post('/systems/build', signedIn, async (req: Request, res: Response) => {
    const request = systemRequestSchema.parse(req.body);
    res.json(await buildFromLibrary(db, request));
  });

  router.post('/runs', allow('chemist', 'technician'), async (req: Request, res: Response) => {
    const user = requireUser(res);
    const input = runInputSchema.parse(req.body);
    const run = await db.transaction(async (tx) => {
      const built = await buildFromLibrary(tx, input.system);
      const result = solveOrExplain(built, input.system.pH);
      const id = randomUUID();
      const [row] = await tx
        .insert(runs)
        .values({
          id,
          title: input.title,
          calculator: input.calculator,
          inputs: input.system as SystemRequest as Record<string, unknown>,
          problem: built.problem,
          result,
          warnings: built.warnings,
          constantsUsed: built.constants,
          engineVersion: ENGINE_VERSION,
          status: result.status,
          usesDrafts: built.drafts.length > 0,
          authorId: user.id,
        })
        .returning();
      if (!row) throw new Error('run not stored');
      if (built.constants.length > 0) await tx.insert(runConstants).values(built.constants.map((c) => ({ runId: id, constantId: c.id })));
      await writeAudit(tx, {
        actor: user.id,
        action: 'run.saved',
        subject: `run:${id}`,
        payload: { calculator: input.calculator, constants: built.constants.map((c) => c.id), drafts: built.drafts.map((c) => c.id), status: result.status },
      });
      return runDetail(tx, row, user.name);
    });
    res.status(201).json(run);
  });

  router.get('/runs', signedIn, async (_req: Request, res: Response) => {
    const rows = await db
      .select({ run: runs, name: users.name })
      .from(runs)
      .innerJoin(users, eq(users.id, runs.authorId))
      .where(isNull(runs.deletedAt))
      .orderBy(desc(runs.createdAt))
      .limit(RUN_LIST_LIMIT);
    res.json(rows.map((r) => summaryOf(r.run, r.name)));
  });

  router.get('/runs/:id', signedIn, async (req: Request, res: Response) => {
    const parsed = runIdParam.safeParse(req.params.id);
    if (!parsed.success) throw new HttpError(404, 'not_found', `No run with id ${String(req.params.id)}.`);
    const [row] = await db
      .select()
      .from(runs)
      .where(and(eq(runs.id, parsed.data), isNull(runs.deletedAt)));
    if (!row) throw new HttpError(404, 'not_found', `No run with id ${parsed.data}.`);
    res.json(await runDetail(db, row, await authorName(db, row.authorId)));
  });

  return router;
}
