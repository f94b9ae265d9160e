// The demo-like silver bath the calculator screen tests start from: the bath, its one analysis,
// the routes that serve them, and the cyanide silver problem the library would build for it.
import { keys } from '@/lib/api/keys';
import { type Analysis, type Bath } from '@/shared/baths';

import { type Routes } from './helpers';

export const BATH_ID = '4b6f7a52-8d3e-4c1a-9f0e-2a5b6c7d8e9f';

/** "Silver line tank 2", a 400 L cyanide silver bath; `extra` changes any field. */
export function silverBath(extra: Partial<Bath> = {}): Bath {
  return {
    id: BATH_ID,
    name: 'Silver line tank 2',
    process: 'cyanide_silver_plate',
    status: 'active',
    volume: 400,
    volumeUnit: 'L',
    volumeL: 400,
    temperatureC: 25,
    makeUp: [],
    metal: 'Ag+',
    ligand: 'CN-',
    metalUnit: 'g/L',
    ligandUnit: 'g/L',
    ligandAs: 'KCN',
    carbonateAs: 'K2CO3',
    extras: ['carbonate'],
    targets: { metal: { min: null, max: null }, freeLigand: { min: null, max: null }, pH: { min: null, max: null } },
    site: '',
    owner: { id: 'u-chem', name: 'Cora Quill' },
    notes: '',
    createdBy: { id: 'u-chem', name: 'Cora Quill' },
    createdAt: '2026-01-10T09:00:00.000Z',
    updatedAt: '2026-01-10T09:00:00.000Z',
    archivedAt: null,
    ...extra,
  };
}

/** Its latest analysis: 0.1 mol/L silver, 0.15 mol/L free cyanide, pH 12. */
export const silverAnalysis: Analysis = {
  id: 'a-1',
  bathId: BATH_ID,
  sampledAt: '2026-03-16T00:00:00.000Z',
  analyst: 'Cora Quill',
  values: { metal: 0.1, freeLigand: 0.15, totalLigand: null, pH: 12, carbonate: null, bromide: null },
  entered: {},
  notes: '',
  source: 'manual',
  enteredBy: { id: 'u-chem', name: 'Cora Quill' },
  createdAt: '2026-03-16T00:00:00.000Z',
  outOfRange: [],
};

/** The bath list (baths in service), the bath and its analyses, as the API serves them. */
export function bathRoutes(bath: Bath, analysis: Analysis = silverAnalysis): Routes {
  return {
    '/api/baths?status=active': { status: 200, body: [{ ...bath, analysisCount: 1, lastAnalysisAt: analysis.sampledAt, lastAnalysisAgeDays: 2, outOfRange: [], hazards: [], review: null }] },
    [keys.bath(bath.id)]: { status: 200, body: bath },
    [keys.analyses(bath.id)]: { status: 200, body: [analysis] },
  };
}

/** Cyanide silver at pH 12 with potassium: silver cyanide can form; H+ is held by the pH. */
export const cyanideSilverProblem = {
  components: ['Ag+', 'CN-', 'K+', 'H+'],
  totals: { 'Ag+': 0.1, 'CN-': 0.35, 'K+': 0.35 },
  fixed: { 'H+': 1e-12 },
  species: [
    { name: 'Ag(CN)2-', logK: 20.48, stoich: { 'Ag+': 1, 'CN-': 2 } },
    { name: 'Ag(CN)3-2', logK: 21.4, stoich: { 'Ag+': 1, 'CN-': 3 } },
    { name: 'HCN', logK: 9.21, stoich: { 'H+': 1, 'CN-': 1 } },
  ],
  solids: [{ name: 'AgCN(s)', logKsp: -15.66, stoich: { 'Ag+': 1, 'CN-': 1 } }],
  activity: 'davies',
  temperatureC: 25,
};

/** What the library builds for it. */
export const cyanideSilverBuilt = { problem: cyanideSilverProblem, constants: [], drafts: [], availableSolids: ['AgCN(s)'], warnings: [] };
