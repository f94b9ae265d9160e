import { sql } from 'drizzle-orm';
import { check, doublePrecision, index, integer, jsonb, pgTable, text, timestamp } from 'drizzle-orm/pg-core';

import { users } from './auth';

// Baths, their analysis log and their attachments. Nothing here is ever deleted: a bath is
// archived; analyses and attachments stay (triggers refuse DELETE). Concentrations are stored in
// mol/L; what was typed is kept beside them in `entered`.

export const baths = pgTable(
  'baths',
  {
    id: text('id').primaryKey(),
    name: text('name').notNull(),
    process: text('process').notNull(),
    status: text('status').notNull().default('active'),
    volume: doublePrecision('volume').notNull(),
    volumeUnit: text('volume_unit').notNull(),
    volumeL: doublePrecision('volume_l').notNull(),
    temperatureC: doublePrecision('temperature_c'),
    makeUp: jsonb('make_up').notNull().default(sql`'[]'::jsonb`),
    metal: text('metal').notNull(),
    ligand: text('ligand').notNull(),
    metalUnit: text('metal_unit').notNull(),
    ligandUnit: text('ligand_unit').notNull(),
    ligandAs: text('ligand_as').notNull(),
    carbonateAs: text('carbonate_as'),
    // In the bath's display units (pH as pH).
    targets: jsonb('targets').notNull(),
    site: text('site').notNull().default(''),
    ownerId: text('owner_id')
      .notNull()
      .references(() => users.id),
    notes: text('notes').notNull().default(''),
    createdBy: text('created_by')
      .notNull()
      .references(() => users.id),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
    archivedAt: timestamp('archived_at', { withTimezone: true }),
    archivedBy: text('archived_by').references(() => users.id),
  },
  (t) => [
    index('baths_status_idx').on(t.status),
    check('baths_status_known', sql`${t.status} in ('active', 'archived')`),
    check('baths_volume_positive', sql`${t.volume} > 0 and ${t.volumeL} > 0`),
  ],
);

export const analyses = pgTable(
  'analyses',
  {
    id: text('id').primaryKey(),
    bathId: text('bath_id')
      .notNull()
      .references(() => baths.id),
    sampledAt: timestamp('sampled_at', { withTimezone: true }).notNull(),
    analyst: text('analyst').notNull(),
    metalMolL: doublePrecision('metal_mol_l'),
    freeLigandMolL: doublePrecision('free_ligand_mol_l'),
    totalLigandMolL: doublePrecision('total_ligand_mol_l'),
    ph: doublePrecision('ph'),
    carbonateMolL: doublePrecision('carbonate_mol_l'),
    bromideMolL: doublePrecision('bromide_mol_l'),
    entered: jsonb('entered').notNull(),
    notes: text('notes').notNull().default(''),
    source: text('source').notNull(),
    enteredBy: text('entered_by')
      .notNull()
      .references(() => users.id),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('analyses_bath_sampled_idx').on(t.bathId, t.sampledAt), check('analyses_source_known', sql`${t.source} in ('manual', 'csv')`)],
);

export const attachments = pgTable(
  'attachments',
  {
    id: text('id').primaryKey(),
    bathId: text('bath_id')
      .notNull()
      .references(() => baths.id),
    title: text('title').notNull(),
    fileName: text('file_name').notNull(),
    contentType: text('content_type').notNull(),
    sizeBytes: integer('size_bytes').notNull(),
    sha256: text('sha256').notNull(),
    // File name under the uploads folder (never a path a person typed).
    storageKey: text('storage_key').notNull(),
    uploadedBy: text('uploaded_by')
      .notNull()
      .references(() => users.id),
    uploadedAt: timestamp('uploaded_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('attachments_bath_idx').on(t.bathId)],
);

export type BathRow = typeof baths.$inferSelect;
export type AnalysisRow = typeof analyses.$inferSelect;
export type AttachmentRow = typeof attachments.$inferSelect;
