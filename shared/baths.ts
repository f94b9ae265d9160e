import { z } from 'zod';

import { personRefSchema } from './people';
import { hazardBriefSchema, reviewBriefSchema, safetyStateSchema } from './safety';

// Baths, their analysis log and attachments: request and response shapes shared by the client and
// the server. Routes (all under /api):
//   GET    /baths?q=&process=&status=                    (signed in)  -> BathSummary[]
//   POST   /baths                              (chemist, technician) BathInput -> 201 Bath
//   GET    /baths/:id                                    (signed in)  -> Bath
//   PATCH  /baths/:id                          (chemist, technician) BathInput (any subset) -> Bath
//   POST   /baths/:id/archive                  (admin)                -> Bath (status archived)
//   POST   /baths/:id/restore                  (admin)                -> Bath (status active)
//   GET    /baths/:id/analyses                           (signed in)  -> Analysis[] (oldest first)
//   POST   /baths/:id/analyses                 (chemist, technician) AnalysisInput -> 201 Analysis
//   POST   /baths/:id/analyses/import          (chemist, technician) multipart: file (CSV), mode -> AnalysisImportReport
//   GET    /baths/:id/attachments                        (signed in)  -> Attachment[] (newest first)
//   POST   /baths/:id/attachments              (chemist, technician) multipart: file (PDF, PNG, JPEG), title -> 201 Attachment
//   GET    /baths/:id/attachments/:attachmentId          (signed in)  -> the file (download)
//
// Concentrations are stored in mol/L (of the metal, of the ligand, of carbonate, of bromide) and
// shown in the bath's units. Mass units count the metal as the element (g/L of Ag) and the ligand
// as the bath's `ligandAs` salt (free cyanide as g/L NaCN, as shops titrate it; common practice).

/** Bath processes with the metal and ligand each one holds. */
export const PROCESSES = [
  'cyanide_silver_plate',
  'silver_strike',
  'cyanide_copper',
  'cyanide_zinc',
  'gold_strike',
  'thiosulfate_fixer',
  'ammoniacal_silver',
  'ammoniacal_copper',
] as const;
export type Process = (typeof PROCESSES)[number];

/** Concentration units a bath may be shown and entered in (lib/units). */
export const BATH_UNITS = ['mol/L', 'mmol/L', 'g/L', 'mg/L', 'troy oz/gal', 'oz/gal'] as const;
export type BathUnit = (typeof BATH_UNITS)[number];

/** Quantities an analysis may hold. */
export const QUANTITIES = ['metal', 'freeLigand', 'totalLigand', 'pH', 'carbonate', 'bromide'] as const;
export type Quantity = (typeof QUANTITIES)[number];

/** Salts a ligand may be stated as, per ligand (one ligand per formula unit each). */
export const LIGAND_AS: Record<string, readonly string[]> = {
  'CN-': ['NaCN', 'KCN'],
  'S2O3-2': ['(NH4)2S2O3', 'Na2S2O3', 'Na2S2O3·5H2O'],
  NH3: ['NH3'],
};

export interface ProcessInfo {
  label: string;
  metal: string;
  ligand: string;
  /** Default salt the free and total ligand are stated as. */
  ligandAs: string;
  /** Extra quantities this process logs (carbonate builds up in cyanide baths; bromide in fixers). */
  extras: readonly ('carbonate' | 'bromide')[];
  /** Carbonate stated as this salt (mass units). */
  carbonateAs?: 'K2CO3' | 'Na2CO3';
  /** Default display units. */
  metalUnit: BathUnit;
  ligandUnit: BathUnit;
}

// Typical expressions of the trade (common practice): precious metal in troy oz/gal or g/L, free
// cyanide as the salt the bath is made with, fixer thiosulfate as the ammonium salt.
export const PROCESS_INFO: Record<Process, ProcessInfo> = {
  cyanide_silver_plate: { label: 'Cyanide silver plate', metal: 'Ag+', ligand: 'CN-', ligandAs: 'KCN', extras: ['carbonate'], carbonateAs: 'K2CO3', metalUnit: 'g/L', ligandUnit: 'g/L' },
  silver_strike: { label: 'Silver strike', metal: 'Ag+', ligand: 'CN-', ligandAs: 'KCN', extras: ['carbonate'], carbonateAs: 'K2CO3', metalUnit: 'g/L', ligandUnit: 'g/L' },
  cyanide_copper: { label: 'Cyanide copper', metal: 'Cu+', ligand: 'CN-', ligandAs: 'NaCN', extras: ['carbonate'], carbonateAs: 'Na2CO3', metalUnit: 'g/L', ligandUnit: 'g/L' },
  cyanide_zinc: { label: 'Cyanide zinc', metal: 'Zn+2', ligand: 'CN-', ligandAs: 'NaCN', extras: ['carbonate'], carbonateAs: 'Na2CO3', metalUnit: 'g/L', ligandUnit: 'g/L' },
  gold_strike: { label: 'Gold strike', metal: 'Au+', ligand: 'CN-', ligandAs: 'KCN', extras: [], metalUnit: 'g/L', ligandUnit: 'g/L' },
  thiosulfate_fixer: { label: 'Thiosulfate fixer', metal: 'Ag+', ligand: 'S2O3-2', ligandAs: '(NH4)2S2O3', extras: ['bromide'], metalUnit: 'g/L', ligandUnit: 'g/L' },
  ammoniacal_silver: { label: 'Ammoniacal silver solution', metal: 'Ag+', ligand: 'NH3', ligandAs: 'NH3', extras: [], metalUnit: 'g/L', ligandUnit: 'g/L' },
  ammoniacal_copper: { label: 'Ammoniacal copper solution', metal: 'Cu+2', ligand: 'NH3', ligandAs: 'NH3', extras: [], metalUnit: 'g/L', ligandUnit: 'g/L' },
};

export const BATH_STATUSES = ['active', 'archived'] as const;
export type BathStatus = (typeof BATH_STATUSES)[number];

const finite = (what: string) => z.number({ error: `enter ${what} as a number` }).refine(Number.isFinite, 'must be a finite number');

/** A target range in the bath's units; either end may be open. */
export const rangeSchema = z
  .object({
    min: finite('the lower limit').min(0, 'cannot be negative').nullable().default(null),
    max: finite('the upper limit').min(0, 'cannot be negative').nullable().default(null),
  })
  .refine((r) => r.min === null || r.max === null || r.min <= r.max, { path: ['max'], message: 'must not be below the lower limit' });
export type Range = z.infer<typeof rangeSchema>;

const phRangeSchema = z
  .object({
    min: finite('the lower pH').min(-2, 'must be at least -2').max(16, 'must be at most 16').nullable().default(null),
    max: finite('the upper pH').min(-2, 'must be at least -2').max(16, 'must be at most 16').nullable().default(null),
  })
  .refine((r) => r.min === null || r.max === null || r.min <= r.max, { path: ['max'], message: 'must not be below the lower limit' });

export const targetsSchema = z.object({
  metal: rangeSchema.default({ min: null, max: null }),
  freeLigand: rangeSchema.default({ min: null, max: null }),
  pH: phRangeSchema.default({ min: null, max: null }),
});
export type Targets = z.infer<typeof targetsSchema>;

export const MAKE_UP_UNITS = ['g/L', 'oz/gal', 'mL/L'] as const;
export const makeUpLineSchema = z.object({
  /** A formula ("KCN", "Na2S2O3·5H2O") or a catalogue name. */
  salt: z.string({ error: 'name the salt' }).trim().min(1, 'name the salt').max(60, 'must be at most 60 characters'),
  amount: finite('the amount').gt(0, 'must be more than 0').max(2000, 'must be at most 2000'),
  unit: z.enum(MAKE_UP_UNITS, { error: `must be one of ${MAKE_UP_UNITS.join(', ')}` }),
});
export type MakeUpLine = z.infer<typeof makeUpLineSchema>;

export const VOLUME_UNITS = ['L', 'gal'] as const;

export const bathInputSchema = z.object({
  name: z.string({ error: 'enter a name' }).trim().min(1, 'enter a name').max(100, 'must be at most 100 characters'),
  process: z.enum(PROCESSES, { error: `choose a process (${PROCESSES.join(', ')})` }),
  /** Tank volume in `volumeUnit`. */
  volume: finite('the tank volume').gt(0, 'must be more than 0').max(1_000_000, 'must be at most 1,000,000'),
  volumeUnit: z.enum(VOLUME_UNITS, { error: 'must be L or gal' }).default('L'),
  temperatureC: finite('the temperature in °C').min(0, 'must be at least 0 °C').max(100, 'must be at most 100 °C').nullable().default(null),
  makeUp: z.array(makeUpLineSchema).max(20, 'at most 20 lines').default([]),
  /** Display and entry units. */
  metalUnit: z.enum(BATH_UNITS, { error: `must be one of ${BATH_UNITS.join(', ')}` }).optional(),
  ligandUnit: z.enum(BATH_UNITS, { error: `must be one of ${BATH_UNITS.join(', ')}` }).optional(),
  /** Salt the ligand is stated as (LIGAND_AS of the process's ligand); default from the process. */
  ligandAs: z.string().trim().max(40).optional(),
  targets: targetsSchema.default({ metal: { min: null, max: null }, freeLigand: { min: null, max: null }, pH: { min: null, max: null } }),
  site: z.string().trim().max(100, 'must be at most 100 characters').default(''),
  /** The person who answers for the bath; default the creator. */
  ownerId: z.string().uuid('is not a person on the team').optional(),
  notes: z.string().trim().max(2000, 'must be at most 2000 characters').default(''),
});
export type BathInput = z.input<typeof bathInputSchema>;
/** PATCH: any subset of the fields. */
export const bathPatchSchema = bathInputSchema.partial().refine((v) => Object.keys(v).length > 0, 'change at least one field');

/** One value of the latest analysis that lies outside its target range. */
export const outOfRangeSchema = z.object({
  quantity: z.enum(QUANTITIES),
  value: z.number(),
  /** "below" or "above" the range. */
  side: z.enum(['below', 'above']),
});

export const bathSchema = z.object({
  id: z.string(),
  name: z.string(),
  process: z.enum(PROCESSES),
  status: z.enum(BATH_STATUSES),
  volume: z.number(),
  volumeUnit: z.enum(VOLUME_UNITS),
  /** The volume in litres whatever it was entered in. */
  volumeL: z.number(),
  temperatureC: z.number().nullable(),
  makeUp: z.array(makeUpLineSchema),
  metal: z.string(),
  ligand: z.string(),
  metalUnit: z.enum(BATH_UNITS),
  ligandUnit: z.enum(BATH_UNITS),
  ligandAs: z.string(),
  carbonateAs: z.string().nullable(),
  extras: z.array(z.enum(['carbonate', 'bromide'])),
  targets: targetsSchema,
  site: z.string(),
  owner: personRefSchema,
  notes: z.string(),
  createdBy: personRefSchema,
  createdAt: z.string(),
  updatedAt: z.string(),
  archivedAt: z.string().nullable(),
  /** The hazard rules on the latest analysis and the bath's latest safety review (single-bath answers). */
  safety: safetyStateSchema.optional(),
});
export type Bath = z.infer<typeof bathSchema>;

export const bathSummarySchema = bathSchema.extend({
  analysisCount: z.number(),
  lastAnalysisAt: z.string().nullable(),
  /** Whole days since the last analysis (null when none). */
  lastAnalysisAgeDays: z.number().nullable(),
  /** Values of the latest analysis outside their target ranges, in the bath's units. */
  outOfRange: z.array(outOfRangeSchema),
  /** What the hazard rules find on the latest analysis, as chips, and the latest safety review. */
  hazards: z.array(hazardBriefSchema),
  review: reviewBriefSchema.nullable(),
});
export type BathSummary = z.infer<typeof bathSummarySchema>;
export const bathListSchema = z.array(bathSummarySchema);

export const bathQuerySchema = z.object({
  q: z.string().trim().max(100, 'must be at most 100 characters').optional(),
  process: z.enum(PROCESSES, { error: `must be one of ${PROCESSES.join(', ')}` }).optional(),
  status: z.enum([...BATH_STATUSES, 'all'], { error: 'must be active, archived or all' }).default('active'),
});

// A date, or an ISO 8601 date and time with its offset.
const SAMPLED_AT = /^\d{4}-\d{2}-\d{2}(T\d{2}:\d{2}(:\d{2}(\.\d+)?)?(Z|[+-]\d{2}:\d{2}))?$/;

/** One entered value: the number and the unit it was entered in (pH has no unit). */
export const enteredValueSchema = z.object({
  value: finite('the value').min(0, 'cannot be negative').max(100_000, 'is too large'),
  unit: z.enum(BATH_UNITS, { error: `must be one of ${BATH_UNITS.join(', ')}` }).optional(),
});

export const analysisInputSchema = z
  .object({
    /** ISO date or date-time of sampling; not in the future. */
    sampledAt: z
      .string({ error: 'give the date of sampling as YYYY-MM-DD' })
      .trim()
      .refine((v) => SAMPLED_AT.test(v) && !Number.isNaN(Date.parse(v.length === 10 ? `${v}T12:00:00Z` : v)), 'give the date of sampling as YYYY-MM-DD, or a date and time such as 2026-11-20T09:30:00Z'),
    analyst: z.string({ error: 'name the analyst' }).trim().min(1, 'name the analyst').max(100, 'must be at most 100 characters'),
    metal: enteredValueSchema.optional(),
    freeLigand: enteredValueSchema.optional(),
    totalLigand: enteredValueSchema.optional(),
    pH: finite('the pH').min(-2, 'must be at least -2').max(16, 'must be at most 16').optional(),
    carbonate: enteredValueSchema.optional(),
    bromide: enteredValueSchema.optional(),
    notes: z.string().trim().max(2000, 'must be at most 2000 characters').default(''),
  })
  .refine((a) => QUANTITIES.some((q) => a[q] !== undefined), { path: ['metal'], message: 'enter at least one result (metal, free or total ligand, pH, ...)' });
export type AnalysisInput = z.input<typeof analysisInputSchema>;

export const analysisSchema = z.object({
  id: z.string(),
  bathId: z.string(),
  sampledAt: z.string(),
  analyst: z.string(),
  /** mol/L (pH: the pH). Null when not measured. */
  values: z.object({
    metal: z.number().nullable(),
    freeLigand: z.number().nullable(),
    totalLigand: z.number().nullable(),
    pH: z.number().nullable(),
    carbonate: z.number().nullable(),
    bromide: z.number().nullable(),
  }),
  /** What was entered, as typed: {quantity: {value, unit}}. */
  entered: z.record(z.string(), z.object({ value: z.number(), unit: z.string().nullable() })),
  notes: z.string(),
  source: z.enum(['manual', 'csv']),
  enteredBy: personRefSchema,
  createdAt: z.string(),
  /** Quantities outside the bath's target ranges. */
  outOfRange: z.array(outOfRangeSchema),
});
export type Analysis = z.infer<typeof analysisSchema>;
export const analysisListSchema = z.array(analysisSchema);

/** CSV columns for analyses. Each concentration column takes a unit column, or the bath's unit when absent. */
export const ANALYSIS_CSV_COLUMNS = [
  'sampled_at',
  'analyst',
  'metal',
  'metal_unit',
  'free_ligand',
  'free_ligand_unit',
  'total_ligand',
  'total_ligand_unit',
  'ph',
  'carbonate',
  'carbonate_unit',
  'bromide',
  'bromide_unit',
  'notes',
] as const;
export const ANALYSIS_CSV_REQUIRED = ['sampled_at', 'analyst'] as const;
export const ANALYSIS_IMPORT_MAX_BYTES = 1_000_000;
export const ANALYSIS_IMPORT_MAX_ROWS = 5000;

export const analysisImportReportSchema = z.object({
  mode: z.enum(['all', 'valid']),
  rows: z.number(),
  created: z.number(),
  rejected: z.number(),
  written: z.boolean(),
  problems: z.array(z.object({ row: z.number(), column: z.string().nullable(), message: z.string() })),
  analysisIds: z.array(z.string()),
});
export type AnalysisImportReport = z.infer<typeof analysisImportReportSchema>;

export const ATTACHMENT_TYPES = ['application/pdf', 'image/png', 'image/jpeg'] as const;
export const ATTACHMENT_MAX_BYTES = 10_000_000;

export const attachmentSchema = z.object({
  id: z.string(),
  bathId: z.string(),
  title: z.string(),
  fileName: z.string(),
  contentType: z.enum(ATTACHMENT_TYPES),
  sizeBytes: z.number(),
  uploadedBy: personRefSchema,
  uploadedAt: z.string(),
});
export type Attachment = z.infer<typeof attachmentSchema>;
export const attachmentListSchema = z.array(attachmentSchema);
