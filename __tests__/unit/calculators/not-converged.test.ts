// Non-convergence is a status, never a throw: every calculator must pass it on. The engine is
// wrapped here so that every solve reports "not_converged" (with its numbers otherwise intact).
import {
  curve,
  dosingPlan,
  fixerLoading,
  headroom,
  makeUp,
  precipitationOrder,
  solveAtPh,
  speciation,
} from '@/lib/calculators';

import { expectNoNaN, referenceBath } from './support';

jest.mock('@/lib/engine', () => {
  const actual = jest.requireActual('@/lib/engine');
  return {
    ...actual,
    solveTableau: (...args: Parameters<typeof actual.solveTableau>) => {
      const out = actual.solveTableau(...args);
      return { ...out, result: { ...out.result, status: 'not_converged', message: 'forced by the test' } };
    },
  };
});

const thio = referenceBath(['Ag+', 'Br-', 'S2O3-2', 'H+'], 'davies');
const state = { totals: { 'Ag+': 0.02, 'Br-': 0.02, 'S2O3-2': 0.4 } };

describe('a solve that does not converge', () => {
  it.each<[string, () => { status: string }]>([
    ['solveAtPh', () => solveAtPh(thio, state, 7).result],
    ['headroom', () => headroom({ system: thio, state, pH: { pH: 7 }, solid: 'AgBr(s)' })],
    ['fixerLoading', () => fixerLoading({ system: thio, state, pH: { pH: 7 } })],
    ['speciation', () => speciation({ system: thio, state, pH: { pH: 7 } })],
    ['curve', () => curve({ system: thio, state: { ...state, fixed: { 'H+': 1e-7 } }, sweep: { variable: { kind: 'total', component: 'Ag+' }, from: 0, to: 0.3, points: 5 }, series: [{ kind: 'fractions', component: 'Ag+' }] })],
    ['precipitationOrder', () => precipitationOrder({ system: thio, state: { totals: { ...state.totals, 'Ag+': 0 } }, pH: { pH: 7 }, precipitant: 'Ag+', cations: ['Br-'] })],
    ['dosingPlan', () => dosingPlan({ system: thio, vessel: { volumeL: 1, amounts: { 'S2O3-2': 0.4 }, pH: { pH: 7 } }, steps: [{ kind: 'add', reagent: 'AgBr', stoich: { 'Ag+': 1, 'Br-': 1 }, mol: 0.02 }] })],
    ['makeUp', () => makeUp({ system: thio, state, pH: { pH: 7 }, volume: { value: 10, unit: 'L' }, salt: { name: 'thiosulfate', stoich: { 'S2O3-2': 1 } }, target: { kind: 'headroom', solid: 'AgBr(s)', molPerL: 0.3 } })],
  ])('%s reports it in its status, with no NaN', (_name, run) => {
    const r = run();
    expect(r.status).toBe('not_converged');
    expectNoNaN(r);
  });
});
