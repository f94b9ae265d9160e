import { Dimensions } from 'react-native';
import { fireEvent, renderRouter, screen, waitFor, within } from 'expo-router/testing-library';
import { getDocumentAsync } from 'expo-document-picker';

import { chemist, errorBody, mockApi, type Routes } from './helpers';

jest.mock('expo-document-picker', () => ({ getDocumentAsync: jest.fn() }));

const pickMock = getDocumentAsync as jest.Mock;
const phone = Dimensions.get('window');
const technician = { ...chemist, id: 'u-tech', name: 'Theo Bench', roles: ['technician'] };

function picks(name: string, size: number) {
  pickMock.mockResolvedValueOnce({
    canceled: false,
    assets: [{ name, size, uri: `file:///cache/${name}`, mimeType: 'text/csv', lastModified: 0 }],
  });
}

const badReport = {
  mode: 'all',
  rows: 3,
  created: 0,
  unchanged: 1,
  rejected: 1,
  written: false,
  problems: [{ row: 3, column: 'log_value', message: 'enter the log10 value as a number' }],
  draftIds: [],
};

/** The parts of a multipart body as [field, value] pairs, whichever FormData the test runtime provides. */
function formParts(body: unknown): Record<string, unknown> {
  const form = body as { getParts?: () => { fieldName: string; string?: string; uri?: string }[]; get?: (k: string) => unknown };
  if (form.getParts) return Object.fromEntries(form.getParts().map((p) => [p.fieldName, p.string ?? p.uri]));
  return { mode: form.get?.('mode'), file: form.get?.('file') };
}

function importCall(fetchMock: jest.Mock): RequestInit {
  const call = fetchMock.mock.calls.find(([p, init]) => p === '/api/constants/import' && (init as RequestInit)?.method === 'POST');
  if (!call) throw new Error('no import request');
  return call[1] as RequestInit;
}

async function openWithFile(routes: Routes = {}) {
  const fetchMock = mockApi(routes);
  renderRouter('./app', { initialUrl: '/library/import' });
  const form = within(await screen.findByTestId('import-form'));
  picks('fixer-constants.csv', 2048);
  fireEvent.press(form.getByRole('button', { name: 'Choose a CSV file' }));
  expect(await form.findByText('fixer-constants.csv · 2.05 kB')).toBeOnTheScreen();
  return { fetchMock, form };
}

// The test runtime's FormData is Node's; on a phone the app gets React Native's, which reads {uri, name, type} parts.
const nodeFormData = global.FormData;
beforeAll(() => {
  global.FormData = jest.requireActual('react-native/Libraries/Network/FormData').default;
});
afterAll(() => {
  global.FormData = nodeFormData;
});

afterEach(() => {
  pickMock.mockReset();
  Dimensions.set({ window: phone, screen: phone });
});

describe('Import screen', () => {
  it('tells someone without the chemist role why they cannot import', async () => {
    mockApi({ '/api/me': { status: 200, body: technician } });
    renderRouter('./app', { initialUrl: '/library/import' });
    expect(await screen.findByText('Needs the chemist role')).toBeOnTheScreen();
    expect(screen.queryByTestId('import-form')).toBeNull();
  });

  it('explains the columns and what becomes of each row', async () => {
    mockApi();
    renderRouter('./app', { initialUrl: '/library/import' });
    const help = within(await screen.findByTestId('import-columns'));
    for (const column of ['kind', 'reaction', 'log_value', 'source', 'uncertainty', 'temperature_c']) {
      expect(help.getByText(column)).toBeOnTheScreen();
    }
    expect(help.getByText(/Ag\+ \+ 2 NH3 = Ag\(NH3\)2\+/)).toBeOnTheScreen();
    expect(help.getByText(/Every imported row becomes a draft/)).toBeOnTheScreen();
    expect(help.getByText(/identical to the approved value is skipped as unchanged/)).toBeOnTheScreen();
  });

  it('asks for CSV files and refuses one over the size limit before sending it', async () => {
    const fetchMock = mockApi();
    renderRouter('./app', { initialUrl: '/library/import' });
    const form = within(await screen.findByTestId('import-form'));
    expect(form.getByRole('button', { name: 'Import' })).toBeDisabled();
    picks('everything.csv', 1_500_000);
    fireEvent.press(form.getByRole('button', { name: 'Choose a CSV file' }));
    expect(await form.findByText(/everything.csv is 1.50 MB; the largest file the import takes is 1.00 MB/)).toBeOnTheScreen();
    expect(pickMock).toHaveBeenCalledWith(expect.objectContaining({ type: ['text/csv', 'text/comma-separated-values', 'text/plain'] }));
    expect(form.getByRole('button', { name: 'Import' })).toBeDisabled();
    fireEvent.press(form.getByRole('button', { name: 'Import' }));
    expect(fetchMock.mock.calls.some(([p]) => p === '/api/constants/import')).toBe(false);
  });

  it('keeps the file it had when the chooser is cancelled', async () => {
    const { form } = await openWithFile();
    pickMock.mockResolvedValueOnce({ canceled: true, assets: null });
    fireEvent.press(form.getByRole('button', { name: 'Choose another file' }));
    await waitFor(() => expect(pickMock).toHaveBeenCalledTimes(2));
    expect(form.getByText('fixer-constants.csv · 2.05 kB')).toBeOnTheScreen();
  });

  it('uploads as multipart with mode all and shows that nothing was written when a row is bad', async () => {
    const { fetchMock, form } = await openWithFile({
      'POST /api/constants/import': { status: 422, body: errorBody('validation_failed', '1 row has a problem', badReport) },
    });
    expect(form.getByRole('radio', { name: 'Only if every row is valid', checked: true })).toBeOnTheScreen();
    fireEvent.press(form.getByRole('button', { name: 'Import' }));
    const report = within(await screen.findByTestId('import-report'));
    expect(report.getByText(/Nothing was written: some lines have problems. 1 row has a problem./)).toBeOnTheScreen();
    expect(report.getByLabelText('Rows read: 3')).toBeOnTheScreen();
    expect(report.getByLabelText('Rejected: 1')).toBeOnTheScreen();
    expect(report.getByText('Line 3')).toBeOnTheScreen();
    expect(report.getByText(/Enter the log10 value as a number/)).toBeOnTheScreen();
    expect(report.queryByText('Open the review queue')).toBeNull();

    const init = importCall(fetchMock);
    expect(init.credentials).toBe('same-origin');
    expect(Object.keys(init.headers ?? {}).map((h) => h.toLowerCase())).not.toContain('content-type');
    expect(formParts(init.body)).toMatchObject({ mode: 'all', file: 'file:///cache/fixer-constants.csv' });
  });

  it('imports the valid rows as drafts and links to the review queue', async () => {
    const done = { ...badReport, mode: 'valid', created: 2, rows: 4, written: true, draftIds: [11, 12] };
    const { fetchMock, form } = await openWithFile({ 'POST /api/constants/import': { status: 200, body: done } });
    fireEvent.press(form.getByRole('radio', { name: 'Import the valid rows as drafts, skip the rest' }));
    fireEvent.press(form.getByRole('button', { name: 'Import' }));
    const report = within(await screen.findByTestId('import-report'));
    expect(report.getByText('2 drafts created, waiting for review.')).toBeOnTheScreen();
    expect(report.getByLabelText('Drafts created: 2')).toBeOnTheScreen();
    expect(report.getByLabelText('Unchanged: 1')).toBeOnTheScreen();
    expect(report.getByRole('link', { name: 'Open the review queue' })).toBeOnTheScreen();
    expect(formParts(importCall(fetchMock).body)).toMatchObject({ mode: 'valid' });
  });

  it('says so when every row matched the library', async () => {
    const same = { ...badReport, rows: 2, unchanged: 2, rejected: 0, problems: [] };
    const { form } = await openWithFile({ 'POST /api/constants/import': { status: 200, body: same } });
    fireEvent.press(form.getByRole('button', { name: 'Import' }));
    expect(await screen.findByText('Nothing was written: no line held a new or changed value.')).toBeOnTheScreen();
  });

  it('shows any other refusal from the server', async () => {
    const { form } = await openWithFile({
      'POST /api/constants/import': { status: 413, body: errorBody('payload_too_large', 'The file is larger than 1 MB.') },
    });
    fireEvent.press(form.getByRole('button', { name: 'Import' }));
    expect(await form.findByText('The file is larger than 1 MB.')).toBeOnTheScreen();
    expect(screen.queryByTestId('import-report')).toBeNull();
  });

  it('shows problems as a table on a wide screen', async () => {
    Dimensions.set({ window: { width: 1280, height: 800, scale: 1, fontScale: 1 }, screen: { width: 1280, height: 800, scale: 1, fontScale: 1 } });
    const { form } = await openWithFile({
      'POST /api/constants/import': { status: 422, body: errorBody('validation_failed', '1 row has a problem', badReport) },
    });
    fireEvent.press(form.getByRole('button', { name: 'Import' }));
    const report = within(await screen.findByTestId('import-report'));
    expect(report.getByText('What is wrong')).toBeOnTheScreen();
    expect(report.getByText('log_value')).toBeOnTheScreen();
  });
});
