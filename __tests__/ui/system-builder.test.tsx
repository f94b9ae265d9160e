import { Dimensions } from 'react-native';
import { fireEvent, renderRouter, screen, waitFor, within } from 'expo-router/testing-library';

import { solve } from '@/lib/engine';

import { chemist, errorBody, mockApi, sentBodies, type Routes } from './helpers';

jest.mock('@/lib/engine', () => {
  const actual = jest.requireActual('@/lib/engine');
  return { ...actual, solve: jest.fn(actual.solve) };
});

const solveMock = solve as jest.Mock;
const phone = Dimensions.get('window');
const reviewer = { ...chemist, id: 'u-rev', name: 'Rhea Check', roles: ['reviewer'] };

const use = (id: number, reaction: string, logValue: number, status = 'approved', kind = 'cumulative_formation') => ({
  id,
  lineageId: `lin-${id}`,
  version: 1,
  status,
  kind,
  reaction,
  logValue,
  temperatureC: 25,
  source: 'Handbook table 4, 2004',
});

// Silver thiosulfate fixer: 0.02 mol/L silver in 0.2 mol/L thiosulfate with sodium.
const thioBuilt = {
  problem: {
    components: ['Ag+', 'S2O3-2', 'Na+'],
    totals: { 'Ag+': 0.02, 'S2O3-2': 0.2, 'Na+': 0.4 },
    fixed: {},
    species: [
      { name: 'AgS2O3-', logK: 8.82, stoich: { 'Ag+': 1, 'S2O3-2': 1 } },
      { name: 'Ag(S2O3)2-3', logK: 13.46, stoich: { 'Ag+': 1, 'S2O3-2': 2 } },
    ],
    solids: [],
    activity: 'davies',
  },
  constants: [use(1, 'Ag+ + S2O3-2 = AgS2O3-', 8.82), use(2, 'Ag+ + 2 S2O3-2 = Ag(S2O3)2-3', 13.46)],
  drafts: [],
  availableSolids: [],
  warnings: [],
};

// Silver chloride in dilute ammonia: about half the silver stays as the solid.
const chlorideBuilt = {
  problem: {
    components: ['Ag+', 'Cl-', 'NH3'],
    totals: { 'Ag+': 0.01, 'Cl-': 0.01, NH3: 0.1 },
    fixed: {},
    species: [
      { name: 'Ag(NH3)+', logK: 3.31, stoich: { 'Ag+': 1, NH3: 1 } },
      { name: 'Ag(NH3)2+', logK: 7.23, stoich: { 'Ag+': 1, NH3: 2 } },
    ],
    solids: [{ name: 'AgCl(s)', logKsp: -9.75, stoich: { 'Ag+': 1, 'Cl-': 1 } }],
    activity: 'davies',
  },
  constants: [use(3, 'Ag+ + 2 NH3 = Ag(NH3)2+', 7.23, 'draft'), use(4, 'AgCl(s) = Ag+ + Cl-', -9.75, 'approved', 'solubility_product')],
  drafts: [use(3, 'Ag+ + 2 NH3 = Ag(NH3)2+', 7.23, 'draft')],
  availableSolids: ['AgCl(s)', 'Ag2O(s)'],
  warnings: [],
};

function open(routes: Routes = {}) {
  const fetchMock = mockApi(routes);
  renderRouter('./app', { initialUrl: '/calculate/system' });
  return fetchMock;
}

async function chooseFixer() {
  const inputs = within(await screen.findByTestId('system-inputs'));
  fireEvent.press(inputs.getByRole('checkbox', { name: 'Silver (Ag+)' }));
  fireEvent.press(inputs.getByRole('checkbox', { name: 'Thiosulfate (S2O3-2)' }));
  fireEvent.press(inputs.getByRole('checkbox', { name: 'Sodium (Na+)' }));
  fireEvent.changeText(inputs.getByLabelText('Total Ag+ (mol/L)'), '0.02');
  fireEvent.changeText(inputs.getByLabelText('Total S2O3-2 (mol/L)'), '0,2');
  fireEvent.changeText(inputs.getByLabelText('Total Na+ (mol/L)'), '4e-1');
  return inputs;
}

async function chooseChloride() {
  const inputs = within(await screen.findByTestId('system-inputs'));
  fireEvent.press(inputs.getByRole('checkbox', { name: 'Silver (Ag+)' }));
  fireEvent.press(inputs.getByRole('checkbox', { name: 'Chloride (Cl-)' }));
  fireEvent.press(inputs.getByRole('checkbox', { name: 'Ammonia (NH3)' }));
  fireEvent.changeText(inputs.getByLabelText('Total Ag+ (mol/L)'), '0.01');
  fireEvent.changeText(inputs.getByLabelText('Total Cl- (mol/L)'), '0.01');
  fireEvent.changeText(inputs.getByLabelText('Total NH3 (mol/L)'), '0.1');
  return inputs;
}

afterEach(() => {
  Dimensions.set({ window: phone, screen: phone });
});

describe('Speciation from the library', () => {
  it('is linked from the Calculate landing, with every calculator available', async () => {
    mockApi();
    renderRouter('./app', { initialUrl: '/calculate' });
    expect(await screen.findByRole('link', { name: 'Open Speciation' })).toBeOnTheScreen();
    expect(screen.getByRole('link', { name: 'Saved runs' })).toBeOnTheScreen();
    expect(screen.queryByText('Not available yet')).toBeNull();
  });

  it('checks the inputs before asking the server', async () => {
    const fetchMock = open();
    const inputs = within(await screen.findByTestId('system-inputs'));
    fireEvent.press(inputs.getByRole('button', { name: 'Calculate' }));
    expect(await inputs.findByText('Choose at least one metal ion')).toBeOnTheScreen();
    fireEvent.press(inputs.getByRole('checkbox', { name: 'Silver (Ag+)' }));
    fireEvent.changeText(inputs.getByLabelText('pH (optional, measured)'), 'seven');
    fireEvent.changeText(inputs.getByLabelText('Temperature (°C)'), 'warm');
    fireEvent.press(inputs.getByRole('button', { name: 'Calculate' }));
    expect(await inputs.findByText('Enter the total in mol/L')).toBeOnTheScreen();
    expect(inputs.getByText('Must be a number (or leave it empty)')).toBeOnTheScreen();
    expect(inputs.getByText('Must be a number of °C (or leave it empty for 25 °C)')).toBeOnTheScreen();
    fireEvent.changeText(inputs.getByLabelText('Temperature (°C)'), '120');
    fireEvent.press(inputs.getByRole('button', { name: 'Calculate' }));
    expect(await inputs.findByText(/at most 100 °C/i)).toBeOnTheScreen();
    fireEvent.changeText(inputs.getByLabelText('Temperature (°C)'), '25');
    fireEvent.changeText(inputs.getByLabelText('Total Ag+ (mol/L)'), '25');
    fireEvent.changeText(inputs.getByLabelText('pH (optional, measured)'), '');
    fireEvent.press(inputs.getByRole('button', { name: 'Calculate' }));
    expect(await inputs.findByText('Must be at most 20 mol/L')).toBeOnTheScreen();
    expect(sentBodies(fetchMock, 'POST', '/api/systems/build')).toHaveLength(0);
  });

  it('takes a total in g/L of the ion and sends it as mol/L, converting what is typed when the unit changes', async () => {
    const fetchMock = open({ 'POST /api/systems/build': { status: 200, body: thioBuilt } });
    const inputs = await chooseFixer();
    fireEvent.changeText(inputs.getByLabelText('Total Ag+ (mol/L)'), '0.1');
    // The first unit group belongs to the first total, Ag+.
    fireEvent.press(inputs.getAllByRole('radio', { name: 'g/L', checked: false })[0]!);
    // 0.1 mol/L of Ag (107.8682 g/mol, IUPAC) is 10.78682 g/L.
    expect(inputs.getByLabelText('Total Ag+ (g/L)')).toHaveProp('value', '10.7868');
    fireEvent.changeText(inputs.getByLabelText('Total Ag+ (g/L)'), '5.39341');
    fireEvent.press(inputs.getByRole('button', { name: 'Calculate' }));
    await screen.findByText(/Silver is held mostly/);
    const sent = sentBodies(fetchMock, 'POST', '/api/systems/build')[0] as { totals: Record<string, number> };
    expect(sent.totals['Ag+']).toBeCloseTo(0.05, 9);
  });

  it('builds the system, solves it here and says where the silver is', async () => {
    const fetchMock = open({ 'POST /api/systems/build': { status: 200, body: thioBuilt } });
    const inputs = await chooseFixer();
    fireEvent.press(inputs.getByRole('button', { name: 'Calculate' }));
    expect(await screen.findByText('Silver is held mostly as Ag(S2O3)2-3 (> 99 %); no solid forms.')).toBeOnTheScreen();
    expect(sentBodies(fetchMock, 'POST', '/api/systems/build')).toEqual([
      {
        metals: ['Ag+'],
        ligands: ['S2O3-2'],
        counterIons: ['Na+'],
        totals: { 'Ag+': 0.02, 'S2O3-2': 0.2, 'Na+': 0.4 },
        activity: 'davies',
        includeDrafts: false,
        temperatureC: 25,
      },
    ]);
    const row = within(screen.getByTestId('species-AgS2O3-'));
    expect(row.getByText(/8\.64 × 10⁻⁷/)).toBeOnTheScreen();
    expect(row.getByText(/0\.00432 % of Ag\+/)).toBeOnTheScreen();
    expect(screen.getByText(/Ionic strength: 0\.610 mol\/L/)).toBeOnTheScreen();
    expect(screen.getByText(/beyond the usual range of the Davies equation/)).toBeOnTheScreen();
    const used = within(screen.getByTestId('constant-2'));
    expect(used.getByText('Ag+ + 2 S2O3-2 = Ag(S2O3)2-3')).toBeOnTheScreen();
    expect(used.getByText(/v1 · log β 13\.46/)).toBeOnTheScreen();
    expect(used.getByText('Approved')).toBeOnTheScreen();
    expect(screen.queryByText(/NaN/)).toBeNull();
  });

  it('sends pH, the ideal model and drafts when asked, with a warning about drafts', async () => {
    const fetchMock = open({ 'POST /api/systems/build': { status: 200, body: chlorideBuilt } });
    const inputs = await chooseChloride();
    fireEvent.changeText(inputs.getByLabelText('pH (optional, measured)'), '9.5');
    fireEvent.press(inputs.getByRole('radio', { name: 'Ideal' }));
    expect(inputs.queryByTestId('drafts-warning')).toBeNull();
    fireEvent.press(inputs.getByRole('checkbox', { name: 'Use drafts waiting for review' }));
    expect(inputs.getByTestId('drafts-warning')).toBeOnTheScreen();
    fireEvent.press(inputs.getByRole('button', { name: 'Calculate' }));
    expect(await screen.findByText(/AgCl\(s\) \(47 % of the silver\) is present as a solid/)).toBeOnTheScreen();
    expect(sentBodies(fetchMock, 'POST', '/api/systems/build')[0]).toMatchObject({ pH: 9.5, activity: 'ideal', includeDrafts: true });
    expect(screen.getByText('This result uses 1 draft value not yet reviewed.')).toBeOnTheScreen();
    expect(within(screen.getByTestId('constant-3')).getByText('Draft, not reviewed')).toBeOnTheScreen();
    expect(within(screen.getByTestId('solids-AgCl(s)')).getByText(/Saturation index: 0\.00/)).toBeOnTheScreen();
  });

  it('offers the solids after building and sends them only once changed', async () => {
    const fetchMock = open({ 'POST /api/systems/build': { status: 200, body: chlorideBuilt } });
    const inputs = await chooseChloride();
    fireEvent.press(inputs.getByRole('button', { name: 'Calculate' }));
    const agcl = await inputs.findByRole('checkbox', { name: 'Allow AgCl(s)', checked: true });
    expect(inputs.getByRole('checkbox', { name: 'Allow Ag2O(s)', checked: true })).toBeOnTheScreen();
    expect(sentBodies(fetchMock, 'POST', '/api/systems/build')[0]).not.toHaveProperty('solids');
    fireEvent.press(agcl);
    expect(screen.getByTestId('stale')).toBeOnTheScreen();
    fireEvent.press(inputs.getByRole('button', { name: 'Calculate' }));
    await waitFor(() => expect(sentBodies(fetchMock, 'POST', '/api/systems/build')).toHaveLength(2));
    expect(sentBodies(fetchMock, 'POST', '/api/systems/build')[1]).toMatchObject({ solids: ['Ag2O(s)'] });
  });

  it('puts the server’s field errors beside the fields and other refusals above the form', async () => {
    let answer: 'field' | 'system' = 'field';
    open({
      'POST /api/systems/build': () =>
        answer === 'field'
          ? { status: 400, body: errorBody('validation_failed', 'Check the inputs', [{ path: 'totals.Ag+', message: 'must be at most 20 mol/L' }]) }
          : { status: 422, body: errorBody('validation_failed', 'The library has no constant linking Ag+ with Na+; choose a ligand.') },
    });
    const inputs = await chooseFixer();
    fireEvent.press(inputs.getByRole('button', { name: 'Calculate' }));
    expect(await inputs.findByText('Must be at most 20 mol/L')).toBeOnTheScreen();
    answer = 'system';
    fireEvent.press(inputs.getByRole('button', { name: 'Calculate' }));
    expect(await inputs.findByText('The library has no constant linking Ag+ with Na+; choose a ligand.')).toBeOnTheScreen();
    expect(inputs.queryByText('Must be at most 20 mol/L')).toBeNull();
  });

  it('turns a result that did not settle into words, never NaN', async () => {
    solveMock.mockReturnValueOnce({
      status: 'not_converged',
      message: 'No assemblage of solids met the mass balances',
      free: { 'Ag+': Number.NaN },
      species: { 'Ag+': Number.NaN },
      solids: {},
      saturation: {},
      gamma: {},
      ionicStrength: Number.NaN,
      iterations: 4000,
      residual: Number.NaN,
      warnings: [],
      activity: 'davies',
      temperatureC: 25,
    });
    open({ 'POST /api/systems/build': { status: 200, body: thioBuilt } });
    const inputs = await chooseFixer();
    fireEvent.press(inputs.getByRole('button', { name: 'Calculate' }));
    expect(await screen.findByText(/The calculation did not settle, so these numbers cannot be trusted. No assemblage of solids met the mass balances./)).toBeOnTheScreen();
    expect(screen.queryByText(/NaN/)).toBeNull();
    expect(screen.queryByTestId('species')).toBeNull();
  });

  it('shows the engine’s own words when it refuses the problem', async () => {
    const species = [{ name: 'AgX', logK: 1, stoich: { 'Ag+': 1, 'X-': 1 } }];
    open({ 'POST /api/systems/build': { status: 200, body: { ...thioBuilt, problem: { ...thioBuilt.problem, species } } } });
    const inputs = await chooseFixer();
    fireEvent.press(inputs.getByRole('button', { name: 'Calculate' }));
    expect(await screen.findByText(/unknown component "X-"/)).toBeOnTheScreen();
    expect(screen.queryByTestId('verdict')).toBeNull();
  });

  it('saves a run and opens it', async () => {
    const run = {
      id: 'run-7',
      title: 'Fixer tank 2',
      calculator: 'speciation',
      author: { id: chemist.id, name: chemist.name },
      createdAt: '2026-03-03T10:00:00.000Z',
      status: 'converged',
      usesDrafts: false,
      verdict: 'Ag+ is held mostly as Ag(S2O3)2-3 (> 99 %); no solid forms.',
      bath: null,
      hazards: [],
      review: null,
      released: false,
      output: null,
      safety: { hazards: [], flagged: false, review: null, released: null },
      inputs: { system: { metals: ['Ag+'], ligands: ['S2O3-2'], counterIons: ['Na+'], totals: thioBuilt.problem.totals } },
      problem: thioBuilt.problem,
      engineVersion: '1.0.0',
      result: { ...solveMock.getMockImplementation()!(thioBuilt.problem) },
      constants: thioBuilt.constants.map((c) => ({ ...c, supersededBy: null, statusNow: 'approved' })),
      warnings: [],
    };
    let answer: 'bad' | 'ok' = 'bad';
    const fetchMock = open({
      'POST /api/runs': () =>
        answer === 'bad'
          ? { status: 400, body: errorBody('validation_failed', 'Check the inputs', [{ path: 'system.totals.Na+', message: 'cannot be negative' }]) }
          : { status: 201, body: run },
      '/api/runs/run-7': { status: 200, body: run },
    });
    const inputs = await chooseFixer();
    const save = within(screen.getByTestId('save-run'));
    fireEvent.changeText(save.getByLabelText('Title of the run'), ' Fixer tank 2 ');
    fireEvent.press(save.getByRole('button', { name: 'Save run' }));
    expect(await inputs.findByText('Cannot be negative')).toBeOnTheScreen();
    answer = 'ok';
    fireEvent.press(save.getByRole('button', { name: 'Save run' }));
    expect(await screen.findByText(/engine 1\.0\.0/)).toBeOnTheScreen();
    expect(sentBodies(fetchMock, 'POST', '/api/runs')[1]).toEqual({
      title: 'Fixer tank 2',
      calculator: 'speciation',
      system: {
        metals: ['Ag+'],
        ligands: ['S2O3-2'],
        counterIons: ['Na+'],
        totals: { 'Ag+': 0.02, 'S2O3-2': 0.2, 'Na+': 0.4 },
        activity: 'davies',
        includeDrafts: false,
        temperatureC: 25,
      },
    });
  });

  it('does not offer saving to someone who is neither chemist nor technician', async () => {
    open({ '/api/me': { status: 200, body: reviewer } });
    expect(await screen.findByText('Saving runs is for chemists and technicians.')).toBeOnTheScreen();
    expect(screen.queryByTestId('save-run')).toBeNull();
  });

  it('puts inputs beside a results table on a wide screen', async () => {
    Dimensions.set({ window: { width: 1280, height: 800, scale: 1, fontScale: 1 }, screen: { width: 1280, height: 800, scale: 1, fontScale: 1 } });
    open({ 'POST /api/systems/build': { status: 200, body: thioBuilt } });
    const inputs = await chooseFixer();
    fireEvent.press(inputs.getByRole('button', { name: 'Calculate' }));
    expect(await screen.findByText('Share of its metal')).toBeOnTheScreen();
    expect(within(screen.getByTestId('species-Ag(S2O3)2-3')).getByText('0.0200')).toBeOnTheScreen();
  });
});
