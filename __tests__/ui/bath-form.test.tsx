import { fireEvent, renderRouter, screen, waitFor, within } from 'expo-router/testing-library';

import { keys } from '@/lib/api/keys';
import { type User } from '@/shared/auth';
import { type Bath } from '@/shared/baths';

import { errorBody, mockApi, sentBodies, type Routes } from './helpers';

const technician: User = { id: 'u-tech', email: 'tom@shop.test', name: 'Tom Tank', roles: ['technician'] };
const safety: User = { id: 'u-safe', email: 'sam@shop.test', name: 'Sam Guard', roles: ['safety'] };

function bath(extra: Partial<Bath> = {}): Bath {
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
    targets: { metal: { min: 25, max: 40 }, freeLigand: { min: 90, max: 130 }, pH: { min: null, max: null } },
    site: 'Plating room',
    owner: { id: 'u-chem', name: 'Cora Quill' },
    notes: '',
    createdBy: { id: 'u-chem', name: 'Cora Quill' },
    createdAt: '2026-02-01T10:00:00.000Z',
    updatedAt: '2026-02-01T10:00:00.000Z',
    archivedAt: null,
    ...extra,
  };
}

function type(label: string, text: string) {
  fireEvent.changeText(screen.getByLabelText(label), text);
}

/** The radio named `name` inside the radio group labelled `group`. */
function radio(group: string, name: string) {
  return within(screen.getByLabelText(group)).getByRole('radio', { name });
}

function open(url: string, routes: Routes = {}) {
  const fetchMock = mockApi(routes);
  const view = renderRouter('./app', { initialUrl: url });
  return { fetchMock, view };
}

describe('New bath', () => {
  it('explains to someone without the chemist or technician role that they cannot add a bath', async () => {
    open('/baths/new', { '/api/me': { status: 200, body: safety } });
    expect(await screen.findByText('Needs the chemist or technician role')).toBeOnTheScreen();
    expect(screen.queryByLabelText('Name')).toBeNull();
  });

  it('lets a technician fill it in', async () => {
    open('/baths/new', { '/api/me': { status: 200, body: technician } });
    expect(await screen.findByLabelText('Name')).toBeOnTheScreen();
  });

  it('labels its parts as headings and marks what is missing before sending anything', async () => {
    const { fetchMock } = open('/baths/new');
    fireEvent.press(await screen.findByRole('button', { name: 'Save bath' }));
    for (const heading of ['The bath', 'Make-up', 'Units', 'Target ranges', 'Site and notes']) {
      expect(screen.getByRole('header', { name: heading })).toBeOnTheScreen();
    }
    const form = within(screen.getByTestId('bath-form'));
    expect(await form.findByText('Enter a name')).toBeOnTheScreen();
    expect(form.getByText('Choose the process')).toBeOnTheScreen();
    expect(form.getByText('Enter the tank volume as a number')).toBeOnTheScreen();
    expect(form.getByText('Check name, process, tank volume.')).toBeOnTheScreen();
    expect(sentBodies(fetchMock, 'POST', keys.bathsCreate)).toHaveLength(0);
  });

  it('sets the metal, ligand and units a process implies', async () => {
    open('/baths/new');
    fireEvent.press(await screen.findByRole('radio', { name: 'Cyanide copper' }));
    expect(screen.getByText('Copper(I) (Cu+) held by cyanide (CN-)')).toBeOnTheScreen();
    expect(radio('Free and total ligand stated as', 'NaCN')).toBeChecked();
    expect(radio('Metal shown in', 'g/L')).toBeChecked();
    expect(screen.getByLabelText('Cu metal, low (g/L)')).toBeOnTheScreen();
    expect(screen.getByLabelText('Free NaCN, high (g/L)')).toBeOnTheScreen();

    fireEvent.press(screen.getByRole('radio', { name: 'Ammoniacal silver solution' }));
    expect(screen.getByText('Silver (Ag+) held by ammonia (NH3)')).toBeOnTheScreen();
    expect(screen.getByText('NH3')).toBeOnTheScreen();
    expect(screen.getByLabelText('Free NH3, low (g/L)')).toBeOnTheScreen();
  });

  it('converts typed ranges when the units change', async () => {
    open('/baths/new');
    fireEvent.press(await screen.findByRole('radio', { name: 'Cyanide silver plate' }));
    // 1 troy oz/gal = 31.1034768 g / 3.785411784 L = 8.2167 g/L.
    type('Ag metal, low (g/L)', '16,4335');
    type('Ag metal, high (g/L)', '24.65');
    fireEvent.press(radio('Metal shown in', 'troy oz/gal'));
    expect(screen.getByLabelText('Ag metal, low (troy oz/gal)')).toHaveProp('value', '2');
    expect(screen.getByLabelText('Ag metal, high (troy oz/gal)')).toHaveProp('value', '3');
    expect(screen.getByText('Target ranges converted to the new units.')).toBeOnTheScreen();

    // Free cyanide stated as KCN, then as NaCN: the same moles weigh less (49.007 / 65.116 g/mol).
    type('Free KCN, low (g/L)', '65.116');
    fireEvent.press(radio('Free and total ligand stated as', 'NaCN'));
    expect(screen.getByLabelText('Free NaCN, low (g/L)')).toHaveProp('value', '49.01');
  });

  it('sends the whole bath, reading decimal commas and leaving empty ends open, then opens it', async () => {
    const created = bath({ id: 'b-9' });
    const { fetchMock, view } = open('/baths/new', { [`POST ${keys.bathsCreate}`]: { status: 201, body: created } });
    await screen.findByLabelText('Name');
    type('Name', '  Silver line 9 ');
    fireEvent.press(screen.getByRole('radio', { name: 'Cyanide silver plate' }));
    type('Tank volume (L)', '31,7');
    fireEvent.press(radio('Volume unit', 'US gal'));
    expect(screen.getByLabelText('Tank volume (US gal)')).toBeOnTheScreen();
    type('Temperature (°C)', '24');
    fireEvent.press(screen.getByRole('button', { name: 'Add a make-up line' }));
    type('Salt, line 1', 'K[Ag(CN)2]');
    type('Amount, line 1', '5,5');
    fireEvent.press(radio('Unit, line 1', 'oz/gal'));
    fireEvent.press(screen.getByRole('button', { name: 'Add a make-up line' }));
    type('Salt, line 2', 'KCN');
    type('Amount, line 2', '12');
    type('Free KCN, low (g/L)', '90');
    type('pH, high', '12.5');
    type('Site', 'Plating room');
    fireEvent.press(screen.getByRole('button', { name: 'Save bath' }));

    await waitFor(() => expect(view.getPathname()).toBe('/baths/b-9'));
    expect(sentBodies(fetchMock, 'POST', keys.bathsCreate)).toEqual([
      {
        name: 'Silver line 9',
        process: 'cyanide_silver_plate',
        volume: 31.7,
        volumeUnit: 'gal',
        temperatureC: 24,
        makeUp: [
          { salt: 'K[Ag(CN)2]', amount: 5.5, unit: 'oz/gal' },
          { salt: 'KCN', amount: 12, unit: 'g/L' },
        ],
        metalUnit: 'g/L',
        ligandUnit: 'g/L',
        ligandAs: 'KCN',
        targets: { metal: { min: null, max: null }, freeLigand: { min: 90, max: null }, pH: { min: null, max: 12.5 } },
        site: 'Plating room',
        notes: '',
      },
    ]);
  });

  it('adds and removes make-up lines and says which line is wrong', async () => {
    open('/baths/new');
    fireEvent.press(await screen.findByRole('button', { name: 'Add a make-up line' }));
    fireEvent.press(screen.getByRole('button', { name: 'Add a make-up line' }));
    type('Salt, line 2', 'NaCN');
    type('Amount, line 2', 'lots');
    fireEvent.press(screen.getByRole('button', { name: 'Save bath' }));
    const line2 = within(screen.getByTestId('make-up-line-2'));
    expect(await line2.findByText('Enter a number')).toBeOnTheScreen();
    expect(within(screen.getByTestId('make-up-line-1')).getByText('Name the salt')).toBeOnTheScreen();
    expect(screen.getByText(/make-up line 1, make-up line 2/)).toBeOnTheScreen();

    fireEvent.press(screen.getByRole('button', { name: 'Remove make-up line 1' }));
    expect(screen.queryByTestId('make-up-line-2')).toBeNull();
    expect(screen.getByLabelText('Salt, line 1')).toHaveProp('value', 'NaCN');
    expect(screen.queryByText('Name the salt')).toBeNull();
  });

  it("shows the server's validation details beside their fields", async () => {
    open('/baths/new', {
      [`POST ${keys.bathsCreate}`]: {
        status: 400,
        body: errorBody('validation_failed', 'Some fields need attention.', [
          { path: 'targets.metal.max', message: 'must not be below the lower limit' },
          { path: 'makeUp.0.amount', message: 'must be at most 2000' },
          { path: 'ownerId', message: 'is not a person on the team' },
        ]),
      },
    });
    await screen.findByLabelText('Name');
    type('Name', 'Strike');
    fireEvent.press(screen.getByRole('radio', { name: 'Silver strike' }));
    type('Tank volume (L)', '40');
    fireEvent.press(screen.getByRole('button', { name: 'Add a make-up line' }));
    type('Salt, line 1', 'KCN');
    type('Amount, line 1', '1500');
    fireEvent.press(screen.getByRole('button', { name: 'Save bath' }));
    expect(await screen.findByText('Must not be below the lower limit')).toBeOnTheScreen();
    expect(within(screen.getByTestId('make-up-line-1')).getByText('Must be at most 2000')).toBeOnTheScreen();
    expect(screen.getByText('ownerId: is not a person on the team. Check metal range, make-up line 1.')).toBeOnTheScreen();
  });
});

describe('Edit a bath', () => {
  it('fills the form from the bath and sends the changes, then opens the bath', async () => {
    const saved = bath();
    const { fetchMock, view } = open('/baths/edit/b-1', {
      [keys.bath('b-1')]: { status: 200, body: saved },
      [`PATCH ${keys.bath('b-1')}`]: { status: 200, body: { ...saved, volume: 150 } },
    });
    expect(await screen.findByLabelText('Name')).toHaveProp('value', 'Silver line 2');
    expect(screen.getByRole('radio', { name: 'Cyanide silver plate' })).toBeChecked();
    expect(screen.getByLabelText('Tank volume (L)')).toHaveProp('value', '120');
    expect(screen.getByLabelText('Salt, line 1')).toHaveProp('value', 'KCN');
    expect(screen.getByLabelText('Ag metal, high (g/L)')).toHaveProp('value', '40');
    expect(screen.getByLabelText('pH, low')).toHaveProp('value', '');
    type('Tank volume (L)', '150');
    fireEvent.press(screen.getByRole('button', { name: 'Save changes' }));

    await waitFor(() => expect(view.getPathname()).toBe('/baths/b-1'));
    const [sent] = sentBodies(fetchMock, 'PATCH', keys.bath('b-1')) as Record<string, unknown>[];
    expect(sent).toMatchObject({
      name: 'Silver line 2',
      volume: 150,
      makeUp: [{ salt: 'KCN', amount: 100, unit: 'g/L' }],
      targets: { metal: { min: 25, max: 40 }, freeLigand: { min: 90, max: 130 }, pH: { min: null, max: null } },
    });
  });

  it('does not offer the form for an archived bath, which the server keeps as it was', async () => {
    open('/baths/edit/b-1', { [keys.bath('b-1')]: { status: 200, body: bath({ status: 'archived', archivedAt: '2026-02-10T10:00:00.000Z' }) } });
    expect(await screen.findByText('This bath is archived')).toBeOnTheScreen();
    expect(screen.queryByLabelText('Name')).toBeNull();
    expect(screen.getByRole('link', { name: 'Back to the bath' })).toBeOnTheScreen();
  });

  it('says when there is no such bath', async () => {
    open('/baths/edit/nope');
    expect(await screen.findByText('No such bath')).toBeOnTheScreen();
  });

  it('shows a failed load with retry', async () => {
    open('/baths/edit/b-1', { [keys.bath('b-1')]: { status: 500, body: errorBody('internal', 'The bath could not be read.') } });
    expect(await screen.findByText('The bath could not be read.')).toBeOnTheScreen();
    expect(screen.getByRole('button', { name: 'Retry' })).toBeOnTheScreen();
  });
});
