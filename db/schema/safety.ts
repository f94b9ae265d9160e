import { sql } from 'drizzle-orm';
import { check, index, integer, jsonb, pgTable, serial, text, timestamp, uniqueIndex } from 'drizzle-orm/pg-core';

import { users } from './auth';
import { baths } from './baths';
import { runs } from './library';

// The shop's hazard thresholds (versioned: a change is a new row, never an update) and the safety
// desk: one review per flagged run or bath state, with every step kept as an event. Releases of
// runs are rows of their own. Triggers (migration 0010) refuse UPDATE and DELETE where the rows
// are history; a review's own row moves only its status and decision columns.

export const hazardThresholds = pgTable('hazard_thresholds', {
  version: integer('version').primaryKey(),
  values: jsonb('values').notNull(),
  note: text('note').notNull(),
  // null: the built-in defaults (version 1).
  createdBy: text('created_by').references(() => users.id),
  createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
});

export const safetyReviews = pgTable(
  'safety_reviews',
  {
    id: text('id').primaryKey(),
    subjectKind: text('subject_kind').notNull(),
    runId: text('run_id').references(() => runs.id),
    bathId: text('bath_id').references(() => baths.id),
    // The hazards found when the review was opened or last resubmitted (lib/hazards, JSON).
    hazards: jsonb('hazards').notNull(),
    flags: text('flags').array().notNull(),
    thresholdsVersion: integer('thresholds_version')
      .notNull()
      .references(() => hazardThresholds.version),
    status: text('status').notNull().default('pending'),
    submittedBy: text('submitted_by')
      .notNull()
      .references(() => users.id),
    submittedAt: timestamp('submitted_at', { withTimezone: true }).notNull().defaultNow(),
    decidedBy: text('decided_by').references(() => users.id),
    decidedAt: timestamp('decided_at', { withTimezone: true }),
    conditions: text('conditions'),
    note: text('note'),
  },
  (t) => [
    index('safety_reviews_status_idx').on(t.status),
    index('safety_reviews_run_idx').on(t.runId),
    index('safety_reviews_bath_idx').on(t.bathId),
    check('safety_reviews_status_known', sql`${t.status} in ('pending', 'signed_off', 'sent_back')`),
    check(
      'safety_reviews_one_subject',
      sql`(${t.subjectKind} = 'run' and ${t.runId} is not null and ${t.bathId} is null) or (${t.subjectKind} = 'bath' and ${t.bathId} is not null and ${t.runId} is null)`,
    ),
    // A run has one review; a bath may have many over time, but one open at once.
    uniqueIndex('safety_reviews_one_per_run').on(t.runId).where(sql`${t.runId} is not null`),
    uniqueIndex('safety_reviews_one_open_per_bath').on(t.bathId).where(sql`${t.bathId} is not null and ${t.status} = 'pending'`),
  ],
);

export const safetyReviewEvents = pgTable(
  'safety_review_events',
  {
    id: serial('id').primaryKey(),
    reviewId: text('review_id')
      .notNull()
      .references(() => safetyReviews.id),
    action: text('action').notNull(),
    actorId: text('actor_id')
      .notNull()
      .references(() => users.id),
    note: text('note'),
    at: timestamp('at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('safety_review_events_review_idx').on(t.reviewId), check('safety_review_events_action_known', sql`${t.action} in ('submitted', 'signed_off', 'sent_back', 'resubmitted')`)],
);

export const runReleases = pgTable('run_releases', {
  runId: text('run_id')
    .primaryKey()
    .references(() => runs.id),
  releasedBy: text('released_by')
    .notNull()
    .references(() => users.id),
  note: text('note').notNull().default(''),
  releasedAt: timestamp('released_at', { withTimezone: true }).notNull().defaultNow(),
});

export type ThresholdsRow = typeof hazardThresholds.$inferSelect;
export type ReviewRow = typeof safetyReviews.$inferSelect;
export type ReviewEventRow = typeof safetyReviewEvents.$inferSelect;
