import { Dimensions } from 'react-native';
import { fireEvent, renderRouter, screen, within } from 'expo-router/testing-library';

import { errorBody, mockApi, type Routes } from './helpers';

const phone = Dimensions.get('window');
const cora = { id: 'u-chem', name: 'Cora Quill' };
const theo = { id: 'u-tech', name: 'Theo Bench' };

const summaries = [
  { id: 'run-2', title: 'Fixer tank 2, after top-up', calculator: 'speciation', author: theo, createdAt: '2026-03-04T09:00:00.000Z', status: 'converged', usesDrafts: true, verdict: 'Silver is held mostly as Ag(S2O3)2-3 (> 99 %); no solid forms.', bath: null },
  { id: 'run-1', title: '', calculator: 'speciation', author: cora, createdAt: '2026-03-01T15:30:00.000Z', status: 'not_converged', usesDrafts: false, verdict: '', bath: null },
];

// Silver chloride in dilute ammonia, as the server stored it when the run was saved.
const problem = {
  components: ['Ag+', 'Cl-', 'NH3'],
  totals: { 'Ag+': 0.01, 'Cl-': 0.01, NH3: 0.1 },
  fixed: {},
  species: [
    { name: 'Ag(NH3)+', logK: 3.31, stoich: { 'Ag+': 1, NH3: 1 } },
    { name: 'Ag(NH3)2+', logK: 7.23, stoich: { 'Ag+': 1, NH3: 2 } },
  ],
  solids: [{ name: 'AgCl(s)', logKsp: -9.75, stoich: { 'Ag+': 1, 'Cl-': 1 } }],
  activity: 'davies',
};
const result = {
  status: 'converged',
  free: { 'Ag+': 3.91e-8, 'Cl-': 0.005313, NH3: 0.08938 },
  species: { 'Ag+': 3.91e-8, 'Cl-': 0.005313, NH3: 0.08938, 'Ag(NH3)+': 7.136e-6, 'Ag(NH3)2+': 0.005305 },
  solids: { 'AgCl(s)': 0.004687 },
  saturation: { 'AgCl(s)': 0 },
  ionicStrength: 0.005313,
  iterations: 8,
  residual: 5.2e-16,
  warnings: [],
  activity: 'davies',
  temperatureC: 25,
};
const constant = (id: number, version: number, reaction: string, logValue: number, kind: string) => ({
  id,
  lineageId: `lin-${id}`,
  version,
  status: 'approved',
  kind,
  reaction,
  logValue,
  temperatureC: 25,
  source: 'Handbook table 4, 2004',
});
const run = {
  ...summaries[0],
  inputs: {
    title: 'Fixer tank 2, after top-up',
    calculator: 'speciation',
    system: { metals: ['Ag+'], ligands: ['Cl-', 'NH3'], counterIons: [], totals: problem.totals, pH: 9.5, activity: 'davies', includeDrafts: true },
  },
  problem,
  engineVersion: '1.2.0',
  result,
  constants: [
    { ...constant(31, 1, 'Ag+ + 2 NH3 = Ag(NH3)2+', 7.23, 'cumulative_formation'), supersededBy: { id: 32, version: 2, logValue: 7.4 }, statusNow: 'retired' },
    { ...constant(40, 3, 'AgCl(s) = Ag+ + Cl-', -9.75, 'solubility_product'), supersededBy: null, statusNow: 'approved' },
  ],
  warnings: ['Uses 1 draft not yet reviewed.'],
  output: null,
};

function open(url: string, routes: Routes) {
  const fetchMock = mockApi(routes);
  const view = renderRouter('./app', { initialUrl: url });
  return { fetchMock, view };
}

afterEach(() => {
  Dimensions.set({ window: phone, screen: phone });
});

describe('Saved runs', () => {
  it('shows loading, then an error with retry', async () => {
    open('/calculate/runs', { '/api/runs': 'pending' });
    expect(await screen.findByText('Loading saved runs…')).toBeOnTheScreen();
    open('/calculate/runs', { '/api/runs': { status: 500, body: errorBody('internal', 'Something broke on the server.') } });
    expect(await screen.findByText('Something broke on the server.')).toBeOnTheScreen();
    mockApi({ '/api/runs': { status: 200, body: summaries } });
    fireEvent.press(screen.getByRole('button', { name: 'Retry' }));
    expect(await screen.findByText('Fixer tank 2, after top-up')).toBeOnTheScreen();
  });

  it('says when nothing has been saved yet', async () => {
    open('/calculate/runs', { '/api/runs': { status: 200, body: [] } });
    expect(await screen.findByText('No saved runs yet')).toBeOnTheScreen();
    expect(screen.getByRole('link', { name: 'Open speciation' })).toBeOnTheScreen();
  });

  it('lists runs newest first with author, status and a drafts marker', async () => {
    open('/calculate/runs', { '/api/runs': { status: 200, body: [...summaries].reverse() } });
    const links = await screen.findAllByRole('link', { name: /Fixer tank 2|Untitled run/ });
    expect(links.map((l) => l.props.accessibilityLabel)).toEqual(['Fixer tank 2, after top-up', 'Untitled run']);
    const first = within(screen.getByTestId('run-run-2'));
    expect(first.getByText(/Speciation · Theo Bench · /)).toBeOnTheScreen();
    expect(first.getByText('Settled')).toBeOnTheScreen();
    expect(first.getByText('Uses drafts')).toBeOnTheScreen();
    const second = within(screen.getByTestId('run-run-1'));
    expect(second.getByText('Did not settle')).toBeOnTheScreen();
    expect(second.queryByText('Uses drafts')).toBeNull();
  });

  it('opens a run with its inputs, stored result and the versions it used', async () => {
    const { view } = open('/calculate/runs', { '/api/runs': { status: 200, body: summaries }, '/api/runs/run-2': { status: 200, body: run } });
    fireEvent.press(await screen.findByTestId('run-run-2'));
    expect(await screen.findByText(/Speciation · by Theo Bench · .* · engine 1\.2\.0/)).toBeOnTheScreen();
    expect(view.getPathname()).toBe('/calculate/runs/run-2');
    const inputs = within(screen.getByTestId('run-inputs'));
    expect(inputs.getByText(/Ligands: Cl-, NH3/)).toBeOnTheScreen();
    expect(inputs.getByText(/pH: 9\.5/)).toBeOnTheScreen();
    expect(inputs.getByText(/Drafts waiting for review were allowed/)).toBeOnTheScreen();
    expect(screen.getByText('Silver is held mostly as Ag(NH3)2+ (53 %); AgCl(s) (47 % of the silver) is present as a solid.')).toBeOnTheScreen();
    expect(screen.getByText('Uses 1 draft not yet reviewed.')).toBeOnTheScreen();
    const replaced = within(screen.getByTestId('constant-31'));
    expect(replaced.getByText(/v1 · log β 7\.23/)).toBeOnTheScreen();
    expect(replaced.getByText('v1 (log β 7.23) — since replaced by v2 (log β 7.40)')).toBeOnTheScreen();
    expect(replaced.getByText('Status now: retired')).toBeOnTheScreen();
    expect(replaced.getByRole('link', { name: 'Version 1 of Ag+ + 2 NH3 = Ag(NH3)2+ and its history' })).toBeOnTheScreen();
    const kept = within(screen.getByTestId('constant-40'));
    expect(kept.getByText(/v3 · log Ksp -9\.75/)).toBeOnTheScreen();
    expect(kept.queryByText(/since replaced/)).toBeNull();
  });

  it('says plainly when a run does not exist, without a retry', async () => {
    open('/calculate/runs/nope', { '/api/runs/nope': { status: 404, body: errorBody('not_found', 'No saved run with that id.') } });
    expect(await screen.findByText('No saved run with that id.')).toBeOnTheScreen();
    expect(screen.queryByRole('button', { name: 'Retry' })).toBeNull();
  });

  it('puts the inputs beside the result tables on a wide screen', async () => {
    Dimensions.set({ window: { width: 1280, height: 800, scale: 1, fontScale: 1 }, screen: { width: 1280, height: 800, scale: 1, fontScale: 1 } });
    open('/calculate/runs/run-2', { '/api/runs/run-2': { status: 200, body: run } });
    expect(await screen.findByText('Saturation index')).toBeOnTheScreen();
    expect(within(screen.getByTestId('solids-AgCl(s)')).getByText('0.00469')).toBeOnTheScreen();
  });
});
