import { Dimensions, Platform, Share } from 'react-native';
import { act, fireEvent, renderRouter, screen, waitFor, within } from 'expo-router/testing-library';

import { type BathSummary } from '@/shared/baths';

import { admin, errorBody, mockApi, sentBodies, type Routes } from './helpers';

const phone = Dimensions.get('window');
const wideWindow = { width: 1280, height: 800, scale: 1, fontScale: 1 };
const cora = { id: 'u-chem', name: 'Cora Quill' };
const theo = { id: 'u-tech', name: 'Theo Bench' };
const fixerBath = { id: 'bath-fix', name: 'Fixer tank 2' };

const summaries = [
  { id: 'run-2', title: 'Fixer tank 2, after top-up', calculator: 'speciation', author: theo, createdAt: '2026-03-04T09:00:00.000Z', status: 'converged', usesDrafts: true, verdict: 'Silver is held mostly as Ag(S2O3)2-3 (> 99 %); no solid forms.', bath: fixerBath, hazards: [], review: null, released: false },
  { id: 'run-1', title: '', calculator: 'headroom', author: cora, createdAt: '2026-03-01T15:30:00.000Z', status: 'not_converged', usesDrafts: false, verdict: '', bath: null, hazards: [], review: null, released: false },
];

// Silver chloride in dilute ammonia, as the server stored it when the run was saved.
const problem = {
  components: ['Ag+', 'Cl-', 'NH3'],
  totals: { 'Ag+': 0.01, 'Cl-': 0.01, NH3: 0.1 },
  fixed: {},
  species: [
    { name: 'Ag(NH3)+', logK: 3.31, stoich: { 'Ag+': 1, NH3: 1 } },
    { name: 'Ag(NH3)2+', logK: 7.23, stoich: { 'Ag+': 1, NH3: 2 } },
  ],
  solids: [{ name: 'AgCl(s)', logKsp: -9.75, stoich: { 'Ag+': 1, 'Cl-': 1 } }],
  activity: 'davies',
};
const result = {
  status: 'converged',
  free: { 'Ag+': 3.91e-8, 'Cl-': 0.005313, NH3: 0.08938 },
  species: { 'Ag+': 3.91e-8, 'Cl-': 0.005313, NH3: 0.08938, 'Ag(NH3)+': 7.136e-6, 'Ag(NH3)2+': 0.005305 },
  solids: { 'AgCl(s)': 0.004687 },
  saturation: { 'AgCl(s)': 0 },
  ionicStrength: 0.005313,
  iterations: 8,
  residual: 5.2e-16,
  warnings: [],
  activity: 'davies',
  temperatureC: 25,
};
const constant = (id: number, version: number, reaction: string, logValue: number, kind: string) => ({
  id,
  lineageId: `lin-${id}`,
  version,
  status: 'approved',
  kind,
  reaction,
  logValue,
  temperatureC: 25,
  source: 'Handbook table 4, 2004',
});
const system = { metals: ['Ag+'], ligands: ['Cl-', 'NH3'], counterIons: [], totals: problem.totals, pH: 9.5, activity: 'davies', includeDrafts: true };
const run = {
  ...summaries[0],
  inputs: { system, params: {}, bathId: fixerBath.id },
  problem,
  engineVersion: '1.2.0',
  result,
  constants: [
    { ...constant(31, 1, 'Ag+ + 2 NH3 = Ag(NH3)2+', 7.23, 'cumulative_formation'), supersededBy: { id: 32, version: 2, logValue: 7.4 }, statusNow: 'retired' },
    { ...constant(40, 3, 'AgCl(s) = Ag+ + Cl-', -9.75, 'solubility_product'), supersededBy: null, statusNow: 'approved' },
  ],
  warnings: ['Uses 1 draft not yet reviewed.'],
  output: null,
  safety: { hazards: [], flagged: false, review: null, released: null },
};
// Cora's own headroom run: her chemist account may delete it.
const headroomRun = {
  ...summaries[1],
  title: 'AgCl headroom',
  status: 'converged',
  verdict: 'The bath takes 0.012 mol/L more AgCl(s) before a solid persists.',
  inputs: { system, params: { solid: 'AgCl(s)' } },
  problem,
  engineVersion: '1.2.0',
  result,
  constants: [],
  warnings: [],
  output: null,
  safety: { hazards: [], flagged: false, review: null, released: null },
};
function bath(extra: Partial<BathSummary>): BathSummary {
  return {
    id: 'bath-fix',
    name: 'Fixer tank 2',
    process: 'cyanide_silver_plate',
    status: 'active',
    volume: 120,
    volumeUnit: 'L',
    volumeL: 120,
    temperatureC: 25,
    makeUp: [],
    metal: 'Ag+',
    ligand: 'CN-',
    metalUnit: 'g/L',
    ligandUnit: 'g/L',
    ligandAs: 'KCN',
    carbonateAs: null,
    extras: [],
    targets: { metal: { min: null, max: null }, freeLigand: { min: null, max: null }, pH: { min: null, max: null } },
    site: '',
    owner: cora,
    notes: '',
    createdBy: cora,
    createdAt: '2026-02-01T10:00:00.000Z',
    updatedAt: '2026-02-01T10:00:00.000Z',
    archivedAt: null,
    hazards: [],
    review: null,
    analysisCount: 0,
    lastAnalysisAt: null,
    lastAnalysisAgeDays: null,
    outOfRange: [],
    ...extra,
  };
}
const baths = [bath({}), bath({ id: 'bath-old', name: 'Old silver line', status: 'archived', archivedAt: '2026-02-20T10:00:00.000Z' })];

function open(url: string, routes: Routes) {
  const fetchMock = mockApi(routes);
  const view = renderRouter('./app', { initialUrl: url });
  return { fetchMock, view };
}

function makeWide() {
  Dimensions.set({ window: wideWindow, screen: wideWindow });
}

/** The GET paths asked for so far. */
function gets(fetchMock: jest.Mock): string[] {
  return fetchMock.mock.calls.filter(([, init]) => ((init as RequestInit | undefined)?.method ?? 'GET') === 'GET').map(([p]) => p as string);
}

afterEach(() => {
  Dimensions.set({ window: phone, screen: phone });
  jest.restoreAllMocks();
});

describe('Saved runs list', () => {
  it('shows loading, then an error with retry', async () => {
    open('/calculate/runs', { '/api/runs': 'pending' });
    expect(await screen.findByText('Loading saved runs…')).toBeOnTheScreen();
    open('/calculate/runs', { '/api/runs': { status: 500, body: errorBody('internal', 'Something broke on the server.') } });
    expect(await screen.findByText('Something broke on the server.')).toBeOnTheScreen();
    mockApi({ '/api/runs': { status: 200, body: summaries } });
    fireEvent.press(screen.getByRole('button', { name: 'Retry' }));
    expect(await screen.findByText('Fixer tank 2, after top-up')).toBeOnTheScreen();
  });

  it('says when nothing has been saved yet', async () => {
    open('/calculate/runs', { '/api/runs': { status: 200, body: [] } });
    expect(await screen.findByText('No saved runs yet')).toBeOnTheScreen();
    expect(screen.getByRole('link', { name: 'Open the calculators' })).toBeOnTheScreen();
  });

  it('lists runs newest first with calculator, bath, author, status, drafts and the verdict on one line', async () => {
    open('/calculate/runs', { '/api/runs': { status: 200, body: [...summaries].reverse() } });
    const links = await screen.findAllByRole('link', { name: /Fixer tank 2|Untitled run/ });
    expect(links.map((l) => l.props.accessibilityLabel)).toEqual(['Fixer tank 2, after top-up', 'Untitled run']);
    expect(screen.getByText('2 runs')).toBeOnTheScreen();
    const first = within(screen.getByTestId('run-run-2'));
    expect(first.getByText(/Speciation · Theo Bench · /)).toBeOnTheScreen();
    expect(first.getByText('Bath: Fixer tank 2')).toBeOnTheScreen();
    expect(first.getByText('Settled')).toBeOnTheScreen();
    expect(first.getByText('Uses drafts')).toBeOnTheScreen();
    expect(screen.getByTestId('run-run-2-verdict')).toHaveProp('numberOfLines', 1);
    expect(screen.getByTestId('run-run-2')).toHaveProp('accessibilityHint', expect.stringContaining('no solid forms'));
    const second = within(screen.getByTestId('run-run-1'));
    expect(second.getByText(/Headroom · Cora Quill · /)).toBeOnTheScreen();
    expect(second.getByText('Did not settle')).toBeOnTheScreen();
    expect(second.queryByText('Uses drafts')).toBeNull();
    expect(second.queryByText(/^Bath:/)).toBeNull();
  });

  it('reads its filters from the link and sends them', async () => {
    const path = '/api/runs?author=u-chem&calculator=headroom&from=2026-03-01&to=2026-03-31';
    const { fetchMock } = open('/calculate/runs?calculator=headroom&author=mine&from=2026-03-01&to=2026-03-31', {
      [path]: { status: 200, body: [summaries[1]] },
    });
    expect(await screen.findByText('Untitled run')).toBeOnTheScreen();
    expect(gets(fetchMock)).toContain(path);
    expect(gets(fetchMock)).not.toContain('/api/runs');
    expect(screen.getByRole('radio', { name: 'Mine' })).toBeChecked();
    expect(screen.getByRole('button', { name: 'Show filters, 4 on' })).toBeOnTheScreen();
  });

  it('narrows by who saved, calculator, bath and dates, and says when nothing matches', async () => {
    makeWide();
    const { fetchMock } = open('/calculate/runs', {
      '/api/runs': { status: 200, body: summaries },
      '/api/runs?author=u-chem': { status: 200, body: [summaries[1]] },
      '/api/runs?author=u-chem&calculator=headroom': { status: 200, body: [summaries[1]] },
      '/api/runs?author=u-chem&bath=bath-old&calculator=headroom': { status: 200, body: [] },
      '/api/runs?author=u-chem&bath=bath-old&calculator=headroom&from=2026-03-02': { status: 200, body: [] },
      '/api/baths?status=all': { status: 200, body: baths },
    });
    expect(await screen.findByText('2 runs')).toBeOnTheScreen();
    fireEvent.press(screen.getByRole('radio', { name: 'Mine' }));
    expect(await screen.findByText('1 run')).toBeOnTheScreen();
    fireEvent.press(screen.getByRole('radio', { name: 'Headroom' }));
    await waitFor(() => expect(gets(fetchMock)).toContain('/api/runs?author=u-chem&calculator=headroom'));
    fireEvent.press(await screen.findByRole('radio', { name: 'Old silver line (archived)' }));
    expect(await screen.findByText('No runs match')).toBeOnTheScreen();

    fireEvent.changeText(screen.getByLabelText('From'), '2026-3-2');
    expect(await screen.findByText('Write the date as YYYY-MM-DD, for example 2026-03-01.')).toBeOnTheScreen();
    expect(gets(fetchMock).some((p) => p.includes('from='))).toBe(false);
    fireEvent.changeText(screen.getByLabelText('From'), '2026-03-02');
    await waitFor(() => expect(gets(fetchMock)).toContain('/api/runs?author=u-chem&bath=bath-old&calculator=headroom&from=2026-03-02'));
    expect(screen.queryByText(/Write the date as/)).toBeNull();

    // One in the filters, one in the "no match" box.
    expect(screen.getAllByRole('button', { name: 'Clear filters' })).toHaveLength(2);
    fireEvent.press(screen.getAllByRole('button', { name: 'Clear filters' })[1]!);
    expect(await screen.findByText('2 runs')).toBeOnTheScreen();
    expect(screen.getByRole('radio', { name: 'Everyone' })).toBeChecked();
  });

  it('folds the filters away on a phone', async () => {
    open('/calculate/runs', { '/api/runs': { status: 200, body: summaries }, '/api/baths?status=all': { status: 200, body: baths } });
    expect(await screen.findByText('2 runs')).toBeOnTheScreen();
    expect(screen.queryByRole('radio', { name: 'Headroom' })).toBeNull();
    fireEvent.press(screen.getByRole('button', { name: 'Show filters' }));
    expect(screen.getByRole('radio', { name: 'Headroom' })).toBeOnTheScreen();
    expect(await screen.findByRole('radio', { name: 'Fixer tank 2' })).toBeOnTheScreen();
  });
});

describe('Saved run', () => {
  it('opens a run with its verdict, inputs, stored result, model notes and the versions it used', async () => {
    const { view } = open('/calculate/runs', { '/api/runs': { status: 200, body: summaries }, '/api/runs/run-2': { status: 200, body: run } });
    fireEvent.press(await screen.findByTestId('run-run-2'));
    expect(await screen.findByText(/Speciation · by Theo Bench · .* · engine 1\.2\.0/)).toBeOnTheScreen();
    expect(view.getPathname()).toBe('/calculate/runs/run-2');
    expect(screen.getByRole('link', { name: 'Bath Fixer tank 2' })).toBeOnTheScreen();
    expect(within(screen.getByTestId('run-verdict')).getByText('Silver is held mostly as Ag(S2O3)2-3 (> 99 %); no solid forms.')).toBeOnTheScreen();
    const inputs = within(screen.getByTestId('run-inputs'));
    expect(inputs.getByText(/Ligands: Cl-, NH3/)).toBeOnTheScreen();
    expect(inputs.getByText(/pH: 9\.5/)).toBeOnTheScreen();
    expect(inputs.getByText(/Drafts waiting for review were allowed/)).toBeOnTheScreen();
    expect(inputs.getByText('None beyond the system.')).toBeOnTheScreen();
    expect(screen.getByText('Silver is held mostly as Ag(NH3)2+ (53 %); AgCl(s) (47 % of the silver) is present as a solid.')).toBeOnTheScreen();
    const notes = within(screen.getByTestId('model-notes'));
    expect(notes.getByText(/Activity model: Davies .* at 25 °C/)).toBeOnTheScreen();
    expect(notes.getByText(/Ionic strength: 0\.00531 mol\/L/)).toBeOnTheScreen();
    expect(notes.getByText(/Solver: settled after 8 iterations/)).toBeOnTheScreen();
    expect(notes.getByText('Uses 1 draft not yet reviewed.')).toBeOnTheScreen();
    const replaced = within(screen.getByTestId('constant-31'));
    expect(replaced.getByText(/v1 · log β 7\.23/)).toBeOnTheScreen();
    expect(replaced.getByText('v1 (log β 7.23) — since replaced by v2 (log β 7.40)')).toBeOnTheScreen();
    expect(replaced.getByText('Status now: retired')).toBeOnTheScreen();
    expect(replaced.getByRole('link', { name: 'Version 1 of Ag+ + 2 NH3 = Ag(NH3)2+ and its history' })).toBeOnTheScreen();
    const kept = within(screen.getByTestId('constant-40'));
    expect(kept.getByText(/v3 · log Ksp -9\.75/)).toBeOnTheScreen();
    expect(kept.queryByText(/since replaced/)).toBeNull();
  });

  it("puts the calculator's settings in words", async () => {
    open('/calculate/runs/run-1', { '/api/runs/run-1': { status: 200, body: headroomRun } });
    const settings = within(await screen.findByTestId('run-params'));
    expect(settings.getByText('Headroom settings')).toBeOnTheScreen();
    expect(settings.getByText(/Solid: AgCl\(s\)/)).toBeOnTheScreen();
    expect(settings.getByText(/Metal counted: the first metal in the solid/)).toBeOnTheScreen();
    // Saved before the headroom calculator kept its output: the bath's equilibrium stands in.
    expect(screen.getByTestId('no-output')).toHaveTextContent(/headroom calculator kept its own result/);
    expect(screen.getByTestId('speciation-result')).toBeOnTheScreen();
  });

  it('says plainly when a run does not exist, without a retry', async () => {
    open('/calculate/runs/nope', { '/api/runs/nope': { status: 404, body: errorBody('not_found', 'No saved run with that id.') } });
    expect(await screen.findByText('No saved run with that id.')).toBeOnTheScreen();
    expect(screen.queryByRole('button', { name: 'Retry' })).toBeNull();
  });

  it('puts the inputs beside the result tables on a wide screen', async () => {
    makeWide();
    open('/calculate/runs/run-2', { '/api/runs/run-2': { status: 200, body: run } });
    expect(await screen.findByText('Saturation index')).toBeOnTheScreen();
    expect(within(screen.getByTestId('solids-AgCl(s)')).getByText('0.00469')).toBeOnTheScreen();
  });

  it('shares its link, saying only the team can open it', async () => {
    const share = jest.spyOn(Share, 'share').mockResolvedValue({ action: Share.sharedAction });
    open('/calculate/runs/run-2', { '/api/runs/run-2': { status: 200, body: run } });
    fireEvent.press(await screen.findByRole('button', { name: 'Copy share link' }));
    const message = within(await screen.findByTestId('share-message'));
    expect(message.getByText('Link shared.')).toBeOnTheScreen();
    expect(message.getByText(/\/calculate\/runs\/run-2$/)).toBeOnTheScreen();
    expect(share).toHaveBeenCalledWith(expect.objectContaining({ message: expect.stringMatching(/\/calculate\/runs\/run-2$/) }));
    expect(screen.getByText('Only people on the team can open a share link: it asks them to sign in first.')).toBeOnTheScreen();
  });

  it('copies the link on the web, and shows it when the browser refuses the clipboard', async () => {
    const writeText = jest.fn().mockResolvedValueOnce(undefined).mockRejectedValueOnce(new Error('denied'));
    const before = Object.getOwnPropertyDescriptor(globalThis, 'navigator');
    Object.defineProperty(globalThis, 'navigator', { value: { ...globalThis.navigator, clipboard: { writeText } }, configurable: true });
    open('/calculate/runs/run-2', { '/api/runs/run-2': { status: 200, body: run } });
    const button = await screen.findByRole('button', { name: 'Copy share link' });
    jest.replaceProperty(Platform, 'OS', 'web');
    await act(async () => fireEvent.press(button));
    expect(writeText).toHaveBeenCalledWith(expect.stringMatching(/\/calculate\/runs\/run-2$/));
    expect(await screen.findByText('Link copied.')).toBeOnTheScreen();
    await act(async () => fireEvent.press(button));
    expect(await screen.findByText('Copy this link:')).toBeOnTheScreen();
    if (before) Object.defineProperty(globalThis, 'navigator', before);
    else delete (globalThis as { navigator?: unknown }).navigator;
  });

  it('opens the print view', async () => {
    const { view } = open('/calculate/runs/run-2', { '/api/runs/run-2': { status: 200, body: run } });
    fireEvent.press(await screen.findByRole('button', { name: 'Print' }));
    await waitFor(() => expect(view.getPathname()).toBe('/print/run/run-2'));
  });

  it("offers Delete only to the run's author or an admin", async () => {
    open('/calculate/runs/run-2', { '/api/runs/run-2': { status: 200, body: run } });
    expect(await screen.findByRole('button', { name: 'Copy share link' })).toBeOnTheScreen();
    expect(screen.queryByRole('button', { name: /^Delete/ })).toBeNull();
  });

  it('deletes its own run after asking, and goes back to the list', async () => {
    let deleted = false;
    const { fetchMock, view } = open('/calculate/runs/run-1', {
      '/api/runs/run-1': { status: 200, body: headroomRun },
      'DELETE /api/runs/run-1': () => {
        deleted = true;
        return { status: 204 };
      },
      '/api/runs': () => ({ status: 200, body: deleted ? [summaries[0]] : summaries }),
    });
    fireEvent.press(await screen.findByRole('button', { name: 'Delete AgCl headroom' }));
    expect(screen.getByText('Delete "AgCl headroom"? It leaves the saved runs for everyone on the team.')).toBeOnTheScreen();
    fireEvent.press(screen.getByRole('button', { name: 'Delete the run' }));
    await waitFor(() => expect(view.getPathname()).toBe('/calculate/runs'));
    expect(sentBodies(fetchMock, 'DELETE', '/api/runs/run-1')).toHaveLength(1);
    expect(await screen.findByText('1 run')).toBeOnTheScreen();
    expect(screen.queryByTestId('run-run-1')).toBeNull();
  });

  it("shows the server's words when it refuses a delete", async () => {
    open('/calculate/runs/run-2', {
      '/api/me': { status: 200, body: admin },
      '/api/runs/run-2': { status: 200, body: run },
      'DELETE /api/runs/run-2': { status: 403, body: errorBody('forbidden', 'Only the author of a run, or an admin, can delete it.') },
    });
    fireEvent.press(await screen.findByRole('button', { name: 'Delete Fixer tank 2, after top-up' }));
    fireEvent.press(screen.getByRole('button', { name: 'Delete the run' }));
    expect(await screen.findByText('Only the author of a run, or an admin, can delete it.')).toBeOnTheScreen();
    expect(screen.getByRole('button', { name: 'Delete Fixer tank 2, after top-up' })).toBeOnTheScreen();
  });
});

describe('A run and the safety desk', () => {
  const hazard = {
    rule: 'cyanide_low_ph',
    severity: 'danger',
    flag: true,
    title: 'Cyanide below pH 11: hydrogen cyanide can escape',
    text: 'Follow the safety data sheet (SDS), local codes and licensed practice; this caution does not replace them.',
    evidence: [{ label: 'pH', value: 10 }],
    ghs: [{ code: 'H330', text: 'Fatal if inhaled' }],
    pictograms: ['GHS06'],
    reagents: ['hydrogen cyanide (HCN)'],
    source: 'common practice',
  };
  const review = (status: string, extra: Record<string, unknown> = {}) => ({
    id: 'rev-1',
    subject: { kind: 'run', id: 'run-1', title: 'AgCl headroom', calculator: 'headroom' },
    status,
    flags: ['cyanide_low_ph'],
    submittedBy: cora,
    submittedAt: '2026-03-01T15:30:00.000Z',
    decidedBy: status === 'pending' ? null : { id: 'u-safe', name: 'Sam Reyes' },
    decidedAt: status === 'pending' ? null : '2026-03-02T09:00:00.000Z',
    conditions: null,
    note: null,
    ...extra,
  });

  it('a flagged run waits for the desk and cannot be released; its list row carries the chips', async () => {
    const held = { ...headroomRun, hazards: [hazard], review: { id: 'rev-1', status: 'pending' }, safety: { hazards: [hazard], flagged: true, review: review('pending'), released: null } };
    open('/calculate/runs/run-1', { '/api/runs/run-1': { status: 200, body: held } });
    expect(await screen.findByTestId('run-review-status')).toHaveTextContent('Waiting for the safety desk');
    expect(screen.getByTestId('release-held')).toBeOnTheScreen();
    expect(screen.getByTestId('release-run')).toBeDisabled();
    expect(screen.getByTestId('hazard-banner')).toBeOnTheScreen();

    open('/calculate/runs', { '/api/runs': { status: 200, body: [{ ...summaries[1], hazards: [{ rule: 'cyanide_low_ph', severity: 'danger', flag: true, title: hazard.title }], review: { id: 'rev-1', status: 'pending' } }] } });
    const row = within(await screen.findByTestId('run-run-1'));
    expect(row.getByLabelText('Danger: Low pH cyanide')).toBeOnTheScreen();
    expect(row.getByText('Desk: waiting')).toBeOnTheScreen();
  });

  it('once signed off, the author sees the conditions and releases it', async () => {
    let released = false;
    const signed = review('signed_off', { conditions: 'HCN monitor in the room.' });
    const state = () => ({ hazards: [hazard], flagged: true, review: signed, released: released ? { by: cora, at: '2026-03-02T10:00:00.000Z', note: '' } : null });
    const { fetchMock } = open('/calculate/runs/run-1', {
      '/api/runs/run-1': () => ({ status: 200, body: { ...headroomRun, released, safety: state() } }),
      'POST /api/runs/run-1/release': () => {
        released = true;
        return { status: 200, body: state() };
      },
    });
    expect(await screen.findByTestId('run-review-conditions')).toHaveTextContent('Conditions: HCN monitor in the room.');
    fireEvent.press(screen.getByTestId('release-run'));
    expect(await screen.findByTestId('run-released')).toHaveTextContent(/Released by Cora Quill/);
    expect(sentBodies(fetchMock, 'POST', '/api/runs/run-1/release')).toEqual([{ note: '' }]);
  });
});
