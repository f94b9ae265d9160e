import { sql } from 'drizzle-orm';
import {
  type AnyPgColumn,
  bigint,
  boolean,
  check,
  doublePrecision,
  index,
  integer,
  jsonb,
  numeric,
  pgTable,
  primaryKey,
  serial,
  text,
  timestamp,
  uniqueIndex,
} from 'drizzle-orm/pg-core';

import { users } from './auth';
import { baths } from './baths';

// The constants library and the runs that use it. A constant row is one version of a lineage
// (the same reaction over time); its values never change after insert (a trigger refuses it):
// a revision is a new row naming the row it replaces. Only the review columns and the status
// move, and only forward: draft -> approved | rejected, approved -> retired.

const ROLE_CHECK = sql`'{metal,ligand,proton,water,counter_ion,complex,solid,salt}'::text[]`;

export const species = pgTable(
  'species',
  {
    id: serial('id').primaryKey(),
    // As written in reactions: "Ag(NH3)2+", "S2O3-2", "AgCl(s)".
    formula: text('formula').notNull(),
    name: text('name').notNull(),
    charge: integer('charge').notNull(),
    // g/mol from IUPAC standard atomic weights (lib/units), computed from the formula on insert.
    molarMass: numeric('molar_mass', { precision: 14, scale: 5 }).notNull(),
    role: text('role').notNull(),
    aliases: text('aliases').array().notNull().default(sql`'{}'::text[]`),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [uniqueIndex('species_formula_idx').on(t.formula), check('species_role_known', sql`${t.role} = any(${ROLE_CHECK})`)],
);

export const constants = pgTable(
  'constants',
  {
    id: serial('id').primaryKey(),
    lineageId: text('lineage_id').notNull(),
    version: integer('version').notNull(),
    replacesId: integer('replaces_id').references((): AnyPgColumn => constants.id),
    kind: text('kind').notNull(),
    // The readable equation, and the same with terms sorted (one reaction, however typed).
    reaction: text('reaction').notNull(),
    reactionKey: text('reaction_key').notNull(),
    definesSpeciesId: integer('defines_species_id')
      .notNull()
      .references(() => species.id),
    logValue: doublePrecision('log_value').notNull(),
    uncertainty: doublePrecision('uncertainty'),
    temperatureC: doublePrecision('temperature_c').notNull().default(25),
    ionicStrength: doublePrecision('ionic_strength').notNull().default(0),
    medium: text('medium').notNull().default(''),
    enthalpyKjMol: doublePrecision('enthalpy_kj_mol'),
    source: text('source').notNull(),
    note: text('note').notNull().default(''),
    status: text('status').notNull(),
    // Null for the seeded starting library (proposed by the seed, not a person).
    proposedBy: text('proposed_by').references(() => users.id),
    proposedAt: timestamp('proposed_at', { withTimezone: true }).notNull().defaultNow(),
    reviewedBy: text('reviewed_by').references(() => users.id),
    reviewedAt: timestamp('reviewed_at', { withTimezone: true }),
    reviewNote: text('review_note'),
    retiredBy: text('retired_by').references(() => users.id),
    retiredAt: timestamp('retired_at', { withTimezone: true }),
    retireNote: text('retire_note'),
  },
  (t) => [
    uniqueIndex('constants_lineage_version_idx').on(t.lineageId, t.version),
    // One approved version per lineage, one approved constant per defined species, one draft per lineage.
    uniqueIndex('constants_one_approved_per_lineage').on(t.lineageId).where(sql`${t.status} = 'approved'`),
    uniqueIndex('constants_one_approved_per_species').on(t.definesSpeciesId).where(sql`${t.status} = 'approved'`),
    uniqueIndex('constants_one_draft_per_lineage').on(t.lineageId).where(sql`${t.status} = 'draft' and ${t.replacesId} is not null`),
    index('constants_status_idx').on(t.status),
    check('constants_kind_known', sql`${t.kind} in ('solubility_product', 'cumulative_formation', 'stepwise_formation', 'protonation')`),
    check('constants_status_known', sql`${t.status} in ('draft', 'approved', 'rejected', 'retired')`),
    check('constants_version_positive', sql`${t.version} >= 1`),
    check('constants_log_finite', sql`${t.logValue} between -80 and 80`),
  ],
);

export const constantTerms = pgTable(
  'constant_terms',
  {
    constantId: integer('constant_id')
      .notNull()
      .references(() => constants.id),
    speciesId: integer('species_id')
      .notNull()
      .references(() => species.id),
    // Products positive, reactants negative.
    coefficient: doublePrecision('coefficient').notNull(),
    position: integer('position').notNull(),
  },
  (t) => [primaryKey({ columns: [t.constantId, t.speciesId] }), check('constant_terms_nonzero', sql`${t.coefficient} <> 0`)],
);

// One row whose revision goes up, in the same transaction, with every statement that changes
// species, constants or constant_terms (statement triggers, migration 0012). The server keeps the
// builder's view of the library in memory and checks it against this number on each calculation.
export const libraryRevision = pgTable(
  'library_revision',
  {
    id: integer('id').primaryKey(),
    revision: bigint('revision', { mode: 'number' }).notNull(),
  },
  (t) => [check('library_revision_one_row', sql`${t.id} = 1`)],
);

export const runs = pgTable(
  'runs',
  {
    id: text('id').primaryKey(),
    title: text('title').notNull().default(''),
    calculator: text('calculator').notNull(),
    inputs: jsonb('inputs').notNull(),
    problem: jsonb('problem').notNull(),
    result: jsonb('result').notNull(),
    warnings: jsonb('warnings').notNull().default(sql`'[]'::jsonb`),
    // The constant versions used, as they were (also linked row by row in run_constants).
    constantsUsed: jsonb('constants_used').notNull(),
    engineVersion: text('engine_version').notNull(),
    status: text('status').notNull(),
    usesDrafts: boolean('uses_drafts').notNull().default(false),
    authorId: text('author_id')
      .notNull()
      .references(() => users.id),
    bathId: text('bath_id').references(() => baths.id),
    // The one-line answer, and the calculator's own result (JSON-safe).
    verdict: text('verdict').notNull().default(''),
    output: jsonb('output'),
    // The hazard rules' findings when saved (lib/hazards) and the thresholds version used; null
    // for runs saved before the rules existed (they are evaluated when read).
    hazards: jsonb('hazards'),
    thresholdsVersion: integer('thresholds_version'),
    deletedBy: text('deleted_by').references(() => users.id),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    deletedAt: timestamp('deleted_at', { withTimezone: true }),
  },
  (t) => [index('runs_created_idx').on(t.createdAt), index('runs_author_idx').on(t.authorId), index('runs_bath_idx').on(t.bathId)],
);

export const runConstants = pgTable(
  'run_constants',
  {
    runId: text('run_id')
      .notNull()
      .references(() => runs.id),
    constantId: integer('constant_id')
      .notNull()
      .references(() => constants.id),
  },
  (t) => [primaryKey({ columns: [t.runId, t.constantId] })],
);

export type SpeciesRow = typeof species.$inferSelect;
export type ConstantRow = typeof constants.$inferSelect;
export type RunRow = typeof runs.$inferSelect;
