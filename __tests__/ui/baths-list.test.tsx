import { Dimensions } from 'react-native';
import { fireEvent, renderRouter, screen, waitFor, within } from 'expo-router/testing-library';

import { keys } from '@/lib/api/keys';
import { type User } from '@/shared/auth';
import { type BathSummary } from '@/shared/baths';

import { errorBody, mockApi, type Routes } from './helpers';

const phone = Dimensions.get('window');
const wideWindow = { width: 1280, height: 800, scale: 1, fontScale: 1 };
const reviewer: User = { id: 'u-rev', email: 'rita@shop.test', name: 'Rita Vale', roles: ['reviewer'] };
const technician: User = { id: 'u-tech', email: 'tom@shop.test', name: 'Tom Tank', roles: ['technician'] };

function bath(extra: Partial<BathSummary> = {}): BathSummary {
  return {
    id: 'b-1',
    name: 'Silver line 2',
    process: 'cyanide_silver_plate',
    status: 'active',
    volume: 120,
    volumeUnit: 'L',
    volumeL: 120,
    temperatureC: 25,
    makeUp: [{ salt: 'KCN', amount: 100, unit: 'g/L' }],
    metal: 'Ag+',
    ligand: 'CN-',
    metalUnit: 'g/L',
    ligandUnit: 'g/L',
    ligandAs: 'KCN',
    carbonateAs: 'K2CO3',
    extras: ['carbonate'],
    targets: { metal: { min: 25, max: 40 }, freeLigand: { min: 90, max: 130 }, pH: { min: 11.5, max: 12.5 } },
    site: 'Plating room',
    owner: { id: 'u-chem', name: 'Cora Quill' },
    notes: '',
    createdBy: { id: 'u-chem', name: 'Cora Quill' },
    createdAt: '2026-02-01T10:00:00.000Z',
    updatedAt: '2026-02-01T10:00:00.000Z',
    archivedAt: null,
    hazards: [],
    review: null,
    analysisCount: 4,
    lastAnalysisAt: '2026-03-01T10:00:00.000Z',
    lastAnalysisAgeDays: 3,
    outOfRange: [
      { quantity: 'freeLigand', value: 80, side: 'below' },
      { quantity: 'pH', value: 12.9, side: 'above' },
    ],
    ...extra,
  };
}

const silver = bath();
const fixer = bath({
  id: 'b-2',
  name: 'Fixer tank A',
  process: 'thiosulfate_fixer',
  volume: 40,
  volumeUnit: 'gal',
  volumeL: 151.4,
  metal: 'Ag+',
  ligand: 'S2O3-2',
  ligandAs: '(NH4)2S2O3',
  carbonateAs: null,
  extras: ['bromide'],
  site: '',
  analysisCount: 0,
  lastAnalysisAt: null,
  lastAnalysisAgeDays: null,
  outOfRange: [],
});
const stale = bath({ id: 'b-3', name: 'Copper strike', process: 'cyanide_copper', metal: 'Cu+', ligandAs: 'NaCN', lastAnalysisAgeDays: 20, outOfRange: [] });
const archived = bath({ id: 'b-4', name: 'Old silver tank', status: 'archived', archivedAt: '2026-02-10T10:00:00.000Z', lastAnalysisAgeDays: 0, outOfRange: [] });

function listPath(extra: Record<string, string> = {}): string {
  return keys.baths({ status: 'active', ...extra });
}

function routes(extra: Routes = {}): Routes {
  return { [listPath()]: { status: 200, body: [silver, fixer, stale] }, ...extra };
}

function asked(fetchMock: jest.Mock, path: string): boolean {
  return fetchMock.mock.calls.some(([p]) => p === path);
}

afterEach(() => {
  Dimensions.set({ window: phone, screen: phone });
});

describe('Bath list on a phone', () => {
  it('asks for the baths in service first', () => {
    expect(listPath()).toBe('/api/baths?status=active');
  });

  it('shows each bath as a card with its process, site, volume, analysis age and flags in words', async () => {
    mockApi(routes());
    renderRouter('./app', { initialUrl: '/baths' });
    const card = within(await screen.findByTestId('bath-b-1'));
    expect(card.getByText('Silver line 2')).toBeOnTheScreen();
    expect(card.getByText('Cyanide silver plate · Plating room · 120 L')).toBeOnTheScreen();
    expect(card.getByText('Analysed 3 days ago')).toBeOnTheScreen();
    expect(card.getByText('Free KCN low')).toBeOnTheScreen();
    expect(card.getByText('pH high')).toBeOnTheScreen();

    const fixerCard = within(screen.getByTestId('bath-b-2'));
    expect(fixerCard.getByText('Thiosulfate fixer · 40 US gal')).toBeOnTheScreen();
    expect(fixerCard.getByText('No analyses yet')).toBeOnTheScreen();

    const staleCard = within(screen.getByTestId('bath-b-3'));
    expect(staleCard.getByText('Analysed 20 days ago')).toBeOnTheScreen();
    expect(staleCard.getByText('Stale (over 14 days)')).toBeOnTheScreen();
    expect(staleCard.getByText('Within targets')).toBeOnTheScreen();
    expect(screen.getByText('3 baths')).toBeOnTheScreen();
  });

  it('makes the whole card a link to the bath, named with what it shows', async () => {
    mockApi(routes());
    const view = renderRouter('./app', { initialUrl: '/baths' });
    await screen.findByTestId('bath-b-1');
    const link = screen.getByRole('link', { name: /^Silver line 2\. Cyanide silver plate · Plating room · 120 L\. Analysed 3 days ago\. Free KCN low\. pH high$/ });
    fireEvent.press(link);
    await waitFor(() => expect(view.getPathname()).toBe('/baths/b-1'));
  });

  it('shows loading, then an error with retry', async () => {
    mockApi(routes({ [listPath()]: 'pending' }));
    renderRouter('./app', { initialUrl: '/baths' });
    expect(await screen.findByText('Loading baths…')).toBeOnTheScreen();

    mockApi(routes({ [listPath()]: { status: 500, body: errorBody('internal', 'The baths could not be read.') } }));
    renderRouter('./app', { initialUrl: '/baths' });
    expect(await screen.findByText('The baths could not be read.')).toBeOnTheScreen();
    mockApi(routes());
    fireEvent.press(screen.getByRole('button', { name: 'Retry' }));
    expect(await screen.findByTestId('bath-b-1')).toBeOnTheScreen();
  });

  it('says there are no baths yet, and says so differently when filters match nothing', async () => {
    mockApi(routes({ [listPath()]: { status: 200, body: [] }, [listPath({ process: 'gold_strike' })]: { status: 200, body: [] } }));
    renderRouter('./app', { initialUrl: '/baths' });
    expect(await screen.findByText('No baths recorded yet')).toBeOnTheScreen();
    expect(screen.getByText(/Chemists and technicians can add one/)).toBeOnTheScreen();

    fireEvent.press(screen.getByRole('button', { name: 'Show filters' }));
    fireEvent.press(screen.getByRole('checkbox', { name: 'Gold strike' }));
    expect(await screen.findByText('No baths match')).toBeOnTheScreen();
    fireEvent.press(screen.getByRole('button', { name: 'Clear search and filters' }));
    expect(await screen.findByText('No baths recorded yet')).toBeOnTheScreen();
  });

  it('filters by process and status, and searches after typing stops', async () => {
    const fetchMock = mockApi(
      routes({
        [listPath({ process: 'thiosulfate_fixer' })]: { status: 200, body: [fixer] },
        [keys.baths({ process: 'thiosulfate_fixer', status: 'all' })]: { status: 200, body: [fixer] },
        [keys.baths({ status: 'archived' })]: { status: 200, body: [archived] },
        [listPath({ q: 'copper' })]: { status: 200, body: [stale] },
      }),
    );
    renderRouter('./app', { initialUrl: '/baths' });
    await screen.findByTestId('bath-b-1');
    fireEvent.press(screen.getByRole('button', { name: 'Show filters' }));
    expect(screen.getByRole('radio', { name: 'Active', checked: true })).toBeOnTheScreen();
    fireEvent.press(screen.getByRole('checkbox', { name: 'Thiosulfate fixer' }));
    await waitFor(() => expect(screen.queryByTestId('bath-b-1')).toBeNull());
    fireEvent.press(screen.getByRole('radio', { name: 'All' }));
    await waitFor(() => expect(asked(fetchMock, keys.baths({ process: 'thiosulfate_fixer', status: 'all' }))).toBe(true));
    expect(screen.getByRole('button', { name: 'Hide filters, 2 on' })).toBeOnTheScreen();

    fireEvent.press(screen.getByRole('checkbox', { name: 'Thiosulfate fixer', checked: true }));
    fireEvent.press(screen.getByRole('radio', { name: 'Archived' }));
    const card = within(await screen.findByTestId('bath-b-4'));
    expect(card.getByText('Archived')).toBeOnTheScreen();
    expect(card.getByText('Analysed today')).toBeOnTheScreen();

    fireEvent.press(screen.getByRole('button', { name: 'Clear filters' }));
    fireEvent.changeText(screen.getByLabelText('Search'), ' copper ');
    await waitFor(() => expect(asked(fetchMock, listPath({ q: 'copper' }))).toBe(true));
    expect(fetchMock.mock.calls.some(([p]) => /q=co?&/.test(String(p)))).toBe(false);
  });

  it('opens the list from a link with its filters', async () => {
    const fetchMock = mockApi(routes({ [keys.baths({ status: 'archived' })]: { status: 200, body: [archived] } }));
    renderRouter('./app', { initialUrl: '/baths?status=archived' });
    expect(await screen.findByTestId('bath-b-4')).toBeOnTheScreen();
    expect(asked(fetchMock, listPath())).toBe(false);
  });
});

describe('Bath list: who may add a bath', () => {
  it('offers a chemist New bath, which opens the form', async () => {
    mockApi(routes());
    const view = renderRouter('./app', { initialUrl: '/baths' });
    await screen.findByTestId('bath-b-1');
    fireEvent.press(screen.getByRole('button', { name: 'New bath' }));
    expect(await screen.findByLabelText('Name')).toBeOnTheScreen();
    expect(view.getPathname()).toBe('/baths/new');
  });

  it('offers a technician New bath too', async () => {
    mockApi(routes({ '/api/me': { status: 200, body: technician } }));
    renderRouter('./app', { initialUrl: '/baths' });
    await screen.findByTestId('bath-b-1');
    expect(screen.getByRole('button', { name: 'New bath' })).toBeOnTheScreen();
  });

  it('shows a reviewer the list without New bath', async () => {
    mockApi(routes({ '/api/me': { status: 200, body: reviewer }, [listPath()]: { status: 200, body: [] } }));
    renderRouter('./app', { initialUrl: '/baths' });
    expect(await screen.findByText('No baths recorded yet')).toBeOnTheScreen();
    expect(screen.queryByRole('button', { name: 'New bath' })).toBeNull();
    expect(screen.getByText(/Chemists and technicians can add one\.$/)).toBeOnTheScreen();
  });
});

describe('Bath list on a wide screen', () => {
  beforeEach(() => {
    Dimensions.set({ window: wideWindow, screen: wideWindow });
  });

  it('shows a table: name link, process, site, volume, last analysis and state', async () => {
    mockApi(routes());
    renderRouter('./app', { initialUrl: '/baths' });
    const row = within(await screen.findByTestId('bath-b-1'));
    expect(row.getByRole('link', { name: 'Silver line 2' })).toBeOnTheScreen();
    expect(row.getByText('Cyanide silver plate')).toBeOnTheScreen();
    expect(row.getByText('Plating room')).toBeOnTheScreen();
    expect(row.getByText('120 L')).toBeOnTheScreen();
    expect(row.getByText('Analysed 3 days ago')).toBeOnTheScreen();
    expect(row.getByText('Free KCN low')).toBeOnTheScreen();
    const fixerRow = within(screen.getByTestId('bath-b-2'));
    expect(fixerRow.getByText('No analyses yet')).toBeOnTheScreen();
    expect(fixerRow.getByText('—')).toBeOnTheScreen();
    expect(screen.queryByRole('button', { name: 'Show filters' })).toBeNull();
    expect(screen.getByRole('checkbox', { name: 'Cyanide zinc' })).toBeOnTheScreen();
  });
});
