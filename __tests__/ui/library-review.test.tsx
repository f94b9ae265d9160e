import { fireEvent, renderRouter, screen, within } from 'expo-router/testing-library';

import { keys } from '@/lib/api/keys';
import { type User } from '@/shared/auth';
import { type ConstantSummary } from '@/shared/constants';

import { errorBody, mockApi, type Routes } from './helpers';

const reviewer: User = { id: 'u-rev', email: 'rita@shop.test', name: 'Rita Vale', roles: ['reviewer', 'chemist'] };
const queuePath = keys.constants({ status: 'draft', sort: 'proposedAt', dir: 'asc' });

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
    reviewedBy: null,
    reviewedAt: null,
    reviewNote: null,
    retiredBy: null,
    retiredAt: null,
    retireNote: null,
    ...extra,
  };
}

const approved = constant();
const cyanide = constant({
  id: 20,
  lineageId: 'lin-20',
  version: 1,
  kind: 'cumulative_formation',
  reaction: 'Au+ + 2 CN- = Au(CN)2-',
  defines: 'Au(CN)2-',
  logValue: 38.3,
  status: 'draft',
  proposedAt: '2026-03-01T09:00:00.000Z',
});
const silverRevision = constant({
  id: 21,
  version: 3,
  replacesId: 1,
  logValue: 7.1,
  status: 'draft',
  proposedBy: { id: reviewer.id, name: reviewer.name },
  proposedAt: '2026-03-02T09:00:00.000Z',
});

function routes(extra: Routes = {}): Routes {
  return {
    '/api/me': { status: 200, body: reviewer },
    [queuePath]: { status: 200, body: [cyanide, silverRevision] },
    [keys.constant(1)]: { status: 200, body: { constant: approved, history: [silverRevision, approved] } },
    [keys.constant(20)]: { status: 200, body: { constant: cyanide, history: [cyanide] } },
    ...extra,
  };
}

describe('Review queue', () => {
  it('tells someone without the reviewer role what the page is for', async () => {
    const fetchMock = mockApi(routes({ '/api/me': { status: 200, body: { ...reviewer, roles: ['chemist'] } } }));
    renderRouter('./app', { initialUrl: '/library/review' });
    expect(await screen.findByText('Needs the reviewer role')).toBeOnTheScreen();
    expect(fetchMock.mock.calls.some(([p]) => p === queuePath)).toBe(false);
  });

  it('lists drafts oldest first with the value a revision replaces', async () => {
    mockApi(routes());
    renderRouter('./app', { initialUrl: '/library/review' });
    expect(await screen.findByText('2 drafts waiting, oldest first')).toBeOnTheScreen();
    const ids = screen.getAllByTestId(/^draft-/).map((n) => n.props.testID);
    expect(ids).toEqual(['draft-20', 'draft-21']);

    const first = within(screen.getByTestId('draft-20'));
    expect(first.getByText('Au+ + 2 CN- = Au(CN)2-')).toBeOnTheScreen();
    expect(first.getByText(/Proposed log β 38\.30 by Cora Quill/)).toBeOnTheScreen();
    expect(first.getByText('New constant')).toBeOnTheScreen();

    const second = within(screen.getByTestId('draft-21'));
    expect(await second.findByText('Revision of version 2, which has log β 7.05')).toBeOnTheScreen();
    expect(second.getByText(/Proposed log β 7\.10 by you/)).toBeOnTheScreen();
    expect(second.getByText(/another reviewer decides on it/)).toBeOnTheScreen();
  });

  it('opens a draft where the decision is made', async () => {
    mockApi(routes());
    const view = renderRouter('./app', { initialUrl: '/library/review' });
    fireEvent.press(await screen.findByTestId('draft-20'));
    expect(await screen.findByTestId('decide-draft')).toBeOnTheScreen();
    expect(view.getPathname()).toBe('/library/constant/20');
  });

  it('says when nothing is waiting, and shows a failed load', async () => {
    mockApi(routes({ [queuePath]: { status: 200, body: [] } }));
    renderRouter('./app', { initialUrl: '/library/review' });
    expect(await screen.findByText('Nothing to review')).toBeOnTheScreen();

    mockApi(routes({ [queuePath]: { status: 500, body: errorBody('internal', 'The drafts could not be read.') } }));
    renderRouter('./app', { initialUrl: '/library/review' });
    expect(await screen.findByText('The drafts could not be read.')).toBeOnTheScreen();
  });
});
