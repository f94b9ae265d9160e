import { dosingPlan, type ChemicalSystem, type DosingStep, type Vessel } from '@/lib/calculators';

import { expectClose, expectInvariants, expectNoNaN, inputError, referenceBath } from './support';

// An invented strike tank: potassium cyanide, then silver cyanide in two lots (the second past what
// the free cyanide holds, so AgCN(s) appears), a dilution, a pH set point, more cyanide (the solid
// dissolves again). Reference constants (Smith & Martell, CRC, Baes & Mesmer; from memory).
const system: ChemicalSystem = referenceBath(['Ag+', 'CN-', 'K+', 'H+'], 'davies');
const vessel: Vessel = { volumeL: 100, amounts: { 'CN-': 50, 'K+': 50 }, pH: { pH: 12 } };
const steps: DosingStep[] = [
  { kind: 'add', reagent: 'AgCN', stoich: { 'Ag+': 1, 'CN-': 1 }, mol: 20 },
  { kind: 'add', reagent: 'AgCN', stoich: { 'Ag+': 1, 'CN-': 1 }, mol: 40, label: 'second lot of AgCN' },
  { kind: 'dilute', toVolumeL: 200 },
  { kind: 'set-ph', pH: 11 },
  { kind: 'add', reagent: 'KCN', stoich: { 'K+': 1, 'CN-': 1 }, mol: 40, volumeL: 0.5 },
  { kind: 'dilute', addWaterL: 9.5 },
  { kind: 'add', reagent: 'NaOH', stoich: { 'H+': -1 }, mol: 1 },
];
const plan = dosingPlan({ system, vessel, steps });

describe('dosingPlan', () => {
  it('keeps the mass balance at every step: amounts = start + added, totals = amounts / volume, dissolved + solids = totals', () => {
    expect(plan.states).toHaveLength(steps.length + 1);
    expect(plan.status).toBe('converged');
    expectNoNaN(plan);
    for (const s of plan.states) {
      for (const c of ['Ag+', 'CN-', 'K+']) {
        const start = vessel.amounts[c] ?? 0;
        expectClose(s.amounts[c] as number, start + (s.componentsAdded[c] ?? 0), 1e-12, 1e-300);
        expectClose(s.totals[c] as number, (s.amounts[c] as number) / s.volumeL, 1e-12, 1e-300);
      }
      expectInvariants(system, { totals: s.totals }, s.result);
      expect(s.status).toBe('converged');
    }
  });

  it('tracks volumes, labels and reagents added so far', () => {
    expect(plan.states.map((s) => s.volumeL)).toEqual([100, 100, 100, 200, 200, 200.5, 210, 210]);
    expect(plan.states.map((s) => s.label)).toEqual([
      'start', 'add 20 mol AgCN', 'second lot of AgCN', 'dilute to 200 L', 'set pH 11', 'add 40 mol KCN', 'add 9.5 L water', 'add 1 mol NaOH',
    ]);
    expect(plan.states[5]!.reagentsAdded).toEqual({ AgCN: 60, KCN: 40 });
    expect(plan.states[7]!.componentsAdded).toEqual({ 'Ag+': 60, 'CN-': 100, 'K+': 40, 'H+': -1 });
  });

  it('says which solids appear and dissolve', () => {
    expect(plan.states.map((s) => s.appeared)).toEqual([[], [], ['AgCN(s)'], [], [], [], [], []]);
    expect(plan.states.map((s) => s.dissolved)).toEqual([[], [], [], [], [], ['AgCN(s)'], [], []]);
  });

  it('holds the pH set point and says where H+ from a reagent goes', () => {
    expect(plan.states[3]!.pH).toEqual({ pH: 12, measured: undefined, hComponent: undefined });
    expect(plan.states[4]!.pH).toEqual({ pH: 11, measured: undefined, hComponent: 'H+' });
    const g = plan.states[4]!.result.gamma['H+'] as number;
    expectClose(plan.states[4]!.fixed['H+'] as number, 1e-11 / g, 1e-9);
    expect(plan.states[7]!.warnings).toContain('H+ from NaOH (-1.00 mol) is taken up by the H+ held fixed.');
  });

  it('starts absent components at 0 and turns an H+ amount into a set point', () => {
    const acid = referenceBath(['CN-', 'H+'], 'ideal');
    const r = dosingPlan({ system: acid, vessel: { volumeL: 1, amounts: { 'H+': 0.001 } }, steps: [{ kind: 'set-ph', pH: 10, measured: false }, { kind: 'add', reagent: 'NaCN', stoich: { 'CN-': 1 }, mol: 0.01 }] });
    expect(r.states[0]!.totals).toEqual({ 'CN-': 0, 'H+': 0.001 });
    expect(r.states[1]!.amounts).toEqual({ 'CN-': 0 });
    expect(r.states[1]!.warnings).toContain('The H+ amount is replaced by the pH set point from here on.');
    expectClose(r.states[2]!.result.species.HCN as number, 0.01 / (1 + 10 ** (10 - 9.21)), 1e-9);
  });
});

describe('dosing errors', () => {
  const run = (over: Partial<Vessel> | null, s: DosingStep[] = []) =>
    dosingPlan({ system, vessel: (over === null ? null : { ...vessel, ...over }) as Vessel, steps: s });
  const add = (over: Partial<Extract<DosingStep, { kind: 'add' }>>): DosingStep[] => [{ kind: 'add', reagent: 'KCN', stoich: { 'K+': 1, 'CN-': 1 }, mol: 1, ...over }];
  it.each<[string, () => unknown, string, string]>([
    ['no vessel', () => run(null), 'vessel', 'vessel: give the vessel: volumeL and amounts in mol'],
    ['a vessel of 0 L', () => run({ volumeL: 0 }), 'vessel.volumeL', 'vessel.volumeL: the volume (L) must be above 0, got 0'],
    ['no amounts', () => run({ amounts: undefined }), 'vessel.amounts', 'vessel.amounts: give the moles of each component as an object'],
    ['an unknown component', () => run({ amounts: { 'Na+': 1 } }), 'vessel.amounts.Na+', 'vessel.amounts.Na+: "Na+" is not a component of the system; use one of Ag+, CN-, K+, H+'],
    ['a negative amount', () => run({ amounts: { 'CN-': -1 } }), 'vessel.amounts.CN-', 'vessel.amounts.CN-: an amount (mol) cannot be negative, got -1'],
    ['a fixed value of 0', () => run({ pH: undefined, fixed: { 'H+': 0 } }), 'vessel.fixed.H+', 'vessel.fixed.H+: a fixed free concentration (mol/L) must be above 0, got 0'],
    ['a bad vessel pH', () => run({ pH: { pH: 99 } }), 'vessel.pH', 'vessel.pH: the pH must lie between -2 and 16, got 99'],
    ['an amount for the pH component', () => run({ amounts: { 'H+': 1 } }), 'vessel.amounts.H+',
      'vessel.amounts.H+: "H+" is held fixed (or set by the pH); give it an amount or a fixed value, not both'],
    ['steps that are not a list', () => dosingPlan({ system, vessel, steps: undefined as unknown as DosingStep[] }), 'steps', 'steps: give a list of steps (it may be empty)'],
    ['an unknown step', () => run({}, [{ kind: 'stir' } as unknown as DosingStep]), 'steps[0].kind', 'steps[0].kind: must be "add", "set-ph" or "dilute"'],
    ['a reagent without a name', () => run({}, add({ reagent: ' ' })), 'steps[0].reagent', 'steps[0].reagent: name the reagent, such as "NaCN"'],
    ['a reagent without stoichiometry', () => run({}, add({ stoich: {} })), 'steps[0].stoich',
      'steps[0].stoich: give the moles of each component in one mole of reagent, such as {"Na+": 1, "CN-": 1}'],
    ['a reagent with an unknown component', () => run({}, add({ stoich: { 'Na+': 1 } })), 'steps[0].stoich.Na+',
      'steps[0].stoich.Na+: "Na+" is not a component of the system; use one of Ag+, CN-, K+, H+'],
    ['a count that is not a number', () => run({}, add({ stoich: { 'CN-': Number.NaN } })), 'steps[0].stoich.CN-', 'steps[0].stoich.CN-: a count must be a finite number, got NaN'],
    ['a negative amount added', () => run({}, add({ mol: -1 })), 'steps[0].mol', 'steps[0].mol: the amount added (mol) cannot be negative, got -1'],
    ['a negative reagent volume', () => run({}, add({ volumeL: -1 })), 'steps[0].volumeL', 'steps[0].volumeL: the volume the reagent brings (L) cannot be negative, got -1'],
    ['a reagent that takes out more than there is', () => run({}, add({ reagent: 'AgNO3 sink', stoich: { 'CN-': -1 }, mol: 60 })), 'steps[0].stoich.CN-',
      'steps[0].stoich.CN-: adding 60 mol AgNO3 sink would leave -10.0 mol of "CN-"; set a pH instead, or add less'],
    ['a bad set point', () => run({}, [{ kind: 'set-ph', pH: Number.NaN }]), 'steps[0].pH', 'steps[0].pH: the pH must be a finite number, got NaN'],
    ['a dilution with both forms', () => run({}, [{ kind: 'dilute', addWaterL: 1, toVolumeL: 200 }]), 'steps[0]', 'steps[0]: give either addWaterL or toVolumeL for a dilution'],
    ['a dilution with neither', () => run({}, [{ kind: 'dilute' }]), 'steps[0]', 'steps[0]: give either addWaterL or toVolumeL for a dilution'],
    ['negative water', () => run({}, [{ kind: 'dilute', addWaterL: -1 }]), 'steps[0].addWaterL', 'steps[0].addWaterL: the water added (L) cannot be negative, got -1'],
    ['a new volume of 0', () => run({}, [{ kind: 'dilute', toVolumeL: 0 }]), 'steps[0].toVolumeL', 'steps[0].toVolumeL: the new volume (L) must be above 0, got 0'],
    ['a "dilution" that shrinks the vessel', () => run({}, [{ kind: 'dilute', toVolumeL: 50 }]), 'steps[0].toVolumeL',
      'steps[0].toVolumeL: a dilution cannot reduce the volume: 50 L is below the 100 L already in the vessel'],
  ])('%s', (_name, call, field, message) => {
    const e = inputError(call);
    expect(e.field).toBe(field);
    expect(e.message).toBe(message);
  });
});
