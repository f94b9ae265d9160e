import { render } from '@testing-library/react-native';
import { fireEvent, renderRouter, screen, waitFor, within } from 'expo-router/testing-library';

import { chartGroups } from '@/components/screens/calculators/curves/curve-groups';
import { axisTicks, seriesPath } from '@/components/screens/calculators/curves/curve-model';
import { splitIndices } from '@/components/screens/calculators/curves/run-in-chunks';
import { RESULT_VIEWS } from '@/components/screens/calculators/result-views';

import { mockApi, sentBodies } from './helpers';

const use = (id: number, reaction: string, logValue: number) => ({
  id,
  lineageId: `lin-${id}`,
  version: 1,
  status: 'approved',
  kind: 'cumulative_formation',
  reaction,
  logValue,
  temperatureC: 25,
  source: 'Handbook table 4, 2004',
});

// Cyanide silver; with a pH, H+ and HCN join the system as the library would build them.
function built(withPh: boolean) {
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
    constants: [use(1, 'Ag+ + 2 CN- = Ag(CN)2-', 20.48)],
    drafts: [],
    availableSolids: ['AgCN(s)'],
    warnings: [],
  };
}

function open() {
  const fetchMock = mockApi({ 'POST /api/systems/build': (body) => ({ status: 200, body: built((body as { pH?: number }).pH !== undefined) }) });
  renderRouter('./app', { initialUrl: '/calculate/curves' });
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

const params = () => within(screen.getByTestId('calculator-params'));
const verdict = (text: string | RegExp) => screen.findByText(text, {}, { timeout: 4000 });

describe('Curves', () => {
  it('draws free cyanide against total silver as one types, without pressing Calculate', async () => {
    const fetchMock = open();
    await chooseCyanide();
    expect(params().getByRole('radio', { name: 'Total Ag+', checked: true })).toBeOnTheScreen();
    expect(params().getByLabelText('To (mol/L)')).toHaveDisplayValue('0.2');
    expect(params().getByRole('checkbox', { name: 'Free concentration: CN-', checked: true })).toBeOnTheScreen();
    expect(await verdict('Total Ag+ from 0 to 0.2 mol/L over 100 points; every point settled.')).toBeOnTheScreen();
    const chart = screen.getByTestId('curve-chart-concentration-drawing');
    expect(chart.props.accessibilityLabel).toMatch(/^Concentrations against total Ag\+ \(mol\/L\), 100 points from 0 to 0\.200: free CN- from 0\.350 to /);
    expect(screen.getByText('Concentrations (mol/L, log scale)')).toBeOnTheScreen();
    const builds = sentBodies(fetchMock, 'POST', '/api/systems/build').length;

    fireEvent.changeText(params().getByLabelText('Points'), '20');
    expect(await verdict('Total Ag+ from 0 to 0.2 mol/L over 20 points; every point settled.')).toBeOnTheScreen();
    // The system did not change: the live redraw reuses the last build.
    expect(sentBodies(fetchMock, 'POST', '/api/systems/build')).toHaveLength(builds);

    fireEvent.press(params().getByRole('checkbox', { name: 'Where a metal sits (fractions of its total): Ag+' }));
    expect(await screen.findByTestId('curve-chart-fraction-drawing', {}, { timeout: 4000 })).toBeOnTheScreen();
    expect(screen.getByText('Fractions of the total (0 to 1)')).toBeOnTheScreen();
    fireEvent.press(screen.getByRole('checkbox', { name: 'Log scale for concentrations' }));
    expect(screen.getByText('Concentrations (mol/L)')).toBeOnTheScreen();
    expect(screen.getByRole('button', { name: /Download the result as CSV \(curve-total-ag\.csv\)/ })).toBeOnTheScreen();
    expect(screen.queryByText(/NaN/)).toBeNull();
  });

  it('sweeps pH with H+ brought into the system, and shows a log range that starts at 0 beside its field', async () => {
    const fetchMock = open();
    await chooseCyanide();
    fireEvent.press(params().getByRole('radio', { name: 'pH' }));
    expect(params().getByLabelText('From (pH)')).toHaveDisplayValue('2');
    expect(params().getByRole('checkbox', { name: 'Where a metal sits (fractions of its total): Ag+', checked: true })).toBeOnTheScreen();
    expect(await verdict(/^pH from 2 to 12 .* over 100 points/)).toBeOnTheScreen();
    await waitFor(() => expect(sentBodies(fetchMock, 'POST', '/api/systems/build').some((b) => (b as { pH?: number; totals?: object }).pH === 2 && Object.keys((b as { totals: object }).totals).length === 3)).toBe(true));

    fireEvent.press(params().getByRole('radio', { name: 'Total Ag+' }));
    fireEvent.press(params().getByRole('radio', { name: 'Log' }));
    expect(params().getByLabelText('From (mol/L)')).toHaveDisplayValue('0.0002');
    fireEvent.changeText(params().getByLabelText('From (mol/L)'), '0');
    fireEvent.press(screen.getByRole('button', { name: 'Calculate' }));
    expect(await params().findByText('A log range must start above 0')).toBeOnTheScreen();
  });

  it('runs a long sweep in pieces with progress, and can be cancelled', async () => {
    open();
    await chooseCyanide();
    expect(await verdict(/over 100 points/)).toBeOnTheScreen();
    fireEvent.changeText(params().getByLabelText('Points'), '500');
    fireEvent.press(screen.getByRole('button', { name: 'Calculate' }));
    expect(await screen.findByTestId('calculation-progress')).toBeOnTheScreen();
    expect(await verdict('Total Ag+ from 0 to 0.2 mol/L over 500 points; every point settled.')).toBeOnTheScreen();
    expect(screen.queryByTestId('calculation-progress')).toBeNull();

    fireEvent.changeText(params().getByLabelText('To (mol/L)'), '0.25');
    fireEvent.press(screen.getByRole('button', { name: 'Calculate' }));
    fireEvent.press(await screen.findByRole('button', { name: 'Cancel the calculation' }));
    // Long enough for the remaining pieces to have finished, had they not been cancelled (timers may be fake: waitFor moves them on).
    const cancelledAt = Date.now();
    await waitFor(() => expect(Date.now() - cancelledAt).toBeGreaterThan(1000), { timeout: 3000 });
    expect(screen.queryByText(/from 0 to 0\.25 mol\/L/)).toBeNull();
    expect(screen.getByTestId('stale')).toBeOnTheScreen();
    expect(screen.getByRole('button', { name: 'Calculate' })).toBeEnabled();
  });
});

describe('Curves view of a stored run', () => {
  it('draws at a fixed width for print, leaves out points that did not settle, and never shows NaN', () => {
    const CurvesView = RESULT_VIEWS.curves!;
    const output = {
      axis: { key: 'total:Ag+', label: 'total Ag+', unit: 'mol/L' },
      series: [
        { key: 'free:CN-', label: 'free CN-', unit: 'mol/L' },
        { key: 'saturation:AgCN(s)', label: 'SI AgCN(s)', unit: 'log10 IAP/Ksp' },
      ],
      points: [
        { x: 0, status: 'converged', values: [0.35, null], warnings: [] },
        { x: 0.1, status: 'not_converged', values: [null, null], warnings: [] },
        { x: 0.2, status: 'converged', values: [2.3e-6, 0], warnings: [] },
      ],
      status: 'not_converged',
      warnings: [],
    };
    const view = render(<CurvesView problem={built(false).problem as never} result={{} as never} output={output} params={{ spacing: 'linear' }} print />);
    expect(view.getByTestId('curve-chart-concentration-drawing')).toHaveStyle({ width: 640 });
    expect(view.getByTestId('curve-chart-concentration-drawing').props.accessibilityLabel).toMatch(/free CN- from 0\.350 to 2\.30 × 10⁻⁶; 1 point did not settle and is left out\./);
    expect(view.getByText('1 of 3 points did not settle; they are left out of the charts as gaps and marked in the CSV.')).toBeOnTheScreen();
    expect(view.queryByRole('checkbox', { name: /Log scale/ })).toBeNull();
    expect(view.queryByText(/NaN/)).toBeNull();
  });

  it('leaves out the fractions of a metal where there is none of it', () => {
    const groups = chartGroups({
      axis: { key: 'total:Ag+', label: 'total Ag+', unit: 'mol/L' },
      series: [
        { key: 'fraction:Ag+:Ag(CN)2-', label: 'Ag+ as Ag(CN)2-', unit: 'fraction of total' },
        { key: 'fraction:Ag+:(solids)', label: 'Ag+ in solids', unit: 'fraction of total' },
      ],
      points: [
        { x: 0, status: 'converged', values: [0, 0], warnings: [] },
        { x: 0.1, status: 'converged', values: [1, 0], warnings: [] },
      ],
      status: 'converged',
      warnings: [],
    });
    expect(groups.map((g) => g.id)).toEqual(['fraction']);
    expect(groups[0]?.series.map((s) => s.values)).toEqual([[null, 1], [null, 0]]);
  });

  it('splits long sweeps evenly, breaks lines at gaps and labels log axes in powers of ten', () => {
    expect(splitIndices(500, 10)[0]).toEqual([0, 49]);
    expect(splitIndices(500, 10)[9]).toEqual([450, 499]);
    expect(splitIndices(201, 10).every(([a, b]) => b - a + 1 >= 20)).toBe(true);
    const g = { x: (v: number) => v * 100, y: (v: number) => v };
    expect(seriesPath([0, 1, 2, 3], [1, null, 2, 3], [true, true, true, true], g, 'linear', 'linear')).toBe('M0.0 1.0h0.1M200.0 2.0L300.0 3.0');
    expect(seriesPath([0, 1], [0, 1], [true, true], g, 'linear', 'log')).toBe('M100.0 1.0h0.1');
    expect(axisTicks(2e-6, 0.35, 'log').labels).toEqual(['10⁻⁶', '10⁻⁵', '10⁻⁴', '10⁻³', '10⁻²', '10⁻¹', '10⁰']);
  });
});
