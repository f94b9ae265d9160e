import { z } from 'zod';

import { CALCULATOR_KEYS, type CalculatorKey } from './calculators';
import { systemRequestSchema } from './constants';
import { hazardSchema } from './safety';

export { CALCULATOR_KEYS, CALCULATOR_LABELS, type CalculatorKey } from './calculators';

// The calculators as requests: which one, the system (built from the library by the server or by
// POST /api/systems/build for the browser), and the calculator's own parameters. The same request
// runs in the browser (lib/calculators/run-calculation.ts) and on the server when a run is saved.
// Routes (all under /api):
//   POST   /solve                  (signed in) a problem in the general form -> the engine's result
//   POST   /calculations           (signed in) CalculationRequest -> CalculationOutcome (nothing saved)
// Saved runs (shared/constants.ts) take the same request with a title and, optionally, a bath.

const formula = z.string({ error: 'name it by formula' }).trim().min(1, 'name it by formula').max(40, 'must be at most 40 characters');
const positive = (what: string) => z.number({ error: `enter ${what} as a number` }).refine(Number.isFinite, 'must be a finite number').gt(0, 'must be more than 0');
const nonNegative = (what: string) => z.number({ error: `enter ${what} as a number` }).refine(Number.isFinite, 'must be a finite number').min(0, 'cannot be negative');

export const headroomParamsSchema = z.object({
  /** A solid the system can form ("AgCl(s)"). */
  solid: formula,
  /** The metal component to report as metal (default: the first metal in the solid). */
  metal: formula.optional(),
});

export const fixerLoadingParamsSchema = z.object({
  solid: formula.default('AgBr(s)'),
  silver: formula.default('Ag+'),
});

export const speciationParamsSchema = z.object({});

export const seriesRequestSchema = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('free'), component: formula }),
  z.object({ kind: z.literal('species'), name: formula }),
  z.object({ kind: z.literal('fractions'), component: formula, species: z.array(formula).max(20).optional() }),
  z.object({ kind: z.literal('solubility'), component: formula }),
  z.object({ kind: z.literal('solid'), name: formula }),
  z.object({ kind: z.literal('saturation'), name: formula }),
]);

export const CURVE_MAX_POINTS = 500;

export const curvesParamsSchema = z
  .object({
    variable: z.discriminatedUnion('kind', [
      z.object({ kind: z.literal('total'), component: formula }),
      z.object({ kind: z.literal('pH') }),
    ]),
    from: nonNegative('the start of the range'),
    to: nonNegative('the end of the range'),
    points: z.number({ error: 'enter a whole number of points' }).int('must be a whole number').min(2, 'must be at least 2').max(CURVE_MAX_POINTS, `must be at most ${CURVE_MAX_POINTS}`).default(100),
    spacing: z.enum(['linear', 'log'], { error: 'must be linear or log' }).default('linear'),
    series: z.array(seriesRequestSchema).min(1, 'choose at least one thing to draw').max(12, 'at most 12 series'),
  })
  .refine((p) => p.from !== p.to, { path: ['to'], message: 'must differ from the start' })
  .refine((p) => p.spacing !== 'log' || (p.from > 0 && p.to > 0), { path: ['from'], message: 'a log range must start above 0' });

export const precipitationOrderParamsSchema = z.object({
  /** The component dosed ("Cl-", "OH-" is written through H+: use "S-2", "Cl-", "I-", "CN-"). */
  precipitant: formula,
  cations: z.array(formula).min(1, 'choose at least one metal ion').max(8, 'at most 8'),
  maxPrecipitantMolPerL: positive('the most precipitant to consider (mol/L)').max(20, 'must be at most 20 mol/L').optional(),
});

export const dosingStepSchema = z.discriminatedUnion('kind', [
  z.object({
    kind: z.literal('add'),
    label: z.string().trim().max(100).optional(),
    /** What is added, by name or formula ("NaCN", "sodium cyanide"). */
    reagent: z.string().trim().min(1, 'name the reagent').max(60),
    /** Moles of each component one mole of reagent brings ({"CN-": 1, "Na+": 1}). */
    stoich: z.record(z.string(), z.number().refine(Number.isFinite, 'must be a finite number')).refine((s) => Object.keys(s).length > 0, 'give what one mole brings'),
    mol: positive('the amount added (mol)'),
    volumeL: nonNegative('the liquid it brings (L)').optional(),
  }),
  z.object({ kind: z.literal('set-ph'), label: z.string().trim().max(100).optional(), pH: z.number().min(-2, 'must be at least -2').max(16, 'must be at most 16') }),
  z.object({
    kind: z.literal('dilute'),
    label: z.string().trim().max(100).optional(),
    addWaterL: positive('the water added (L)').optional(),
    toVolumeL: positive('the final volume (L)').optional(),
  }),
]);

export const dosingPlanParamsSchema = z.object({
  /** Volume of the vessel before the first step, L (its amounts come from the system totals x volume). */
  volumeL: positive('the volume (L)').max(1_000_000, 'must be at most 1,000,000 L'),
  steps: z.array(dosingStepSchema).min(1, 'add at least one step').max(30, 'at most 30 steps'),
});

export const makeUpParamsSchema = z.object({
  volume: z.object({ value: positive('the tank volume'), unit: z.enum(['L', 'gal'], { error: 'must be L or gal' }) }),
  salt: z.object({
    name: z.string().trim().min(1, 'name the salt').max(60),
    formula: z.string().trim().max(60).optional(),
    stoich: z.record(z.string(), z.number()).refine((s) => Object.keys(s).length > 0, 'give what one mole of the salt brings'),
    /** A liquid stock (aqueous ammonia): mass fraction of the salt and density; its volume counts as dilution. */
    stock: z
      .object({
        massFraction: z.number({ error: 'enter the strength as a fraction' }).gt(0, 'must be more than 0').max(1, 'must be at most 1'),
        densityKgPerL: z.number({ error: 'enter the density in kg/L' }).gt(0.5, 'must be more than 0.5 kg/L').max(3, 'must be at most 3 kg/L'),
      })
      .optional(),
  }),
  target: z.discriminatedUnion('kind', [
    z.object({ kind: z.literal('free'), component: formula, molPerL: positive('the target (mol/L)') }),
    z.object({ kind: z.literal('headroom'), solid: formula, molPerL: positive('the headroom (mol/L)') }),
  ]),
  massUnit: z.enum(['g', 'kg', 'oz', 'lb'], { error: 'must be g, kg, oz or lb' }).default('kg'),
});

export const PARAMS_SCHEMAS = {
  headroom: headroomParamsSchema,
  fixer_loading: fixerLoadingParamsSchema,
  speciation: speciationParamsSchema,
  curves: curvesParamsSchema,
  precipitation_order: precipitationOrderParamsSchema,
  dosing_plan: dosingPlanParamsSchema,
  make_up: makeUpParamsSchema,
} as const;

export type CalculatorParams = { [K in CalculatorKey]: z.input<(typeof PARAMS_SCHEMAS)[K]> };

/** One calculation: the calculator, the system and its parameters; `bathId` when it was opened from a bath. */
export const calculationRequestSchema = z
  .object({
    calculator: z.enum(CALCULATOR_KEYS, { error: `must be one of ${CALCULATOR_KEYS.join(', ')}` }),
    system: systemRequestSchema,
    params: z.record(z.string(), z.unknown()).default({}),
    bathId: z.string().uuid('is not a bath').optional(),
  })
  .superRefine((req, ctx) => {
    const parsed = PARAMS_SCHEMAS[req.calculator].safeParse(req.params);
    if (!parsed.success) {
      for (const issue of parsed.error.issues) ctx.addIssue({ code: 'custom', path: ['params', ...issue.path.map(String)], message: issue.message });
    }
  });
export type CalculationRequest = z.input<typeof calculationRequestSchema>;

/** What a calculation answers: a one-line verdict, the calculator's own result (JSON), warnings. */
export const calculationOutcomeSchema = z.object({
  calculator: z.enum(CALCULATOR_KEYS),
  status: z.enum(['converged', 'not_converged']),
  verdict: z.string(),
  warnings: z.array(z.string()),
  /** The calculator's result as lib/calculators returns it (infinities and NaN become null). */
  result: z.unknown(),
  /** What the hazard rules find with the thresholds in force (POST /calculations fills it). */
  hazards: z.array(hazardSchema).optional(),
});
export type CalculationOutcome = z.infer<typeof calculationOutcomeSchema>;
