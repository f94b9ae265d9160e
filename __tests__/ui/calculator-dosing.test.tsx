import { render } from '@testing-library/react-native';
import { fireEvent, renderRouter, screen, waitFor, within } from 'expo-router/testing-library';

import { dosingParams } from '@/components/screens/calculators/dosing-plan/use-dosing-form';
import { RESULT_VIEWS } from '@/components/screens/calculators/result-views';
import { runCalculation } from '@/lib/calculators/run-calculation';

import { BATH_ID, bathRoutes, cyanideSilverBuilt, cyanideSilverProblem, silverBath } from './bath-fixtures';
import { mockApi, sentBodies } from './helpers';

const problem = cyanideSilverProblem;
const built = cyanideSilverBuilt;
const bath = silverBath();

function open(url: string) {
  const fetchMock = mockApi({ 'POST /api/systems/build': { status: 200, body: built }, ...bathRoutes(bath) });
  renderRouter('./app', { initialUrl: url });
  return fetchMock;
}

const params = () => within(screen.getByTestId('calculator-params'));
const step = (n: number) => within(screen.getByTestId(`dosing-step-${n}`));
const calculate = () => fireEvent.press(screen.getByRole('button', { name: 'Calculate' }));

describe('Dosing plan', () => {
  it('takes the volume from the bath, reads reagents from their formulas, flags acid in a cyanide bath and gives the state after each step', async () => {
    const fetchMock = open(`/calculate/dosing-plan?bath=${BATH_ID}`);
    expect(await screen.findByText(/Filled from Silver line tank 2/)).toBeOnTheScreen();
    expect(await params().findByLabelText('Volume in the vessel (L)')).toHaveDisplayValue('400');
    expect(params().getByText('From Silver line tank 2.')).toBeOnTheScreen();
    calculate();
    expect(await params().findByText('Add at least one step')).toBeOnTheScreen();

    fireEvent.press(params().getByRole('button', { name: 'Add a reagent' }));
    fireEvent.changeText(step(1).getByLabelText('Step 1: reagent (formula or name)'), 'KCN');
    expect(await step(1).findByText('One mole brings K+ 1, CN- 1.')).toBeOnTheScreen();
    fireEvent.changeText(step(1).getByLabelText('Step 1: amount added'), '10');
    fireEvent.press(step(1).getByRole('radio', { name: 'kg' }));

    fireEvent.press(params().getByRole('button', { name: 'Add a reagent' }));
    fireEvent.changeText(step(2).getByLabelText('Step 2: reagent (formula or name)'), 'HCl');
    expect(step(2).getByText(/adds acid to a cyanide bath: hydrogen cyanide gas can be released — follow the SDS and local codes\./)).toBeOnTheScreen();
    expect(step(2).getByText(/Left out: Cl- \(not among the ions chosen\)\./)).toBeOnTheScreen();
    fireEvent.changeText(step(2).getByLabelText('Step 2: amount added'), '0.5');
    fireEvent.press(step(2).getByRole('radio', { name: 'mol' }));

    fireEvent.press(params().getByRole('button', { name: 'Add water / make up to volume' }));
    fireEvent.press(step(3).getByRole('radio', { name: 'Make up to volume' }));
    fireEvent.changeText(step(3).getByLabelText('Step 3: final volume (L)'), '500');

    fireEvent.press(params().getByRole('button', { name: 'Set the pH' }));
    fireEvent.changeText(step(4).getByLabelText('Step 4: pH to hold from here on'), '11');
    // The pH first: move it up twice, and it is step 2.
    fireEvent.press(step(4).getByRole('button', { name: 'Move step 4 up' }));
    fireEvent.press(step(3).getByRole('button', { name: 'Move step 3 up' }));
    expect(step(2).getByLabelText('Step 2: pH to hold from here on')).toHaveDisplayValue('11');
    expect(step(1).getByRole('button', { name: 'Move step 1 up' })).toBeDisabled();
    // From pH 12 to 11 in a cyanide bath takes acid.
    expect(step(2).getByTestId('acid-caution-2')).toHaveTextContent('Step 2 (pH 11) lowers the pH of a cyanide bath, which takes acid: hydrogen cyanide gas can be released — follow the SDS and local codes.');

    calculate();
    const verdict = await screen.findByTestId('calculator-verdict', {}, { timeout: 4000 });
    expect(verdict).toHaveTextContent('After 4 steps: 500 L, nothing solid. Caution: steps 2 and 3 add acid to a cyanide bath: hydrogen cyanide gas can be released — follow the SDS and local codes.');
    expect(screen.getByTestId('dosing-acid-caution-2')).toBeOnTheScreen();
    expect(screen.getByTestId('dosing-acid-caution-3')).toHaveTextContent('Step 3 (HCl) adds acid to a cyanide bath: hydrogen cyanide gas can be released — follow the SDS and local codes.');
    const table = within(screen.getByTestId('dosing-table'));
    expect(table.getByText('Start')).toBeOnTheScreen();
    expect(table.getByText('1. Add 10 kg KCN')).toBeOnTheScreen();
    expect(table.getByText('2. Set pH 11')).toBeOnTheScreen();
    expect(table.getByText('4. Make up to 500 L')).toBeOnTheScreen();
    expect(within(screen.getByTestId('dosing-table-4')).getByText('Volume (L): 500')).toBeOnTheScreen();
    expect(within(screen.getByTestId('dosing-table-3')).getByText(/taken up by the H\+ held fixed/)).toBeOnTheScreen();
    expect(screen.getByRole('button', { name: /Download the result as CSV \(dosing-plan\.csv\)/ })).toBeOnTheScreen();
    expect(screen.queryByText(/NaN/)).toBeNull();

    const last = sentBodies(fetchMock, 'POST', '/api/systems/build').at(-1) as { pH?: number };
    expect(last.pH).toBe(12);
  });

  it('asks what one mole brings when the reagent cannot be read, and puts a step’s problem beside it', async () => {
    open('/calculate/dosing-plan');
    const inputs = within(await screen.findByTestId('calculator-inputs'));
    fireEvent.press(inputs.getByRole('checkbox', { name: 'Silver (Ag+)' }));
    fireEvent.press(inputs.getByRole('checkbox', { name: 'Cyanide (CN-)' }));
    fireEvent.press(inputs.getByRole('checkbox', { name: 'Potassium (K+)' }));
    fireEvent.changeText(inputs.getByLabelText('Total Ag+ (mol/L)'), '0.1');
    fireEvent.changeText(inputs.getByLabelText('Total CN- (mol/L)'), '0.35');
    fireEvent.changeText(inputs.getByLabelText('Total K+ (mol/L)'), '0.35');
    fireEvent.changeText(inputs.getByLabelText('pH (optional, measured)'), '12');
    expect(params().getByLabelText('Volume in the vessel (L)')).toHaveDisplayValue('');

    fireEvent.press(params().getByRole('button', { name: 'Add a reagent' }));
    fireEvent.changeText(step(1).getByLabelText('Step 1: reagent (formula or name)'), 'brightener B');
    expect(step(1).getByText(/brightener B is not a salt, acid or base we can read/)).toBeOnTheScreen();
    fireEvent.changeText(step(1).getByLabelText('Step 1: amount added'), '2');
    calculate();
    expect(await params().findByText('Enter the volume in the vessel, in L')).toBeOnTheScreen();
    expect(step(1).getByText('brightener B is not a salt, acid or base we can read: write what one mole brings.')).toBeOnTheScreen();

    fireEvent.press(step(1).getByRole('button', { name: 'Step 1: write what one mole brings' }));
    fireEvent.changeText(step(1).getByLabelText('Step 1: what one mole brings (component: count)'), 'K+: 1, CN-: 1');
    fireEvent.changeText(params().getByLabelText('Volume in the vessel (L)'), '100');
    calculate();
    expect(await step(1).findByText('Give the amount in mol: brightener B has no formula to weigh it by')).toBeOnTheScreen();
    fireEvent.press(step(1).getByRole('radio', { name: 'mol' }));
    fireEvent.press(params().getByRole('radio', { name: 'gal' }));
    calculate();
    expect(await screen.findByTestId('calculator-verdict', {}, { timeout: 4000 })).toHaveTextContent(/^After 1 step: 100 gal, nothing solid\.$/);
    expect(screen.queryByTestId('dosing-acid-caution-1')).toBeNull();

    fireEvent.press(step(1).getByRole('button', { name: 'Remove step 1' }));
    await waitFor(() => expect(screen.queryByTestId('dosing-step-1')).toBeNull());
  });
});

describe('Dosing plan params and stored view', () => {
  it('converts masses by the molar mass and gallons to litres', () => {
    const made = dosingParams('100', 'gal', [{ id: 'a', kind: 'add', reagent: 'NaOH', amount: '40', unit: 'g', stoich: null, liquid: '' }], ['Ag+', 'CN-', 'Na+', 'H+']);
    expect(made.ok).toBe(true);
    if (!made.ok) return;
    expect(made.params.volumeL).toBeCloseTo(378.541, 3);
    const [s] = made.params.steps as { stoich: Record<string, number>; mol: number }[];
    expect(s?.stoich).toEqual({ 'Na+': 1, 'H+': -1 });
    expect(s?.mol).toBeCloseTo(40 / 39.997, 4);
  });

  it('renders a saved run from its stored output, caution included', () => {
    const sent = { volumeL: 100, volumeUnit: 'L', steps: [{ kind: 'add', reagent: 'HCl', label: 'add 1 mol HCl', stoich: { 'H+': 1 }, mol: 1 }] };
    const run = runCalculation('dosing_plan', problem as never, 12, sent as never);
    const View = RESULT_VIEWS.dosing_plan!;
    const view = render(<View problem={problem as never} result={{} as never} output={JSON.parse(JSON.stringify(run.result))} params={sent} print />);
    expect(view.getByTestId('dosing-acid-caution-1')).toBeOnTheScreen();
    expect(view.getByText('1. Add 1 mol HCl')).toBeOnTheScreen();
    expect(view.queryByText(/NaN/)).toBeNull();
  });
});
