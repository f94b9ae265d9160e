// The system builder: library constants (reactions among catalogue species) to the engine's
// problem. Values here are small hand-made libraries, not the seed, so each expectation can be
// worked out by hand beside it.
import { solve } from '@/lib/engine';
import { BuildError, buildSelection, buildSystem, completeBuild, type BuildSelection, type CatalogueEntry, type LibraryConstant, selectionKey } from '@/lib/library/build';
import { checkReaction } from '@/lib/library/reaction';
import type { ConstantKind, ConstantStatus } from '@/shared/constants';

const CATALOGUE: CatalogueEntry[] = [
  { formula: 'Ag+', role: 'metal' },
  { formula: 'Cu+2', role: 'metal' },
  { formula: 'NH3', role: 'ligand' },
  { formula: 'Cl-', role: 'ligand' },
  { formula: 'H+', role: 'proton' },
  { formula: 'H2O', role: 'water' },
  { formula: 'Na+', role: 'counter_ion' },
  { formula: 'OH-', role: 'complex' },
  { formula: 'NH4+', role: 'complex' },
  { formula: 'Ag(NH3)+', role: 'complex' },
  { formula: 'Ag(NH3)2+', role: 'complex' },
  { formula: 'AgCl(s)', role: 'solid' },
  { formula: 'Cu(OH)2(s)', role: 'solid' },
];

let nextId = 1;
function constant(kind: ConstantKind, reaction: string, logValue: number, extra: Partial<LibraryConstant> = {}): LibraryConstant {
  const checked = checkReaction(kind, reaction);
  const id = nextId++;
  return {
    id,
    lineageId: `lineage-${checked.defines}`,
    version: 1,
    status: 'approved' as ConstantStatus,
    kind,
    reaction: checked.reaction,
    terms: checked.terms,
    defines: checked.defines,
    logValue,
    temperatureC: 25,
    ionicStrength: 0,
    enthalpyKjMol: null,
    source: 'test value',
    ...extra,
  };
}

// Stepwise silver ammine constants and Ksp values of the order handbooks print (test values).
const WATER = constant('protonation', 'H+ + OH- = H2O', 14.0, { enthalpyKjMol: -55.8 });
const AMMONIUM = constant('protonation', 'H+ + NH3 = NH4+', 9.25, { enthalpyKjMol: -52.2 });
const K1 = constant('stepwise_formation', 'Ag+ + NH3 = Ag(NH3)+', 3.31);
const K2 = constant('stepwise_formation', 'Ag(NH3)+ + NH3 = Ag(NH3)2+', 3.91);
const AGCL = constant('solubility_product', 'AgCl(s) = Ag+ + Cl-', -9.74);
const CUOH2 = constant('solubility_product', 'Cu(OH)2(s) = Cu+2 + 2 OH-', -19.32);
const LIBRARY = [WATER, AMMONIUM, K1, K2, AGCL, CUOH2];

function select(extra: Partial<BuildSelection>): BuildSelection {
  return { metals: ['Ag+'], ligands: ['NH3', 'Cl-'], counterIons: [], totals: {}, activity: 'ideal', temperatureC: 25, includeDrafts: false, ...extra };
}

describe('buildSystem', () => {
  it('chains a stepwise constant onto the one before it: log beta2 = log K1 + log K2', () => {
    const out = buildSystem(CATALOGUE, LIBRARY, select({ pH: 9 }));
    const diammine = out.problem.species.find((s) => s.name === 'Ag(NH3)2+');
    expect(diammine?.logK).toBeCloseTo(3.31 + 3.91, 10);
    expect(diammine?.stoich).toEqual({ 'Ag+': 1, NH3: 2 });
    expect(out.constants.map((c) => c.id).sort()).toEqual([WATER.id, AMMONIUM.id, K1.id, K2.id, AGCL.id].sort());
  });

  it('writes hydroxide through water: OH- is log K -14 with one H+ removed, and a hydroxide Ksp is written through H+', () => {
    const out = buildSystem(CATALOGUE, LIBRARY, select({ metals: ['Cu+2'], ligands: [], pH: 8 }));
    expect(out.problem.species.find((s) => s.name === 'OH-')).toMatchObject({ logK: -14, stoich: { 'H+': -1 } });
    // Cu(OH)2(s) = Cu+2 + 2 OH-, log Ksp -19.32; with OH- = H2O - H+ (log K -14) the solid dissolves
    // to Cu+2 - 2 H+ with log K = -19.32 + 28 = 8.68 (hand-worked).
    expect(out.problem.solids).toEqual([{ name: 'Cu(OH)2(s)', logKsp: 8.68, stoich: { 'Cu+2': 1, 'H+': -2 }, temperatureC: 25 }]);
    expect(out.problem.fixed).toEqual({ 'H+': 1e-8 });
  });

  it('leaves protonation and hydroxide out, and says so, when no pH is given', () => {
    const out = buildSystem(CATALOGUE, LIBRARY, select({}));
    expect(out.problem.components).toEqual(['Ag+', 'NH3', 'Cl-']);
    expect(out.problem.species.map((s) => s.name)).toEqual(expect.not.arrayContaining(['NH4+', 'OH-']));
    expect(out.warnings.join(' ')).toMatch(/No pH given/);
  });

  it('uses a draft only when asked, and then lists it', () => {
    const draft = constant('stepwise_formation', 'Ag(NH3)+ + NH3 = Ag(NH3)2+', 4.0, { status: 'draft', lineageId: K2.lineageId, version: 2 });
    const lib = [...LIBRARY, draft];
    const plain = buildSystem(CATALOGUE, lib, select({}));
    expect(plain.problem.species.find((s) => s.name === 'Ag(NH3)2+')?.logK).toBeCloseTo(7.22, 10);
    expect(plain.drafts).toEqual([]);
    const withDrafts = buildSystem(CATALOGUE, lib, select({ includeDrafts: true }));
    expect(withDrafts.problem.species.find((s) => s.name === 'Ag(NH3)2+')?.logK).toBeCloseTo(7.31, 10);
    expect(withDrafts.drafts.map((d) => d.id)).toEqual([draft.id]);
    expect(withDrafts.warnings.join(' ')).toMatch(/draft/);
  });

  it('corrects constants with an enthalpy by van t Hoff and warns about the rest', () => {
    const out = buildSystem(CATALOGUE, LIBRARY, select({ pH: 9, temperatureC: 50 }));
    // van 't Hoff, dH -52.2 kJ/mol from 25 to 50 C: d(log K) = 52200/(8.314462618 ln10) (1/323.15 - 1/298.15) = -0.7073 (hand-worked).
    expect(out.problem.species.find((s) => s.name === 'NH4+')?.logK).toBeCloseTo(9.25 - 0.7073, 3);
    expect(out.warnings.join(' ')).toMatch(/No enthalpy is known for .*Ag\+ \+ NH3 = Ag\(NH3\)\+/);
  });

  it('names the field for a selection it cannot build', () => {
    const fieldOf = (sel: Partial<BuildSelection>) => {
      try {
        buildSystem(CATALOGUE, LIBRARY, select(sel));
      } catch (e) {
        return e instanceof BuildError ? `${e.field}: ${e.message}` : String(e);
      }
      return 'no error';
    };
    expect(fieldOf({ metals: ['Hg+2'] })).toMatch(/^metals\.0: "Hg\+2" is not in the species catalogue/);
    expect(fieldOf({ metals: ['NH3'] })).toMatch(/^metals\.0: .*ligand, not a metal/);
    expect(fieldOf({ totals: { 'Na+': 1 } })).toMatch(/^totals\.Na\+: .*not one of the chosen ions/);
    expect(fieldOf({ solids: ['Cu(OH)2(s)'] })).toMatch(/^solids\.0: .*cannot form.*AgCl\(s\)/);
    expect(fieldOf({ pH: 7, totals: { 'H+': 0.1 } })).toMatch(/^totals\.H\+: give either a pH or a total/);
  });

  it('builds in two parts: one kept part per choice of ions serves any totals and pH exactly as a whole build does', () => {
    const choice = select({ pH: 9, solids: ['AgCl(s)'] });
    const part = buildSelection(CATALOGUE, LIBRARY, choice);
    // Frozen as the server keeps it: finishing a build must only read it.
    const frozen = JSON.parse(JSON.stringify(part)) as typeof part;
    const freeze = (v: unknown): void => {
      if (typeof v === 'object' && v !== null) {
        Object.freeze(v);
        Object.values(v).forEach(freeze);
      }
    };
    freeze(frozen);
    const overs: Partial<BuildSelection>[] = [{ totals: { 'Ag+': 0.1, NH3: 1 }, pH: 9 }, { totals: { 'Ag+': 0.02, 'Cl-': 0.5 }, pH: 10.5 }, { totals: { 'Na+': 1 }, pH: 9 }, { totals: { 'H+': 0.1 }, pH: 9 }];
    for (const over of overs) {
      const sel = select({ ...choice, ...over });
      expect(selectionKey(sel)).toBe(selectionKey(choice));
      const whole = (() => {
        try {
          return buildSystem(CATALOGUE, LIBRARY, sel);
        } catch (e) {
          return String(e);
        }
      })();
      const halves = (() => {
        try {
          return completeBuild(frozen, sel);
        } catch (e) {
          return String(e);
        }
      })();
      expect(halves).toEqual(whole);
    }
    // A solid that cannot form is refused when the build is finished, with the whole build's message.
    const badSolid = select({ pH: 9, solids: ['Cu(OH)2(s)'] });
    expect(() => completeBuild(buildSelection(CATALOGUE, LIBRARY, badSolid), badSolid)).toThrow(/cannot form from the chosen ions \(those that can: AgCl\(s\)\)/);
    // What the library-dependent part depends on changes the key; the totals and the pH value do not.
    expect(selectionKey(select({ pH: 9 }))).not.toBe(selectionKey(select({})));
    expect(selectionKey(select({ activity: 'davies' }))).not.toBe(selectionKey(select({})));
    expect(selectionKey(select({ temperatureC: 40 }))).not.toBe(selectionKey(select({})));
    expect(selectionKey(select({ includeDrafts: true }))).not.toBe(selectionKey(select({})));
    expect(selectionKey(select({ ligands: ['Cl-', 'NH3'] }))).not.toBe(selectionKey(select({})));
    expect(selectionKey(select({ solids: [] }))).not.toBe(selectionKey(select({})));
  });

  it('solves silver chloride in 1 M ammonia to the closed-form answer', () => {
    const out = buildSystem(CATALOGUE, LIBRARY, select({ totals: { 'Ag+': 0.2, 'Cl-': 0.2, NH3: 1 } }));
    const result = solve(out.problem);
    expect(result.status).toBe('converged');
    // Closed form (bisection here, independent of the engine): dissolved Ag = Cl- = s,
    // Ag+ = Ksp/s, NH3 = 1 - [Ag(NH3)+] - 2 [Ag(NH3)2+]; s = Ag+ (1 + b1 L + b2 L^2).
    const ksp = 10 ** -9.74;
    const b1 = 10 ** 3.31;
    const b2 = 10 ** 7.22;
    const excess = (s: number) => {
      const ag = ksp / s;
      let lo = 0;
      let hi = 1;
      for (let i = 0; i < 200; i++) {
        const l = (lo + hi) / 2;
        if (l + ag * (b1 * l + 2 * b2 * l * l) > 1) hi = l;
        else lo = l;
      }
      return ag * (1 + b1 * lo + b2 * lo * lo) - s;
    };
    let lo = 1e-6;
    let hi = 0.2;
    for (let i = 0; i < 200; i++) {
      const mid = (lo + hi) / 2;
      if (excess(mid) > 0) lo = mid;
      else hi = mid;
    }
    expect(result.free['Cl-']).toBeCloseTo(lo, 8);
    expect(result.solids['AgCl(s)']).toBeCloseTo(0.2 - lo, 8);
  });
});
