import { fireEvent, renderRouter, screen, waitFor, within } from 'expo-router/testing-library';

import { keys } from '@/lib/api/keys';
import { type User } from '@/shared/auth';
import { type ConstantSummary } from '@/shared/constants';

import { errorBody, mockApi, sentBodies, type Routes } from './helpers';

const technician: User = { id: 'u-tech', email: 'tom@shop.test', name: 'Tom Tank', roles: ['technician'] };

function constant(extra: Partial<ConstantSummary> = {}): ConstantSummary {
  return {
    id: 1,
    lineageId: 'lin-1',
    version: 2,
    replacesId: null,
    kind: 'cumulative_formation',
    reaction: 'Ag+ + 2 NH3 = Ag(NH3)2+',
    reactants: [
      { species: 'Ag+', coefficient: 1 },
      { species: 'NH3', coefficient: 2 },
    ],
    products: [{ species: 'Ag(NH3)2+', coefficient: 1 }],
    defines: 'Ag(NH3)2+',
    metals: ['Ag+'],
    ligands: ['NH3'],
    logValue: 7.05,
    uncertainty: 0.05,
    temperatureC: 25,
    ionicStrength: 0,
    medium: '',
    enthalpyKjMol: null,
    source: 'Handbook table 4, 2nd edition',
    note: '',
    status: 'approved',
    proposedBy: { id: 'u-chem', name: 'Cora Quill' },
    proposedAt: '2026-02-01T10:00:00.000Z',
    reviewedBy: { id: 'u-rev', name: 'Rita Vale' },
    reviewedAt: '2026-02-02T10:00:00.000Z',
    reviewNote: 'Checked',
    retiredBy: null,
    retiredAt: null,
    retireNote: null,
    ...extra,
  };
}

const approved = constant();
const draft = constant({ id: 12, version: 1, status: 'draft', reviewedBy: null, reviewedAt: null, reviewNote: null });
const revision = constant({ id: 13, version: 3, replacesId: 1, status: 'draft', logValue: 7.1, reviewedBy: null, reviewedAt: null, reviewNote: null });

function routes(extra: Routes = {}): Routes {
  return {
    [keys.constant(1)]: { status: 200, body: { constant: approved, history: [approved] } },
    [keys.constant(12)]: { status: 200, body: { constant: draft, history: [draft] } },
    [keys.constant(13)]: { status: 200, body: { constant: revision, history: [revision, approved] } },
    ...extra,
  };
}

function type(label: string, text: string) {
  fireEvent.changeText(screen.getByLabelText(label), text);
}

describe('Propose a constant', () => {
  it('explains to someone without the chemist role that they cannot propose', async () => {
    mockApi(routes({ '/api/me': { status: 200, body: technician } }));
    renderRouter('./app', { initialUrl: '/library/propose' });
    expect(await screen.findByText('Needs the chemist role')).toBeOnTheScreen();
    expect(screen.queryByLabelText('Reaction')).toBeNull();
  });

  it('marks every missing field and numbers that are not numbers', async () => {
    const fetchMock = mockApi(routes());
    renderRouter('./app', { initialUrl: '/library/propose' });
    fireEvent.press(await screen.findByRole('button', { name: 'Send for review' }));
    const form = within(screen.getByTestId('constant-form'));
    expect(await form.findByText('Choose the kind of constant')).toBeOnTheScreen();
    expect(form.getByText('Write the reaction, e.g. "Ag+ + 2 NH3 = Ag(NH3)2+"')).toBeOnTheScreen();
    expect(form.getByText('Enter the log10 value as a number')).toBeOnTheScreen();
    expect(form.getByText('Name the published source (handbook, table, year)')).toBeOnTheScreen();
    expect(form.getByText('Check Kind, Reaction, Log value, Source.')).toBeOnTheScreen();

    type('Log value', 'seven');
    type('Uncertainty (± log units)', '0.05x');
    fireEvent.press(screen.getByRole('button', { name: 'Send for review' }));
    expect(await form.findAllByText('Enter a number')).toHaveLength(2);
    expect(sentBodies(fetchMock, 'POST', keys.proposals)).toHaveLength(0);
  });

  it('sends the proposal and opens the new draft', async () => {
    const fetchMock = mockApi(routes({ [`POST ${keys.proposals}`]: { status: 201, body: draft } }));
    const view = renderRouter('./app', { initialUrl: '/library/propose' });
    fireEvent.press(await screen.findByRole('checkbox', { name: 'Cumulative formation' }));
    type('Reaction', ' Ag+ + 2 NH3 = Ag(NH3)2+ ');
    type('Log value', '7,05');
    type('Ionic strength (mol/L)', '');
    type('Enthalpy of reaction (kJ/mol)', '−56.1');
    type('Source', 'Handbook table 4, 2nd edition');
    fireEvent.press(screen.getByRole('button', { name: 'Send for review' }));
    expect(await screen.findByTestId('constant-facts')).toBeOnTheScreen();
    expect(view.getPathname()).toBe('/library/constant/12');
    expect(sentBodies(fetchMock, 'POST', keys.proposals)).toEqual([
      {
        kind: 'cumulative_formation',
        reaction: 'Ag+ + 2 NH3 = Ag(NH3)2+',
        logValue: 7.05,
        uncertainty: null,
        temperatureC: 25,
        ionicStrength: 0,
        medium: '',
        enthalpyKjMol: -56.1,
        source: 'Handbook table 4, 2nd edition',
        note: '',
      },
    ]);
  });

  it('shows the server’s objection to the reaction beside the reaction', async () => {
    const details = [{ path: 'reaction', message: 'charge is not balanced: 1 on the left, 0 on the right' }];
    mockApi(routes({ [`POST ${keys.proposals}`]: { status: 400, body: errorBody('validation_failed', 'Check the fields.', details) } }));
    renderRouter('./app', { initialUrl: '/library/propose' });
    fireEvent.press(await screen.findByRole('checkbox', { name: 'Cumulative formation' }));
    type('Reaction', 'Ag+ + 2 NH3 = Ag(NH3)2');
    type('Log value', '7.05');
    type('Source', 'from memory');
    fireEvent.press(screen.getByRole('button', { name: 'Send for review' }));
    expect(await screen.findByText('Charge is not balanced: 1 on the left, 0 on the right')).toBeOnTheScreen();
    expect(screen.getByText('Check Reaction.')).toBeOnTheScreen();
  });
});

describe('Propose a revision', () => {
  it('starts from the version, keeps reaction and kind, and asks what changed', async () => {
    const fetchMock = mockApi(routes({ [`POST ${keys.constantRevisions(1)}`]: { status: 201, body: revision } }));
    const view = renderRouter('./app', { initialUrl: '/library/revise/1' });
    expect(await screen.findByText(/Revising version 2 \(approved, log β = 7.05 ± 0.05\)/)).toBeOnTheScreen();
    expect(screen.queryByLabelText('Reaction')).toBeNull();
    expect(screen.getByText('Ag+ + 2 NH3 = Ag(NH3)2+')).toBeOnTheScreen();
    expect(screen.getByLabelText('Log value')).toHaveDisplayValue('7.05');
    expect(screen.getByLabelText('Source')).toHaveDisplayValue('Handbook table 4, 2nd edition');

    type('Log value', '7.1');
    fireEvent.press(screen.getByRole('button', { name: 'Send for review' }));
    expect(await screen.findByText('Say what changed and why')).toBeOnTheScreen();

    type('What changed and why', 'The 3rd edition revised it');
    fireEvent.press(screen.getByRole('button', { name: 'Send for review' }));
    await waitFor(() => expect(view.getPathname()).toBe('/library/constant/13'));
    expect(sentBodies(fetchMock, 'POST', keys.constantRevisions(1))).toEqual([
      {
        logValue: 7.1,
        uncertainty: 0.05,
        temperatureC: 25,
        ionicStrength: 0,
        medium: '',
        enthalpyKjMol: null,
        source: 'Handbook table 4, 2nd edition',
        note: 'The 3rd edition revised it',
      },
    ]);
  });
});
