import { fireEvent, renderRouter, screen, waitFor, within } from 'expo-router/testing-library';

import { keys } from '@/lib/api/keys';
import { type User } from '@/shared/auth';
import { DEFAULT_THRESHOLDS, type Hazard, type Review, type ReviewSummary, type ThresholdsVersion } from '@/shared/safety';

import { errorBody, mockApi, sentBodies, type Routes } from './helpers';

const officer: User = { id: 'u-safe', email: 'sam@shop.test', name: 'Sam Reyes', roles: ['safety'] };
const chemist: User = { id: 'u-chem', email: 'cora@shop.test', name: 'Cora Quill', roles: ['chemist'] };

const lowPh: Hazard = {
  rule: 'cyanide_low_ph',
  severity: 'danger',
  flag: true,
  title: 'Cyanide below pH 11: hydrogen cyanide can escape',
  text: 'At this pH part of the free cyanide is HCN. Follow the safety data sheet (SDS), local codes and licensed practice; this caution does not replace them.',
  evidence: [
    { label: 'pH', value: 10 },
    { label: 'HCN share of free cyanide', value: 0.1396, unit: 'fraction', note: 'pKa 9.21, 25 °C (CRC Handbook, from memory)' },
  ],
  ghs: [{ code: 'H330', text: 'Fatal if inhaled' }],
  pictograms: ['GHS06'],
  reagents: ['hydrogen cyanide (HCN)'],
  source: 'common practice',
};

function summary(extra: Partial<ReviewSummary> = {}): ReviewSummary {
  return {
    id: 'rev-1',
    subject: { kind: 'run', id: 'run-1', title: 'Strike at pH 10', calculator: 'speciation' },
    status: 'pending',
    flags: ['cyanide_low_ph'],
    submittedBy: { id: chemist.id, name: chemist.name },
    submittedAt: '2026-11-30T09:00:00.000Z',
    decidedBy: null,
    decidedAt: null,
    conditions: null,
    note: null,
    ...extra,
  };
}

function review(extra: Partial<Review> = {}): Review {
  return {
    ...summary(),
    hazards: [lowPh],
    thresholdsVersion: 1,
    events: [{ action: 'submitted', actor: { id: chemist.id, name: chemist.name }, at: '2026-11-30T09:00:00.000Z', note: null }],
    ...extra,
  };
}

const thresholds: ThresholdsVersion = { version: 1, values: DEFAULT_THRESHOLDS, note: 'Built-in defaults (common practice).', createdBy: null, createdAt: '2026-11-01T00:00:00.000Z' };

function routes(me: User, extra: Routes = {}): Routes {
  return {
    '/api/me': { status: 200, body: me },
    [keys.thresholds]: { status: 200, body: thresholds },
    [keys.thresholdsHistory]: { status: 200, body: [thresholds] },
    [keys.reviews('pending')]: { status: 200, body: [summary()] },
    [keys.reviews('all')]: { status: 200, body: [summary({ status: 'signed_off', conditions: 'HCN monitor on', decidedBy: { id: officer.id, name: officer.name }, decidedAt: '2026-11-30T10:00:00.000Z' })] },
    [keys.reviews('signed_off')]: { status: 200, body: [] },
    [keys.review('rev-1')]: { status: 200, body: review() },
    ...extra,
  };
}

describe('Safety desk', () => {
  it('shows a safety officer what waits, with its flags, and the thresholds in force', async () => {
    mockApi(routes(officer));
    renderRouter('./app', { initialUrl: '/safety' });
    expect(await screen.findByText('Safety desk')).toBeOnTheScreen();
    const item = within(await screen.findByTestId('review-rev-1'));
    expect(item.getByText('Strike at pH 10')).toBeOnTheScreen();
    expect(item.getByText(/Run · Speciation · sent by Cora Quill/)).toBeOnTheScreen();
    expect(item.getByLabelText('Danger: Low pH cyanide')).toBeOnTheScreen();
    expect(item.getByText('Desk: waiting')).toBeOnTheScreen();
    expect(await screen.findByLabelText('Lowest pH for cyanide: pH 11')).toBeOnTheScreen();
    expect(screen.getByLabelText('Largest HCN share of free cyanide: 2 %')).toBeOnTheScreen();

    fireEvent.press(screen.getByLabelText('Show signed off'));
    expect(await screen.findByText('Nothing has been signed off yet.')).toBeOnTheScreen();
  });

  it("shows a chemist their own flagged work and the desk's decision", async () => {
    mockApi(routes(chemist));
    renderRouter('./app', { initialUrl: '/safety' });
    expect(await screen.findByText('Your work on the safety desk')).toBeOnTheScreen();
    expect(await screen.findByText('Conditions: HCN monitor on')).toBeOnTheScreen();
    expect(screen.getByText('Thresholds and their history')).toBeOnTheScreen();
  });

  it('a failed load says so with Retry', async () => {
    mockApi(routes(officer, { [keys.reviews('pending')]: { status: 500, body: errorBody('internal', 'The desk could not be read.') } }));
    renderRouter('./app', { initialUrl: '/safety' });
    expect(await screen.findByText('The desk could not be read.')).toBeOnTheScreen();
  });
});

describe('A review', () => {
  it('shows the evidence and signs off with conditions', async () => {
    const signed = review({ status: 'signed_off', conditions: 'Extraction on; HCN monitor in the room.', decidedBy: { id: officer.id, name: officer.name }, decidedAt: '2026-11-30T10:00:00.000Z' });
    const fetchMock = mockApi(routes(officer, { [`POST ${keys.reviewAction('rev-1', 'sign-off')}`]: { status: 200, body: signed } }));
    renderRouter('./app', { initialUrl: '/safety/review/rev-1' });
    expect(await screen.findByText('Waiting for the safety desk')).toBeOnTheScreen();
    expect(screen.getByTestId('hazard-cyanide_low_ph')).toBeOnTheScreen();
    expect(screen.getByText('Sent to the desk by Cora Quill')).toBeOnTheScreen();
    fireEvent.changeText(screen.getByLabelText('Conditions'), 'Extraction on; HCN monitor in the room.');
    fireEvent.press(screen.getByTestId('sign-off'));
    expect(await screen.findByText('Signed off with your conditions; the submitter has been mailed.')).toBeOnTheScreen();
    expect(sentBodies(fetchMock, 'POST', keys.reviewAction('rev-1', 'sign-off'))).toEqual([{ conditions: 'Extraction on; HCN monitor in the room.' }]);
    expect(await screen.findByTestId('review-conditions')).toHaveTextContent('Conditions: Extraction on; HCN monitor in the room.');
  });

  it('asks for a note before sending back, and shows the server refusing', async () => {
    const fetchMock = mockApi(
      routes(officer, { [`POST ${keys.reviewAction('rev-1', 'send-back')}`]: { status: 409, body: errorBody('conflict', 'This review is already signed off.') } }),
    );
    renderRouter('./app', { initialUrl: '/safety/review/rev-1' });
    fireEvent.press(await screen.findByTestId('send-back'));
    expect(await screen.findByText('Say what has to change')).toBeOnTheScreen();
    expect(sentBodies(fetchMock, 'POST', keys.reviewAction('rev-1', 'send-back'))).toEqual([]);
    fireEvent.changeText(screen.getByLabelText('What has to change'), 'Raise the pH first.');
    fireEvent.press(screen.getByTestId('send-back'));
    expect(await screen.findByText('This review is already signed off.')).toBeOnTheScreen();
  });

  it('an officer reading their own work gets no decision forms', async () => {
    mockApi(routes({ ...officer, id: chemist.id }, {}));
    renderRouter('./app', { initialUrl: '/safety/review/rev-1' });
    expect(await screen.findByText(/your own work: another safety officer/i)).toBeOnTheScreen();
    expect(screen.queryByTestId('sign-off-form')).toBeNull();
  });

  it('the submitter resubmits work that was sent back', async () => {
    const back = review({ status: 'sent_back', note: 'Raise the pH to 11.5 first.', decidedBy: { id: officer.id, name: officer.name }, decidedAt: '2026-11-30T10:00:00.000Z' });
    const fetchMock = mockApi(routes(chemist, { [keys.review('rev-1')]: { status: 200, body: back }, [`POST ${keys.reviewAction('rev-1', 'resubmit')}`]: { status: 200, body: review() } }));
    renderRouter('./app', { initialUrl: '/safety/review/rev-1' });
    expect(await screen.findByText('Note: Raise the pH to 11.5 first.')).toBeOnTheScreen();
    expect(screen.queryByTestId('sign-off-form')).toBeNull();
    fireEvent.changeText(screen.getByLabelText('What changed'), 'Raised to pH 11.8 with KOH.');
    fireEvent.press(screen.getByTestId('resubmit'));
    expect(await screen.findByText('Resubmitted: the safety desk has been mailed.')).toBeOnTheScreen();
    expect(sentBodies(fetchMock, 'POST', keys.reviewAction('rev-1', 'resubmit'))).toEqual([{ note: 'Raised to pH 11.8 with KOH.' }]);
  });

  it('an unknown review says so', async () => {
    mockApi(routes(officer, { [keys.review('rev-1')]: { status: 404, body: errorBody('not_found', 'No safety review with id rev-1.') } }));
    renderRouter('./app', { initialUrl: '/safety/review/rev-1' });
    expect(await screen.findByText('No such review')).toBeOnTheScreen();
  });
});

describe('Thresholds', () => {
  it('the safety role changes them as a new version; a bad value is named', async () => {
    const saved: ThresholdsVersion = { ...thresholds, version: 2, values: { ...DEFAULT_THRESHOLDS, cyanideMinPh: 11.5 }, note: 'Stricter after the audit.', createdBy: { id: officer.id, name: officer.name } };
    const fetchMock = mockApi(routes(officer, { [`POST ${keys.thresholds}`]: { status: 201, body: saved } }));
    renderRouter('./app', { initialUrl: '/safety/thresholds' });
    const field = await screen.findByLabelText('Lowest pH for cyanide');
    fireEvent.changeText(field, '3');
    fireEvent.changeText(screen.getByLabelText('Why they change'), 'Stricter after the audit.');
    fireEvent.press(screen.getByTestId('save-thresholds'));
    expect(await screen.findByText('Must be at least 7')).toBeOnTheScreen();
    fireEvent.changeText(screen.getByLabelText('Lowest pH for cyanide'), '11.5');
    fireEvent.press(screen.getByTestId('save-thresholds'));
    expect(await screen.findByTestId('thresholds-saved')).toHaveTextContent(/Saved as version 2/);
    const [sent] = sentBodies(fetchMock, 'POST', keys.thresholds) as { values: { cyanideMinPh: number }; note: string }[];
    expect(sent).toMatchObject({ values: { ...DEFAULT_THRESHOLDS, cyanideMinPh: 11.5 }, note: 'Stricter after the audit.' });
  });

  it('others read them and their history only', async () => {
    mockApi(routes(chemist));
    renderRouter('./app', { initialUrl: '/safety/thresholds' });
    expect(await screen.findByText(/Only the safety role changes the thresholds/)).toBeOnTheScreen();
    expect(screen.queryByTestId('thresholds-form')).toBeNull();
    await waitFor(() => expect(screen.getByText('Version 1 (in force)')).toBeOnTheScreen());
  });
});
