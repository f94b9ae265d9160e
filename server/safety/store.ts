// The safety desk in the database: the thresholds in force, reviews with their events, run
// releases, and the hazards of a run or a bath as the rules find them. Every write goes through
// the caller's transaction, with its audit entry.
import { randomUUID } from 'node:crypto';

import { and, arrayContains, asc, desc, eq, inArray, sql } from 'drizzle-orm';

import type { Db } from '@/db/client';
import {
  analyses,
  baths,
  hazardThresholds,
  type ReviewRow,
  runReleases,
  type RunRow,
  runs,
  safetyReviewEvents,
  safetyReviews,
  users,
} from '@/db/schema';
import { bathHazards, calculationHazards, isFlagged } from '@/lib/hazards';
import { writeAudit } from '@/server/audit';
import { toAnalysis } from '@/server/baths/store';
import { HttpError } from '@/server/http-error';
import type { Tx } from '@/server/library/store';
import { readRevisions, type Revisions } from '@/server/revisions';
import type { Bath } from '@/shared/baths';
import type { CalculatorKey } from '@/shared/calculators';
import type { ProblemJson } from '@/shared/constants';
import { systemRequestSchema } from '@/shared/constants';
import {
  type Hazard,
  type HazardRule,
  hazardThresholdsSchema,
  type HazardThresholds,
  type Review,
  type ReviewAction,
  type ReviewBrief,
  type ReviewStatus,
  type ReviewSummary,
  type SafetyState,
  type ThresholdsVersion,
} from '@/shared/safety';

export type ThresholdsInForce = { version: number; values: HazardThresholds };

// Versions never change once stored (a trigger refuses it), so each is parsed once per database.
const thresholdsCache = new Map<string, ThresholdsInForce>();

/** The newest thresholds version (version 1, the defaults, always exists: migration 0010). */
export async function currentThresholds(tx: Tx, known?: Revisions): Promise<ThresholdsInForce> {
  // Every calculation asks: one small query (or none, when the caller read the revisions), the
  // values parsed only when the version is new.
  const revisions = known ?? (await readRevisions(tx));
  const row = revisions.thresholds;
  if (!row) throw new Error('no hazard thresholds stored (migration 0010 inserts version 1)');
  const key = `${revisions.database}|${row.version}`;
  const held = thresholdsCache.get(key);
  if (held) return held;
  const parsed = { version: row.version, values: hazardThresholdsSchema.parse(row.values) };
  if (thresholdsCache.size >= 64) thresholdsCache.clear();
  thresholdsCache.set(key, parsed);
  return parsed;
}

/** Every thresholds version, newest first. */
export async function thresholdsHistory(tx: Tx): Promise<ThresholdsVersion[]> {
  const rows = await tx.select({ t: hazardThresholds, name: users.name }).from(hazardThresholds).leftJoin(users, eq(users.id, hazardThresholds.createdBy)).orderBy(desc(hazardThresholds.version));
  return rows.map(({ t, name }) => ({
    version: t.version,
    values: hazardThresholdsSchema.parse(t.values),
    note: t.note,
    createdBy: t.createdBy ? { id: t.createdBy, name: name ?? 'Unknown' } : null,
    createdAt: t.createdAt.toISOString(),
  }));
}

/** Stores a new thresholds version (the next number) and audits what changed. */
export async function addThresholds(tx: Tx, user: { id: string }, values: HazardThresholds, note: string): Promise<number> {
  // One writer at a time, so two changes cannot take the same number.
  await tx.execute(sql`lock table hazard_thresholds in share row exclusive mode`);
  const before = await currentThresholds(tx);
  const version = before.version + 1;
  await tx.insert(hazardThresholds).values({ version, values, note, createdBy: user.id });
  const changed = Object.fromEntries(
    (Object.keys(values) as (keyof HazardThresholds)[]).filter((k) => values[k] !== before.values[k]).map((k) => [k, { from: before.values[k], to: values[k] }]),
  );
  await writeAudit(tx, { actor: user.id, action: 'safety.thresholds_changed', subject: `thresholds:${version}`, payload: { version, from: before.version, changes: changed, note } });
  return version;
}

/** The flag-level rules among the hazards, once each, in rule order. */
export function flagsOf(hazards: readonly Hazard[]): HazardRule[] {
  return [...new Set(hazards.filter((h) => h.flag).map((h) => h.rule))];
}

/** Opens a review on the desk with its "submitted" event and audit entry; returns its id. */
export async function openReview(
  tx: Tx,
  input: { subject: { kind: 'run'; runId: string } | { kind: 'bath'; bathId: string }; hazards: Hazard[]; thresholdsVersion: number; submittedBy: string },
): Promise<string> {
  const id = randomUUID();
  const flags = flagsOf(input.hazards);
  await tx.insert(safetyReviews).values({
    id,
    subjectKind: input.subject.kind,
    runId: input.subject.kind === 'run' ? input.subject.runId : null,
    bathId: input.subject.kind === 'bath' ? input.subject.bathId : null,
    hazards: input.hazards,
    flags,
    thresholdsVersion: input.thresholdsVersion,
    submittedBy: input.submittedBy,
  });
  await tx.insert(safetyReviewEvents).values({ reviewId: id, action: 'submitted', actorId: input.submittedBy, note: null });
  const subject = input.subject.kind === 'run' ? `run:${input.subject.runId}` : `bath:${input.subject.bathId}`;
  await writeAudit(tx, { actor: input.submittedBy, action: 'safety.submitted', subject: `review:${id}`, payload: { subject, flags, thresholdsVersion: input.thresholdsVersion } });
  return id;
}

/** The hazards of a saved run: as stored, or (runs saved before the rules) evaluated now. */
export function runHazards(row: RunRow, thresholds: HazardThresholds): Hazard[] {
  if (Array.isArray(row.hazards)) return row.hazards as Hazard[];
  const inputs = row.inputs as { system?: unknown; params?: unknown };
  const system = systemRequestSchema.safeParse(inputs.system ?? {});
  if (!system.success) return [];
  try {
    return calculationHazards(
      { calculator: row.calculator as CalculatorKey, system: system.data, params: inputs.params ?? {}, problem: row.problem as ProblemJson, outcome: { result: row.output } },
      thresholds,
    );
  } catch {
    return [];
  }
}

type Names = Map<string, string>;

async function peopleNames(tx: Tx, ids: readonly (string | null)[]): Promise<Names> {
  const wanted = [...new Set(ids.filter((x): x is string => !!x))];
  if (wanted.length === 0) return new Map();
  const rows = await tx.select({ id: users.id, name: users.name }).from(users).where(inArray(users.id, wanted));
  return new Map(rows.map((r) => [r.id, r.name]));
}

const person = (id: string, names: Names) => ({ id, name: names.get(id) ?? 'Unknown' });

/** A run's title as the desk shows it; a run deleted since it was flagged says so. */
function runTitleOf(run: { title: string; deletedAt: Date | null } | undefined): string {
  if (!run) return '';
  return run.deletedAt ? `${run.title.trim() || 'Untitled run'} (deleted)` : run.title;
}

/** Review rows as summaries, with people's names and the subject's title. */
export async function reviewSummaries(tx: Tx, rows: readonly ReviewRow[]): Promise<ReviewSummary[]> {
  if (rows.length === 0) return [];
  const names = await peopleNames(tx, rows.flatMap((r) => [r.submittedBy, r.decidedBy]));
  const runIds = rows.flatMap((r) => (r.runId ? [r.runId] : []));
  const bathIds = rows.flatMap((r) => (r.bathId ? [r.bathId] : []));
  const runRows = runIds.length
    ? await tx.select({ id: runs.id, title: runs.title, calculator: runs.calculator, deletedAt: runs.deletedAt }).from(runs).where(inArray(runs.id, runIds))
    : [];
  const bathRows = bathIds.length ? await tx.select({ id: baths.id, name: baths.name, process: baths.process }).from(baths).where(inArray(baths.id, bathIds)) : [];
  const runBy = new Map(runRows.map((r) => [r.id, r]));
  const bathBy = new Map(bathRows.map((b) => [b.id, b]));
  return rows.map((r) => {
    const subject: ReviewSummary['subject'] = r.runId
      ? { kind: 'run', id: r.runId, title: runTitleOf(runBy.get(r.runId)), calculator: runBy.get(r.runId)?.calculator ?? '' }
      : { kind: 'bath', id: r.bathId ?? '', title: bathBy.get(r.bathId ?? '')?.name ?? 'Unknown bath', process: bathBy.get(r.bathId ?? '')?.process ?? '' };
    return {
      id: r.id,
      subject,
      status: r.status as ReviewStatus,
      flags: r.flags as HazardRule[],
      submittedBy: person(r.submittedBy, names),
      submittedAt: r.submittedAt.toISOString(),
      decidedBy: r.decidedBy ? person(r.decidedBy, names) : null,
      decidedAt: r.decidedAt?.toISOString() ?? null,
      conditions: r.conditions,
      note: r.note,
    };
  });
}

/** A review with its hazards and every event, or 404. */
export async function reviewDetail(tx: Tx, id: string): Promise<{ review: Review; row: ReviewRow }> {
  const [row] = await tx.select().from(safetyReviews).where(eq(safetyReviews.id, id));
  if (!row) throw new HttpError(404, 'not_found', `No safety review with id ${id}.`);
  const [summary] = await reviewSummaries(tx, [row]);
  const events = await tx.select().from(safetyReviewEvents).where(eq(safetyReviewEvents.reviewId, id)).orderBy(asc(safetyReviewEvents.at), asc(safetyReviewEvents.id));
  const names = await peopleNames(tx, events.map((e) => e.actorId));
  return {
    row,
    review: {
      ...(summary as ReviewSummary),
      hazards: row.hazards as Hazard[],
      thresholdsVersion: row.thresholdsVersion,
      events: events.map((e) => ({ action: e.action as ReviewAction, actor: person(e.actorId, names), at: e.at.toISOString(), note: e.note })),
    },
  };
}

/** The review of a run, if it has one. */
export async function reviewOfRun(tx: Tx, runId: string): Promise<ReviewSummary | null> {
  const rows = await tx.select().from(safetyReviews).where(eq(safetyReviews.runId, runId));
  return (await reviewSummaries(tx, rows))[0] ?? null;
}

/** The latest review of a bath, if it has one. */
export async function latestReviewOfBath(tx: Tx, bathId: string): Promise<ReviewRow | null> {
  const [row] = await tx.select().from(safetyReviews).where(eq(safetyReviews.bathId, bathId)).orderBy(desc(safetyReviews.submittedAt)).limit(1);
  return row ?? null;
}

/** The latest review of each of these baths, by bath id (for lists: one query). */
export async function latestReviewsOfBaths(tx: Pick<Db, 'selectDistinctOn'>, bathIds: readonly string[]): Promise<Map<string, ReviewBrief>> {
  if (bathIds.length === 0) return new Map();
  const rows = await tx
    .selectDistinctOn([safetyReviews.bathId], { bathId: safetyReviews.bathId, id: safetyReviews.id, status: safetyReviews.status })
    .from(safetyReviews)
    .where(inArray(safetyReviews.bathId, [...bathIds]))
    .orderBy(safetyReviews.bathId, desc(safetyReviews.submittedAt));
  return new Map(rows.map((r) => [r.bathId ?? '', { id: r.id, status: r.status as ReviewStatus }]));
}

/** A run's hazards, its review and its release. */
export async function runSafety(tx: Tx, row: RunRow, thresholds?: HazardThresholds): Promise<SafetyState> {
  const hazards = runHazards(row, thresholds ?? (await currentThresholds(tx)).values);
  const review = await reviewOfRun(tx, row.id);
  const [release] = await tx.select({ r: runReleases, name: users.name }).from(runReleases).innerJoin(users, eq(users.id, runReleases.releasedBy)).where(eq(runReleases.runId, row.id));
  return {
    hazards,
    flagged: isFlagged(hazards),
    review,
    released: release ? { by: { id: release.r.releasedBy, name: release.name }, at: release.r.releasedAt.toISOString(), note: release.r.note } : null,
  };
}

/** Reviews of many runs at once (for lists), by run id. */
export async function reviewsOfRuns(tx: Tx, runIds: readonly string[]): Promise<Map<string, ReviewRow>> {
  if (runIds.length === 0) return new Map();
  const rows = await tx.select().from(safetyReviews).where(inArray(safetyReviews.runId, [...runIds]));
  return new Map(rows.map((r) => [r.runId ?? '', r]));
}

/** Run ids among these that were released. */
export async function releasedRuns(tx: Tx, runIds: readonly string[]): Promise<Set<string>> {
  if (runIds.length === 0) return new Set();
  const rows = await tx.select({ id: runReleases.runId }).from(runReleases).where(inArray(runReleases.runId, [...runIds]));
  return new Set(rows.map((r) => r.id));
}

/** The bath's latest analysis (by sampling time, as lib/baths/prefill.ts takes it), as a list of at most one: the rules read nothing older. */
async function latestAnalysisOf(tx: Tx, bath: Bath): Promise<ReturnType<typeof toAnalysis>[]> {
  const rows = await tx.select().from(analyses).where(eq(analyses.bathId, bath.id)).orderBy(desc(analyses.sampledAt), desc(analyses.createdAt)).limit(1);
  return rows.map((a) => toAnalysis(a, bath, new Map()));
}

/** A bath's hazards from its latest analysis (or as `checkBath` just found them), with its latest review. */
export async function bathSafety(tx: Tx, bath: Bath, known?: Hazard[]): Promise<SafetyState> {
  const hazards = known ?? safeBathHazards(bath, await latestAnalysisOf(tx, bath), (await currentThresholds(tx)).values);
  const latest = await latestReviewOfBath(tx, bath.id);
  const [review] = latest ? await reviewSummaries(tx, [latest]) : [];
  return { hazards, flagged: isFlagged(hazards), review: review ?? null, released: null };
}

export function safeBathHazards(bath: Bath, list: Parameters<typeof bathHazards>[1], thresholds: HazardThresholds): Hazard[] {
  try {
    return bathHazards(bath, list, thresholds);
  } catch {
    return [];
  }
}

/**
 * After a bath is created, edited or analysed: when a flag-level rule fires and its last review
 * does not already cover the same rules (pending, signed off, or sent back and not yet
 * resubmitted), a new review is opened. Returns the hazards found (for bathSafety) and the new
 * review's id, or null.
 */
export async function checkBath(tx: Tx, bath: Bath, userId: string): Promise<{ hazards: Hazard[]; opened: string | null }> {
  // One check per bath at a time, so two analyses saved together open one review.
  await tx.execute(sql`select id from baths where id = ${bath.id} for update`);
  const thresholds = await currentThresholds(tx);
  const hazards = safeBathHazards(bath, await latestAnalysisOf(tx, bath), thresholds.values);
  const flags = flagsOf(hazards);
  if (flags.length === 0) return { hazards, opened: null };
  const latest = await latestReviewOfBath(tx, bath.id);
  if (latest && (latest.status === 'pending' || flags.every((f) => latest.flags.includes(f)))) return { hazards, opened: null };
  const opened = await openReview(tx, { subject: { kind: 'bath', bathId: bath.id }, hazards, thresholdsVersion: thresholds.version, submittedBy: userId });
  return { hazards, opened };
}

/** Active people with the safety role (whom the desk's mail goes to). */
export async function safetyOfficers(tx: Tx): Promise<{ id: string; name: string; email: string }[]> {
  return tx
    .select({ id: users.id, name: users.name, email: users.email })
    .from(users)
    .where(and(eq(users.active, true), arrayContains(users.roles, ['safety'])));
}

/** The person with this id (for mail), or null. */
export async function personOf(tx: Tx, id: string): Promise<{ id: string; name: string; email: string; active: boolean } | null> {
  const [u] = await tx.select({ id: users.id, name: users.name, email: users.email, active: users.active }).from(users).where(eq(users.id, id));
  return u ?? null;
}
