// A calculator's system from a bath's latest analysis: the totals, the estimate of total ligand
// when only free ligand was titrated, the counter-ion for the ionic strength, and what is missing.
import { latestAnalysis, prefillFromBath } from '@/lib/baths/prefill';
import type { Bath } from '@/shared/baths';

import { analysis } from '@/__tests__/support/analyses';

const bath = {
  metal: 'Ag+',
  ligand: 'CN-',
  ligandAs: 'KCN',
  extras: ['carbonate'],
  temperatureC: 22,
} as unknown as Bath;

describe('prefillFromBath', () => {
  it('takes the newest analysis and estimates total cyanide as free + 2 per silver', () => {
    const older = analysis('2026-10-01T12:00:00.000Z', { metal: 0.2, freeLigand: 1.5, pH: 12 });
    const newer = analysis('2026-11-01T12:00:00.000Z', { metal: 0.3, freeLigand: 1.8, pH: 12.2 });
    expect(latestAnalysis([newer, older])).toBe(newer);
    const { system, notes } = prefillFromBath(bath, [older, newer]);
    // Ag(CN)2-: 0.3 M silver holds 0.6 M cyanide; total = 1.8 + 0.6 = 2.4 M; K+ one per CN- from KCN.
    expect(system).toMatchObject({ metals: ['Ag+'], ligands: ['CN-'], counterIons: ['K+'], pH: 12.2, temperatureC: 22 });
    expect(system.totals?.['CN-']).toBeCloseTo(2.4, 12);
    expect(system.totals?.['K+']).toBeCloseTo(2.4, 12);
    expect(notes.join(' ')).toMatch(/estimated as free \+ 2 per Ag\+/);
  });

  it('uses an analysed total when there is one, and says what is missing', () => {
    const { system, notes } = prefillFromBath(bath, [analysis('2026-11-01T12:00:00.000Z', { metal: 0.3, totalLigand: 2.0 })]);
    expect(system.totals?.['CN-']).toBe(2.0);
    expect(system.pH).toBeUndefined();
    expect(notes.join(' ')).toMatch(/No pH was analysed/);
    expect(prefillFromBath(bath, []).notes.join(' ')).toMatch(/no analyses yet/);
  });

  it('gives a fixer its bromide, taken as 0 when the analysis did not measure it', () => {
    const fixer = { metal: 'Ag+', ligand: 'S2O3-2', ligandAs: 'Na2S2O3', extras: ['bromide'], temperatureC: 20 } as unknown as Bath;
    const measured = prefillFromBath(fixer, [analysis('2026-11-01T12:00:00.000Z', { metal: 0.05, freeLigand: 0.8, bromide: 0.01, pH: 5 })]);
    expect(measured.system.ligands).toEqual(['S2O3-2', 'Br-']);
    expect(measured.system.totals?.['Br-']).toBe(0.01);
    const unmeasured = prefillFromBath(fixer, [analysis('2026-11-02T12:00:00.000Z', { metal: 0.05, freeLigand: 0.8, pH: 5 })]);
    expect(unmeasured.system.ligands).toEqual(['S2O3-2', 'Br-']);
    expect(unmeasured.system.totals?.['Br-']).toBe(0);
    expect(unmeasured.notes.join(' ')).toMatch(/No bromide was analysed: taken as 0/);
  });
});
