// Every input error the engine throws, with the field it names and the words it uses.
import { compileProblem, EngineInputError, retarget, solve } from '@/lib/engine';

const base = () => ({
  components: ['Ag+', 'CN-', 'H+'],
  totals: { 'Ag+': 0.01, 'CN-': 0.05 } as Record<string, unknown>,
  fixed: { 'H+': 1e-11 } as Record<string, unknown>,
  species: [{ name: 'Ag(CN)2-', logK: 20.48, stoich: { 'Ag+': 1, 'CN-': 2 } as Record<string, unknown> }] as unknown[],
  solids: [{ name: 'AgCN(s)', logKsp: -15.74, stoich: { 'Ag+': 1, 'CN-': 1 } as Record<string, unknown> }] as unknown[],
});

type Case = [string, (p: ReturnType<typeof base>) => unknown, string, RegExp];

const cases: Case[] = [
  ['not an object', () => 42, 'problem', /must be a JSON object/],
  ['no components', (p) => ({ ...p, components: [] }), 'components', /non-empty list of component names/],
  ['component not a string', (p) => ({ ...p, components: ['Ag+', 3] }), 'components[1]', /non-empty string/],
  ['duplicate component', (p) => ({ ...p, components: ['Ag+', 'CN-', 'Ag+'] }), 'components[2]', /duplicate component "Ag\+"/],
  ['totals not an object', (p) => ({ ...p, totals: [1, 2] }), 'totals', /must be an object/],
  ['total for unknown component', (p) => ({ ...p, totals: { ...p.totals, 'Cl-': 0.1 } }), 'totals.Cl-', /"Cl-" is not one of the components/],
  ['negative total', (p) => ({ ...p, totals: { ...p.totals, 'CN-': -0.1 } }), 'totals.CN-', /a total cannot be negative \(got -0.1 mol\/L\)/],
  ['non-finite total', (p) => ({ ...p, totals: { ...p.totals, 'CN-': 'lots' } }), 'totals.CN-', /a total must be a finite number, got "lots"/],
  ['zero fixed value', (p) => ({ ...p, fixed: { 'H+': 0 } }), 'fixed.H+', /must be above 0 mol\/L \(got 0\)/],
  ['fixed and total', (p) => ({ ...p, totals: { ...p.totals, 'H+': 0 } }), 'fixed.H+', /has both a total and a fixed free concentration; give one/],
  ['neither fixed nor total', (p) => ({ ...p, fixed: {} }), 'totals.H+', /needs a total \(mol\/L\) or a fixed free concentration/],
  ['species not a list', (p) => ({ ...p, species: {} }), 'species', /must be a list/],
  ['species not an object', (p) => ({ ...p, species: ['AgCN'] }), 'species[0]', /must be an object with name, logK and stoich/],
  ['species without name', (p) => ({ ...p, species: [{ logK: 1, stoich: { 'Ag+': 1 } }] }), 'species[0].name', /must be a non-empty string/],
  ['unknown component in stoichiometry', (p) => ({ ...p, species: [{ name: 'AgCl', logK: 3, stoich: { 'Ag+': 1, 'Cl-': 1 } }] }), 'species[0].stoich.Cl-', /unknown component "Cl-"; add it to components or fix the name/],
  ['non-finite log K', (p) => ({ ...p, species: [{ name: 'X', logK: Infinity, stoich: { 'Ag+': 1 } }] }), 'species[0].logK', /log K must be a finite number, got Infinity/],
  ['missing log K', (p) => ({ ...p, species: [{ name: 'X', stoich: { 'Ag+': 1 } }] }), 'species[0].logK', /log K must be a finite number, got undefined/],
  ['non-numeric coefficient', (p) => ({ ...p, species: [{ name: 'X', logK: 1, stoich: { 'Ag+': 'one' } }] }), 'species[0].stoich.Ag+', /a stoichiometric coefficient must be a finite number/],
  ['empty stoichiometry', (p) => ({ ...p, species: [{ name: 'X', logK: 1, stoich: {} }] }), 'species[0].stoich', /needs at least one component with a non-zero coefficient/],
  ['stoichiometry not an object', (p) => ({ ...p, species: [{ name: 'X', logK: 1, stoich: 'Ag+' }] }), 'species[0].stoich', /must be an object of component name to count/],
  ['species named like a component', (p) => ({ ...p, species: [{ name: 'CN-', logK: 1, stoich: { 'CN-': 1 } }] }), 'species[0].name', /duplicate name "CN-"/],
  ['duplicate species', (p) => ({ ...p, species: [p.species[0], p.species[0]] }), 'species[1].name', /duplicate name "Ag\(CN\)2-"/],
  ['bad charge', (p) => ({ ...p, species: [{ name: 'X', logK: 1, stoich: { 'Ag+': 1 }, charge: 'plus' }] }), 'species[0].charge', /a charge must be a finite number/],
  ['bad enthalpy', (p) => ({ ...p, species: [{ name: 'X', logK: 1, stoich: { 'Ag+': 1 }, deltaH: null }] }), 'species[0].deltaH', /an enthalpy in kJ\/mol must be a finite number, got null/],
  ['duplicate solid', (p) => ({ ...p, solids: [p.solids[0], p.solids[0]] }), 'solids[1].name', /duplicate solid "AgCN\(s\)"/],
  ['non-finite log Ksp', (p) => ({ ...p, solids: [{ name: 'AgCN(s)', logKsp: NaN, stoich: { 'Ag+': 1 } }] }), 'solids[0].logKsp', /log Ksp must be a finite number, got NaN/],
  ['solid of fixed components only', (p) => ({ ...p, solids: [{ name: 'ice', logKsp: 1, stoich: { 'H+': 1 } }] }), 'solids[0].stoich', /made only of fixed components/],
  ['unknown activity model', (p) => ({ ...p, activity: 'extended' }), 'activity', /must be "ideal" or "davies", got "extended"/],
  ['temperature out of range', (p) => ({ ...p, temperatureC: 300 }), 'temperatureC', /between -5 and 150 C/],
  ['negative ionic strength', (p) => ({ ...p, ionicStrength: -1 }), 'ionicStrength', /cannot be negative/],
];

describe('engine input errors name the field to fix', () => {
  it.each(cases)('%s', (_name, mutate, field, message) => {
    const problem = mutate(base());
    let thrown: unknown;
    try {
      compileProblem(problem);
    } catch (error) {
      thrown = error;
    }
    expect(thrown).toBeInstanceOf(EngineInputError);
    expect((thrown as EngineInputError).field).toBe(field);
    expect((thrown as EngineInputError).message).toMatch(message);
    expect((thrown as EngineInputError).message.startsWith(`${field}: `)).toBe(true);
    expect(() => solve(problem)).toThrow(EngineInputError);
  });

  it('retarget refuses a total for a fixed component and a negative total', () => {
    const tab = compileProblem(base());
    expect(() => retarget(tab, { totals: { 'H+': 1 } })).toThrow('totals.H+: "H+" is not a component with a total');
    expect(() => retarget(tab, { totals: { 'CN-': -1 } })).toThrow('totals.CN-: a total must be a finite number of at least 0 mol/L, got -1');
    expect(() => retarget(tab, { fixed: { 'CN-': 1 } })).toThrow('fixed.CN-: "CN-" is not a fixed component');
    expect(() => retarget(tab, { fixed: { 'H+': 0 } })).toThrow('fixed.H+: a fixed free concentration must be above 0 mol/L, got 0');
  });
});
