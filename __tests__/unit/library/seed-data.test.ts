// The seeded starting library (db/seed/library-data.ts) is well formed: every reaction reads,
// balances and fits its kind; every species is in the catalogue; every complex and solid is
// defined by exactly one constant; sources are named; and the coverage the product needs is there.
import { SEED_CONSTANTS, SEED_SPECIES, type SeedConstant, type SeedSpecies } from '@/db/seed/library-data';
import { checkBalance, definedSpecies, isSolidFormula, parseReaction, type Reaction } from '@/lib/library/reaction';
import { analyseFormula } from '@/lib/units';
import { BASIS_ROLES, proposalSchema } from '@/shared/constants';

// Sources transcribed from a printed table in hand. None yet: every seeded value was written from
// memory, so every source must say so. Add a source here only with the table open beside it.
const TRANSCRIBED_SOURCES: readonly string[] = [];

const REQUIRED_METALS = ['Ag+', 'Cu+', 'Cu+2', 'Au+', 'Zn+2', 'Cd+2', 'Ni+2', 'Pb+2'];
const REQUIRED_LIGANDS = ['NH3', 'CN-', 'S2O3-2', 'SCN-', 'Cl-', 'Br-', 'I-', 'S-2'];
const REQUIRED_COUNTER_IONS = ['Na+', 'K+', 'NO3-', 'SO4-2'];

const REQUIRED_SOLIDS = [
  'AgCl(s)',
  'AgBr(s)',
  'AgI(s)',
  'AgCN(s)',
  'AgSCN(s)',
  'Ag2S(s)',
  'AgOH(s)',
  'CuCN(s)',
  'CuCl(s)',
  'CuI(s)',
  'CuSCN(s)',
  'Cu(OH)2(s)',
  'Zn(CN)2(s)',
  'Zn(OH)2(s)',
  'Cd(OH)2(s)',
  'Ni(OH)2(s)',
  'Pb(OH)2(s)',
  'PbI2(s)',
  'PbCl2(s)',
  'PbBr2(s)',
];

// Each base and the acids its protonation constants must define (two steps for S-2 and CO3-2).
const REQUIRED_PROTONATION: [string, string[]][] = [
  ['OH-', ['H2O']],
  ['NH3', ['NH4+']],
  ['CN-', ['HCN']],
  ['S2O3-2', ['HS2O3-']],
  ['SCN-', ['HSCN']],
  ['S-2', ['HS-', 'H2S']],
  ['CO3-2', ['HCO3-', 'H2CO3']],
];

// Metal and ligand pairs that matter in plating and fixing: at least one constant (a complex or a
// solid) must have both in its reaction. OH- stands for hydrolysis and hydroxide solids.
const REQUIRED_PAIRS: [string, string[]][] = [
  ['Ag+', ['NH3', 'CN-', 'S2O3-2', 'SCN-', 'Cl-', 'Br-', 'I-', 'S-2', 'OH-']],
  ['Cu+', ['NH3', 'CN-', 'S2O3-2', 'SCN-', 'Cl-', 'Br-', 'I-']],
  ['Cu+2', ['NH3', 'OH-']],
  ['Au+', ['CN-', 'S2O3-2']],
  ['Zn+2', ['NH3', 'CN-', 'OH-']],
  ['Cd+2', ['NH3', 'CN-', 'OH-', 'Cl-']],
  ['Ni+2', ['NH3', 'CN-', 'OH-']],
  ['Pb+2', ['Cl-', 'Br-', 'I-', 'OH-']],
];

// Salts shops buy, by formula; each must be in the catalogue with at least one alias or name.
const REQUIRED_SALTS = ['NaCN', 'KCN', 'AgNO3', 'K[Ag(CN)2]', 'K[Au(CN)2]', 'Na2S2O3·5H2O', '(NH4)2S2O3', 'NaOH', 'KOH', 'CuSO4·5H2O', 'NaCl', 'KSCN'];

const BASIS = new Set<string>(BASIS_ROLES);
const byFormula = new Map<string, SeedSpecies>(SEED_SPECIES.map((s) => [s.formula, s]));

function reactionOf(c: SeedConstant): Reaction {
  return parseReaction(c.reaction);
}

function speciesIn(c: SeedConstant): string[] {
  const r = reactionOf(c);
  return [...r.reactants, ...r.products].map((t) => t.species);
}

function definedBy(c: SeedConstant): string {
  return definedSpecies(c.kind, reactionOf(c));
}

function roleOf(formula: string): string | undefined {
  return byFormula.get(formula)?.role;
}

function isBasis(formula: string): boolean {
  const role = roleOf(formula);
  return role !== undefined && BASIS.has(role);
}

/** How many constants define each species. */
function definitionCounts(): Map<string, number> {
  const counts = new Map<string, number>();
  for (const c of SEED_CONSTANTS) {
    const d = definedBy(c);
    counts.set(d, (counts.get(d) ?? 0) + 1);
  }
  return counts;
}

const constantCases = SEED_CONSTANTS.map((c) => [c.reaction, c] as const);

describe('seeded reactions', () => {
  it.each(constantCases)('%s parses, balances and fits its kind', (_reaction, c) => {
    const r = reactionOf(c);
    expect(() => checkBalance(r)).not.toThrow();
    expect(() => definedSpecies(c.kind, r)).not.toThrow();
  });

  it.each(constantCases)('%s passes the proposal checks the API applies', (_reaction, c) => {
    const parsed = proposalSchema.safeParse(c);
    expect(parsed.success ? [] : parsed.error.issues).toEqual([]);
  });

  it('names only species in the catalogue, and never a salt', () => {
    const missing: string[] = [];
    const salts: string[] = [];
    for (const c of SEED_CONSTANTS) {
      for (const s of speciesIn(c)) {
        if (!byFormula.has(s)) missing.push(`${s} in ${c.reaction}`);
        else if (roleOf(s) === 'salt') salts.push(`${s} in ${c.reaction}`);
      }
    }
    expect(missing).toEqual([]);
    expect(salts).toEqual([]);
  });

  it('defines a solid by a solubility product and a complex by any other kind, never a basis species', () => {
    const wrong: string[] = [];
    for (const c of SEED_CONSTANTS) {
      const d = definedBy(c);
      const want = c.kind === 'solubility_product' ? 'solid' : 'complex';
      if (roleOf(d) !== want) wrong.push(`${c.reaction} defines ${d} (role ${roleOf(d)}, want ${want})`);
    }
    expect(wrong).toEqual([]);
  });

  it('defines no species twice', () => {
    const twice = [...definitionCounts()].filter(([, n]) => n > 1).map(([s]) => s);
    expect(twice).toEqual([]);
  });

  it('defines every non-basis species that a reaction names', () => {
    const counts = definitionCounts();
    const undefinedOnes = new Set<string>();
    for (const c of SEED_CONSTANTS) {
      for (const s of speciesIn(c)) if (!isBasis(s) && counts.get(s) !== 1) undefinedOnes.add(s);
    }
    expect([...undefinedOnes]).toEqual([]);
  });

  it('defines every complex and solid in the catalogue exactly once', () => {
    const counts = definitionCounts();
    const wrong = SEED_SPECIES.filter((s) => s.role === 'complex' || s.role === 'solid')
      .filter((s) => counts.get(s.formula) !== 1)
      .map((s) => s.formula);
    expect(wrong).toEqual([]);
  });

  it('writes H+ only in protonation constants (hydroxo species are written with OH-)', () => {
    const withProton = SEED_CONSTANTS.filter((c) => c.kind !== 'protonation' && speciesIn(c).includes('H+'));
    expect(withProton.map((c) => c.reaction)).toEqual([]);
  });

  it('is for 25 C, with I = 0 wherever the medium is the extrapolated one', () => {
    for (const c of SEED_CONSTANTS) {
      expect(c.temperatureC).toBe(25);
      if (c.medium === 'I → 0 (extrapolated)') expect(c.ionicStrength).toBe(0);
      else expect(c.medium.length).toBeGreaterThan(0);
    }
  });
});

describe('seeded sources', () => {
  it('names a source for every constant', () => {
    const empty = SEED_CONSTANTS.filter((c) => c.source.trim().length < 3).map((c) => c.reaction);
    expect(empty).toEqual([]);
  });

  it('says "from memory" for every source not transcribed from a table in hand', () => {
    const unmarked = SEED_CONSTANTS.filter((c) => !TRANSCRIBED_SOURCES.includes(c.source))
      .filter((c) => !c.source.includes('from memory'))
      .map((c) => c.reaction);
    expect(unmarked).toEqual([]);
  });

  it('says "from memory" in any note that gives outside values as facts from a named table', () => {
    const unmarked = SEED_CONSTANTS.filter((c) => (c.note ?? '').includes('NBS Tables') && !(c.note ?? '').includes('from memory'));
    expect(unmarked.map((c) => c.reaction)).toEqual([]);
  });
});

describe('seeded species', () => {
  it('has each formula once', () => {
    const seen = new Set<string>();
    const twice: string[] = [];
    for (const s of SEED_SPECIES) {
      if (seen.has(s.formula)) twice.push(s.formula);
      seen.add(s.formula);
    }
    expect(twice).toEqual([]);
  });

  it.each(SEED_SPECIES.map((s) => [s.formula, s] as const))('%s parses as a formula', (formula) => {
    expect(() => analyseFormula(formula)).not.toThrow();
  });

  it('marks solids, and only solids, with (s)', () => {
    const wrong = SEED_SPECIES.filter((s) => isSolidFormula(s.formula) !== (s.role === 'solid')).map((s) => s.formula);
    expect(wrong).toEqual([]);
  });

  it('gives every species a name, and salts no charge', () => {
    for (const s of SEED_SPECIES) expect(s.name.trim()).not.toBe('');
    const charged = SEED_SPECIES.filter((s) => s.role === 'salt' && analyseFormula(s.formula).charge !== 0).map((s) => s.formula);
    expect(charged).toEqual([]);
  });

  it('has water and the proton as the building blocks', () => {
    expect(roleOf('H2O')).toBe('water');
    expect(roleOf('H+')).toBe('proton');
    expect(roleOf('OH-')).toBe('complex');
  });
});

describe('coverage the product needs', () => {
  it.each(REQUIRED_METALS)('has the metal ion %s', (m) => {
    expect(roleOf(m)).toBe('metal');
  });

  it.each(REQUIRED_LIGANDS)('has the ligand %s', (l) => {
    expect(roleOf(l)).toBe('ligand');
  });

  it.each(REQUIRED_COUNTER_IONS)('has the counter-ion %s', (x) => {
    expect(roleOf(x)).toBe('counter_ion');
  });

  it.each(REQUIRED_SOLIDS)('has a solubility product for %s', (solid) => {
    const found = SEED_CONSTANTS.filter((c) => c.kind === 'solubility_product' && definedBy(c) === solid);
    expect(found).toHaveLength(1);
  });

  it.each(REQUIRED_PROTONATION)('protonates %s', (base, acids) => {
    const products = SEED_CONSTANTS.filter((c) => c.kind === 'protonation').map((c) => reactionOf(c).products[0]?.species);
    for (const acid of acids) expect(products).toContain(acid);
  });

  describe.each(REQUIRED_PAIRS)('%s', (metal, ligands) => {
    it.each(ligands)(`has a constant with ${metal} and %s`, (ligand) => {
      const found = SEED_CONSTANTS.filter((c) => {
        const names = speciesIn(c);
        return names.includes(metal) && names.includes(ligand);
      });
      expect(found.length).toBeGreaterThan(0);
    });
  });

  it.each(REQUIRED_SALTS)('has the salt %s', (salt) => {
    expect(roleOf(salt)).toBe('salt');
  });

  it('knows the trade names shops use', () => {
    const aliases = SEED_SPECIES.flatMap((s) => s.aliases ?? []);
    for (const name of ['hypo', 'caustic soda', 'blue vitriol']) expect(aliases).toContain(name);
  });
});
