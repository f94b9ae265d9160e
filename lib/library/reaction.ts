// Reactions as the library stores them: species with signed coefficients, written as a readable
// equation ("Ag+ + 2 NH3 = Ag(NH3)2+"), checked for balance of atoms and charge, and the one
// species each constant defines (the complex, the solid, the protonated base).
import { analyseFormula, UnitsInputError } from '@/lib/units';
import type { ConstantKind, Term } from '@/shared/constants';

/** A problem with a reaction; `field` is "reaction" or "kind". */
export class ReactionError extends Error {
  constructor(
    readonly field: 'reaction' | 'kind',
    message: string,
  ) {
    super(message);
    this.name = 'ReactionError';
  }
}

export interface Reaction {
  reactants: Term[];
  products: Term[];
}

const ARROWS = /\s*(?:<=>|⇌|=)\s*/;
const PLUS = /\s+\+\s+/;
const COEFFICIENT = /^(\d+(?:\.\d+)?)\s*(?=\S)/;

function parseSide(text: string, side: 'left' | 'right'): Term[] {
  const trimmed = text.trim();
  if (trimmed === '') throw new ReactionError('reaction', `the ${side} side of the reaction is empty`);
  const terms: Term[] = [];
  for (const raw of trimmed.split(PLUS)) {
    const part = raw.trim();
    const m = COEFFICIENT.exec(part);
    const coefficient = m ? Number(m[1]) : 1;
    const species = (m ? part.slice(m[0].length) : part).trim();
    if (species === '') throw new ReactionError('reaction', `"${part}" on the ${side} side has a number but no species`);
    if (!(coefficient > 0) || coefficient > 20) {
      throw new ReactionError('reaction', `the coefficient of ${species} must be a number between 0 and 20`);
    }
    if (/\s/.test(species)) {
      throw new ReactionError('reaction', `"${species}" is not one species: put " + " (with spaces) between species`);
    }
    const same = terms.find((t) => t.species === species);
    if (same) same.coefficient += coefficient;
    else terms.push({ species, coefficient });
  }
  return terms;
}

/** Reads "Ag+ + 2 NH3 = Ag(NH3)2+" (also "⇌" or "<=>"); species are separated by " + " with spaces. */
export function parseReaction(text: string): Reaction {
  if (typeof text !== 'string' || text.trim() === '') {
    throw new ReactionError('reaction', 'write the reaction, e.g. "Ag+ + 2 NH3 = Ag(NH3)2+"');
  }
  const sides = text.split(ARROWS);
  if (sides.length !== 2) {
    throw new ReactionError('reaction', 'write one "=" between the two sides, e.g. "Ag+ + 2 NH3 = Ag(NH3)2+"');
  }
  const reactants = parseSide(sides[0] as string, 'left');
  const products = parseSide(sides[1] as string, 'right');
  for (const t of reactants) {
    if (products.some((p) => p.species === t.species)) {
      throw new ReactionError('reaction', `${t.species} appears on both sides`);
    }
  }
  return { reactants, products };
}

function termText(t: Term): string {
  return t.coefficient === 1 ? t.species : `${t.coefficient} ${t.species}`;
}

/** The readable equation: "Ag+ + 2 NH3 = Ag(NH3)2+". */
export function formatReaction(r: Reaction): string {
  return `${r.reactants.map(termText).join(' + ')} = ${r.products.map(termText).join(' + ')}`;
}

/** A key that is the same for the same reaction however it was typed (order of terms ignored). */
export function reactionKey(r: Reaction): string {
  const side = (ts: Term[]) =>
    ts
      .map(termText)
      .sort()
      .join(' + ');
  return `${side(r.reactants)} = ${side(r.products)}`;
}

/** Checks that atoms and charge balance; throws ReactionError naming what does not. */
export function checkBalance(r: Reaction): void {
  const atoms = new Map<string, number>();
  let charge = 0;
  const add = (terms: Term[], sign: number) => {
    for (const t of terms) {
      let parsed;
      try {
        parsed = analyseFormula(t.species);
      } catch (e) {
        const why = e instanceof UnitsInputError ? `: ${e.message}` : '';
        throw new ReactionError('reaction', `cannot read the formula "${t.species}"${why}`);
      }
      for (const [el, n] of parsed.counts) atoms.set(el, (atoms.get(el) ?? 0) + sign * t.coefficient * n.toNumber());
      charge += sign * t.coefficient * parsed.charge;
    }
  };
  add(r.reactants, 1);
  add(r.products, -1);
  for (const [el, diff] of atoms) {
    if (Math.abs(diff) > 1e-9) {
      const left = sumAtoms(r.reactants, el);
      const right = sumAtoms(r.products, el);
      throw new ReactionError('reaction', `the reaction does not balance: ${left} ${el} on the left, ${right} on the right`);
    }
  }
  if (Math.abs(charge) > 1e-9) {
    const left = sumCharge(r.reactants);
    const right = sumCharge(r.products);
    throw new ReactionError('reaction', `the charges do not balance: ${signed(left)} on the left, ${signed(right)} on the right`);
  }
}

function sumAtoms(ts: Term[], el: string): number {
  let n = 0;
  for (const t of ts) n += t.coefficient * (analyseFormula(t.species).counts.get(el)?.toNumber() ?? 0);
  return Math.round(n * 1e6) / 1e6;
}

function sumCharge(ts: Term[]): number {
  let n = 0;
  for (const t of ts) n += t.coefficient * analyseFormula(t.species).charge;
  return Math.round(n * 1e6) / 1e6;
}

function signed(n: number): string {
  return n > 0 ? `+${n}` : String(n);
}

/** Whether a formula names a solid ("AgCl(s)"). */
export function isSolidFormula(formula: string): boolean {
  return /\(s\)$/.test(formula);
}

const WATER = 'H2O';
const PROTON = 'H+';

/**
 * The species a constant defines, and checks the reaction fits its kind:
 * - solubility_product: one solid on the left, dissolved species on the right ("AgCl(s) = Ag+ + Cl-");
 * - cumulative_formation: one product, at least two reactants ("Ag+ + 2 NH3 = Ag(NH3)2+");
 * - stepwise_formation: one product from one species and one ligand ("Ag(NH3)+ + NH3 = Ag(NH3)2+");
 * - protonation: H+ on the left, one product ("H+ + CN- = HCN"); when the product is water the
 *   base is the species defined ("H+ + OH- = H2O" defines OH- through the ion product of water).
 */
export function definedSpecies(kind: ConstantKind, r: Reaction): string {
  const solidsLeft = r.reactants.filter((t) => isSolidFormula(t.species));
  const solidsRight = r.products.filter((t) => isSolidFormula(t.species));
  if (kind === 'solubility_product') {
    if (solidsLeft.length !== 1 || r.reactants.length !== 1 || (solidsLeft[0] as Term).coefficient !== 1) {
      throw new ReactionError('reaction', 'a solubility product is written for one solid dissolving: "AgCl(s) = Ag+ + Cl-"');
    }
    if (solidsRight.length > 0) throw new ReactionError('reaction', 'a solubility product has only dissolved species on the right');
    return (solidsLeft[0] as Term).species;
  }
  if (solidsLeft.length + solidsRight.length > 0) {
    throw new ReactionError('kind', 'a reaction with a solid in it is a solubility product: choose that kind and write the solid on the left');
  }
  if (r.products.length !== 1 || (r.products[0] as Term).coefficient !== 1) {
    throw new ReactionError('reaction', 'a formation or protonation constant has one product on the right, with coefficient 1');
  }
  const product = (r.products[0] as Term).species;
  if (kind === 'cumulative_formation') {
    if (r.reactants.length < 2) throw new ReactionError('reaction', 'a formation constant has the metal ion and the ligand(s) on the left');
    return product;
  }
  if (kind === 'stepwise_formation') {
    if (r.reactants.length !== 2 || r.reactants.some((t) => t.coefficient !== 1)) {
      throw new ReactionError('reaction', 'a stepwise constant adds one ligand to one species: "Ag(NH3)+ + NH3 = Ag(NH3)2+"');
    }
    return product;
  }
  const proton = r.reactants.find((t) => t.species === PROTON);
  if (!proton || proton.coefficient !== 1 || r.reactants.length !== 2) {
    throw new ReactionError('reaction', 'a protonation constant adds one H+ to one base: "H+ + CN- = HCN"');
  }
  if (product === WATER) return (r.reactants.find((t) => t.species !== PROTON) as Term).species;
  return product;
}

/** Signed stoichiometry (products positive, reactants negative). */
export function signedTerms(r: Reaction): Term[] {
  return [...r.reactants.map((t) => ({ species: t.species, coefficient: -t.coefficient })), ...r.products];
}

/** Rebuilds reactants and products from signed terms. */
export function fromSignedTerms(terms: readonly Term[]): Reaction {
  return {
    reactants: terms.filter((t) => t.coefficient < 0).map((t) => ({ species: t.species, coefficient: -t.coefficient })),
    products: terms.filter((t) => t.coefficient > 0).map((t) => ({ species: t.species, coefficient: t.coefficient })),
  };
}

/** A reaction checked against its kind and the catalogue, ready to store. */
export interface CheckedReaction {
  reaction: string;
  key: string;
  defines: string;
  /** Signed, in written order. */
  terms: Term[];
}

/** Parses and checks a reaction for a kind; throws ReactionError. */
export function checkReaction(kind: ConstantKind, text: string): CheckedReaction {
  const parsed = parseReaction(text);
  checkBalance(parsed);
  const defines = definedSpecies(kind, parsed);
  return { reaction: formatReaction(parsed), key: reactionKey(parsed), defines, terms: signedTerms(parsed) };
}
