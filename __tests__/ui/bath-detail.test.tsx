import { Dimensions, Linking } from 'react-native';
import { act, fireEvent, renderRouter, screen, waitFor, within } from 'expo-router/testing-library';
import { getDocumentAsync } from 'expo-document-picker';

import { todayText } from '@/components/screens/bath-detail/bath-words';
import { keys } from '@/lib/api/keys';
import { toStored } from '@/lib/baths/quantities';
import { type User } from '@/shared/auth';
import { type Analysis, type Attachment, type Bath } from '@/shared/baths';

import { admin, chemist, errorBody, mockApi, sentBodies, type Routes } from './helpers';

jest.mock('expo-document-picker', () => ({ getDocumentAsync: jest.fn() }));

const pickMock = getDocumentAsync as jest.Mock;
const phone = Dimensions.get('window');
const technician: User = { ...chemist, id: 'u-tech', name: 'Theo Bench', roles: ['technician'] };
const reviewer: User = { id: 'u-rev', email: 'rita@shop.test', name: 'Rita Vale', roles: ['reviewer'] };
const ID = 'b-1';

const bath: Bath = {
  id: ID,
  name: 'Silver line tank 2',
  process: 'cyanide_silver_plate',
  status: 'active',
  volume: 400,
  volumeUnit: 'L',
  volumeL: 400,
  temperatureC: 24,
  makeUp: [
    { salt: 'KAg(CN)2', amount: 60, unit: 'g/L' },
    { salt: 'KCN', amount: 115, unit: 'g/L' },
  ],
  metal: 'Ag+',
  ligand: 'CN-',
  metalUnit: 'g/L',
  ligandUnit: 'g/L',
  ligandAs: 'KCN',
  carbonateAs: 'K2CO3',
  extras: ['carbonate'],
  targets: { metal: { min: 28, max: 36 }, freeLigand: { min: 90, max: 130 }, pH: { min: 11.5, max: 12.5 } },
  site: 'Plating room B',
  owner: { id: 'u-chem', name: 'Cora Quill' },
  notes: 'Filter weekly; carbon treat when brightener drifts.',
  createdBy: { id: 'u-chem', name: 'Cora Quill' },
  createdAt: '2026-01-10T09:00:00.000Z',
  updatedAt: '2026-01-10T09:00:00.000Z',
  archivedAt: null,
};

type Shown = { metal?: number; freeLigand?: number; pH?: number; carbonate?: number; totalLigand?: number };

/** An analysis as the server sends it, from values in the bath's g/L. */
function analysis(id: string, sampledAt: string, v: Shown, extra: Partial<Analysis> = {}): Analysis {
  const stored = (q: 'metal' | 'freeLigand' | 'totalLigand' | 'carbonate') => (v[q] === undefined ? null : toStored(bath, q, v[q], 'g/L'));
  return {
    id,
    bathId: ID,
    sampledAt,
    analyst: 'Cora Quill',
    values: { metal: stored('metal'), freeLigand: stored('freeLigand'), totalLigand: stored('totalLigand'), pH: v.pH ?? null, carbonate: stored('carbonate'), bromide: null },
    entered: {},
    notes: '',
    source: 'manual',
    enteredBy: { id: 'u-chem', name: 'Cora Quill' },
    createdAt: sampledAt,
    outOfRange: [],
    ...extra,
  };
}

// Oldest first, as the server lists them.
const log: Analysis[] = [
  analysis('a-1', '2026-03-02T00:00:00.000Z', { metal: 31.2, freeLigand: 112, pH: 12.1, carbonate: 40 }),
  analysis('a-2', '2026-03-09T00:00:00.000Z', { metal: 37.5, freeLigand: 95, pH: 12.0, carbonate: 45 }, { notes: 'after top-up' }),
  analysis('a-3', '2026-03-16T00:00:00.000Z', { metal: 30.1, freeLigand: 84.6, pH: 12.2, carbonate: 52 }, { analyst: 'Theo Bench' }),
];

const attachments: Attachment[] = [
  {
    id: 'f-1',
    bathId: ID,
    title: 'Supplier analysis, March',
    fileName: 'supplier-march.pdf',
    contentType: 'application/pdf',
    sizeBytes: 254_000,
    uploadedBy: { id: 'u-chem', name: 'Cora Quill' },
    uploadedAt: '2026-03-05T10:00:00.000Z',
  },
];

function routes(me: User, extra: Routes = {}): Routes {
  return {
    '/api/me': { status: 200, body: me },
    [keys.bath(ID)]: { status: 200, body: bath },
    [keys.analyses(ID)]: { status: 200, body: log },
    [keys.attachments(ID)]: { status: 200, body: attachments },
    ...extra,
  };
}

function open(me: User = chemist, extra: Routes = {}) {
  const fetchMock = mockApi(routes(me, extra));
  renderRouter('./app', { initialUrl: `/baths/${ID}` });
  return fetchMock;
}

function wide() {
  const size = { width: 1280, height: 800, scale: 1, fontScale: 1 };
  Dimensions.set({ window: size, screen: size });
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
  jest.restoreAllMocks();
  Dimensions.set({ window: phone, screen: phone });
});

/** The parts of React Native's multipart body as {field: text or file uri}. */
function formParts(body: unknown): Record<string, unknown> {
  const form = body as { getParts: () => { fieldName: string; string?: string; uri?: string }[] };
  return Object.fromEntries(form.getParts().map((p) => [p.fieldName, p.string ?? p.uri]));
}

describe('Bath detail: the record', () => {
  it('shows the bath, its targets in its units, the make-up and notes', async () => {
    open();
    expect(await screen.findByRole('header', { name: 'Silver line tank 2' })).toBeOnTheScreen();
    const header = within(screen.getByTestId('bath-header'));
    expect(header.getByText('Cyanide silver plate')).toBeOnTheScreen();
    expect(header.getByText('Active')).toBeOnTheScreen();
    expect(header.getByText('400 L')).toBeOnTheScreen();
    expect(header.getByText('24 °C')).toBeOnTheScreen();
    expect(header.getByText('Plating room B')).toBeOnTheScreen();
    expect(header.getByText('Cora Quill')).toBeOnTheScreen();
    const targets = within(header.getByTestId('bath-targets'));
    expect(targets.getByText('Ag metal 28–36 g/L')).toBeOnTheScreen();
    expect(targets.getByText('Free KCN 90–130 g/L')).toBeOnTheScreen();
    expect(targets.getByText('pH 11.5–12.5')).toBeOnTheScreen();
    expect(header.getByText('KCN 115 g/L')).toBeOnTheScreen();
    expect(header.getByText(/Filter weekly/)).toBeOnTheScreen();
  });

  it('says so when the bath does not exist, and offers a retry for other failures', async () => {
    mockApi(routes(chemist, { [keys.bath(ID)]: { status: 404, body: errorBody('not_found', 'No such bath') } }));
    renderRouter('./app', { initialUrl: `/baths/${ID}` });
    expect(await screen.findByText('No such bath')).toBeOnTheScreen();

    let calls = 0;
    mockApi(routes(chemist, { [keys.bath('b-2')]: () => (++calls === 1 ? { status: 500, body: errorBody('internal', 'The server failed.') } : { status: 200, body: { ...bath, id: 'b-2' } }) }));
    renderRouter('./app', { initialUrl: '/baths/b-2' });
    fireEvent.press(await screen.findByRole('button', { name: 'Retry' }));
    expect(await screen.findByRole('header', { name: 'Silver line tank 2' })).toBeOnTheScreen();
  });

  it('offers Edit to chemists and technicians, and Archive only to admins', async () => {
    mockApi(routes(technician));
    const view = renderRouter('./app', { initialUrl: `/baths/${ID}` });
    const edit = await screen.findByRole('button', { name: 'Edit Silver line tank 2' });
    expect(screen.queryByRole('button', { name: 'Archive' })).toBeNull();
    fireEvent.press(edit);
    await waitFor(() => expect(view.getPathname()).toBe(`/baths/edit/${ID}`));
  });

  it('lets an admin archive after confirming, and shows the bath as archived', async () => {
    const archived = { ...bath, status: 'archived', archivedAt: '2026-03-20T10:00:00.000Z' };
    let done = false;
    const fetchMock = open(admin, {
      [keys.bath(ID)]: () => ({ status: 200, body: done ? archived : bath }),
      [`POST ${keys.bathArchive(ID)}`]: () => {
        done = true;
        return { status: 200, body: archived };
      },
    });
    fireEvent.press(await screen.findByRole('button', { name: 'Archive' }));
    expect(screen.getByText(/Archive Silver line tank 2\? It leaves the active list/)).toBeOnTheScreen();
    fireEvent.press(screen.getByRole('button', { name: 'Archive the bath' }));
    expect(await screen.findByText(/Bath archived/)).toBeOnTheScreen();
    expect(sentBodies(fetchMock, 'POST', keys.bathArchive(ID))).toHaveLength(1);
    expect(await screen.findByText(/^Archived since/)).toBeOnTheScreen();
    expect(screen.getByRole('button', { name: 'Restore' })).toBeOnTheScreen();
    expect(screen.getByTestId('log-archived')).toBeOnTheScreen();
  });

  it('shows a reader the bath without any way to change it', async () => {
    open(reviewer);
    expect(await screen.findByTestId('bath-log')).toBeOnTheScreen();
    expect(screen.queryByRole('button', { name: /^Edit/ })).toBeNull();
    expect(screen.queryByTestId('add-analysis')).toBeNull();
    expect(screen.queryByTestId('upload-analyses')).toBeNull();
    expect(screen.queryByTestId('attachment-upload')).toBeNull();
  });
});

describe('Bath detail: trends and the log', () => {
  it('on a phone shows one chart at a time, chosen with chips', async () => {
    open();
    const trends = within(await screen.findByTestId('bath-trends'));
    expect(trends.getByLabelText('Ag metal over 3 analyses, 1 outside the target range; latest 30.1 g/L')).toBeOnTheScreen();
    expect(trends.queryByTestId('trend-freeLigand')).toBeNull();
    fireEvent.press(trends.getByRole('radio', { name: 'Free KCN' }));
    expect(trends.getByLabelText('Free KCN over 3 analyses, 1 outside the target range; latest 84.6 g/L (low)')).toBeOnTheScreen();
    fireEvent.press(trends.getByRole('radio', { name: 'Carbonate (as K2CO3)' }));
    expect(trends.getByLabelText('Carbonate (as K2CO3) over 3 analyses, no target range set; latest 52.0 g/L')).toBeOnTheScreen();
    expect(trends.queryByRole('radio', { name: /Total KCN/ })).toBeNull();
  });

  it('lists analyses newest first with values out of range marked in words', async () => {
    open();
    const table = within(await screen.findByTestId('analyses-table'));
    expect(table.getAllByTestId(/^analysis-/).map((n) => n.props.testID)).toEqual(['analysis-a-3', 'analysis-a-2', 'analysis-a-1']);
    const newest = within(table.getByTestId('analysis-a-3'));
    expect(newest.getByText('2026-03-16 · Theo Bench')).toBeOnTheScreen();
    expect(newest.getByText('84.6 g/L ▼ low')).toBeOnTheScreen();
    expect(newest.getByText('Ag metal: 30.1 g/L')).toBeOnTheScreen();
    expect(within(table.getByTestId('analysis-a-2')).getByText('37.5 g/L ▲ high')).toBeOnTheScreen();
    expect(within(table.getByTestId('analysis-a-2')).getByText(/after top-up/)).toBeOnTheScreen();
  });

  it('lists the newest ten and shows the rest on request', async () => {
    const many = Array.from({ length: 12 }, (_, i) =>
      analysis(`m-${i}`, new Date(Date.UTC(2026, 1, 1 + i)).toISOString(), { metal: 30 + i * 0.1 }),
    );
    open(chemist, { [keys.analyses(ID)]: { status: 200, body: many } });
    const table = await screen.findByTestId('analyses-table');
    expect(within(table).getAllByTestId(/^analysis-/)).toHaveLength(10);
    expect(within(table).queryByTestId('analysis-m-0')).toBeNull();
    fireEvent.press(screen.getByRole('button', { name: 'Show all 12 analyses' }));
    expect(within(screen.getByTestId('analyses-table')).getAllByTestId(/^analysis-/)).toHaveLength(12);
  });

  it('on a wide screen shows every chart beside the table', async () => {
    wide();
    open();
    expect(await screen.findByTestId('trend-metal')).toBeOnTheScreen();
    for (const q of ['freeLigand', 'pH', 'carbonate']) expect(screen.getByTestId(`trend-${q}`)).toBeOnTheScreen();
    expect(screen.queryByRole('radio', { name: 'Free KCN' })).toBeNull();
    expect(screen.getByTestId('analyses-table')).toBeOnTheScreen();
  });

  it('draws the table as a grid when it has room', async () => {
    open();
    const table = await screen.findByTestId('analyses-table');
    fireEvent(table, 'layout', { nativeEvent: { layout: { width: 900, height: 400 } } });
    const grid = within(screen.getByTestId('analyses-table'));
    expect(grid.getByText('Free KCN (g/L)')).toBeOnTheScreen();
    expect(grid.getByText('84.6 ▼ low')).toBeOnTheScreen();
  });

  it('says there are no analyses yet, and retries a failed load', async () => {
    let calls = 0;
    open(chemist, {
      [keys.analyses(ID)]: () => (++calls === 1 ? { status: 500, body: errorBody('internal', 'The server failed.') } : { status: 200, body: [] }),
    });
    expect(await screen.findByText('The server failed.')).toBeOnTheScreen();
    fireEvent.press(screen.getAllByRole('button', { name: 'Retry' })[0]!);
    expect(await screen.findByText('No analyses yet')).toBeOnTheScreen();
  });
});

describe('Bath detail: adding an analysis', () => {
  async function openForm(extra: Routes = {}, me: User = chemist) {
    const fetchMock = open(me, extra);
    fireEvent.press(await screen.findByRole('button', { name: 'Add an analysis' }));
    return { fetchMock, form: within(screen.getByTestId('add-analysis-form')) };
  }

  it('starts with today and the signed-in person, in the bath units, with carbonate but not bromide', async () => {
    const { form } = await openForm({}, technician);
    expect(form.getByLabelText('Date sampled').props.value).toBe(todayText());
    expect(form.getByLabelText('Analyst').props.value).toBe('Theo Bench');
    expect(within(form.getByTestId('field-metal')).getByRole('radio', { name: 'g/L', checked: true })).toBeOnTheScreen();
    expect(form.getByLabelText('Carbonate (as K2CO3)')).toBeOnTheScreen();
    expect(form.queryByLabelText('Bromide')).toBeNull();
  });

  it('sends the values with their units and refreshes the log', async () => {
    const added = analysis('a-4', '2026-03-20T00:00:00.000Z', { metal: 33, freeLigand: 101, pH: 12.3 });
    let posted = false;
    const { fetchMock, form } = await openForm({
      [keys.analyses(ID)]: () => ({ status: 200, body: posted ? [...log, added] : log }),
      [`POST ${keys.analyses(ID)}`]: () => {
        posted = true;
        return { status: 201, body: added };
      },
    });
    fireEvent.changeText(form.getByLabelText('Date sampled'), '2026-03-20');
    fireEvent.changeText(form.getByLabelText('Ag metal'), '33');
    fireEvent.changeText(form.getByLabelText('Free KCN'), '13,5');
    fireEvent.press(within(form.getByTestId('field-freeLigand')).getByRole('radio', { name: 'oz/gal' }));
    fireEvent.changeText(form.getByLabelText('pH'), '12.3');
    fireEvent.changeText(form.getByLabelText('Notes'), 'weekly check');
    fireEvent.press(form.getByRole('button', { name: 'Save the analysis' }));
    expect(await screen.findByText(/Analysis of 2026-03-20 saved/)).toBeOnTheScreen();
    expect(sentBodies(fetchMock, 'POST', keys.analyses(ID))).toEqual([
      {
        sampledAt: '2026-03-20',
        analyst: 'Cora Quill',
        metal: { value: 33, unit: 'g/L' },
        freeLigand: { value: 13.5, unit: 'oz/gal' },
        pH: 12.3,
        notes: 'weekly check',
      },
    ]);
    await waitFor(() => expect(within(screen.getByTestId('analyses-table')).getByTestId('analysis-a-4')).toBeOnTheScreen());
    expect(form.getByLabelText('Ag metal').props.value).toBe('');
  });

  it('checks the form before sending: a result is needed, numbers must be numbers', async () => {
    const { fetchMock, form } = await openForm();
    fireEvent.press(form.getByRole('button', { name: 'Save the analysis' }));
    expect(await form.findByText(/^Enter at least one result/)).toBeOnTheScreen();
    fireEvent.changeText(form.getByLabelText('pH'), 'twelve');
    fireEvent.changeText(form.getByLabelText('Date sampled'), '4 March');
    fireEvent.press(form.getByRole('button', { name: 'Save the analysis' }));
    expect(await form.findByText('Enter a number')).toBeOnTheScreen();
    expect(form.getByText(/give the date of sampling as YYYY-MM-DD, or a date and time/i)).toBeOnTheScreen();
    expect(sentBodies(fetchMock, 'POST', keys.analyses(ID))).toHaveLength(0);
  });

  it('shows the server’s objections beside their fields', async () => {
    const { form } = await openForm({
      [`POST ${keys.analyses(ID)}`]: {
        status: 422,
        body: errorBody('validation_failed', 'Check the form', [
          { path: 'metal.value', message: 'is too large' },
          { path: 'sampledAt', message: 'cannot be in the future' },
        ]),
      },
    });
    fireEvent.changeText(form.getByLabelText('Ag metal'), '99999');
    fireEvent.press(form.getByRole('button', { name: 'Save the analysis' }));
    expect(await form.findByText('Is too large')).toBeOnTheScreen();
    expect(form.getByText('Cannot be in the future')).toBeOnTheScreen();
  });
});

describe('Bath detail: attachments', () => {
  function picks(name: string, size: number, mimeType: string) {
    pickMock.mockResolvedValueOnce({ canceled: false, assets: [{ name, size, uri: `file:///cache/${name}`, mimeType, lastModified: 0 }] });
  }

  it('lists files with their type, size and who added them, each with a download', async () => {
    const openUrl = jest.spyOn(Linking, 'openURL').mockResolvedValue(true);
    open(reviewer);
    const item = within(await screen.findByTestId('attachment-f-1'));
    expect(item.getByText('Supplier analysis, March')).toBeOnTheScreen();
    expect(item.getByText('supplier-march.pdf · PDF · 254 kB')).toBeOnTheScreen();
    expect(item.getByText(/^Added by Cora Quill/)).toBeOnTheScreen();
    fireEvent.press(item.getByRole('button', { name: 'Download Supplier analysis, March' }));
    expect(openUrl).toHaveBeenCalledWith(keys.attachment(ID, 'f-1'));
  });

  it('says when there are none', async () => {
    open(chemist, { [keys.attachments(ID)]: { status: 200, body: [] } });
    expect(await screen.findByText('No attachments yet.')).toBeOnTheScreen();
  });

  it('uploads a PDF with its title as multipart and lists it', async () => {
    const added: Attachment = { ...attachments[0]!, id: 'f-2', title: 'Hull cell panel', fileName: 'panel.jpg', contentType: 'image/jpeg', sizeBytes: 1_200_000 };
    let posted = false;
    const fetchMock = open(chemist, {
      [keys.attachments(ID)]: () => ({ status: 200, body: posted ? [added, ...attachments] : attachments }),
      [`POST ${keys.attachments(ID)}`]: () => {
        posted = true;
        return { status: 201, body: added };
      },
    });
    const upload = within(await screen.findByTestId('attachment-upload'));
    expect(upload.getByRole('button', { name: 'Upload the file' })).toBeDisabled();
    picks('panel.jpg', 1_200_000, 'image/jpeg');
    fireEvent.press(upload.getByRole('button', { name: 'Choose a PDF, PNG or JPEG' }));
    expect(await upload.findByText('panel.jpg · 1.20 MB')).toBeOnTheScreen();
    expect(pickMock).toHaveBeenCalledWith(expect.objectContaining({ type: ['application/pdf', 'image/png', 'image/jpeg'] }));
    expect(upload.getByLabelText('Title').props.value).toBe('panel');
    fireEvent.changeText(upload.getByLabelText('Title'), 'Hull cell panel');
    fireEvent.press(upload.getByRole('button', { name: 'Upload the file' }));
    expect(await upload.findByText('Attached “Hull cell panel”.')).toBeOnTheScreen();
    const call = fetchMock.mock.calls.find(([p, init]) => p === keys.attachments(ID) && (init as RequestInit)?.method === 'POST');
    expect(formParts((call![1] as RequestInit).body)).toEqual({ file: 'file:///cache/panel.jpg', title: 'Hull cell panel' });
    expect(await screen.findByTestId('attachment-f-2')).toBeOnTheScreen();
  });

  it('refuses other types and files over the limit before sending, and shows the server’s refusal', async () => {
    const fetchMock = open(chemist, {
      [`POST ${keys.attachments(ID)}`]: { status: 413, body: errorBody('payload_too_large', 'The file is larger than 10 MB.') },
    });
    const upload = within(await screen.findByTestId('attachment-upload'));
    picks('notes.docx', 20_000, 'application/vnd.openxmlformats-officedocument.wordprocessingml.document');
    fireEvent.press(upload.getByRole('button', { name: 'Choose a PDF, PNG or JPEG' }));
    expect(await upload.findByText(/notes.docx is not a PDF, PNG or JPEG file/)).toBeOnTheScreen();
    expect(upload.getByRole('button', { name: 'Upload the file' })).toBeDisabled();

    picks('scan.pdf', 12_500_000, 'application/pdf');
    fireEvent.press(upload.getByRole('button', { name: 'Choose another file' }));
    expect(await upload.findByText(/scan.pdf is 12.5 MB; the largest file you can attach is 10.0 MB/)).toBeOnTheScreen();
    expect(upload.getByRole('button', { name: 'Upload the file' })).toBeDisabled();
    expect(fetchMock.mock.calls.some(([p, init]) => p === keys.attachments(ID) && (init as RequestInit)?.method === 'POST')).toBe(false);

    picks('scan-small.pdf', 900_000, 'application/pdf');
    fireEvent.press(upload.getByRole('button', { name: 'Choose another file' }));
    await upload.findByText('scan-small.pdf · 900 kB');
    await act(async () => {
      fireEvent.press(upload.getByRole('button', { name: 'Upload the file' }));
    });
    expect(await upload.findByText('The file is larger than 10 MB.')).toBeOnTheScreen();
  });
});
