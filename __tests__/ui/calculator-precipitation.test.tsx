import { render } from '@testing-library/react-native';
import { fireEvent, renderRouter, screen, within } from 'expo-router/testing-library';

import { orderChart, readableVerdict } from '@/components/screens/calculators/precipitation-order/precipitation-words';
import { RESULT_VIEWS } from '@/components/screens/calculators/result-views';
import { runCalculation } from '@/lib/calculators/run-calculation';

import { mockApi, sentBodies } from './helpers';

const use = (id: number, reaction: string, logValue: number) => ({
  id,
  lineageId: `lin-${id}`,
  version: 1,
  status: 'approved',
  kind: 'solubility_product',
  reaction,
  logValue,
  temperatureC: 25,
  source: 'Handbook table 4, 2004',
});

// Silver and lead, 0.01 mol/L each, with iodide dosed from none; ideal activities so the first
// threshold is Ksp / [Ag+] exactly: 10^-16.08 / 0.01 = 8.3 × 10⁻¹⁵ mol/L free iodide.
const problem = {
  components: ['Ag+', 'Pb+2', 'I-'],
  totals: { 'Ag+': 0.01, 'Pb+2': 0.01, 'I-': 0 },
  fixed: {},
  species: [],
  solids: [
    { name: 'AgI(s)', logKsp: -16.08, stoich: { 'Ag+': 1, 'I-': 1 } },
    { name: 'PbI2(s)', logKsp: -8.1, stoich: { 'Pb+2': 1, 'I-': 2 } },
  ],
  activity: 'ideal',
  temperatureC: 25,
};

const built = {
  problem,
  constants: [use(1, 'AgI(s) = Ag+ + I-', -16.08), use(2, 'PbI2(s) = Pb+2 + 2 I-', -8.1)],
  drafts: [],
  availableSolids: ['AgI(s)', 'PbI2(s)'],
  warnings: [],
};

function open() {
  const fetchMock = mockApi({ 'POST /api/systems/build': { status: 200, body: built } });
  renderRouter('./app', { initialUrl: '/calculate/precipitation-order' });
  return fetchMock;
}

async function chooseSilverLeadIodide() {
  const inputs = within(await screen.findByTestId('calculator-inputs'));
  fireEvent.press(inputs.getByRole('checkbox', { name: 'Silver (Ag+)' }));
  fireEvent.press(inputs.getByRole('checkbox', { name: 'Lead (Pb+2)' }));
  fireEvent.press(inputs.getByRole('checkbox', { name: 'Iodide (I-)' }));
  fireEvent.changeText(inputs.getByLabelText('Total Ag+ (mol/L)'), '0.01');
  fireEvent.changeText(inputs.getByLabelText('Total Pb+2 (mol/L)'), '0.01');
  fireEvent.changeText(inputs.getByLabelText('Total I- (mol/L)'), '0');
  fireEvent.press(inputs.getByRole('radio', { name: 'Ideal' }));
  return inputs;
}

const params = () => within(screen.getByTestId('calculator-params'));
const calculate = () => fireEvent.press(screen.getByRole('button', { name: 'Calculate' }));

describe('Precipitation order', () => {
  it('is linked from the Calculate landing', async () => {
    mockApi();
    renderRouter('./app', { initialUrl: '/calculate' });
    expect(await screen.findByRole('link', { name: 'Open Precipitation order' })).toBeOnTheScreen();
  });

  it('asks for the precipitant and the metals, then gives the order, the table and the chart', async () => {
    const fetchMock = open();
    expect(await screen.findByText(/Choose the ligand you dose/)).toBeOnTheScreen();
    calculate();
    expect(await params().findByText('Choose the ligand dosed as the precipitant (add it among the ligands above)')).toBeOnTheScreen();
    expect(params().getByText('Follow at least one metal ion')).toBeOnTheScreen();

    await chooseSilverLeadIodide();
    expect(params().getByRole('radio', { name: 'I-', checked: true })).toBeOnTheScreen();
    expect(params().getByRole('checkbox', { name: 'Follow Ag+', checked: true })).toBeOnTheScreen();
    expect(params().getByRole('checkbox', { name: 'Follow Pb+2', checked: true })).toBeOnTheScreen();
    fireEvent.changeText(params().getByLabelText('Most precipitant to consider (mol/L, optional)'), '-1');
    calculate();
    expect(await params().findByText('Must be a number of mol/L above 0 (or leave it empty)')).toBeOnTheScreen();
    fireEvent.changeText(params().getByLabelText('Most precipitant to consider (mol/L, optional)'), '');
    calculate();

    const verdict = await screen.findByTestId('calculator-verdict', {}, { timeout: 4000 });
    expect(verdict).toHaveTextContent(/^As I- is added: AgI\(s\) at .* mol\/L total \(8\.32 × 10⁻¹⁵ mol\/L free\); PbI2\(s\) at/);
    const list = within(screen.getByTestId('precipitation-order-list'));
    expect(list.getByText('1. AgI(s) starts at 8.32 × 10⁻¹⁵ mol/L free I- (8.32 × 10⁻¹⁵ mol/L I- in total).')).toBeOnTheScreen();
    expect(list.getByText(/^When PbI2 starts, left dissolved: Ag\+ 9\.\d\d × 10⁻¹⁴ mol\/L \(< 0\.01 % of it\), Pb\+2 0\.0100 mol\/L \(100 % of it\)\.$/)).toBeOnTheScreen();
    expect(list.getByText(/^2\. PbI2\(s\) starts at 8\.9\d × 10⁻⁴ mol\/L free I-/)).toBeOnTheScreen();
    expect(within(screen.getByTestId('precipitation-table')).getByText('2. PbI2(s)')).toBeOnTheScreen();
    const chart = screen.getByTestId('precipitation-chart-drawing');
    expect(chart.props.accessibilityLabel).toMatch(/^Left dissolved against Free I- \(mol\/L, log scale\), 3 points from 8\.32 × 10⁻¹⁶ to 8\.9\d × 10⁻⁴: Ag\+ dissolved from 0\.0100 to 9\.\d\d × 10⁻¹⁴; Pb\+2 dissolved from 0\.0100 to 0\.0100\.$/);
    expect(screen.getByRole('button', { name: /Download the result as CSV \(precipitation-order-i\.csv\)/ })).toBeOnTheScreen();
    expect(screen.queryByText(/NaN/)).toBeNull();
    expect(sentBodies(fetchMock, 'POST', '/api/systems/build').at(-1)).toMatchObject({ metals: ['Ag+', 'Pb+2'], ligands: ['I-'], activity: 'ideal' });

    // Following only lead: the calculation is out of date until run again.
    fireEvent.press(params().getByRole('checkbox', { name: 'Follow Ag+' }));
    expect(screen.getByTestId('stale')).toBeOnTheScreen();
  });
});

describe('Precipitation order view of a stored run', () => {
  const stored = runCalculation('precipitation_order', problem as never, undefined, { precipitant: 'I-', cations: ['Ag+', 'Pb+2'], maxPrecipitantMolPerL: 1e-5 });

  it('says which solid is not reached within the range, draws at print width, and shows no NaN', () => {
    const View = RESULT_VIEWS.precipitation_order!;
    const output = JSON.parse(JSON.stringify(stored.result));
    const view = render(<View problem={problem as never} result={{} as never} output={output} params={{ precipitant: 'I-', cations: ['Ag+', 'Pb+2'], maxPrecipitantMolPerL: 1e-5 }} print />);
    expect(view.getByText('2. PbI2(s) does not start up to 1.00 × 10⁻⁵ mol/L of I-.')).toBeOnTheScreen();
    expect(view.getByText(/^Left dissolved there: Ag\+/)).toBeOnTheScreen();
    expect(view.getByTestId('precipitation-chart-drawing')).toHaveStyle({ width: 640 });
    expect(view.getByText('2. PbI2(s) (not reached)')).toBeOnTheScreen();
    expect(view.queryByText(/NaN/)).toBeNull();
  });

  it('draws nothing when no threshold is reached, and writes the calculator’s numbers as people read them', () => {
    const none = { status: 'converged', message: '', warnings: [], precipitant: 'I-', freeH: null, thresholds: [{ solid: 'AgI(s)', outcome: 'not_reached', precipitantTotalMolPerL: null, precipitantFreeMolPerL: null, estimate: null, left: [], result: null }] };
    expect(orderChart(problem as never, none as never).xs).toEqual([]);
    expect(readableVerdict('AgI(s) at 8.30e-15 mol/L total (1.20e+3 mol/L free)')).toBe('AgI(s) at 8.30 × 10⁻¹⁵ mol/L total (1200 mol/L free)');
    const View = RESULT_VIEWS.precipitation_order!;
    const view = render(<View problem={problem as never} result={{} as never} output={none} params={{}} />);
    expect(view.queryByTestId('precipitation-chart')).toBeNull();
    expect(view.getByText('1. AgI(s) does not start up to 10.0 mol/L of I-.')).toBeOnTheScreen();
  });
});
