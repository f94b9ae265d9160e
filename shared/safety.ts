import { z } from 'zod';

import { personRefSchema } from './people';

// Hazard rules, the shop's thresholds and the safety desk: shapes shared by the client and the
// server. The rules themselves are pure functions in lib/hazards. Routes (all under /api):
//   GET    /safety/thresholds                  (signed in)        -> ThresholdsVersion (the current one)
//   GET    /safety/thresholds/history          (signed in)        -> ThresholdsVersion[] (newest first)
//   POST   /safety/thresholds                  (safety) ThresholdsInput -> 201 ThresholdsVersion (a new version)
//   GET    /safety/reviews?status=             (signed in)        -> ReviewSummary[] (safety and admin: all;
//                                                                    others: the ones they submitted)
//   GET    /safety/reviews/:id                 (safety, admin, or its submitter) -> Review
//   POST   /safety/reviews/:id/sign-off        (safety) {conditions} -> Review (not on one's own work)
//   POST   /safety/reviews/:id/send-back       (safety) {note}       -> Review (not on one's own work)
//   POST   /safety/reviews/:id/resubmit        (its submitter) {note} -> Review (after a send-back)
//   POST   /runs/:id/release                   (its author, or an admin) {note?} -> SafetyState
//                                              409 sign_off_required while a flagged run is not signed off
// Runs (GET /runs, /runs/:id) carry their hazards, review and release; baths (GET /baths,
// /baths/:id) their hazards and latest review; POST /calculations its hazards.
//
// A saved run, a new bath or a bath's new analysis is checked against the rules with the
// thresholds in force; when a flag-level rule fires, a review is opened on the safety desk (a
// bath only when the flagged rules differ from its last review). Every step is mailed and audited.

/** The hazard rules lib/hazards evaluates. */
export const HAZARD_RULES = [
  'cyanide_present',
  'cyanide_low_ph',
  'acid_into_cyanide',
  'ammoniacal_silver',
  'acidified_thiosulfate',
  'ammonia_vapour',
] as const;
export type HazardRule = (typeof HAZARD_RULES)[number];

/** How serious a hazard is; shown in words as well as colour. */
export const HAZARD_SEVERITIES = ['caution', 'danger'] as const;
export type HazardSeverity = (typeof HAZARD_SEVERITIES)[number];

/** GHS pictograms (an open standard: the UN Globally Harmonized System) and what each stands for. */
export const GHS_PICTOGRAMS = {
  GHS02: 'Flammable',
  GHS03: 'Oxidiser',
  GHS04: 'Gas under pressure',
  GHS05: 'Corrosive',
  GHS06: 'Acute toxicity (fatal or toxic)',
  GHS07: 'Harmful or irritant',
  GHS08: 'Serious health hazard',
  GHS09: 'Hazardous to the aquatic environment',
} as const;
export type GhsPictogram = keyof typeof GHS_PICTOGRAMS;

/** One GHS hazard statement: its code and its standard wording. */
export const ghsStatementSchema = z.object({ code: z.string(), text: z.string() });
export type GhsStatement = z.infer<typeof ghsStatementSchema>;

/** One number (or fact) that made a rule fire. */
export const evidenceSchema = z.object({
  label: z.string(),
  value: z.union([z.number(), z.string(), z.boolean()]).nullable(),
  unit: z.string().optional(),
  /** Where the number comes from ("engine speciation", "pKa 9.21 (CRC Handbook, from memory)", "threshold"). */
  note: z.string().optional(),
});
export type Evidence = z.infer<typeof evidenceSchema>;

/** A rule that fired: what it found, how serious it is, and the caution to show. */
export const hazardSchema = z.object({
  rule: z.enum(HAZARD_RULES),
  severity: z.enum(HAZARD_SEVERITIES),
  /** True: the work goes to the safety desk and a run cannot be released without sign-off. */
  flag: z.boolean(),
  title: z.string(),
  /** The caution in full; it ends by deferring to the SDS, local codes and licensed practice. */
  text: z.string(),
  evidence: z.array(evidenceSchema),
  /** GHS hazard statements of the reagents involved. */
  ghs: z.array(ghsStatementSchema),
  pictograms: z.array(z.enum(Object.keys(GHS_PICTOGRAMS) as [GhsPictogram, ...GhsPictogram[]])),
  /** The reagents the statements belong to ("NaCN", "aqueous ammonia"). */
  reagents: z.array(z.string()),
  /** Where the rule's facts come from (a named handbook "from memory", or "common practice"). */
  source: z.string(),
  /** The dosing step (1 = first) the hazard belongs to, when it belongs to one. */
  step: z.number().int().optional(),
});
export type Hazard = z.infer<typeof hazardSchema>;

/** The shop's thresholds, editable by the safety role. Defaults are common practice. */
export const hazardThresholdsSchema = z.object({
  /** Cyanide below this pH is flagged (common practice: keep cyanide baths at pH 11 or above). */
  cyanideMinPh: z.number({ error: 'enter a pH' }).refine(Number.isFinite, 'must be a finite number').min(7, 'must be at least 7').max(14, 'must be at most 14'),
  /** Cyanide with more than this fraction of free cyanide as HCN, HCN/(HCN + CN-), is flagged. */
  hcnFractionMax: z.number({ error: 'enter a fraction between 0 and 0.5' }).refine(Number.isFinite, 'must be a finite number').gt(0, 'must be more than 0').max(0.5, 'must be at most 0.5'),
  /** Thiosulfate below this pH gives the sulfur dioxide caution. */
  thiosulfateMinPh: z.number({ error: 'enter a pH' }).refine(Number.isFinite, 'must be a finite number').min(1, 'must be at least 1').max(7, 'must be at most 7'),
  /** Total ammonia from which the vapour caution shows, mol/L. */
  ammoniaVapourMolPerL: z.number({ error: 'enter mol/L' }).refine(Number.isFinite, 'must be a finite number').gt(0, 'must be more than 0').max(20, 'must be at most 20 mol/L'),
  /** Ammoniacal silver goes to the safety desk. */
  deskAmmoniacalSilver: z.boolean({ error: 'must be true or false' }),
  /** Acidified thiosulfate goes to the safety desk. */
  deskAcidifiedThiosulfate: z.boolean({ error: 'must be true or false' }),
});
export type HazardThresholds = z.infer<typeof hazardThresholdsSchema>;

/** Built-in thresholds (version 1 of every database). */
export const DEFAULT_THRESHOLDS: HazardThresholds = {
  cyanideMinPh: 11,
  // At pKa 9.21 (25 °C) 2 % of free cyanide is HCN at pH 10.9, next to the pH threshold.
  hcnFractionMax: 0.02,
  thiosulfateMinPh: 4,
  ammoniaVapourMolPerL: 0.05,
  deskAmmoniacalSilver: true,
  deskAcidifiedThiosulfate: false,
};

export const THRESHOLD_LABELS: Record<keyof HazardThresholds, { label: string; help: string }> = {
  cyanideMinPh: { label: 'Lowest pH for cyanide', help: 'Cyanide below this pH goes to the safety desk (common practice: 11).' },
  hcnFractionMax: { label: 'Largest HCN share of free cyanide', help: 'HCN / (HCN + CN-), as a fraction. 0.02 is reached near pH 10.9 at 25 °C.' },
  thiosulfateMinPh: { label: 'Lowest pH for thiosulfate', help: 'Below this pH thiosulfate breaks down to sulfur and sulfur dioxide (about 4).' },
  ammoniaVapourMolPerL: { label: 'Ammonia vapour caution from', help: 'Total ammonia, mol/L, from which the vapour caution and exposure limits show.' },
  deskAmmoniacalSilver: { label: 'Send ammoniacal silver to the desk', help: 'Silver with ammonia can leave explosive residues on standing.' },
  deskAcidifiedThiosulfate: { label: 'Send acidified thiosulfate to the desk', help: 'Sulfur dioxide from thiosulfate below the pH above.' },
};

export const thresholdsInputSchema = z.object({
  values: hazardThresholdsSchema,
  /** Why the thresholds change (kept with the version). */
  note: z.string({ error: 'say why the thresholds change' }).trim().min(3, 'say why the thresholds change').max(1000, 'must be at most 1000 characters'),
});
export type ThresholdsInput = z.infer<typeof thresholdsInputSchema>;

export const thresholdsVersionSchema = z.object({
  version: z.number().int(),
  values: hazardThresholdsSchema,
  note: z.string(),
  /** null: the built-in defaults. */
  createdBy: personRefSchema.nullable(),
  createdAt: z.string(),
});
export type ThresholdsVersion = z.infer<typeof thresholdsVersionSchema>;

export const REVIEW_STATUSES = ['pending', 'signed_off', 'sent_back'] as const;
export type ReviewStatus = (typeof REVIEW_STATUSES)[number];
export const REVIEW_STATUS_LABELS: Record<ReviewStatus, string> = {
  pending: 'Waiting for the safety desk',
  signed_off: 'Signed off',
  sent_back: 'Sent back',
};

export const REVIEW_ACTIONS = ['submitted', 'signed_off', 'sent_back', 'resubmitted'] as const;
export type ReviewAction = (typeof REVIEW_ACTIONS)[number];

export const reviewSubjectSchema = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('run'), id: z.string(), title: z.string(), calculator: z.string() }),
  z.object({ kind: z.literal('bath'), id: z.string(), title: z.string(), process: z.string() }),
]);
export type ReviewSubject = z.infer<typeof reviewSubjectSchema>;

export const reviewSummarySchema = z.object({
  id: z.string(),
  subject: reviewSubjectSchema,
  status: z.enum(REVIEW_STATUSES),
  /** The flag-level rules that opened the review. */
  flags: z.array(z.enum(HAZARD_RULES)),
  submittedBy: personRefSchema,
  submittedAt: z.string(),
  decidedBy: personRefSchema.nullable(),
  decidedAt: z.string().nullable(),
  /** Conditions of the sign-off (what must be done while the work goes ahead). */
  conditions: z.string().nullable(),
  /** The note of the last send-back or resubmission. */
  note: z.string().nullable(),
});
export type ReviewSummary = z.infer<typeof reviewSummarySchema>;

export const reviewEventSchema = z.object({
  action: z.enum(REVIEW_ACTIONS),
  actor: personRefSchema,
  at: z.string(),
  note: z.string().nullable(),
});
export type ReviewEvent = z.infer<typeof reviewEventSchema>;

export const reviewSchema = reviewSummarySchema.extend({
  /** Every hazard found when the review was opened (or resubmitted), with its evidence. */
  hazards: z.array(hazardSchema),
  thresholdsVersion: z.number().int(),
  events: z.array(reviewEventSchema),
});
export type Review = z.infer<typeof reviewSchema>;

export const reviewListSchema = z.array(reviewSummarySchema);

export const reviewQuerySchema = z.object({
  status: z.enum([...REVIEW_STATUSES, 'all'], { error: `must be one of ${[...REVIEW_STATUSES, 'all'].join(', ')}` }).default('pending'),
});

const longText = (what: string) => z.string({ error: what }).trim().max(2000, 'must be at most 2000 characters');

export const signOffSchema = z.object({
  /** What must hold while the work goes ahead ("fume hood on; second person present"). May be empty. */
  conditions: longText('write the conditions, or leave them empty').default(''),
});
export const sendBackSchema = z.object({ note: longText('say what has to change').min(3, 'say what has to change') });
export const resubmitSchema = z.object({ note: longText('say what changed').min(3, 'say what changed') });
export const releaseSchema = z.object({ note: longText('write a note, or leave it empty').default('') });

/** A run's or bath's standing with the safety rules, as shown beside it. */
export const safetyStateSchema = z.object({
  hazards: z.array(hazardSchema),
  flagged: z.boolean(),
  review: reviewSummarySchema.nullable(),
  /** When and by whom a run was released (runs only). */
  released: z.object({ by: personRefSchema, at: z.string(), note: z.string() }).nullable(),
});
export type SafetyState = z.infer<typeof safetyStateSchema>;

/** A hazard as lists show it (a chip). */
export const hazardBriefSchema = hazardSchema.pick({ rule: true, severity: true, flag: true, title: true });
export type HazardBrief = z.infer<typeof hazardBriefSchema>;

/** A review as lists show it. */
export const reviewBriefSchema = z.object({ id: z.string(), status: z.enum(REVIEW_STATUSES) });
export type ReviewBrief = z.infer<typeof reviewBriefSchema>;

/** Hazards as chips: one per rule, the worst of each. */
export function briefHazards(hazards: readonly Hazard[]): HazardBrief[] {
  const byRule = new Map<HazardRule, HazardBrief>();
  for (const h of hazards) {
    const seen = byRule.get(h.rule);
    if (!seen || (h.flag && !seen.flag)) byRule.set(h.rule, { rule: h.rule, severity: h.severity, flag: h.flag, title: h.title });
  }
  return HAZARD_RULES.flatMap((r) => (byRule.has(r) ? [byRule.get(r) as HazardBrief] : []));
}

/** The line every caution ends with. */
export const DEFER_TO_SDS = 'Follow the safety data sheet (SDS), local codes and licensed practice; this caution does not replace them.';
