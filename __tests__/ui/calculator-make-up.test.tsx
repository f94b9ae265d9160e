import { render } from '@testing-library/react-native';
import { fireEvent, renderRouter, screen, within } from 'expo-router/testing-library';

import { makeUpVerdict } from '@/components/screens/calculators/make-up/make-up-words';
import { RESULT_VIEWS } from '@/components/screens/calculators/result-views';
import { runCalculation } from '@/lib/calculators/run-calculation';
import { PARAMS_SCHEMAS } from '@/shared/calculations';

import { BATH_ID, bathRoutes, cyanideSilverBuilt, silverBath } from './bath-fixtures';
import { mockApi, sentBodies } from './helpers';

const built = cyanideSilverBuilt;
const bath = silverBath({ volume: 1200, volumeL: 1200 });

function open(url: string) {
  const fetchMock = mockApi({ 'POST /api/systems/build': { status: 200, body: built }, ...bathRoutes(bath) });
  renderRouter('./app', { initialUrl: url });
  return fetchMock;
}

const params = () => within(screen.getByTestId('calculator-params'));
const calculate = () => fireEvent.press(screen.getByRole('button', { name: 'Calculate' }));
const verdict = () => screen.findByTestId('calculator-verdict', {}, { timeout: 4000 });

describe('Make-up', () => {
  it('takes the tank from the bath, says the salt’s sodium is not in the solution, and gives the mass to add in the unit chosen', async () => {
    const fetchMock = open(`/calculate/make-up?bath=${BATH_ID}`);
    expect(await screen.findByText(/Filled from Silver line tank 2/)).toBeOnTheScreen();
    expect(await params().findByLabelText('Tank volume (L)')).toHaveDisplayValue('1200');
    expect(params().getByRole('radio', { name: 'NaCN', checked: true })).toBeOnTheScreen();
    expect(await params().findByText('Na+ from the salt is not in the solution, so it is left out.')).toBeOnTheScreen();
    expect(params().getByRole('button', { name: 'Add Na+ to the solution' })).toBeOnTheScreen();
    fireEvent.press(params().getByRole('radio', { name: 'KCN' }));
    expect(params().getByText('One mole brings K+ 1, CN- 1.')).toBeOnTheScreen();
    expect(params().getByRole('radio', { name: 'CN-', checked: true })).toBeOnTheScreen();
    calculate();
    expect(await params().findByText('Enter the target, a number of mol/L above 0')).toBeOnTheScreen();
    fireEvent.changeText(params().getByLabelText('Target free CN- (mol/L)'), '0.2');
    calculate();
    expect(await verdict()).toHaveTextContent('Add 9.83 kg of KCN to the 1,200 L tank: free CN- goes from 0.0912 to 0.200 mol/L.');
    expect(screen.getByTestId('make-up-amount')).toHaveTextContent('9.83 kg of KCN');
    expect(screen.getByTestId('make-up-detail')).toHaveTextContent(/^151 mol in all, 0\.126 mol per litre of bath; the tank holds 1,200 L after\.$/);
    expect(within(screen.getByTestId('make-up-table')).getByText('The same as KCN (g/L)')).toBeOnTheScreen();

    // The unit to weigh in is a way of reading the answer: no recalculation.
    fireEvent.press(params().getByRole('radio', { name: 'lb' }));
    expect(screen.getByTestId('calculator-verdict')).toHaveTextContent(/^Add 21\.7 lb of KCN to the 1,200 L tank/);
    expect(screen.queryByTestId('stale')).toBeNull();
    expect(screen.getByRole('button', { name: /Download the result as CSV \(make-up-kcn\.csv\)/ })).toBeOnTheScreen();

    // The same target as g/L of the salt: 13.0 g/L KCN is 0.200 mol/L cyanide.
    fireEvent.press(params().getByRole('radio', { name: 'g/L of the salt' }));
    fireEvent.changeText(params().getByLabelText('Target free CN- (g/L of KCN)'), '13.0');
    calculate();
    expect(await screen.findByText(/^Add 21\.6 lb of KCN to the 1,200 L tank: free CN- goes from 0\.0912 to 0\.200 mol\/L\.$/, {}, { timeout: 4000 })).toBeOnTheScreen();
    const sent = sentBodies(fetchMock, 'POST', '/api/systems/build').at(-1) as { pH?: number };
    expect(sent.pH).toBe(12);
    expect(screen.queryByText(/NaN/)).toBeNull();
  });

  it('works to a headroom, and says when the target is out of reach', async () => {
    open('/calculate/make-up');
    const inputs = within(await screen.findByTestId('calculator-inputs'));
    fireEvent.press(inputs.getByRole('checkbox', { name: 'Silver (Ag+)' }));
    fireEvent.press(inputs.getByRole('checkbox', { name: 'Cyanide (CN-)' }));
    fireEvent.press(inputs.getByRole('checkbox', { name: 'Potassium (K+)' }));
    fireEvent.changeText(inputs.getByLabelText('Total Ag+ (mol/L)'), '0.1');
    fireEvent.changeText(inputs.getByLabelText('Total CN- (mol/L)'), '0.35');
    fireEvent.changeText(inputs.getByLabelText('Total K+ (mol/L)'), '0.35');
    fireEvent.changeText(inputs.getByLabelText('pH (optional, measured)'), '12');
    calculate();
    expect(await params().findByText('Enter the tank volume, a number of L above 0')).toBeOnTheScreen();
    fireEvent.press(params().getByRole('radio', { name: 'gal' }));
    fireEvent.changeText(params().getByLabelText('Tank volume (gal)'), '300');
    fireEvent.press(params().getByRole('radio', { name: 'KCN' }));
    fireEvent.press(params().getByRole('radio', { name: 'Headroom for a solid' }));
    expect(await params().findByRole('radio', { name: 'AgCN(s)', checked: true }, { timeout: 3000 })).toBeOnTheScreen();
    fireEvent.changeText(params().getByLabelText('Target headroom (mol/L of the solid)'), '0.5');
    fireEvent.press(params().getByRole('radio', { name: 'lb' }));
    calculate();
    expect(await verdict()).toHaveTextContent(/^Add \d+\.\d lb of KCN to the 300 gal tank: headroom for AgCN\(s\) goes from 0\.150 to 0\.500 mol\/L\.$/);

    fireEvent.press(params().getByRole('radio', { name: 'Free ligand' }));
    fireEvent.changeText(params().getByLabelText('Target free CN- (mol/L)'), '15');
    calculate();
    expect(await screen.findByText(/^Unreachable: even 10 mol\/L of KCN brings free CN- only to/, {}, { timeout: 4000 })).toBeOnTheScreen();
    expect(screen.getByTestId('make-up-amount')).toHaveTextContent(/^Out of reach: KCN brings the free CN- at most to [\d.]+ mol\/L/);
    expect(within(screen.getByTestId('make-up-table')).getByText('The most it reaches (mol/L)')).toBeOnTheScreen();
    expect(screen.queryByText(/NaN/)).toBeNull();
  });
});

describe('Make-up view of a stored run', () => {
  // Silver in ammonia: aqueous ammonia as bought, 28 % NH3 by mass at 0.90 kg/L.
  const ammonia = {
    components: ['Ag+', 'NH3', 'NO3-'],
    totals: { 'Ag+': 0.05, NH3: 0.2, 'NO3-': 0.05 },
    fixed: {},
    species: [
      { name: 'AgNH3+', logK: 3.31, stoich: { 'Ag+': 1, NH3: 1 } },
      { name: 'Ag(NH3)2+', logK: 7.22, stoich: { 'Ag+': 1, NH3: 2 } },
    ],
    solids: [],
    activity: 'davies',
    temperatureC: 25,
  };
  const sent = {
    volume: { value: 200, unit: 'L' },
    salt: { name: 'aqueous ammonia', formula: 'NH3', stoich: { NH3: 1 }, stock: { massFraction: 0.28, densityKgPerL: 0.9 } },
    target: { kind: 'free', component: 'NH3', molPerL: 0.5 },
    massUnit: 'kg',
  };

  it('gives the stock volume to pour and its weight from the stored output, the params as the app sends them, and never NaN', () => {
    // As the screen and the server run it: the stock travels with the salt, so its own litres count as dilution.
    const run = runCalculation('make_up', ammonia as never, undefined, PARAMS_SCHEMAS.make_up.parse(sent));
    const output = JSON.parse(JSON.stringify(run.result));
    const View = RESULT_VIEWS.make_up!;
    const view = render(<View problem={ammonia as never} result={{} as never} output={output} params={sent} print />);
    // The stock holds 0.28 × 900 g/L / 17.031 g/mol = 14.80 mol/L of NH3. About 0.1 mol/L of NH3 sits on the silver,
    // so the tank needs about 0.6 mol/L in all: 40 mol + 14.80 V = 0.6 (200 + V) gives V = 5.6 L (hand-worked).
    expect(view.getByTestId('make-up-amount')).toHaveTextContent('5.60 L of aqueous ammonia');
    expect(view.getByTestId('make-up-detail')).toHaveTextContent(
      '82.8 mol in all, 0.414 mol per litre of bath; the stock at 28.0 % by mass and 0.900 kg/L weighs 5.04 kg (1.41 kg of the substance itself); the tank holds 205.6 L after.',
    );
    expect(makeUpVerdict(output, sent, run.verdict)).toMatch(/^Add 5\.60 L of aqueous ammonia \(5\.04 kg\) to the 200 L tank: free NH3 goes from 0\.\d+ to 0\.500 mol\/L\.$/);
    expect(view.queryByText(/NaN/)).toBeNull();
  });

  it('takes the calculator’s own stock figures when it gives them', () => {
    const run = runCalculation('make_up', ammonia as never, undefined, sent as never);
    const View = RESULT_VIEWS.make_up!;
    const view = render(<View problem={ammonia as never} result={{} as never} output={JSON.parse(JSON.stringify(run.result))} params={sent} />);
    expect(view.getByTestId('make-up-detail')).toHaveTextContent(/weighs 5\.\d\d kg \(1\.\d\d kg of the substance itself\); the tank holds 205\.\d L after\.$/);
  });

  it('shows nothing for an output it does not know', () => {
    const View = RESULT_VIEWS.make_up!;
    const view = render(<View problem={ammonia as never} result={{} as never} output={null} params={{}} />);
    expect(view.toJSON()).toBeNull();
  });
});
