import { z } from 'zod';

import { CALCULATOR_KEYS } from './calculators';
import { personRefSchema } from './people';
import { hazardBriefSchema, reviewBriefSchema, safetyStateSchema } from './safety';

// The constants library, the system builder and saved runs: request and response shapes shared by
// the client and the server. Routes (all under /api):
//   GET    /species?q=                         (signed in)            -> Species[] (the catalogue)
//   GET    /constants?q=&metal=&ligand=&kind=&status=&sort=&dir=      (signed in) -> ConstantSummary[]
//   GET    /constants/export.csv?<same filters>  (signed in)          -> text/csv (default: the approved library)
//   GET    /constants/:id                      (signed in)            -> ConstantDetail (the version and its history)
//   POST   /constants                          (chemist) ProposalInput -> 201 ConstantSummary (a draft, new lineage)
//   POST   /constants/:id/revisions            (chemist) RevisionInput -> 201 ConstantSummary (a draft replacing :id)
//   POST   /constants/:id/review               (reviewer) {decision, note} -> ConstantSummary
//   POST   /constants/:id/retire               (reviewer) {note}       -> ConstantSummary
//   POST   /constants/import                   (chemist) multipart: file (CSV), mode -> ImportReport
//   POST   /systems/build                      (signed in) SystemRequest -> BuiltSystem
//   POST   /runs                               (chemist, technician) RunInput -> 201 Run (built and solved again here)
//   GET    /runs?bath=&calculator=&author=&from=&to=  (signed in)     -> RunSummary[] (newest first)
//   GET    /runs/:id                           (signed in)            -> Run (any team member: the share link)
//   DELETE /runs/:id                           (its author, or an admin) -> 204 (soft delete)
//
// A constant is one version of a lineage. Edits never overwrite: a revision is a new version of
// the same lineage (same reaction) that names the version it replaces; approving it retires that
// version. Only approved versions feed calculations unless a request opts into drafts.

/** Kinds of constant, as stored and as written in CSV files. */
export const CONSTANT_KINDS = ['solubility_product', 'cumulative_formation', 'stepwise_formation', 'protonation'] as const;
export type ConstantKind = (typeof CONSTANT_KINDS)[number];

export const KIND_LABELS: Record<ConstantKind, { label: string; short: string; explain: string }> = {
  solubility_product: { label: 'Solubility product', short: 'Ksp', explain: 'A solid dissolving into its ions: log Ksp.' },
  cumulative_formation: { label: 'Cumulative formation', short: 'β', explain: 'A complex formed from the metal ion and n ligands: log βn.' },
  stepwise_formation: { label: 'Stepwise formation', short: 'K', explain: 'One more ligand added to the complex before it: log Kn.' },
  protonation: { label: 'Protonation', short: 'K(H)', explain: 'A proton added to a base (the reverse of an acid dissociation): log K(H) = pKa.' },
};

export const CONSTANT_STATUSES = ['draft', 'approved', 'rejected', 'retired'] as const;
export type ConstantStatus = (typeof CONSTANT_STATUSES)[number];

/** What a catalogue species is. Free metal ions, ligands, H+, water and counter-ions are the building blocks (components). */
export const SPECIES_ROLES = ['metal', 'ligand', 'proton', 'water', 'counter_ion', 'complex', 'solid', 'salt'] as const;
export type SpeciesRole = (typeof SPECIES_ROLES)[number];
export const BASIS_ROLES: readonly SpeciesRole[] = ['metal', 'ligand', 'proton', 'water', 'counter_ion'];

export const speciesSchema = z.object({
  id: z.number(),
  /** As written in reactions: trailing charge sign ("Ag(NH3)2+", "S2O3-2"), "(s)" for solids. */
  formula: z.string(),
  name: z.string(),
  charge: z.number(),
  /** g/mol from IUPAC standard atomic weights, as a decimal string. */
  molarMass: z.string(),
  role: z.enum(SPECIES_ROLES),
  aliases: z.array(z.string()),
});
export type Species = z.infer<typeof speciesSchema>;
export const speciesListSchema = z.array(speciesSchema);

export const termSchema = z.object({ species: z.string(), coefficient: z.number() });
export type Term = z.infer<typeof termSchema>;

export const constantSummarySchema = z.object({
  id: z.number(),
  lineageId: z.string(),
  version: z.number(),
  /** The version this one replaces (null for a first version). */
  replacesId: z.number().nullable(),
  kind: z.enum(CONSTANT_KINDS),
  /** The readable equation, e.g. "Ag+ + 2 NH3 = Ag(NH3)2+". */
  reaction: z.string(),
  reactants: z.array(termSchema),
  products: z.array(termSchema),
  /** The species this constant defines (the complex, the solid, the protonated base). */
  defines: z.string(),
  /** Metals and ligands in the reaction, for filters. */
  metals: z.array(z.string()),
  ligands: z.array(z.string()),
  logValue: z.number(),
  uncertainty: z.number().nullable(),
  temperatureC: z.number(),
  ionicStrength: z.number(),
  medium: z.string(),
  enthalpyKjMol: z.number().nullable(),
  source: z.string(),
  /** The proposer's note (why this value, what changed). */
  note: z.string(),
  status: z.enum(CONSTANT_STATUSES),
  proposedBy: personRefSchema.nullable(),
  proposedAt: z.string(),
  /** The approval or rejection (reviewer null for the starting library, which was reviewed before loading). */
  reviewedBy: personRefSchema.nullable(),
  reviewedAt: z.string().nullable(),
  reviewNote: z.string().nullable(),
  /** Retirement: by a reviewer, or on approval of the revision that replaced it. */
  retiredBy: personRefSchema.nullable(),
  retiredAt: z.string().nullable(),
  retireNote: z.string().nullable(),
});
export type ConstantSummary = z.infer<typeof constantSummarySchema>;
export const constantListSchema = z.array(constantSummarySchema);

export const constantDetailSchema = z.object({
  constant: constantSummarySchema,
  /** Every version of the lineage, newest first (including this one). */
  history: z.array(constantSummarySchema),
});
export type ConstantDetail = z.infer<typeof constantDetailSchema>;

export const LOG_VALUE_LIMIT = 80;
export const SOURCE_MAX = 500;
export const NOTE_MAX = 2000;

const optionalNumber = (what: string, min: number, max: number) =>
  z
    .number({ error: `must be a number (${what})` })
    .refine(Number.isFinite, 'must be a finite number')
    .min(min, `must be at least ${min}`)
    .max(max, `must be at most ${max}`)
    .nullable()
    .optional();

/** The values of a constant (everything except its kind and reaction). */
export const constantValuesSchema = z.object({
  logValue: z
    .number({ error: 'enter the log10 value as a number' })
    .refine(Number.isFinite, 'must be a finite number')
    .min(-LOG_VALUE_LIMIT, `must be at least -${LOG_VALUE_LIMIT}`)
    .max(LOG_VALUE_LIMIT, `must be at most ${LOG_VALUE_LIMIT}`),
  uncertainty: optionalNumber('± in log units', 0, 10),
  temperatureC: z.number({ error: 'enter the temperature in °C' }).min(0, 'must be at least 0 °C').max(100, 'must be at most 100 °C').default(25),
  ionicStrength: z.number({ error: 'enter the ionic strength in mol/L' }).min(0, 'cannot be negative').max(10, 'must be at most 10 mol/L').default(0),
  medium: z.string().trim().max(200, 'must be at most 200 characters').default(''),
  enthalpyKjMol: optionalNumber('kJ/mol', -1000, 1000),
  source: z.string({ error: 'name the published source' }).trim().min(3, 'name the published source (handbook, table, year)').max(SOURCE_MAX, `must be at most ${SOURCE_MAX} characters`),
  note: z.string().trim().max(NOTE_MAX, `must be at most ${NOTE_MAX} characters`).default(''),
});

/** A new constant: kind, reaction (a readable equation) and values. */
export const proposalSchema = constantValuesSchema.extend({
  kind: z.enum(CONSTANT_KINDS, { error: `must be one of ${CONSTANT_KINDS.join(', ')}` }),
  reaction: z.string({ error: 'write the reaction, e.g. "Ag+ + 2 NH3 = Ag(NH3)2+"' }).trim().min(3, 'write the reaction, e.g. "Ag+ + 2 NH3 = Ag(NH3)2+"').max(300, 'must be at most 300 characters'),
});
export type ProposalInput = z.input<typeof proposalSchema>;

/** A revision keeps the kind and reaction of the version it replaces; the note says what changed. */
export const revisionSchema = constantValuesSchema.extend({
  note: z.string({ error: 'say what changed and why' }).trim().min(3, 'say what changed and why').max(NOTE_MAX, `must be at most ${NOTE_MAX} characters`),
});
export type RevisionInput = z.input<typeof revisionSchema>;

export const reviewSchema = z.object({
  decision: z.enum(['approve', 'reject'], { error: 'must be approve or reject' }),
  note: z.string({ error: 'write a note for the proposer' }).trim().min(1, 'write a note for the proposer').max(NOTE_MAX),
});
export type ReviewInput = z.infer<typeof reviewSchema>;

export const retireSchema = z.object({
  note: z.string({ error: 'say why it is retired' }).trim().min(3, 'say why it is retired').max(NOTE_MAX),
});

export const SORT_KEYS = ['reaction', 'kind', 'logValue', 'status', 'proposedAt', 'defines'] as const;
export type ConstantSort = (typeof SORT_KEYS)[number];

/** Filters of the library list and of the CSV export. status "current" means approved plus drafts waiting for review. */
export const constantQuerySchema = z.object({
  q: z.string().trim().max(100, 'must be at most 100 characters').optional(),
  metal: z.string().trim().max(40).optional(),
  ligand: z.string().trim().max(40).optional(),
  kind: z.enum(CONSTANT_KINDS, { error: `must be one of ${CONSTANT_KINDS.join(', ')}` }).optional(),
  status: z.enum([...CONSTANT_STATUSES, 'current', 'all'], { error: 'must be draft, approved, rejected, retired, current or all' }).default('approved'),
  sort: z.enum(SORT_KEYS, { error: `must be one of ${SORT_KEYS.join(', ')}` }).default('reaction'),
  dir: z.enum(['asc', 'desc'], { error: 'must be asc or desc' }).default('asc'),
});
export type ConstantQuery = z.input<typeof constantQuerySchema>;

/** CSV columns, in export order. Import reads the same header names (order free; status, version, id, lineage_id ignored). */
export const CSV_COLUMNS = [
  'kind',
  'reaction',
  'log_value',
  'uncertainty',
  'temperature_c',
  'ionic_strength',
  'medium',
  'enthalpy_kj_mol',
  'source',
  'note',
  'status',
  'version',
  'id',
  'lineage_id',
] as const;
export const CSV_REQUIRED = ['kind', 'reaction', 'log_value', 'source'] as const;
export const IMPORT_MAX_BYTES = 1_000_000;
export const IMPORT_MAX_ROWS = 2000;

/** all: write nothing unless every row is valid. valid-as-drafts: write the valid rows, report the rest. */
export const IMPORT_MODES = ['all', 'valid'] as const;
export type ImportMode = (typeof IMPORT_MODES)[number];

export const importProblemSchema = z.object({
  /** 1-based line number in the file (the header is row 1). */
  row: z.number(),
  /** Column name, or null for a problem with the whole row. */
  column: z.string().nullable(),
  message: z.string(),
});
export type ImportProblem = z.infer<typeof importProblemSchema>;

export const importReportSchema = z.object({
  mode: z.enum(IMPORT_MODES),
  /** Data rows read (header not counted). */
  rows: z.number(),
  /** Rows written as drafts (new constants or revisions). */
  created: z.number(),
  /** Rows identical to the current approved version: nothing to do. */
  unchanged: z.number(),
  /** Rows with a problem (not written). */
  rejected: z.number(),
  /** True when something was written. */
  written: z.boolean(),
  problems: z.array(importProblemSchema),
  /** Ids of the drafts created. */
  draftIds: z.array(z.number()),
});
export type ImportReport = z.infer<typeof importReportSchema>;

const formulaList = z.array(z.string().trim().min(1).max(40), { error: 'give a list of formulas' }).max(12, 'at most 12');

/** Which system to build from the library, and optionally a bath state to solve. */
export const systemRequestSchema = z.object({
  metals: formulaList.min(1, 'choose at least one metal ion'),
  ligands: formulaList.default([]),
  counterIons: formulaList.default([]),
  /** Solids to allow; omit for every solid the chosen ions can form. */
  solids: formulaList.optional(),
  /** Analytical totals, mol/L, keyed by component formula. */
  totals: z.record(z.string(), z.number({ error: 'must be a number of mol/L' }).min(0, 'cannot be negative').max(20, 'must be at most 20 mol/L')).default({}),
  /** Measured pH (an activity); omit to leave H+ out of the problem's fixed values. */
  pH: z.number({ error: 'must be a number' }).min(-2, 'must be at least -2').max(16, 'must be at most 16').optional(),
  activity: z.enum(['ideal', 'davies'], { error: 'must be ideal or davies' }).default('davies'),
  temperatureC: z.number({ error: 'must be a number' }).min(0, 'must be at least 0 °C').max(100, 'must be at most 100 °C').default(25),
  /** Use drafts waiting for review in place of approved values (the result lists them). */
  includeDrafts: z.boolean({ error: 'must be true or false' }).default(false),
});
export type SystemRequest = z.input<typeof systemRequestSchema>;

/** One constant a built system uses, with its version. */
export const constantUseSchema = z.object({
  id: z.number(),
  lineageId: z.string(),
  version: z.number(),
  status: z.enum(CONSTANT_STATUSES),
  kind: z.enum(CONSTANT_KINDS),
  reaction: z.string(),
  logValue: z.number(),
  temperatureC: z.number(),
  source: z.string(),
});
export type ConstantUse = z.infer<typeof constantUseSchema>;

const stoichSchema = z.record(z.string(), z.number());

/** The engine's general problem form (DESIGN.md). */
export const problemSchema = z.object({
  components: z.array(z.string()),
  totals: z.record(z.string(), z.number()),
  fixed: z.record(z.string(), z.number()),
  species: z.array(z.object({ name: z.string(), logK: z.number(), stoich: stoichSchema, temperatureC: z.number().optional(), deltaH: z.number().optional() })),
  solids: z.array(z.object({ name: z.string(), logKsp: z.number(), stoich: stoichSchema, temperatureC: z.number().optional(), deltaH: z.number().optional() })),
  activity: z.enum(['ideal', 'davies']),
  temperatureC: z.number().optional(),
});
export type ProblemJson = z.infer<typeof problemSchema>;

export const builtSystemSchema = z.object({
  problem: problemSchema,
  /** Every constant version the problem draws on. */
  constants: z.array(constantUseSchema),
  /** The drafts among them (empty unless includeDrafts). */
  drafts: z.array(constantUseSchema),
  /** Solids the chosen ions can form (whether or not chosen). */
  availableSolids: z.array(z.string()),
  warnings: z.array(z.string()),
});
export type BuiltSystem = z.infer<typeof builtSystemSchema>;

/** Calculators a run may hold (shared/calculators.ts). */
export const CALCULATORS = CALCULATOR_KEYS;
export const runInputSchema = z.object({
  title: z.string().trim().max(200, 'must be at most 200 characters').default(''),
  calculator: z.enum(CALCULATORS, { error: `must be one of ${CALCULATORS.join(', ')}` }).default('speciation'),
  system: systemRequestSchema,
  /** The calculator's parameters (shared/calculations.ts PARAMS_SCHEMAS); checked by the server. */
  params: z.record(z.string(), z.unknown()).default({}),
  /** The bath the run was made for. */
  bathId: z.string().uuid('is not a bath').optional(),
});
export type RunInput = z.input<typeof runInputSchema>;

export const solveResultSchema = z.object({
  status: z.enum(['converged', 'not_converged']),
  message: z.string().optional(),
  free: z.record(z.string(), z.number()),
  species: z.record(z.string(), z.number()),
  solids: z.record(z.string(), z.number()),
  /** log(IAP/Ksp); null when an ion of the solid is absent altogether (minus infinity). */
  saturation: z.record(z.string(), z.number().nullable()),
  gamma: z.record(z.string(), z.number()).optional(),
  ionicStrength: z.number(),
  iterations: z.number(),
  residual: z.number(),
  warnings: z.array(z.string()),
  activity: z.enum(['ideal', 'davies']),
  temperatureC: z.number(),
});
export type SolveResultJson = z.infer<typeof solveResultSchema>;

/** A constant a run used, and what has become of it since. */
export const runConstantSchema = constantUseSchema.extend({
  /** The approved version of the same lineage today when it is a different one, else null. */
  supersededBy: z.object({ id: z.number(), version: z.number(), logValue: z.number() }).nullable(),
  /** Status of that version today (the run keeps what it used either way). */
  statusNow: z.enum(CONSTANT_STATUSES),
});

export const runSummarySchema = z.object({
  id: z.string(),
  title: z.string(),
  calculator: z.enum(CALCULATORS),
  author: personRefSchema,
  createdAt: z.string(),
  status: z.enum(['converged', 'not_converged']),
  usesDrafts: z.boolean(),
  /** The one-line answer. */
  verdict: z.string(),
  bath: z.object({ id: z.string(), name: z.string() }).nullable(),
  /** What the hazard rules found (shared/safety.ts), as chips; the detail has them in full. */
  hazards: z.array(hazardBriefSchema),
  review: reviewBriefSchema.nullable(),
  released: z.boolean(),
});
export type RunSummary = z.infer<typeof runSummarySchema>;

/** Filters of the runs list; from and to are dates (YYYY-MM-DD, inclusive). */
export const runQuerySchema = z.object({
  bath: z.string().uuid('is not a bath').optional(),
  calculator: z.enum(CALCULATORS, { error: `must be one of ${CALCULATORS.join(', ')}` }).optional(),
  author: z.string().uuid('is not a person').optional(),
  from: z.iso.date({ error: 'must be a date, YYYY-MM-DD' }).optional(),
  to: z.iso.date({ error: 'must be a date, YYYY-MM-DD' }).optional(),
});
export const runListSchema = z.array(runSummarySchema);

export const runSchema = runSummarySchema.extend({
  inputs: z.record(z.string(), z.unknown()),
  problem: problemSchema,
  engineVersion: z.string(),
  result: solveResultSchema,
  constants: z.array(runConstantSchema),
  warnings: z.array(z.string()),
  /** The calculator's own result (lib/calculators), JSON-safe; null for runs saved before calculators had one. */
  output: z.unknown(),
  /** Hazards with their evidence, the safety desk's review and the release. */
  safety: safetyStateSchema,
});
export type Run = z.infer<typeof runSchema>;
