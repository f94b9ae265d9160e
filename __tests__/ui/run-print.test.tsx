import { fireEvent, renderRouter, screen, waitFor, within } from 'expo-router/testing-library';

import { errorBody, mockApi, type Routes } from './helpers';

const theo = { id: 'u-tech', name: 'Theo Bench' };

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
  warnings: ['Uses 1 draft not yet reviewed.'],
  activity: 'davies',
  temperatureC: 25,
};
const run = {
  id: 'run-2',
  title: 'Rinse check, silver in ammonia',
  calculator: 'speciation',
  author: theo,
  createdAt: '2026-03-04T09:00:00.000Z',
  status: 'converged',
  usesDrafts: true,
  verdict: 'Silver is held mostly as Ag(NH3)2+; AgCl(s) is present as a solid.',
  bath: { id: 'bath-rinse', name: 'Rinse tank 1' },
  hazards: [],
  review: null,
  released: false,
  inputs: {
    system: { metals: ['Ag+'], ligands: ['Cl-', 'NH3'], counterIons: [], totals: problem.totals, pH: 9.5, activity: 'davies', includeDrafts: true },
    params: {},
    bathId: 'bath-rinse',
  },
  problem,
  engineVersion: '1.2.0',
  result,
  constants: [
    {
      id: 31,
      lineageId: 'lin-31',
      version: 1,
      status: 'approved',
      kind: 'cumulative_formation',
      reaction: 'Ag+ + 2 NH3 = Ag(NH3)2+',
      logValue: 7.23,
      temperatureC: 25,
      source: 'Handbook table 4, 2004',
      supersededBy: { id: 32, version: 2, logValue: 7.4 },
      statusNow: 'retired',
    },
  ],
  warnings: ['Uses 1 draft not yet reviewed.'],
  output: null,
  safety: { hazards: [], flagged: false, review: null, released: null },
};
// A cyanide plating bath with thiosulfate in it too: two more cautions, and no ammonia.
const cyanideRun = {
  ...run,
  id: 'run-cn',
  title: 'Cyanide bath',
  bath: null,
  inputs: {
    system: { metals: ['Ag+'], ligands: ['CN-', 'S2O3-2'], counterIons: ['K+'], totals: { 'Ag+': 0.2, 'CN-': 0.9, 'S2O3-2': 0.01, 'K+': 0.9 }, activity: 'davies', includeDrafts: false },
    params: {},
  },
  problem: { ...problem, components: ['Ag+', 'CN-', 'S2O3-2', 'K+'], totals: { 'Ag+': 0.2, 'CN-': 0.9, 'S2O3-2': 0.01, 'K+': 0.9 }, species: [], solids: [] },
  result: { ...result, species: { 'Ag+': 0.2 }, free: { 'Ag+': 0.2 }, solids: {}, saturation: {}, warnings: [] },
  constants: [],
  warnings: [],
  usesDrafts: false,
};

function open(url: string, routes: Routes) {
  const fetchMock = mockApi(routes);
  const view = renderRouter('./app', { initialUrl: url });
  return { fetchMock, view };
}

afterEach(() => {
  delete (globalThis as { print?: unknown }).print;
});

describe('Run print view', () => {
  it('prints the run whole, without the app navigation', async () => {
    const print = jest.fn();
    (globalThis as { print?: unknown }).print = print;
    open('/print/run/run-2', { '/api/runs/run-2': { status: 200, body: run } });
    expect(await screen.findByRole('header', { name: 'Rinse check, silver in ammonia' })).toBeOnTheScreen();
    expect(screen.queryByRole('tab')).toBeNull();
    expect(screen.queryByTestId('side-rail')).toBeNull();

    const facts = within(screen.getByTestId('print-facts'));
    expect(facts.getByText(/Date: .*2026/)).toBeOnTheScreen();
    expect(facts.getByText('Saved by: Theo Bench')).toBeOnTheScreen();
    expect(facts.getByText('Bath: Rinse tank 1')).toBeOnTheScreen();
    expect(facts.getByText('Engine version: 1.2.0')).toBeOnTheScreen();
    expect(within(screen.getByTestId('run-verdict')).getByText(run.verdict)).toBeOnTheScreen();
    expect(within(screen.getByTestId('run-inputs')).getByText(/Ligands: Cl-, NH3/)).toBeOnTheScreen();
    expect(screen.getByTestId('speciation-result')).toBeOnTheScreen();
    expect(within(screen.getByTestId('model-notes')).getByText(/Ionic strength: 0\.00531 mol\/L/)).toBeOnTheScreen();
    // A warning held by both the run and the solver's result is listed once.
    expect(within(screen.getByTestId('model-notes')).getAllByText('Uses 1 draft not yet reviewed.')).toHaveLength(1);

    const used = within(screen.getByTestId('print-constant-31'));
    expect(used.getByText(/Version 1 · log β 7\.23 · 25 °C/)).toBeOnTheScreen();
    expect(used.getByText('Since replaced by version 2 (log β 7.40); this run kept version 1.')).toBeOnTheScreen();
    expect(used.queryByRole('link')).toBeNull();

    fireEvent.press(screen.getByRole('button', { name: 'Print' }));
    expect(print).toHaveBeenCalledTimes(1);
    expect(screen.getByRole('link', { name: 'Back to the run' })).toBeOnTheScreen();
  });

  it("carries the Safety screen's cautions for ammonia with silver, and the standing line", async () => {
    open('/print/run/run-2', { '/api/runs/run-2': { status: 200, body: run } });
    const cautions = within(await screen.findByTestId('print-cautions'));
    expect(cautions.getByText('Ammoniacal silver can leave explosive residues')).toBeOnTheScreen();
    expect(cautions.queryByTestId('caution-cyanide-acid')).toBeNull();
    expect(cautions.queryByTestId('caution-acid-fixer')).toBeNull();
    expect(cautions.getByText('Follow the SDS, local codes and licensed practice.')).toBeOnTheScreen();
  });

  it('carries the cyanide and thiosulfate cautions when the system holds them', async () => {
    open('/print/run/run-cn', { '/api/runs/run-cn': { status: 200, body: cyanideRun } });
    const cautions = within(await screen.findByTestId('print-cautions'));
    expect(cautions.getByTestId('caution-cyanide-acid')).toBeOnTheScreen();
    expect(cautions.getByTestId('caution-acid-fixer')).toBeOnTheScreen();
    expect(cautions.queryByTestId('caution-ammoniacal-silver')).toBeNull();
    expect(within(screen.getByTestId('print-facts')).getByText('Bath: none named')).toBeOnTheScreen();
  });

  it('shows no Print button where there is no browser print', async () => {
    open('/print/run/run-2', { '/api/runs/run-2': { status: 200, body: run } });
    expect(await screen.findByTestId('print-cautions')).toBeOnTheScreen();
    expect(screen.queryByRole('button', { name: 'Print' })).toBeNull();
  });

  it('says plainly when the run does not exist', async () => {
    open('/print/run/nope', { '/api/runs/nope': { status: 404, body: errorBody('not_found', 'No run with id nope.') } });
    expect(await screen.findByText('No run with id nope.')).toBeOnTheScreen();
    expect(screen.queryByRole('button', { name: 'Retry' })).toBeNull();
  });

  it('sends a signed-out visitor to sign in, then back to the print view', async () => {
    const { view } = open('/print/run/run-2', {
      '/api/me': { status: 401, body: errorBody('unauthenticated', 'Sign in first.') },
      '/api/runs/run-2': { status: 401, body: errorBody('unauthenticated', 'Sign in first.') },
    });
    await waitFor(() => expect(view.getPathname()).toBe('/sign-in'));
    expect(view.getSearchParams()).toEqual({ next: '/print/run/run-2' });
    expect(screen.queryByText(run.verdict)).toBeNull();
  });
});
