import { Dimensions } from 'react-native';
import { fireEvent, renderRouter, screen, waitFor, within } from 'expo-router/testing-library';

import { placeApiError, placeCalculatorError } from '@/components/screens/calculators/frame/errors';
import { ApiError } from '@/lib/api/fetcher';
import { CalculatorInputError } from '@/lib/calculators/errors';

import { BATH_ID, bathRoutes, silverBath } from './bath-fixtures';
import { chemist, errorBody, mockApi, sentBodies, type Routes } from './helpers';

const phone = Dimensions.get('window');

const use = (id: number, reaction: string, logValue: number, kind = 'cumulative_formation') => ({
  id,
  lineageId: `lin-${id}`,
  version: 2,
  status: 'approved',
  kind,
  reaction,
  logValue,
  temperatureC: 25,
  source: 'Handbook table 4, 2004',
});

// Cyanide silver: 0.1 mol/L silver in 0.35 mol/L cyanide with potassium; silver cyanide can form.
function cyanideBuilt(withPh: boolean) {
  return {
    problem: {
      components: ['Ag+', 'CN-', 'K+', ...(withPh ? ['H+'] : [])],
      totals: { 'Ag+': 0.1, 'CN-': 0.35, 'K+': 0.35 },
      fixed: withPh ? { 'H+': 1e-12 } : {},
      species: [
        { name: 'Ag(CN)2-', logK: 20.48, stoich: { 'Ag+': 1, 'CN-': 2 } },
        { name: 'Ag(CN)3-2', logK: 21.4, stoich: { 'Ag+': 1, 'CN-': 3 } },
        ...(withPh ? [{ name: 'HCN', logK: 9.21, stoich: { 'H+': 1, 'CN-': 1 } }] : []),
      ],
      solids: [{ name: 'AgCN(s)', logKsp: -15.66, stoich: { 'Ag+': 1, 'CN-': 1 } }],
      activity: 'davies',
      temperatureC: 25,
    },
    constants: [use(1, 'Ag+ + 2 CN- = Ag(CN)2-', 20.48), use(2, 'Ag+ + 3 CN- = Ag(CN)3-2', 21.4), use(3, 'AgCN(s) = Ag+ + CN-', -15.66, 'solubility_product')],
    drafts: [],
    availableSolids: ['AgCN(s)'],
    warnings: withPh ? [] : ['No pH given: protonated ligands, hydroxo complexes and hydroxide solids are left out.'],
  };
}

// A thiosulfate fixer with bromide: silver bromide is the halide it dissolves.
const fixerBuilt = {
  problem: {
    components: ['Ag+', 'S2O3-2', 'Br-', 'Na+'],
    totals: { 'Ag+': 0.03, 'S2O3-2': 0.5, 'Br-': 0.01, 'Na+': 1 },
    fixed: {},
    species: [
      { name: 'AgS2O3-', logK: 8.82, stoich: { 'Ag+': 1, 'S2O3-2': 1 } },
      { name: 'Ag(S2O3)2-3', logK: 13.46, stoich: { 'Ag+': 1, 'S2O3-2': 2 } },
    ],
    solids: [{ name: 'AgBr(s)', logKsp: -12.3, stoich: { 'Ag+': 1, 'Br-': 1 } }],
    activity: 'davies',
    temperatureC: 25,
  },
  constants: [use(4, 'Ag+ + 2 S2O3-2 = Ag(S2O3)2-3', 13.46), use(5, 'AgBr(s) = Ag+ + Br-', -12.3, 'solubility_product')],
  drafts: [],
  availableSolids: ['AgBr(s)'],
  warnings: [],
};

const buildRoute = (body: unknown) => ({ status: 200, body: cyanideBuilt((body as { pH?: number }).pH !== undefined) });

const bath = silverBath();
const tankRoutes: Routes = bathRoutes(bath);

function open(url: string, routes: Routes = {}) {
  const fetchMock = mockApi({ 'POST /api/systems/build': buildRoute, ...routes });
  renderRouter('./app', { initialUrl: url });
  return fetchMock;
}

async function chooseCyanide() {
  const inputs = within(await screen.findByTestId('calculator-inputs'));
  fireEvent.press(inputs.getByRole('checkbox', { name: 'Silver (Ag+)' }));
  fireEvent.press(inputs.getByRole('checkbox', { name: 'Cyanide (CN-)' }));
  fireEvent.press(inputs.getByRole('checkbox', { name: 'Potassium (K+)' }));
  fireEvent.changeText(inputs.getByLabelText('Total Ag+ (mol/L)'), '0.1');
  fireEvent.changeText(inputs.getByLabelText('Total CN- (mol/L)'), '0.35');
  fireEvent.changeText(inputs.getByLabelText('Total K+ (mol/L)'), '0.35');
  return inputs;
}

const calculate = () => fireEvent.press(screen.getByRole('button', { name: 'Calculate' }));

afterEach(() => {
  Dimensions.set({ window: phone, screen: phone });
});

describe('Calculate landing', () => {
  it('links every calculator, none marked not available', async () => {
    mockApi();
    renderRouter('./app', { initialUrl: '/calculate' });
    for (const name of ['Headroom', 'Fixer loading', 'Curves', 'Speciation', 'Precipitation order', 'Dosing plan', 'Make-up']) {
      expect(await screen.findByRole('link', { name: `Open ${name}` })).toBeOnTheScreen();
    }
    expect(screen.queryByText('Not available yet')).toBeNull();
  });
});

describe('Headroom', () => {
  it('offers the solids once the ions are picked and says how much more the bath takes, in the unit chosen', async () => {
    const fetchMock = open('/calculate/headroom');
    await chooseCyanide();
    const params = within(screen.getByTestId('calculator-params'));
    expect(await params.findByRole('radio', { name: 'AgCN(s)', checked: true }, { timeout: 3000 })).toBeOnTheScreen();
    calculate();
    expect(await screen.findByText('The bath takes 20.1 g/L more AgCN before a solid persists.')).toBeOnTheScreen();
    const sent = sentBodies(fetchMock, 'POST', '/api/systems/build');
    expect(sent[sent.length - 1]).toEqual({
      metals: ['Ag+'],
      ligands: ['CN-'],
      counterIons: ['K+'],
      totals: { 'Ag+': 0.1, 'CN-': 0.35, 'K+': 0.35 },
      activity: 'davies',
      includeDrafts: false,
      temperatureC: 25,
    });
    fireEvent.press(params.getByRole('radio', { name: 'mol/L' }));
    expect(screen.getByText('The bath takes 0.150 mol/L more AgCN before a solid persists.')).toBeOnTheScreen();
    // A unit is a way of reading the answer: the view follows it and the result is not out of date.
    expect(screen.getByTestId('headroom-amount')).toHaveTextContent('0.150 mol/L');
    expect(screen.queryByTestId('stale')).toBeNull();
    fireEvent.press(params.getByRole('radio', { name: 'troy oz/gal' }));
    expect(screen.getByText(/The bath takes 1\.97 troy oz\/gal more Ag \(as AgCN\) before a solid persists\./)).toBeOnTheScreen();
    const table = within(screen.getByTestId('headroom-table'));
    expect(table.getByText('Free CN-')).toBeOnTheScreen();
    expect(table.getByText('Dissolved Ag+')).toBeOnTheScreen();
    const notes = within(screen.getByTestId('model-notes'));
    expect(notes.getByText(/Activity model: Davies/)).toBeOnTheScreen();
    expect(notes.getByText(/Ionic strength of the bath: 0\.\d+ mol\/L/)).toBeOnTheScreen();
    expect(notes.getByText(/No pH given/)).toBeOnTheScreen();
    expect(within(notes.getByTestId('constant-3')).getByText(/v2 · log Ksp -15\.66/)).toBeOnTheScreen();
    expect(screen.getByRole('button', { name: /Download the result as CSV \(headroom-agcn\.csv\)/ })).toBeOnTheScreen();
    expect(screen.queryByText(/NaN/)).toBeNull();
  });

  it('puts the server’s field errors beside the fields, and marks a result the inputs have moved on from', async () => {
    let answer: 'ok' | 'bad' = 'ok';
    open('/calculate/headroom', {
      'POST /api/systems/build': (body) =>
        answer === 'ok' ? buildRoute(body) : { status: 400, body: errorBody('validation_failed', 'Check the inputs', [{ path: 'totals.Ag+', message: 'must be at most 20 mol/L' }]) },
    });
    const inputs = await chooseCyanide();
    await within(screen.getByTestId('calculator-params')).findByRole('radio', { name: 'AgCN(s)' }, { timeout: 3000 });
    calculate();
    expect(await screen.findByTestId('calculator-verdict')).toBeOnTheScreen();
    fireEvent.changeText(inputs.getByLabelText('Total Ag+ (mol/L)'), '0.12');
    expect(screen.getByTestId('stale')).toBeOnTheScreen();
    answer = 'bad';
    calculate();
    expect(await inputs.findByText('Must be at most 20 mol/L')).toBeOnTheScreen();
    expect(screen.queryByTestId('calculator-verdict')).toBeNull();
    expect(screen.getByTestId('calculation-refused')).toBeOnTheScreen();
  });

  it('starts from a bath named in the link, says what it estimated, and saves the run with the bath and the params', async () => {
    const run = {
      id: 'run-9',
      title: 'Tank 2 headroom',
      calculator: 'headroom',
      author: { id: chemist.id, name: chemist.name },
      createdAt: '2026-03-18T10:00:00.000Z',
      status: 'converged',
      usesDrafts: false,
      verdict: '0.1500 mol/L more AgCN(s) dissolves before it persists.',
      bath: { id: BATH_ID, name: bath.name },
      hazards: [],
      review: null,
      released: false,
      output: null,
      safety: { hazards: [], flagged: false, review: null, released: null },
      inputs: {},
      problem: cyanideBuilt(true).problem,
      engineVersion: '1.0.0',
      result: { status: 'converged', free: {}, species: {}, solids: {}, saturation: {}, ionicStrength: 0.35, iterations: 5, residual: 0, warnings: [], activity: 'davies', temperatureC: 25 },
      constants: [],
      warnings: [],
    };
    let save: 'bad' | 'ok' = 'bad';
    const fetchMock = open(`/calculate/headroom?bath=${BATH_ID}`, {
      ...tankRoutes,
      'POST /api/runs': () =>
        save === 'bad'
          ? { status: 422, body: errorBody('validation_failed', 'params.solid: not a solid', [{ path: 'params.solid', message: '"AgCN(s)" is not a solid of the system' }]) }
          : { status: 201, body: run },
      '/api/runs/run-9': { status: 200, body: run },
    });
    const inputs = within(await screen.findByTestId('calculator-inputs'));
    expect(await screen.findByText(/Filled from Silver line tank 2, analysis of/)).toBeOnTheScreen();
    expect(screen.getByText(/Total CN- estimated as free \+ 2 per Ag\+/)).toBeOnTheScreen();
    expect(inputs.getByLabelText('Total CN- (mol/L)')).toHaveDisplayValue('0.35');
    expect(inputs.getByLabelText('Total K+ (mol/L)')).toHaveDisplayValue('0.35');
    expect(inputs.getByLabelText('pH (optional, measured)')).toHaveDisplayValue('12');
    expect(inputs.getByRole('radio', { name: 'Silver line tank 2', checked: true })).toBeOnTheScreen();
    await within(screen.getByTestId('calculator-params')).findByRole('radio', { name: 'AgCN(s)', checked: true }, { timeout: 3000 });
    const card = within(screen.getByTestId('save-run'));
    fireEvent.changeText(card.getByLabelText('Title of the run'), 'Tank 2 headroom');
    fireEvent.press(card.getByRole('button', { name: 'Save run' }));
    expect(await within(screen.getByTestId('calculator-params')).findByText('"AgCN(s)" is not a solid of the system')).toBeOnTheScreen();
    save = 'ok';
    fireEvent.press(card.getByRole('button', { name: 'Save run' }));
    await waitFor(() => expect(sentBodies(fetchMock, 'POST', '/api/runs')).toHaveLength(2));
    expect(sentBodies(fetchMock, 'POST', '/api/runs')[1]).toEqual({
      title: 'Tank 2 headroom',
      calculator: 'headroom',
      bathId: BATH_ID,
      params: { solid: 'AgCN(s)', unit: 'g/L' },
      system: {
        metals: ['Ag+'],
        ligands: ['CN-'],
        counterIons: ['K+'],
        totals: { 'Ag+': 0.1, 'CN-': 0.35, 'K+': 0.35 },
        pH: 12,
        activity: 'davies',
        includeDrafts: false,
        temperatureC: 25,
      },
    });
    expect(await screen.findByText(/engine 1\.0\.0/)).toBeOnTheScreen();
  });

  it('puts inputs beside the result on a wide screen', async () => {
    Dimensions.set({ window: { width: 1280, height: 800, scale: 1, fontScale: 1 }, screen: { width: 1280, height: 800, scale: 1, fontScale: 1 } });
    open('/calculate/headroom');
    await chooseCyanide();
    await within(screen.getByTestId('calculator-params')).findByRole('radio', { name: 'AgCN(s)' }, { timeout: 3000 });
    calculate();
    expect(await screen.findByText('The bath takes 20.1 g/L more AgCN before a solid persists.')).toBeOnTheScreen();
    expect(screen.getByText('At saturation (mol/L)')).toBeOnTheScreen();
  });
});

describe('Fixer loading', () => {
  it('asks for the halide the solid needs, then gives capacity, silver now and the loading', async () => {
    open('/calculate/fixer-loading', { 'POST /api/systems/build': { status: 200, body: fixerBuilt } });
    const inputs = within(await screen.findByTestId('calculator-inputs'));
    fireEvent.press(inputs.getByRole('checkbox', { name: 'Silver (Ag+)' }));
    fireEvent.press(inputs.getByRole('checkbox', { name: 'Thiosulfate (S2O3-2)' }));
    fireEvent.press(inputs.getByRole('checkbox', { name: 'Sodium (Na+)' }));
    const params = within(screen.getByTestId('calculator-params'));
    expect(params.getByRole('radio', { name: 'AgBr(s)', checked: true })).toBeOnTheScreen();
    expect(params.getByText(/AgBr\(s\) needs Br- in the solution/)).toBeOnTheScreen();
    fireEvent.press(params.getByRole('button', { name: 'Add Br- to the solution' }));
    expect(inputs.getByRole('checkbox', { name: 'Bromide (Br-)', checked: true })).toBeOnTheScreen();
    fireEvent.changeText(inputs.getByLabelText('Total Ag+ (mol/L)'), '0.03');
    fireEvent.changeText(inputs.getByLabelText('Total S2O3-2 (mol/L)'), '0.5');
    fireEvent.changeText(inputs.getByLabelText('Total Br- (mol/L)'), '0.01');
    fireEvent.changeText(inputs.getByLabelText('Total Na+ (mol/L)'), '1');
    calculate();
    const verdict = await screen.findByTestId('calculator-verdict');
    expect(verdict).toHaveTextContent(/^Loaded to [\d.]+ % of capacity: 3\.24 g\/L silver held; it takes [\d.]+ g\/L more as AgBr before the solid persists\.$/);
    expect(within(screen.getByTestId('loading-bar')).getByText(/% of capacity used, [\d.]+ % left/)).toBeOnTheScreen();
    expect(within(screen.getByTestId('fixer-table')).getByText('Capacity for silver')).toBeOnTheScreen();
    expect(screen.getByRole('button', { name: /fixer-loading-agbr\.csv/ })).toBeOnTheScreen();
    expect(screen.queryByText(/NaN/)).toBeNull();
  });
});

describe('Where a calculator screen puts an error', () => {
  const names = {
    system: ['metals', 'pH', 'totals', 'totals.Ag+'],
    params: ['from', 'series'],
    paramField: (f: string) => (f.replace(/^sweep\./, '').startsWith('series') ? 'series' : f.replace(/^sweep\./, '')),
  };

  it('reads server paths under system. and params., and keeps the title and anything unknown apart', () => {
    const error = new ApiError(422, 'validation_failed', 'Check the inputs', [
      { path: 'system.totals.Ag+', message: 'cannot be negative' },
      { path: 'params.series[0].component', message: '"X" is not a component' },
      { path: 'title', message: 'must be at most 200 characters' },
      { path: 'params.volumeL', message: 'must be more than 0' },
    ]);
    expect(placeApiError(error, names)).toEqual({
      system: { fields: { 'totals.Ag+': 'Cannot be negative' } },
      params: { series: '"X" is not a component' },
      title: 'Must be at most 200 characters',
      top: 'volumeL: must be more than 0',
    });
  });

  it('puts a calculator’s refusal beside its field, a bath state problem beside the total, and anything else at the top', () => {
    expect(placeCalculatorError(new CalculatorInputError('sweep.from', 'a log range needs from above 0'), names).params).toEqual({ from: 'A log range needs from above 0' });
    expect(placeCalculatorError(new CalculatorInputError('state.totals.Ag+', 'must be finite'), names).system.fields).toEqual({ 'totals.Ag+': 'Must be finite' });
    expect(placeCalculatorError(new Error('The engine gave up'), names).top).toBe('The engine gave up');
  });
});
