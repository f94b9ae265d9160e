// Reactions as people type them: parsing, the readable form, balance and the species defined.
import { checkBalance, definedSpecies, formatReaction, parseReaction, reactionKey, ReactionError } from '@/lib/library/reaction';
import type { ConstantKind } from '@/shared/constants';

function problem(fn: () => unknown): string {
  try {
    fn();
  } catch (e) {
    if (e instanceof ReactionError) return `${e.field}: ${e.message}`;
    throw e;
  }
  return 'no problem';
}

describe('parseReaction and formatReaction', () => {
  it('reads coefficients and charges and writes the equation back the same way', () => {
    const r = parseReaction('  Ag+ +  2 NH3 =  Ag(NH3)2+ ');
    expect(r).toEqual({ reactants: [{ species: 'Ag+', coefficient: 1 }, { species: 'NH3', coefficient: 2 }], products: [{ species: 'Ag(NH3)2+', coefficient: 1 }] });
    expect(formatReaction(r)).toBe('Ag+ + 2 NH3 = Ag(NH3)2+');
    expect(formatReaction(parseReaction('Cu(OH)2(s) ⇌ Cu+2 + 2 OH-'))).toBe('Cu(OH)2(s) = Cu+2 + 2 OH-');
  });

  it('gives the same key however the terms are ordered', () => {
    expect(reactionKey(parseReaction('2 NH3 + Ag+ = Ag(NH3)2+'))).toBe(reactionKey(parseReaction('Ag+ + 2 NH3 = Ag(NH3)2+')));
  });

  it('says what is wrong with a badly written reaction', () => {
    expect(problem(() => parseReaction('Ag+ + 2 NH3'))).toMatch(/^reaction: write one "="/);
    expect(problem(() => parseReaction(' = AgCl(s)'))).toMatch(/left side of the reaction is empty/);
    expect(problem(() => parseReaction('Ag+ +2 NH3 = Ag(NH3)2+'))).toMatch(/not one species/);
    expect(problem(() => parseReaction('Ag+ + Ag+ = Ag+'))).toMatch(/both sides/);
  });
});

describe('checkBalance', () => {
  it('accepts balanced reactions, water included', () => {
    expect(problem(() => checkBalance(parseReaction('H+ + OH- = H2O')))).toBe('no problem');
    expect(problem(() => checkBalance(parseReaction('Ag2S(s) = 2 Ag+ + S-2')))).toBe('no problem');
  });

  it('names the element or the charge that does not balance', () => {
    expect(problem(() => checkBalance(parseReaction('Ag+ + NH3 = Ag(NH3)2+')))).toBe('reaction: the reaction does not balance: 1 N on the left, 2 on the right');
    expect(problem(() => checkBalance(parseReaction('Ag+ + 2 CN- = Ag(CN)2+')))).toBe('reaction: the charges do not balance: -1 on the left, +1 on the right');
    expect(problem(() => checkBalance(parseReaction('Ag+ + Qq- = AgQq')))).toMatch(/cannot read the formula "Qq-"/);
  });
});

describe('definedSpecies', () => {
  const defines = (kind: ConstantKind, text: string) => definedSpecies(kind, parseReaction(text));

  it('is the solid of a Ksp, the product of a formation constant, and the base for water', () => {
    expect(defines('solubility_product', 'AgCl(s) = Ag+ + Cl-')).toBe('AgCl(s)');
    expect(defines('cumulative_formation', 'Ag+ + 2 CN- = Ag(CN)2-')).toBe('Ag(CN)2-');
    expect(defines('stepwise_formation', 'Ag(NH3)+ + NH3 = Ag(NH3)2+')).toBe('Ag(NH3)2+');
    expect(defines('protonation', 'H+ + CN- = HCN')).toBe('HCN');
    expect(defines('protonation', 'H+ + OH- = H2O')).toBe('OH-');
  });

  it('refuses a reaction that does not fit its kind', () => {
    expect(problem(() => defines('solubility_product', 'Ag+ + Cl- = AgCl(s)'))).toMatch(/one solid dissolving/);
    expect(problem(() => defines('cumulative_formation', 'AgCl(s) = Ag+ + Cl-'))).toMatch(/^kind: .*solubility product/);
    expect(problem(() => defines('stepwise_formation', 'Ag+ + 2 NH3 = Ag(NH3)2+'))).toMatch(/adds one ligand/);
    expect(problem(() => defines('protonation', 'Ag+ + CN- = AgCN'))).toMatch(/adds one H\+/);
  });
});
