import { fireEvent, renderRouter, screen, waitFor, within } from 'expo-router/testing-library';

import { keys } from '@/lib/api/keys';
import { type User } from '@/shared/auth';
import { type ConstantDetail, type ConstantSummary } from '@/shared/constants';

import { errorBody, mockApi, sentBodies, type Routes } from './helpers';

const reviewer: User = { id: 'u-rev', email: 'rita@shop.test', name: 'Rita Vale', roles: ['reviewer'] };
const both: User = { id: 'u-both', email: 'bo@shop.test', name: 'Bo Both', roles: ['chemist', 'reviewer'] };

function constant(extra: Partial<ConstantSummary> = {}): ConstantSummary {
  return {
    id: 1,
    lineageId: 'lin-1',
    version: 2,
    replacesId: 3,
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
    ionicStrength: 0.1,
    medium: 'NaClO4',
    enthalpyKjMol: -56.1,
    source: 'Handbook table 4, 2nd edition',
    note: 'Mean of three measurements',
    status: 'approved',
    proposedBy: { id: 'u-chem', name: 'Cora Quill' },
    proposedAt: '2026-02-01T10:00:00.000Z',
    reviewedBy: { id: 'u-rev', name: 'Rita Vale' },
    reviewedAt: '2026-02-02T10:00:00.000Z',
    reviewNote: 'Checked against the table',
    retiredBy: null,
    retiredAt: null,
    retireNote: null,
    ...extra,
  };
}

const v1 = constant({ id: 3, version: 1, replacesId: null, status: 'retired', logValue: 7.2, reviewNote: 'Replaced by v2' });
const v2 = constant();
const v3 = constant({
  id: 5,
  version: 3,
  replacesId: 1,
  status: 'draft',
  logValue: 7.1,
  note: 'Newer edition',
  reviewedBy: null,
  reviewedAt: null,
  reviewNote: null,
});
const history = [v3, v2, v1];

function detail(c: ConstantSummary): ConstantDetail {
  return { constant: c, history };
}

function routes(me: User | null, extra: Routes = {}): Routes {
  return {
    ...(me ? { '/api/me': { status: 200, body: me } } : {}),
    [keys.constant(1)]: { status: 200, body: detail(v2) },
    [keys.constant(3)]: { status: 200, body: detail(v1) },
    [keys.constant(5)]: { status: 200, body: detail(v3) },
    ...extra,
  };
}

describe('Constant detail', () => {
  it('shows the equation, value, conditions, source, review and every version', async () => {
    mockApi(routes(null));
    renderRouter('./app', { initialUrl: '/library/constant/1' });
    expect(await screen.findByRole('header', { name: 'Ag+ + 2 NH3 = Ag(NH3)2+' })).toBeOnTheScreen();
    const facts = within(screen.getByTestId('constant-facts'));
    expect(facts.getByText('log β = 7.05 ± 0.05')).toBeOnTheScreen();
    expect(facts.getByText('Approved')).toBeOnTheScreen();
    expect(facts.getByText('25 °C, I = 0.1 mol/L, NaClO4')).toBeOnTheScreen();
    expect(facts.getByText('ΔH = -56.1 kJ/mol')).toBeOnTheScreen();
    expect(facts.getByText('Handbook table 4, 2nd edition')).toBeOnTheScreen();
    expect(facts.getByText('Mean of three measurements')).toBeOnTheScreen();
    const people = within(screen.getByTestId('constant-people'));
    expect(people.getByText(/^Cora Quill, /)).toBeOnTheScreen();
    expect(people.getByText(/^Rita Vale, /)).toBeOnTheScreen();
    expect(people.getByText('Checked against the table')).toBeOnTheScreen();

    const shown = within(screen.getByTestId('version-1'));
    expect(shown.getByText('Shown here')).toBeOnTheScreen();
    expect(shown.getByText('In use now')).toBeOnTheScreen();
    expect(within(screen.getByTestId('version-5')).getByText(/log β 7\.10 · Draft/)).toBeOnTheScreen();
    expect(within(screen.getByTestId('version-3')).queryByText('In use now')).toBeNull();
  });

  it('opens another version from the history, and from a card in the list', async () => {
    mockApi(routes(null, { [keys.constants({ status: 'approved', sort: 'reaction', dir: 'asc' })]: { status: 200, body: [v2] } }));
    const view = renderRouter('./app', { initialUrl: '/library' });
    fireEvent.press(await screen.findByTestId('constant-1'));
    expect(await screen.findByTestId('constant-facts')).toBeOnTheScreen();
    expect(view.getPathname()).toBe('/library/constant/1');

    fireEvent.press(screen.getByRole('link', { name: 'Open version 1' }));
    expect(await screen.findByText('log β = 7.20 ± 0.05')).toBeOnTheScreen();
    expect(view.getPathname()).toBe('/library/constant/3');
    expect(screen.getByText('Replaced by v2')).toBeOnTheScreen();
  });

  it('says so when there is no such constant', async () => {
    const fetchMock = mockApi(routes(null, { [keys.constant(99)]: { status: 404, body: errorBody('not_found', 'No constant 99.') } }));
    renderRouter('./app', { initialUrl: '/library/constant/99' });
    expect(await screen.findByText('No such constant')).toBeOnTheScreen();

    renderRouter('./app', { initialUrl: '/library/constant/abc' });
    expect(await screen.findByText('No such constant')).toBeOnTheScreen();
    expect(fetchMock.mock.calls.some(([p]) => String(p).includes('abc'))).toBe(false);
  });

  it('offers a chemist no revision of a retired older version', async () => {
    mockApi(routes(null));
    renderRouter('./app', { initialUrl: '/library/constant/3' });
    await screen.findByText('log β = 7.20 ± 0.05');
    expect(screen.queryByRole('button', { name: 'Propose a revision' })).toBeNull();
  });

  it('opens the revision form from the approved version', async () => {
    mockApi(routes(null));
    const view = renderRouter('./app', { initialUrl: '/library/constant/1' });
    fireEvent.press(await screen.findByRole('button', { name: 'Propose a revision' }));
    expect(await screen.findByText(/Revising version 2/)).toBeOnTheScreen();
    expect(view.getPathname()).toBe('/library/revise/1');
  });
});

describe('Constant detail: review decisions', () => {
  it('asks a reviewer for a note, then approves the draft', async () => {
    let decided = false;
    const fetchMock = mockApi(
      routes(reviewer, {
        [keys.constant(5)]: () => ({ status: 200, body: detail(decided ? { ...v3, status: 'approved' } : v3) }),
        [`POST ${keys.constantReview(5)}`]: () => {
          decided = true;
          return { status: 200, body: { ...v3, status: 'approved' } };
        },
      }),
    );
    renderRouter('./app', { initialUrl: '/library/constant/5' });
    const box = within(await screen.findByTestId('decide-draft'));
    expect(box.getByText(/Approving replaces the version in use now/)).toBeOnTheScreen();
    fireEvent.press(box.getByRole('button', { name: 'Approve version 3' }));
    expect(await box.findByText('Write a note for the proposer')).toBeOnTheScreen();
    expect(sentBodies(fetchMock, 'POST', keys.constantReview(5))).toHaveLength(0);

    fireEvent.changeText(box.getByLabelText('Note for the proposer'), 'Matches the new edition');
    fireEvent.press(box.getByRole('button', { name: 'Approve version 3' }));
    expect(await screen.findByText(/Approved: version 3 now feeds calculations/)).toBeOnTheScreen();
    expect(sentBodies(fetchMock, 'POST', keys.constantReview(5))).toEqual([{ decision: 'approve', note: 'Matches the new edition' }]);
    await waitFor(() => expect(screen.queryByTestId('decide-draft')).toBeNull());
    expect(screen.getByRole('button', { name: 'Retire version 3' })).toBeOnTheScreen();
  });

  it('shows the server’s refusal when a decision conflicts', async () => {
    const refusal = 'This draft was decided by someone else a moment ago.';
    mockApi(routes(reviewer, { [`POST ${keys.constantReview(5)}`]: { status: 409, body: errorBody('conflict', refusal) } }));
    renderRouter('./app', { initialUrl: '/library/constant/5' });
    const box = within(await screen.findByTestId('decide-draft'));
    fireEvent.changeText(box.getByLabelText('Note for the proposer'), 'Source does not say this');
    fireEvent.press(box.getByRole('button', { name: 'Reject version 3' }));
    expect(await box.findByText(refusal)).toBeOnTheScreen();
  });

  it('tells a reviewer they cannot decide on their own proposal', async () => {
    mockApi(routes(both, { [keys.constant(5)]: { status: 200, body: detail({ ...v3, proposedBy: { id: both.id, name: both.name } }) } }));
    renderRouter('./app', { initialUrl: '/library/constant/5' });
    expect(await screen.findByText(/You proposed this version, so another reviewer/)).toBeOnTheScreen();
    expect(screen.queryByRole('button', { name: 'Approve version 3' })).toBeNull();
    expect(screen.getByRole('button', { name: 'Propose a revision' })).toBeOnTheScreen();
  });

  it('retires an approved version with a note, and shows a 403', async () => {
    const fetchMock = mockApi(
      routes(reviewer, { [`POST ${keys.constantRetire(1)}`]: { status: 403, body: errorBody('forbidden', 'Only reviewers retire constants.') } }),
    );
    renderRouter('./app', { initialUrl: '/library/constant/1' });
    expect(screen.queryByTestId('decide-draft')).toBeNull();
    fireEvent.press(await screen.findByRole('button', { name: 'Retire version 2' }));
    const box = within(screen.getByTestId('retire-version'));
    fireEvent.press(box.getByRole('button', { name: 'Retire now' }));
    expect(await box.findByText('Say why it is retired')).toBeOnTheScreen();
    fireEvent.changeText(box.getByLabelText('Why it is retired'), 'The handbook withdrew it');
    fireEvent.press(box.getByRole('button', { name: 'Retire now' }));
    expect(await box.findByText('Only reviewers retire constants.')).toBeOnTheScreen();
    expect(sentBodies(fetchMock, 'POST', keys.constantRetire(1))).toEqual([{ note: 'The handbook withdrew it' }]);
    fireEvent.press(box.getByRole('button', { name: 'Cancel' }));
    expect(screen.queryByTestId('retire-version')).toBeNull();
  });
});
