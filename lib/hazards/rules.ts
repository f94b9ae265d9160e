// The hazard rules: pure functions from a situation (totals, pH, speciation, reagents, dosing
// steps) and the shop's thresholds to the hazards that fire, in the order of HAZARD_RULES. Bad
// numbers never throw and never reach the output: a non-finite or negative total counts as 0, a
// non-finite pH as not known, and every number in the evidence is finite or null.
import { molarMass } from '@/lib/units';
import { DEFAULT_THRESHOLDS, DEFER_TO_SDS, type Evidence, type Hazard, type HazardThresholds } from '@/shared/safety';

import {
  DEFAULT_CYANIDE_CODES,
  cyanideGroups,
  ghsStatements,
  isAcidReagent,
  isAmmoniaReagent,
  isCyanideFormula,
  isCyanideReagent,
  isSilverReagent,
  isThiosulfateReagent,
  pictogramsFor,
  recogniseReagent,
  type GhsCode,
} from './ghs';
import type { HazardSituation, HazardStep, SolvedSolution } from './types';

/** pKa of HCN at 25 °C (CRC Handbook of Chemistry and Physics, from memory). */
export const HCN_PKA = 9.21;

/** Share of free cyanide present as HCN at a pH, HCN / (HCN + CN-) = 1 / (1 + 10^(pH - pKa)) (a fraction, 0..1). */
export function hcnRatioFromPh(pH: number, pKa: number = HCN_PKA): number {
  return 1 / (1 + 10 ** (pH - pKa));
}

/** True when any hazard sends the work to the safety desk. */
export function isFlagged(hazards: readonly Hazard[]): boolean {
  return hazards.some((h) => h.flag);
}

/** Below this a total counts as absent, mol/L. */
const PRESENT_MOL_PER_L = 1e-9;
/** Molar mass of CN- for g/L, g/mol: C 12.011 + N 14.007 (IUPAC 2021 conventional values, lib/units). */
const CN_G_PER_MOL = molarMass('CN-').toNumber();
const PKA_NOTE = 'pKa 9.21, 25 °C (CRC Handbook, from memory)';
const ENGINE_NOTE = 'engine speciation';
const EXPOSURE_NOTE = 'NIOSH Pocket Guide to Chemical Hazards, from memory';
const HCN_GAS = 'hydrogen cyanide (HCN)';
const HCN_CODES: readonly GhsCode[] = ['H224', 'H300', 'H310', 'H330', 'H410'];
const AMMONIA_CODES: readonly GhsCode[] = ['H314', 'H335', 'H400'];
const SO2_CODES: readonly GhsCode[] = ['H280', 'H314', 'H331'];

/** One vessel state the rules look at: the base solution (step undefined) or the vessel after a step. */
interface State {
  totals: Record<string, number>;
  pH: number | null;
  solution: SolvedSolution | null;
  step?: number;
  label?: string;
}

interface Step {
  index: number;
  label: string;
  kind: HazardStep['kind'];
  reagent: string | null;
  stoich: Record<string, number>;
  mol: number | null;
  setPh: number | null;
  before: State;
  after: State;
}

const isRecord = (v: unknown): v is Record<string, unknown> => typeof v === 'object' && v !== null && !Array.isArray(v);
const finite = (v: unknown): number | null => (typeof v === 'number' && Number.isFinite(v) ? v : null);

/** Only finite, non-negative numbers; anything else counts as 0 and is left out. */
function cleanAmounts(v: unknown): Record<string, number> {
  if (!isRecord(v)) return {};
  return Object.fromEntries(Object.entries(v).filter((e): e is [string, number] => typeof e[1] === 'number' && Number.isFinite(e[1]) && e[1] > 0));
}

function cleanSolution(v: unknown): SolvedSolution | null {
  if (!isRecord(v)) return null;
  return { free: cleanAmounts(v.free), species: cleanAmounts(v.species) };
}

function cleanState(v: unknown, step?: number, label?: string): State {
  const s = isRecord(v) ? v : {};
  return { totals: cleanAmounts(s.totals), pH: finite(s.pH), solution: cleanSolution(s.solution), ...(step !== undefined ? { step, label } : {}) };
}

function cleanSteps(v: unknown): Step[] {
  if (!Array.isArray(v)) return [];
  return v.filter(isRecord).map((s, i) => {
    const index = Number.isSafeInteger(s.index) && (s.index as number) >= 1 ? (s.index as number) : i + 1;
    const kind = s.kind === 'add' || s.kind === 'set-ph' ? s.kind : 'dilute';
    const label = typeof s.label === 'string' && s.label.trim() !== '' ? s.label : `step ${index}`;
    const stoich = isRecord(s.stoich) ? Object.fromEntries(Object.entries(s.stoich).filter((e): e is [string, number] => finite(e[1]) !== null)) : {};
    return {
      index,
      label,
      kind,
      reagent: typeof s.reagent === 'string' ? s.reagent : null,
      stoich,
      mol: finite(s.mol),
      setPh: finite(s.setPh),
      before: cleanState(s.before, index, label),
      after: cleanState(s.after, index, label),
    };
  });
}

/** Thresholds with any non-finite number replaced by the built-in default. */
function cleanThresholds(t: HazardThresholds): HazardThresholds {
  const num = (k: 'cyanideMinPh' | 'hcnFractionMax' | 'thiosulfateMinPh' | 'ammoniaVapourMolPerL') => finite(t?.[k]) ?? DEFAULT_THRESHOLDS[k];
  const bool = (k: 'deskAmmoniacalSilver' | 'deskAcidifiedThiosulfate') => (typeof t?.[k] === 'boolean' ? t[k] : DEFAULT_THRESHOLDS[k]);
  return {
    cyanideMinPh: num('cyanideMinPh'),
    hcnFractionMax: num('hcnFractionMax'),
    thiosulfateMinPh: num('thiosulfateMinPh'),
    ammoniaVapourMolPerL: num('ammoniaVapourMolPerL'),
    deskAmmoniacalSilver: bool('deskAmmoniacalSilver'),
    deskAcidifiedThiosulfate: bool('deskAcidifiedThiosulfate'),
  };
}

/** Total cyanide, mol/L of CN-: every total keyed by a cyanide formula times its cyanide groups. */
function cyanideTotal(totals: Record<string, number>): number {
  let sum = 0;
  for (const [k, v] of Object.entries(totals)) if (isCyanideFormula(k)) sum += v * cyanideGroups(k);
  return Number.isFinite(sum) ? sum : Number.MAX_VALUE;
}
const ammoniaTotal = (t: Record<string, number>) => Math.min((t.NH3 ?? 0) + (t['NH4+'] ?? 0), Number.MAX_VALUE);
const silverTotal = (t: Record<string, number>) => t['Ag+'] ?? 0;
const thiosulfateTotal = (t: Record<string, number>) => t['S2O3-2'] ?? 0;

interface HcnShare {
  ratio: number;
  /** HCN, mol/L, when the engine gave it. */
  hcn: number | null;
  note: string;
}

/** HCN / (HCN + free CN-): from the engine's speciation when it has both, else from the pH and pKa 9.21; null when neither. */
function hcnShare(state: State): HcnShare | null {
  const s = state.solution;
  const hcn = s?.species.HCN;
  const cn = s?.free['CN-'] ?? s?.species['CN-'];
  if (hcn !== undefined && cn !== undefined) {
    const ratio = hcn / (hcn + cn);
    if (Number.isFinite(ratio)) return { ratio, hcn, note: ENGINE_NOTE };
  }
  if (state.pH === null) return null;
  const ratio = hcnRatioFromPh(state.pH);
  return Number.isFinite(ratio) ? { ratio, hcn: null, note: PKA_NOTE } : null;
}

function ev(label: string, value: number | string | boolean | null, unit?: string, note?: string): Evidence {
  const v = typeof value === 'number' && !Number.isFinite(value) ? null : value;
  return { label, value: v, ...(unit !== undefined ? { unit } : {}), ...(note !== undefined ? { note } : {}) };
}

const phText = (pH: number) => String(Number(pH.toFixed(2)));
/** "about 14 %", "about 0.51 %", "more than 99 %". */
function percentText(x: number): string {
  const p = x * 100;
  if (p >= 99.5) return 'more than 99 %';
  return `about ${p >= 10 ? Math.round(p) : Number(p.toPrecision(2))} %`;
}

const stepEvidence = (s: State): Evidence[] => (s.step === undefined ? [] : [ev('Step', s.step), ev('Step label', s.label ?? null)]);
const withStep = (s: State) => (s.step === undefined ? {} : { step: s.step });
const close = (text: string) => `${text} ${DEFER_TO_SDS}`;

/** The shape every hazard shares; statements and pictograms from the codes. */
function hazard(base: Omit<Hazard, 'text' | 'ghs' | 'pictograms'>, text: string, codes: readonly GhsCode[]): Hazard {
  return { ...base, text: close(text), ghs: ghsStatements(codes), pictograms: pictogramsFor(codes) };
}

interface Context {
  t: HazardThresholds;
  base: State;
  steps: Step[];
  /** The base solution, then the vessel after each step. */
  states: State[];
  /** Every reagent named, in the situation and in the steps. */
  reagents: string[];
}

function cyanidePresent(ctx: Context): Hazard | null {
  const { t } = ctx;
  const named = ctx.reagents.filter(isCyanideReagent);
  const state = ctx.states.find((s) => cyanideTotal(s.totals) > PRESENT_MOL_PER_L);
  if (!state && named.length === 0) return null;
  const where = state ?? ctx.base;
  const total = cyanideTotal(where.totals);
  const known = named.map(recogniseReagent);
  const codes = named.length === 0 ? DEFAULT_CYANIDE_CODES : known.flatMap((r) => (r && r.kinds.includes('cyanide') ? r.codes : DEFAULT_CYANIDE_CODES));
  const reagents = named.length === 0 ? ['NaCN / KCN (typical cyanide salts)'] : unique(named.map((n, i) => known[i]?.label ?? n.trim()));
  const evidence = [
    ...stepEvidence(where),
    ev('Total cyanide', total, 'mol/L'),
    ev('Total cyanide as CN-', total * CN_G_PER_MOL, 'g/L', `CN- ${CN_G_PER_MOL.toFixed(3)} g/mol (IUPAC atomic weights)`),
    ev('pH', where.pH ?? 'not given'),
    ev('Lowest pH for cyanide', t.cyanideMinPh, undefined, 'threshold'),
  ];
  const ph =
    where.pH === null
      ? ` The pH is not given: measure it, and keep it at pH ${phText(t.cyanideMinPh)} or above.`
      : ` Keep the pH at ${phText(t.cyanideMinPh)} or above.`;
  const text =
    'Cyanide salts are fatal if swallowed, in contact with skin or if inhaled. Contact with acids liberates hydrogen cyanide, a fatal gas: ' +
    'keep the solution alkaline, and keep acids, acid cleaners and acid wastes away from it.' +
    ph;
  const source = `${named.length === 0 ? 'typical supplier SDS for NaCN and KCN' : 'supplier SDS'}, from memory; common practice (keep alkaline)`;
  return hazard(
    { rule: 'cyanide_present', severity: 'caution', flag: false, title: 'Cyanide in the solution', evidence, reagents, source, ...withStep(where) },
    text,
    codes,
  );
}

function cyanideLowPhAt(ctx: Context, state: State): Hazard | null {
  const { t } = ctx;
  if (cyanideTotal(state.totals) <= PRESENT_MOL_PER_L) return null;
  const share = hcnShare(state);
  if (!share) return null;
  const lowPh = state.pH !== null && state.pH < t.cyanideMinPh;
  if (!lowPh && !(share.ratio > t.hcnFractionMax)) return null;
  const evidence = [
    ...stepEvidence(state),
    ev('pH', state.pH ?? 'not given'),
    ev('Lowest pH for cyanide', t.cyanideMinPh, undefined, 'threshold'),
    ev('HCN share of free cyanide, HCN / (HCN + CN-)', share.ratio, 'fraction', share.note),
    ev('Largest HCN share', t.hcnFractionMax, 'fraction', 'threshold'),
    ...(share.hcn !== null ? [ev('HCN', share.hcn, 'mol/L', ENGINE_NOTE)] : []),
  ];
  const at = state.pH === null ? 'In this solution' : `At pH ${phText(state.pH)}`;
  const text =
    `${at} ${percentText(share.ratio)} of the free cyanide is hydrogen cyanide, a fatal gas that escapes from the solution. ` +
    `Cyanide is to be kept at pH ${phText(t.cyanideMinPh)} or above, with no more than ${percentText(t.hcnFractionMax).replace('about ', '')} of free cyanide as HCN. ` +
    'Do not let a cyanide solution reach this state; where one has, keep people out of the vapour and correct it only under extraction, by the shop\'s emergency procedure.';
  const title = state.step === undefined ? 'Cyanide below the safe pH: hydrogen cyanide forms' : `Cyanide below the safe pH after step ${state.step}`;
  return hazard(
    { rule: 'cyanide_low_ph', severity: 'danger', flag: true, title, evidence, reagents: [HCN_GAS], source: `common practice (pH threshold); ${PKA_NOTE}`, ...withStep(state) },
    text,
    HCN_CODES,
  );
}

function cyanideLowPh(ctx: Context): Hazard[] {
  return ctx.states.map((s) => cyanideLowPhAt(ctx, s)).filter((h): h is Hazard => h !== null);
}

/** Whether a step adds acid (by reagent or H+) or sets a lower pH. */
function acidifies(step: Step, t: HazardThresholds): boolean {
  if (step.kind === 'add') return isAcidReagent(step.reagent, step.stoich);
  if (step.kind !== 'set-ph' || step.setPh === null) return false;
  return step.before.pH !== null ? step.setPh < step.before.pH : step.setPh < t.cyanideMinPh;
}

function acidIntoCyanideAt(step: Step, t: HazardThresholds): Hazard | null {
  const cyanide = cyanideTotal(step.before.totals);
  if (cyanide <= PRESENT_MOL_PER_L || !acidifies(step, t)) return null;
  const h = step.stoich['H+'];
  const hMol = step.mol !== null && h !== undefined ? step.mol * h : null;
  const after = hcnShare(step.after);
  const acid = step.kind === 'add' ? recogniseReagent(step.reagent) : null;
  const evidence = [
    ev('Step', step.index),
    ev('Step label', step.label),
    ...(step.kind === 'add'
      ? [ev('Reagent', step.reagent), ev('H+ it brings', hMol, 'mol', hMol === null ? 'not given: named as an acid' : 'mol x stoichiometry')]
      : [ev('pH set', step.setPh)]),
    ev('Cyanide in the vessel before', cyanide, 'mol/L'),
    ev('pH before', step.before.pH ?? 'not given'),
    ev('pH after', step.after.pH ?? 'not given'),
    ...(after ? [ev('HCN share of free cyanide after', after.ratio, 'fraction', after.note)] : []),
  ];
  const named = isAcidReagent(step.reagent) ? 'an acid' : 'which brings acid (H+)';
  const what =
    step.kind === 'add'
      ? `adds ${step.reagent ?? 'a reagent'}, ${named}, to a vessel holding cyanide`
      : `sets the pH of a vessel holding cyanide down to ${phText(step.setPh as number)}`;
  const text =
    `Step ${step.index} (${step.label}) ${what}. Acid turns cyanide into hydrogen cyanide, a fatal gas` +
    (after ? ` (${percentText(after.ratio)} of the free cyanide after this step)` : '') +
    '. Never add acid to a cyanide bath, its rinses or its drag-out; keep acids stored and handled apart from cyanide.';
  const codes = [...HCN_CODES, ...(acid?.kinds.includes('acid') ? acid.codes : [])];
  const reagents = unique([...(step.kind === 'add' && step.reagent ? [acid?.label ?? step.reagent.trim()] : []), HCN_GAS]);
  return hazard(
    { rule: 'acid_into_cyanide', severity: 'danger', flag: true, title: `Acid into cyanide at step ${step.index}`, evidence, reagents, source: 'common practice', step: step.index },
    text,
    codes,
  );
}

function acidIntoCyanide(ctx: Context): Hazard[] {
  return ctx.steps.map((s) => acidIntoCyanideAt(s, ctx.t)).filter((h): h is Hazard => h !== null);
}

/** Share of total silver held as ammine complexes ("Ag(NH3)2+"), or null without a solution. */
function ammineShare(state: State): number | null {
  if (!state.solution) return null;
  let ammine = 0;
  for (const [name, c] of Object.entries(state.solution.species)) {
    const ag = /Ag(\d*)/.exec(name);
    if (ag && name.includes('NH3')) ammine += c * (ag[1] ? Number(ag[1]) : 1);
  }
  const share = ammine / silverTotal(state.totals);
  return Number.isFinite(share) ? share : null;
}

function ammoniacalSilver(ctx: Context): Hazard | null {
  const both = (s: State) => silverTotal(s.totals) > PRESENT_MOL_PER_L && ammoniaTotal(s.totals) > PRESENT_MOL_PER_L;
  let found: { state: State; share: number | null } | null = null;
  for (const s of ctx.states.filter(both)) {
    const share = ammineShare(s);
    if (share === null || share >= 0.01) {
      found = { state: s, share };
      break;
    }
  }
  if (!found && !ctx.states.some(both)) {
    // Silver or ammonia known only by name (a make-up or dosing reagent): no solution can speak for it.
    const silver = ctx.reagents.some(isSilverReagent) || ctx.states.some((s) => silverTotal(s.totals) > PRESENT_MOL_PER_L);
    const ammonia = ctx.reagents.some(isAmmoniaReagent) || ctx.states.some((s) => ammoniaTotal(s.totals) > PRESENT_MOL_PER_L);
    if (silver && ammonia) found = { state: ctx.base, share: null };
  }
  if (!found) return null;
  const { state, share } = found;
  const silverNamed = unique(ctx.reagents.filter(isSilverReagent).map((r) => recogniseReagent(r)?.label ?? r.trim()));
  const silverCodes = ctx.reagents.flatMap((r) => (recogniseReagent(r)?.kinds.includes('silver') ? (recogniseReagent(r)?.codes ?? []) : []));
  const evidence = [
    ...stepEvidence(state),
    ev('Silver', silverTotal(state.totals), 'mol/L'),
    ev('Ammonia (NH3 + NH4+)', ammoniaTotal(state.totals), 'mol/L'),
    ...(share !== null ? [ev('Share of silver as ammine complexes', share, 'fraction', ENGINE_NOTE)] : []),
  ];
  const text =
    'Silver with ammonia (ammoniacal silver) can leave explosive residues on standing: silver nitride, "fulminating silver", ' +
    'forms especially as the solution dries or is made alkaline. ' +
    'Never store it: make only what the job needs and discard it the same day by the shop\'s procedure; do not let it dry on glassware, benches or in drains.';
  return hazard(
    {
      rule: 'ammoniacal_silver',
      severity: 'danger',
      flag: ctx.t.deskAmmoniacalSilver,
      title: 'Ammoniacal silver: explosive residues on standing',
      evidence,
      reagents: unique([...silverNamed, 'aqueous ammonia']),
      source: "common practice; Bretherick's Handbook of Reactive Chemical Hazards, from memory",
      ...withStep(state),
    },
    text,
    [...silverCodes, ...AMMONIA_CODES],
  );
}

function acidifiedThiosulfate(ctx: Context): Hazard | null {
  const { t } = ctx;
  const named = ctx.reagents.some(isThiosulfateReagent);
  const state = ctx.states.find((s) => (thiosulfateTotal(s.totals) > PRESENT_MOL_PER_L || named) && s.pH !== null && s.pH < t.thiosulfateMinPh);
  if (!state) return null;
  const evidence = [
    ...stepEvidence(state),
    ev('pH', state.pH),
    ev('Lowest pH for thiosulfate', t.thiosulfateMinPh, undefined, 'threshold'),
    ev('Thiosulfate', thiosulfateTotal(state.totals), 'mol/L'),
  ];
  const text =
    `Below pH ${phText(t.thiosulfateMinPh)} thiosulfate breaks down to sulfur (the solution turns cloudy) and sulfur dioxide gas, toxic if inhaled. ` +
    'Ventilate, keep the pH up, and keep fixer away from acid stop baths and acid wastes.';
  return hazard(
    {
      rule: 'acidified_thiosulfate',
      severity: 'caution',
      flag: t.deskAcidifiedThiosulfate,
      title: 'Acidified thiosulfate: sulfur dioxide',
      evidence,
      reagents: ['SO2'],
      source: 'common practice (pH threshold); SO2 statements from typical supplier SDS, from memory',
      ...withStep(state),
    },
    text,
    SO2_CODES,
  );
}

const EXPOSURE_LIMITS: readonly [string, number][] = [
  ['OSHA PEL, 8-h TWA', 50],
  ['NIOSH REL, TWA', 25],
  ['NIOSH REL, STEL', 35],
  ['ACGIH TLV, TWA', 25],
  ['ACGIH TLV, STEL', 35],
  ['IDLH', 300],
];

function ammoniaVapour(ctx: Context): Hazard | null {
  const state = ctx.states.find((s) => ammoniaTotal(s.totals) >= ctx.t.ammoniaVapourMolPerL);
  if (!state) return null;
  const free = state.solution?.free.NH3;
  const evidence = [
    ...stepEvidence(state),
    ev('Total ammonia (NH3 + NH4+)', ammoniaTotal(state.totals), 'mol/L'),
    ...(free !== undefined ? [ev('Free NH3', free, 'mol/L', ENGINE_NOTE)] : []),
    ev('Caution from', ctx.t.ammoniaVapourMolPerL, 'mol/L', 'threshold'),
    ...EXPOSURE_LIMITS.map(([label, ppm]) => ev(`Ammonia exposure limit: ${label}`, ppm, 'ppm', EXPOSURE_NOTE)),
  ];
  const low =
    state.pH !== null && state.pH < 8
      ? ` At pH ${phText(state.pH)} nearly all of it is held as ammonium and little is volatile while the pH stays low; raising the pH releases it.`
      : '';
  const text =
    'Ammonia solutions give off ammonia vapour, which burns the eyes and irritates the airways. Work under extraction or with good ventilation and keep containers closed.' + low;
  return hazard(
    {
      rule: 'ammonia_vapour',
      severity: 'caution',
      flag: false,
      title: 'Ammonia vapour',
      evidence,
      reagents: ['aqueous ammonia'],
      source: `${EXPOSURE_NOTE}; aqueous ammonia statements from typical supplier SDS, from memory`,
      ...withStep(state),
    },
    text,
    AMMONIA_CODES,
  );
}

function unique<T>(list: readonly T[]): T[] {
  return [...new Set(list)];
}

/** Every rule that fires on the situation, in HAZARD_RULES order (per-step hazards in step order). */
export function evaluateHazards(situation: HazardSituation, thresholds: HazardThresholds): Hazard[] {
  const s: Partial<HazardSituation> = isRecord(situation) ? situation : {};
  const base = cleanState({ totals: s.totals, pH: s.pH, solution: s.solution });
  const steps = cleanSteps(s.steps);
  const reagents = [...(Array.isArray(s.reagents) ? s.reagents : []), ...steps.map((st) => st.reagent)].filter((r): r is string => typeof r === 'string' && r.trim() !== '');
  const ctx: Context = { t: cleanThresholds(thresholds), base, steps, states: [base, ...steps.map((st) => st.after)], reagents };
  return [
    cyanidePresent(ctx),
    ...cyanideLowPh(ctx),
    ...acidIntoCyanide(ctx),
    ammoniacalSilver(ctx),
    acidifiedThiosulfate(ctx),
    ammoniaVapour(ctx),
  ].filter((h): h is Hazard => h !== null);
}
