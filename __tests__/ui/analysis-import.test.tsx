import { Dimensions } from 'react-native';
import { fireEvent, renderRouter, screen, waitFor, within } from 'expo-router/testing-library';
import { getDocumentAsync } from 'expo-document-picker';

import { keys } from '@/lib/api/keys';
import { type AnalysisImportReport, type Bath } from '@/shared/baths';

import { chemist, errorBody, mockApi, type Routes } from './helpers';

jest.mock('expo-document-picker', () => ({ getDocumentAsync: jest.fn() }));

const pickMock = getDocumentAsync as jest.Mock;
const phone = Dimensions.get('window');
const ID = 'b-fix';

const fixer: Bath = {
  id: ID,
  name: 'Fixer tank 1',
  process: 'thiosulfate_fixer',
  status: 'active',
  volume: 20,
  volumeUnit: 'gal',
  volumeL: 75.7,
  temperatureC: null,
  makeUp: [],
  metal: 'Ag+',
  ligand: 'S2O3-2',
  metalUnit: 'g/L',
  ligandUnit: 'g/L',
  ligandAs: '(NH4)2S2O3',
  carbonateAs: null,
  extras: ['bromide'],
  targets: { metal: { min: null, max: 6 }, freeLigand: { min: 120, max: null }, pH: { min: null, max: null } },
  site: '',
  owner: { id: 'u-chem', name: 'Cora Quill' },
  notes: '',
  createdBy: { id: 'u-chem', name: 'Cora Quill' },
  createdAt: '2026-01-10T09:00:00.000Z',
  updatedAt: '2026-01-10T09:00:00.000Z',
  archivedAt: null,
};

const refused: AnalysisImportReport = {
  mode: 'all',
  rows: 3,
  created: 0,
  rejected: 1,
  written: false,
  problems: [
    { row: 4, column: 'metal_unit', message: 'must be one of mol/L, mmol/L, g/L, mg/L, troy oz/gal, oz/gal' },
    { row: 2, column: null, message: 'enter at least one result' },
  ],
  analysisIds: [],
};

function picks(name: string, size: number) {
  pickMock.mockResolvedValueOnce({ canceled: false, assets: [{ name, size, uri: `file:///cache/${name}`, mimeType: 'text/csv', lastModified: 0 }] });
}

function routes(extra: Routes = {}): Routes {
  return {
    '/api/me': { status: 200, body: chemist },
    [keys.bath(ID)]: { status: 200, body: fixer },
    [keys.analyses(ID)]: { status: 200, body: [] },
    [keys.attachments(ID)]: { status: 200, body: [] },
    ...extra,
  };
}

async function openUpload(extra: Routes = {}) {
  const fetchMock = mockApi(routes(extra));
  renderRouter('./app', { initialUrl: `/baths/${ID}` });
  fireEvent.press(await screen.findByRole('button', { name: 'Upload a CSV file' }));
  return { fetchMock, panel: within(screen.getByTestId('analysis-import')) };
}

async function withFile(extra: Routes = {}) {
  const opened = await openUpload(extra);
  picks('fixer-log.csv', 3100);
  fireEvent.press(opened.panel.getByRole('button', { name: 'Choose a CSV file' }));
  expect(await opened.panel.findByText('fixer-log.csv · 3.10 kB')).toBeOnTheScreen();
  return opened;
}

function importCall(fetchMock: jest.Mock): RequestInit {
  const call = fetchMock.mock.calls.find(([p, init]) => p === keys.analysesImport(ID) && (init as RequestInit)?.method === 'POST');
  if (!call) throw new Error('no import request');
  return call[1] as RequestInit;
}

function formParts(body: unknown): Record<string, unknown> {
  const form = body as { getParts: () => { fieldName: string; string?: string; uri?: string }[] };
  return Object.fromEntries(form.getParts().map((p) => [p.fieldName, p.string ?? p.uri]));
}

function analysesFetches(fetchMock: jest.Mock): number {
  return fetchMock.mock.calls.filter(([p, init]) => p === keys.analyses(ID) && ((init as RequestInit | undefined)?.method ?? 'GET') === 'GET').length;
}

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

describe('Uploading analyses from a CSV file', () => {
  it('explains the columns for this bath, with an example', async () => {
    const { panel } = await openUpload();
    const help = within(panel.getByTestId('analysis-csv-help'));
    for (const column of ['sampled_at', 'analyst', 'metal', 'free_ligand', 'total_ligand', 'ph', 'bromide', 'notes']) {
      expect(help.getByText(column)).toBeOnTheScreen();
    }
    expect(help.getByText(/^metal_unit, free_ligand_unit, total_ligand_unit, bromide_unit — the unit of the value column/)).toBeOnTheScreen();
    // A fixer logs bromide, not carbonate.
    expect(help.queryByText('carbonate')).toBeNull();
    expect(help.getByText(/values are read in the bath's units: metal in g\/L, ligand in g\/L as \(NH4\)2S2O3/)).toBeOnTheScreen();
    expect(help.getByTestId('analysis-csv-example')).toHaveTextContent('sampled_at,analyst,metal,free_ligand,ph,bromide,notes 2026-03-04,Cora Quill,31.2,112,12.1,4.5,after top-up');
  });

  it('refuses a file over the size limit before sending it', async () => {
    const { fetchMock, panel } = await openUpload();
    expect(panel.getByRole('button', { name: 'Upload the analyses' })).toBeDisabled();
    picks('years.csv', 2_500_000);
    fireEvent.press(panel.getByRole('button', { name: 'Choose a CSV file' }));
    expect(await panel.findByText(/years.csv is 2.50 MB; the largest file the upload takes is 1.00 MB/)).toBeOnTheScreen();
    expect(panel.getByRole('button', { name: 'Upload the analyses' })).toBeDisabled();
    expect(fetchMock.mock.calls.some(([p]) => p === keys.analysesImport(ID))).toBe(false);
  });

  it('sends mode all by default and reports the problems when nothing was written', async () => {
    const { fetchMock, panel } = await withFile({
      [`POST ${keys.analysesImport(ID)}`]: { status: 422, body: errorBody('validation_failed', '2 rows have problems', refused) },
    });
    expect(panel.getByRole('radio', { name: 'Only if every row is valid', checked: true })).toBeOnTheScreen();
    const before = analysesFetches(fetchMock);
    fireEvent.press(panel.getByRole('button', { name: 'Upload the analyses' }));
    const report = within(await panel.findByTestId('analysis-import-report'));
    expect(report.getByText(/Nothing was written: some lines have problems. 2 rows have problems./)).toBeOnTheScreen();
    expect(report.getByLabelText('Rows read: 3')).toBeOnTheScreen();
    expect(report.getByLabelText('Analyses added: 0')).toBeOnTheScreen();
    expect(report.getByLabelText('Rejected: 1')).toBeOnTheScreen();
    // Sorted by line, as the file reads.
    const lines = report.getAllByText(/^Line \d+$/).map((n) => n.props.children);
    expect(lines).toEqual(['Line 2', 'Line 4']);
    expect(report.getByText(/whole line/)).toBeOnTheScreen();
    expect(report.getByText(/Must be one of mol\/L/)).toBeOnTheScreen();

    const init = importCall(fetchMock);
    expect(init.credentials).toBe('same-origin');
    expect(Object.keys(init.headers ?? {}).map((h) => h.toLowerCase())).not.toContain('content-type');
    expect(formParts(init.body)).toEqual({ file: 'file:///cache/fixer-log.csv', mode: 'all' });
    expect(analysesFetches(fetchMock)).toBe(before);
  });

  it('imports the valid rows and refreshes the trends and the log', async () => {
    const done: AnalysisImportReport = { ...refused, mode: 'valid', rows: 5, created: 4, rejected: 1, written: true, problems: [refused.problems[0]!], analysisIds: ['a', 'b', 'c', 'd'] };
    const { fetchMock, panel } = await withFile({ [`POST ${keys.analysesImport(ID)}`]: { status: 200, body: done } });
    fireEvent.press(panel.getByRole('radio', { name: 'Import the valid rows, skip the rest' }));
    const before = analysesFetches(fetchMock);
    fireEvent.press(panel.getByRole('button', { name: 'Upload the analyses' }));
    const report = within(await panel.findByTestId('analysis-import-report'));
    expect(report.getByText('4 analyses added to the log. 1 line was skipped.')).toBeOnTheScreen();
    expect(formParts(importCall(fetchMock).body)).toMatchObject({ mode: 'valid' });
    await waitFor(() => expect(analysesFetches(fetchMock)).toBeGreaterThan(before));
  });

  it('shows the problems as a table on a wide screen', async () => {
    const size = { width: 1280, height: 800, scale: 1, fontScale: 1 };
    Dimensions.set({ window: size, screen: size });
    const { panel } = await withFile({
      [`POST ${keys.analysesImport(ID)}`]: { status: 422, body: errorBody('validation_failed', '2 rows have problems', refused) },
    });
    fireEvent.press(panel.getByRole('button', { name: 'Upload the analyses' }));
    const report = within(await panel.findByTestId('analysis-import-report'));
    expect(report.getByText('What is wrong')).toBeOnTheScreen();
    expect(report.getByText('metal_unit')).toBeOnTheScreen();
  });

  it('shows any other refusal from the server', async () => {
    const { panel } = await withFile({
      [`POST ${keys.analysesImport(ID)}`]: { status: 403, body: errorBody('forbidden', 'Only chemists and technicians log analyses.') },
    });
    fireEvent.press(panel.getByRole('button', { name: 'Upload the analyses' }));
    expect(await panel.findByText('Only chemists and technicians log analyses.')).toBeOnTheScreen();
    expect(panel.queryByTestId('analysis-import-report')).toBeNull();
  });

  it('offers a fixer bath bromide, not carbonate, in the add form', async () => {
    mockApi(routes());
    renderRouter('./app', { initialUrl: `/baths/${ID}` });
    fireEvent.press(await screen.findByRole('button', { name: 'Add an analysis' }));
    const form = within(screen.getByTestId('add-analysis-form'));
    expect(form.getByLabelText('Bromide')).toBeOnTheScreen();
    expect(form.queryByLabelText(/Carbonate/)).toBeNull();
    expect(form.getByLabelText('Free (NH4)2S2O3')).toBeOnTheScreen();
  });
});
