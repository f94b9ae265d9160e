import { Dimensions, Linking } from 'react-native';
import { fireEvent, renderRouter, screen, waitFor, within } from 'expo-router/testing-library';

import { keys } from '@/lib/api/keys';
import { type User } from '@/shared/auth';
import { type ConstantSummary } from '@/shared/constants';

import { errorBody, mockApi, type Routes } from './helpers';

const phone = Dimensions.get('window');
const wideWindow = { width: 1280, height: 800, scale: 1, fontScale: 1 };
const reviewer: User = { id: 'u-rev', email: 'rita@shop.test', name: 'Rita Vale', roles: ['reviewer'] };

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
    reviewNote: 'Checked against the table',
    retiredBy: null,
    retiredAt: null,
    retireNote: null,
    ...extra,
  };
}

const silver = constant();
const agcl = constant({
  id: 7,
  lineageId: 'lin-7',
  version: 1,
  kind: 'solubility_product',
  reaction: 'AgCl(s) = Ag+ + Cl-',
  defines: 'AgCl(s)',
  ligands: ['Cl-'],
  logValue: -9.75,
  uncertainty: null,
});

/** The list path the screen asks for: the approved library by reaction, plus any changes. */
function listPath(extra: Record<string, string> = {}): string {
  return keys.constants({ status: 'approved', sort: 'reaction', dir: 'asc', ...extra });
}

function routes(extra: Routes = {}): Routes {
  return { [listPath()]: { status: 200, body: [silver, agcl] }, ...extra };
}

function asked(fetchMock: jest.Mock, path: string): boolean {
  return fetchMock.mock.calls.some(([p]) => p === path);
}

type Node = { props: Record<string, unknown>; parent: Node | null };

/** The aria-sort of the column header around a sort button. */
function sortOf(button: Node): unknown {
  let node: Node | null = button;
  while (node && node.props.role !== 'columnheader') node = node.parent;
  return node?.props['aria-sort'];
}

afterEach(() => {
  Dimensions.set({ window: phone, screen: phone });
});

describe('Library list on a phone', () => {
  it('shows each constant as a two-line card', async () => {
    mockApi(routes());
    renderRouter('./app', { initialUrl: '/library' });
    const card = within(await screen.findByTestId('constant-1'));
    expect(card.getByText('Ag+ + 2 NH3 = Ag(NH3)2+')).toBeOnTheScreen();
    expect(card.getByText('Cumulative formation · log β 7.05 · Approved · v2')).toBeOnTheScreen();
    expect(within(screen.getByTestId('constant-7')).getByText('Solubility product · log Ksp -9.75 · Approved · v1')).toBeOnTheScreen();
    expect(screen.getByText('2 constants')).toBeOnTheScreen();
    expect(screen.queryByRole('button', { name: /^Sort by reaction/ })).toBeNull();
  });

  it('shows loading, then an error with retry', async () => {
    mockApi(routes({ [listPath()]: 'pending' }));
    renderRouter('./app', { initialUrl: '/library' });
    expect(await screen.findByText('Loading constants…')).toBeOnTheScreen();

    mockApi(routes({ [listPath()]: { status: 500, body: errorBody('internal', 'The library could not be read.') } }));
    renderRouter('./app', { initialUrl: '/library' });
    expect(await screen.findByText('The library could not be read.')).toBeOnTheScreen();
    mockApi(routes());
    fireEvent.press(screen.getByRole('button', { name: 'Retry' }));
    expect(await screen.findByTestId('constant-1')).toBeOnTheScreen();
  });

  it('says the library is empty, and says so differently when filters match nothing', async () => {
    mockApi(routes({ [listPath()]: { status: 200, body: [] }, [listPath({ metal: 'Au+' })]: { status: 200, body: [] } }));
    renderRouter('./app', { initialUrl: '/library' });
    expect(await screen.findByText('No constants yet')).toBeOnTheScreen();

    fireEvent.press(screen.getByRole('button', { name: 'Show filters' }));
    fireEvent.press(screen.getByRole('checkbox', { name: 'Au(I), gold(I)' }));
    expect(await screen.findByText('No constants match')).toBeOnTheScreen();
    fireEvent.press(screen.getByRole('button', { name: 'Clear search and filters' }));
    expect(await screen.findByText('No constants yet')).toBeOnTheScreen();
  });

  it('filters by metal, ligand, kind and status, and searches after typing stops', async () => {
    const fetchMock = mockApi(
      routes({
        [listPath({ metal: 'Ag+' })]: { status: 200, body: [silver, agcl] },
        [listPath({ metal: 'Ag+', ligand: 'Cl-' })]: { status: 200, body: [agcl] },
        [listPath({ metal: 'Ag+', ligand: 'Cl-', kind: 'solubility_product', status: 'current' })]: { status: 200, body: [agcl] },
        [listPath({ q: 'chloride' })]: { status: 200, body: [agcl] },
      }),
    );
    renderRouter('./app', { initialUrl: '/library' });
    await screen.findByTestId('constant-1');
    fireEvent.press(screen.getByRole('button', { name: 'Show filters' }));
    fireEvent.press(screen.getByRole('checkbox', { name: 'Ag(I), silver(I)' }));
    await waitFor(() => expect(asked(fetchMock, listPath({ metal: 'Ag+' }))).toBe(true));
    fireEvent.press(screen.getByRole('checkbox', { name: 'Cl-, chloride' }));
    await waitFor(() => expect(screen.queryByTestId('constant-1')).toBeNull());
    expect(screen.getByRole('checkbox', { name: 'Ag(I), silver(I)', checked: true })).toBeOnTheScreen();

    fireEvent.press(screen.getByRole('checkbox', { name: 'Solubility product' }));
    fireEvent.press(screen.getByRole('checkbox', { name: 'Status: Approved and waiting' }));
    await waitFor(() =>
      expect(asked(fetchMock, listPath({ metal: 'Ag+', ligand: 'Cl-', kind: 'solubility_product', status: 'current' }))).toBe(true),
    );
    expect(screen.getByRole('button', { name: 'Hide filters, 4 on' })).toBeOnTheScreen();

    fireEvent.press(screen.getByRole('button', { name: 'Clear filters' }));
    fireEvent.changeText(screen.getByLabelText('Search'), ' chloride ');
    await waitFor(() => expect(asked(fetchMock, listPath({ q: 'chloride' }))).toBe(true));
    expect(fetchMock.mock.calls.some(([p]) => String(p).includes('q=c&') || String(p).includes('q=ch&'))).toBe(false);
  });

  it('sorts with chips and a direction button on a phone', async () => {
    const fetchMock = mockApi(routes({ [listPath({ sort: 'logValue', dir: 'desc' })]: { status: 200, body: [silver, agcl] } }));
    renderRouter('./app', { initialUrl: '/library' });
    await screen.findByTestId('constant-1');
    fireEvent.press(screen.getByRole('button', { name: 'Show filters' }));
    fireEvent.press(screen.getByRole('checkbox', { name: 'Sort by log value' }));
    fireEvent.press(screen.getByRole('button', { name: 'Sorted ascending; sort descending' }));
    await waitFor(() => expect(asked(fetchMock, listPath({ sort: 'logValue', dir: 'desc' }))).toBe(true));
  });

  it('opens the list from a link with its filters', async () => {
    const fetchMock = mockApi(routes({ [listPath({ status: 'draft' })]: { status: 200, body: [] } }));
    renderRouter('./app', { initialUrl: '/library?status=draft' });
    expect(await screen.findByText('No constants match')).toBeOnTheScreen();
    expect(asked(fetchMock, listPath({ status: 'draft' }))).toBe(true);
  });
});

describe('Library list: what each role may do', () => {
  it('offers a chemist propose and import, but no review queue', async () => {
    mockApi(routes());
    const view = renderRouter('./app', { initialUrl: '/library' });
    await screen.findByTestId('constant-1');
    expect(screen.getByRole('button', { name: 'Import CSV' })).toBeOnTheScreen();
    expect(screen.queryByRole('button', { name: /Review queue/ })).toBeNull();
    fireEvent.press(screen.getByRole('button', { name: 'Propose a constant' }));
    expect(await screen.findByLabelText('Reaction')).toBeOnTheScreen();
    expect(view.getPathname()).toBe('/library/propose');
  });

  it('offers a reviewer the review queue with the number of drafts waiting', async () => {
    const drafts = [constant({ id: 9, status: 'draft' }), constant({ id: 10, status: 'draft' })];
    mockApi(
      routes({
        '/api/me': { status: 200, body: reviewer },
        [keys.constants({ status: 'draft', sort: 'proposedAt', dir: 'asc' })]: { status: 200, body: drafts },
      }),
    );
    renderRouter('./app', { initialUrl: '/library' });
    expect(await screen.findByRole('button', { name: 'Review queue, 2 drafts waiting' })).toBeOnTheScreen();
    expect(screen.getByText('Review queue (2)')).toBeOnTheScreen();
    expect(screen.queryByRole('button', { name: 'Propose a constant' })).toBeNull();
    expect(screen.queryByRole('button', { name: 'Import CSV' })).toBeNull();
  });

  it('downloads the rows shown as CSV with the same filters', async () => {
    mockApi(routes({ [listPath({ ligand: 'NH3' })]: { status: 200, body: [silver] } }));
    const open = jest.spyOn(Linking, 'openURL').mockResolvedValue(true);
    renderRouter('./app', { initialUrl: '/library?ligand=NH3' });
    await screen.findByTestId('constant-1');
    fireEvent.press(screen.getByRole('button', { name: 'Download CSV' }));
    expect(open).toHaveBeenCalledWith('/api/constants/export.csv?dir=asc&ligand=NH3&sort=reaction&status=approved');
    open.mockRestore();
  });
});

describe('Library list on a wide screen', () => {
  beforeEach(() => {
    Dimensions.set({ window: wideWindow, screen: wideWindow });
  });

  it('shows a table whose column headers sort, with aria-sort on the active one', async () => {
    const fetchMock = mockApi(
      routes({
        [listPath({ sort: 'logValue' })]: { status: 200, body: [agcl, silver] },
        [listPath({ sort: 'logValue', dir: 'desc' })]: { status: 200, body: [silver, agcl] },
      }),
    );
    renderRouter('./app', { initialUrl: '/library' });
    const row = within(await screen.findByTestId('constant-7'));
    expect(row.getByRole('link', { name: 'AgCl(s) = Ag+ + Cl-, version 1' })).toBeOnTheScreen();
    expect(row.getByText('log Ksp -9.75')).toBeOnTheScreen();
    expect(row.getByText('25 °C, I = 0 mol/L')).toBeOnTheScreen();
    expect(row.getByText('Approved · v1')).toBeOnTheScreen();
    expect(screen.queryByRole('button', { name: 'Show filters' })).toBeNull();

    const reaction = screen.getByRole('button', { name: 'Sort by reaction, sorted ascending' });
    expect(sortOf(reaction)).toBe('ascending');
    expect(sortOf(screen.getByRole('button', { name: 'Sort by kind' }))).toBe('none');
    fireEvent.press(screen.getByRole('button', { name: 'Sort by log value' }));
    await waitFor(() => expect(asked(fetchMock, listPath({ sort: 'logValue' }))).toBe(true));
    fireEvent.press(await screen.findByRole('button', { name: 'Sort by log value, sorted ascending' }));
    await waitFor(() => expect(asked(fetchMock, listPath({ sort: 'logValue', dir: 'desc' }))).toBe(true));
    expect(await screen.findByRole('button', { name: 'Sort by log value, sorted descending' })).toBeOnTheScreen();
  });
});
