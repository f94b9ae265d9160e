// The system builder: from library constants (each a reaction among catalogue species) to the
// engine's problem for chosen metal ions, ligands and counter-ions at a pH. Every dissolved
// species and solid is expressed through the components by chaining the constants that define
// it (a stepwise K on top of the previous complex, a hydroxo complex through the ion product of
// water, a Ksp written with OH-), and the result lists each constant version it drew on.
import { vantHoff } from '@/lib/engine';
import type { ProblemJson } from '@/shared/constants';
import {
  BASIS_ROLES,
  type ConstantKind,
  type ConstantStatus,
  type ConstantUse,
  type SpeciesRole,
  type Term,
} from '@/shared/constants';

import { isSolidFormula } from './reaction';

/** A constant version as the builder needs it. */
export interface LibraryConstant {
  id: number;
  lineageId: string;
  version: number;
  status: ConstantStatus;
  kind: ConstantKind;
  reaction: string;
  /** Signed terms: products positive, reactants negative. */
  terms: Term[];
  /** The species this constant defines. */
  defines: string;
  logValue: number;
  temperatureC: number;
  ionicStrength: number;
  enthalpyKjMol: number | null;
  source: string;
}

/** A catalogue entry: formula and role. */
export interface CatalogueEntry {
  formula: string;
  role: SpeciesRole;
}

/** What to build (shared/constants.ts systemRequestSchema, already parsed). */
export interface BuildSelection {
  metals: string[];
  ligands: string[];
  counterIons: string[];
  solids?: string[];
  totals: Record<string, number>;
  pH?: number;
  activity: 'ideal' | 'davies';
  temperatureC: number;
  includeDrafts: boolean;
}

export interface BuildOutput {
  problem: ProblemJson;
  constants: ConstantUse[];
  drafts: ConstantUse[];
  availableSolids: string[];
  warnings: string[];
}

/** A selection the library cannot build; `field` names the request field to fix. */
export class BuildError extends Error {
  constructor(
    readonly field: string,
    message: string,
  ) {
    super(message);
    this.name = 'BuildError';
  }
}

const PROTON = 'H+';
const WATER = 'H2O';

/** A species written through the components: log K of formation, stoichiometry, constants used. */
interface Derived {
  logK: number;
  stoich: Map<string, number>;
  uses: Set<number>;
  /** Enthalpy of formation from the components, kJ/mol, when every constant used has one. */
  deltaH: number | null;
}

const ROLE_OF_LIST: Record<'metals' | 'ligands' | 'counterIons', SpeciesRole> = {
  metals: 'metal',
  ligands: 'ligand',
  counterIons: 'counter_ion',
};

/** The component list: chosen ions in order, then H+ when a pH is set. Checks each against the catalogue. */
function chooseComponents(sel: SelectionChoice, roles: Map<string, SpeciesRole>): string[] {
  const components: string[] = [];
  for (const list of ['metals', 'ligands', 'counterIons'] as const) {
    sel[list].forEach((formula, i) => {
      const role = roles.get(formula);
      const want = ROLE_OF_LIST[list];
      if (role === undefined) throw new BuildError(`${list}.${i}`, `"${formula}" is not in the species catalogue`);
      if (role !== want) throw new BuildError(`${list}.${i}`, `"${formula}" is a ${role.replace('_', '-')}, not a ${want.replace('_', '-')}`);
      if (components.includes(formula)) throw new BuildError(`${list}.${i}`, `"${formula}" is chosen twice`);
      components.push(formula);
    });
  }
  if (sel.pH !== undefined) components.push(PROTON);
  return components;
}

/** Per defined species, the version to use: approved, or with drafts the newest draft. */
function pickVersions(all: readonly LibraryConstant[], includeDrafts: boolean): LibraryConstant[] {
  const byDefines = new Map<string, LibraryConstant>();
  for (const c of all) {
    if (c.status === 'approved') {
      const held = byDefines.get(c.defines);
      if (!held || (held.status === 'approved' && c.id > held.id)) byDefines.set(c.defines, c);
    } else if (c.status === 'draft' && includeDrafts) {
      const held = byDefines.get(c.defines);
      if (!held || held.status !== 'draft' || c.id > held.id) byDefines.set(c.defines, c);
    }
  }
  return [...byDefines.values()].sort((a, b) => a.id - b.id);
}

/** log K of a constant at the solution temperature, and whether it had to be used unchanged. */
function atTemperature(c: LibraryConstant, temperatureC: number): { logK: number; unchanged: boolean } {
  if (Math.abs(c.temperatureC - temperatureC) < 1e-9) return { logK: c.logValue, unchanged: false };
  if (c.enthalpyKjMol === null) return { logK: c.logValue, unchanged: true };
  return { logK: vantHoff(c.logValue, c.enthalpyKjMol, c.temperatureC, temperatureC), unchanged: false };
}

/** Writes the defined species of `c` through already derived species; null if a term is not known yet. */
function derive(c: LibraryConstant, known: Map<string, Derived>, logK: number): Derived | null {
  const own = c.terms.find((t) => t.species === c.defines);
  if (!own) return null;
  let sumLog = 0;
  let sumH: number | null = c.enthalpyKjMol;
  const stoich = new Map<string, number>();
  const uses = new Set<number>([c.id]);
  for (const t of c.terms) {
    if (t.species === c.defines) continue;
    const d = known.get(t.species);
    if (!d) return null;
    sumLog += t.coefficient * d.logK;
    sumH = sumH === null || d.deltaH === null ? null : sumH - t.coefficient * d.deltaH;
    for (const [comp, n] of d.stoich) stoich.set(comp, (stoich.get(comp) ?? 0) - (t.coefficient * n) / own.coefficient);
    for (const id of d.uses) uses.add(id);
  }
  // sum(nu_i log a_i) = log K over all terms, solved for the defined species.
  const derivedLogK = (logK - sumLog) / own.coefficient;
  const deltaH = sumH === null ? null : sumH / own.coefficient;
  for (const [comp, n] of stoich) if (Math.abs(n) < 1e-12) stoich.delete(comp);
  return { logK: derivedLogK, stoich, uses, deltaH };
}

function round(x: number): number {
  return Math.round(x * 1e10) / 1e10;
}

function toUse(c: LibraryConstant): ConstantUse {
  return {
    id: c.id,
    lineageId: c.lineageId,
    version: c.version,
    status: c.status,
    kind: c.kind,
    reaction: c.reaction,
    logValue: c.logValue,
    temperatureC: c.temperatureC,
    source: c.source,
  };
}

/** The parts of a selection a build depends on besides the library: everything but the totals and the pH value. */
export type SelectionChoice = Omit<BuildSelection, 'totals' | 'pH'> & { pH?: unknown };

/**
 * What a build takes from the library and the choice of ions, solids, activity, temperature and
 * drafts (whether a pH is given counts; its value and the totals do not). Callers may keep it for
 * the same library and choice (selectionKey) and finish it for any totals with completeBuild.
 */
export interface SelectionBuild {
  components: string[];
  species: ProblemJson['species'];
  /** The solids asked for that can form (all that can, when none were asked for). */
  solids: ProblemJson['solids'];
  availableSolids: string[];
  constants: ConstantUse[];
  drafts: ConstantUse[];
  /** Warnings about the constants used (temperature, medium, drafts), in that order. */
  notes: string[];
}

/** A text that is equal for two selections exactly when buildSelection gives the same for them. */
export function selectionKey(sel: SelectionChoice): string {
  return JSON.stringify([sel.metals, sel.ligands, sel.counterIons, sel.solids ?? null, sel.pH !== undefined, sel.activity, sel.temperatureC, sel.includeDrafts]);
}

/** The library-dependent part of a build; throws BuildError for an ion the catalogue does not allow. */
export function buildSelection(catalogue: readonly CatalogueEntry[], library: readonly LibraryConstant[], sel: SelectionChoice): SelectionBuild {
  const roles = new Map(catalogue.map((s) => [s.formula, s.role]));
  const components = chooseComponents(sel, roles);

  const known = new Map<string, Derived>();
  for (const comp of components) known.set(comp, { logK: 0, stoich: new Map([[comp, 1]]), uses: new Set(), deltaH: 0 });
  known.set(WATER, { logK: 0, stoich: new Map(), uses: new Set(), deltaH: 0 });

  const chosen = pickVersions(library, sel.includeDrafts);
  const unchanged = new Set<string>();
  const otherMedium = new Set<string>();
  let pending = chosen.filter((c) => !BASIS_ROLES.includes(roles.get(c.defines) ?? 'complex'));
  for (let progress = true; progress && pending.length > 0; ) {
    progress = false;
    const next: LibraryConstant[] = [];
    for (const c of pending) {
      const t = atTemperature(c, sel.temperatureC);
      const d = derive(c, known, t.logK);
      if (!d) {
        next.push(c);
        continue;
      }
      known.set(c.defines, d);
      if (t.unchanged) unchanged.add(c.reaction);
      if (c.ionicStrength > 0 && sel.activity === 'davies') otherMedium.add(c.reaction);
      progress = true;
    }
    pending = next;
  }

  const derivedNames = [...known.keys()].filter((n) => !components.includes(n) && n !== WATER);
  const availableSolids = derivedNames.filter(isSolidFormula).sort();
  const solidNames = sel.solids ? availableSolids.filter((s) => sel.solids?.includes(s)) : availableSolids;
  const speciesNames = derivedNames.filter((n) => !isSolidFormula(n));

  const usedIds = new Set<number>();
  const asStoich = (d: Derived) => Object.fromEntries([...d.stoich].map(([k, v]) => [k, round(v)]));
  const species = speciesNames.map((name) => {
    const d = known.get(name) as Derived;
    d.uses.forEach((id) => usedIds.add(id));
    return { name, logK: round(d.logK), stoich: asStoich(d), temperatureC: sel.temperatureC };
  });
  const solids = solidNames.map((name) => {
    const d = known.get(name) as Derived;
    d.uses.forEach((id) => usedIds.add(id));
    // A solid's formation from the components is the reverse of its dissolution: log Ksp = -log K.
    return { name, logKsp: round(-d.logK), stoich: asStoich(d), temperatureC: sel.temperatureC };
  });

  const used = chosen.filter((c) => usedIds.has(c.id));
  const notes: string[] = [];
  const usedReactions = new Set(used.map((c) => c.reaction));
  const notCorrected = [...unchanged].filter((r) => usedReactions.has(r));
  if (notCorrected.length > 0) {
    notes.push(`No enthalpy is known for ${notCorrected.join('; ')}: the value at its own temperature is used at ${sel.temperatureC} °C.`);
  }
  const media = [...otherMedium].filter((r) => usedReactions.has(r));
  if (media.length > 0) {
    notes.push(`Measured in a background medium rather than extrapolated to I = 0, yet corrected with Davies as if thermodynamic: ${media.join('; ')}.`);
  }
  const drafts = used.filter((c) => c.status === 'draft');
  if (drafts.length > 0) notes.push(`Uses ${drafts.length} draft value${drafts.length === 1 ? '' : 's'} not yet reviewed: ${drafts.map((c) => c.reaction).join('; ')}.`);

  return { components, species, solids, availableSolids, constants: used.map(toUse), drafts: drafts.map(toUse), notes };
}

/**
 * Finishes a build for the selection's totals and pH; throws BuildError naming the field (a total
 * for an ion not chosen, a solid that cannot form). Reads `part` only, so a kept part can be shared.
 */
export function completeBuild(part: SelectionBuild, sel: BuildSelection): BuildOutput {
  const { components, availableSolids } = part;
  for (const key of Object.keys(sel.totals)) {
    if (key === PROTON && sel.pH !== undefined) throw new BuildError(`totals.${key}`, 'give either a pH or a total for H+, not both');
    if (!components.includes(key)) throw new BuildError(`totals.${key}`, `"${key}" is not one of the chosen ions; choose it or remove its total`);
  }
  sel.solids?.forEach((s, i) => {
    if (!availableSolids.includes(s)) {
      const list = availableSolids.length ? availableSolids.join(', ') : 'none';
      throw new BuildError(`solids.${i}`, `"${s}" cannot form from the chosen ions (those that can: ${list})`);
    }
  });

  const totals: Record<string, number> = {};
  for (const comp of components) if (comp !== PROTON) totals[comp] = sel.totals[comp] ?? 0;
  const fixed: Record<string, number> = sel.pH !== undefined ? { [PROTON]: 10 ** -sel.pH } : {};
  const warnings = sel.pH === undefined ? ['No pH given: protonated ligands, hydroxo complexes and hydroxide solids are left out.', ...part.notes] : [...part.notes];
  return {
    problem: { components, totals, fixed, species: part.species, solids: part.solids, activity: sel.activity, temperatureC: sel.temperatureC },
    constants: part.constants,
    drafts: part.drafts,
    availableSolids,
    warnings,
  };
}

/** Builds the engine problem for a selection from the library; throws BuildError naming the field to fix. */
export function buildSystem(catalogue: readonly CatalogueEntry[], library: readonly LibraryConstant[], sel: BuildSelection): BuildOutput {
  return completeBuild(buildSelection(catalogue, library, sel), sel);
}
