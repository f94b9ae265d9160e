// The hazards of a bath from its latest analysis and its make-up salts; no solve, so the HCN share
// comes from the pH and pKa 9.21.
import { bathHazards, bathSituation } from '@/lib/hazards';
import type { Bath } from '@/shared/baths';

import { analysis } from '@/__tests__/support/analyses';
import { DEFAULT_THRESHOLDS, DEFER_TO_SDS, hazardSchema } from '@/shared/safety';

const T = DEFAULT_THRESHOLDS;

// Invented baths; only the fields the rules read.
const bath = (over: Partial<Bath>): Bath =>
  ({ process: 'cyanide_silver_plate', metal: 'Ag+', ligand: 'CN-', ligandAs: 'KCN', extras: ['carbonate'], temperatureC: 22, makeUp: [], ...over }) as unknown as Bath;

describe('bathSituation', () => {
  it('takes totals and pH from the latest analysis and reagents from the make-up and the ligand salt', () => {
    const b = bath({ makeUp: [{ salt: 'K[Ag(CN)2]', amount: 30, unit: 'g/L' }, { salt: 'KCN', amount: 100, unit: 'g/L' }, { salt: 'K2CO3', amount: 15, unit: 'g/L' }] });
    const s = bathSituation(b, [analysis('2026-10-01', { metal: 0.1, freeLigand: 1, pH: 12.5 }), analysis('2026-11-01', { metal: 0.2, freeLigand: 1.2, pH: 10 })]);
    expect(s.pH).toBe(10);
    // Ag(CN)2-: total cyanide = free 1.2 + 2 x 0.2 silver (common practice).
    expect(s.totals['CN-']).toBeCloseTo(1.6, 12);
    expect(s.reagents).toEqual(['K[Ag(CN)2]', 'KCN', 'K2CO3']);
    expect(s.solution).toBeNull();
  });
});

describe('bathHazards', () => {
  it('flags a cyanide bath analysed at pH 10, with the share from the pKa', () => {
    const hs = bathHazards(bath({}), [analysis('2026-11-01', { metal: 0.2, freeLigand: 1.2, pH: 10 })], T);
    expect(hs.map((h) => h.rule)).toEqual(['cyanide_present', 'cyanide_low_ph']);
    const low = hs[1]!;
    expect(low.flag).toBe(true);
    // 1 / (1 + 10^(10 - 9.21)) = 0.13955 (pKa 9.21, CRC Handbook, from memory).
    expect(low.evidence.find((e) => e.note === 'pKa 9.21, 25 °C (CRC Handbook, from memory)')?.value).toBeCloseTo(0.13955, 4);
    expect(hs[0]!.reagents).toEqual(['KCN']);
    for (const h of hs) {
      expect(hazardSchema.parse(h)).toEqual(h);
      expect(h.text.endsWith(DEFER_TO_SDS)).toBe(true);
    }
  });

  it('gives only the caution for a cyanide bath at pH 12.5, and asks for a pH when none was analysed', () => {
    expect(bathHazards(bath({}), [analysis('2026-11-01', { metal: 0.2, freeLigand: 1.2, pH: 12.5 })], T).map((h) => h.rule)).toEqual(['cyanide_present']);
    const [present] = bathHazards(bath({}), [analysis('2026-11-01', { metal: 0.2, freeLigand: 1.2 })], T);
    expect(present?.text).toMatch(/The pH is not given: measure it/);
  });

  it('names cyanide from the ligand salt before any analysis', () => {
    expect(bathHazards(bath({ ligandAs: 'NaCN' }), [], T).map((h) => [h.rule, h.reagents])).toEqual([['cyanide_present', ['NaCN']]]);
  });

  it('sends an ammoniacal silver solution to the desk, with the ammonia vapour caution', () => {
    const b = bath({ process: 'ammoniacal_silver', ligand: 'NH3', ligandAs: 'NH3', extras: [], makeUp: [{ salt: 'AgNO3', amount: 10, unit: 'g/L' }] });
    const hs = bathHazards(b, [analysis('2026-11-01', { metal: 0.06, totalLigand: 0.5, pH: 11 })], T);
    expect(hs.map((h) => [h.rule, h.flag])).toEqual([['ammoniacal_silver', true], ['ammonia_vapour', false]]);
    expect(hs[0]!.reagents).toEqual(['AgNO3', 'aqueous ammonia']);
  });

  it('cautions a thiosulfate fixer analysed at pH 3.5, not at pH 5', () => {
    const fixer = bath({ process: 'thiosulfate_fixer', ligand: 'S2O3-2', ligandAs: '(NH4)2S2O3', extras: ['bromide'] });
    const at = (pH: number) => bathHazards(fixer, [analysis('2026-11-01', { metal: 0.02, totalLigand: 0.8, pH })], T).map((h) => h.rule);
    expect(at(3.5)).toEqual(['acidified_thiosulfate']);
    expect(at(5)).toEqual([]);
  });
});
