import { Dimensions, Linking } from 'react-native';
import { fireEvent, renderRouter, screen, within } from 'expo-router/testing-library';

import { splitLinks } from '@/components/screens/outbox/message-text';

import { admin, mockApi, type Routes } from './helpers';

const phone = Dimensions.get('window');
const withOutbox: Routes = {
  '/api/me': { status: 200, body: admin },
  '/api/auth/options': { status: 200, body: { outbox: true } },
};
const link = 'http://127.0.0.1:8080/welcome/abcdefghijklmnopqrstuvwxyz012345';
const mail = [
  {
    id: 2,
    receivedAt: '2026-03-02T08:30:00.000Z',
    from: 'Ligandry <no-reply@shop.test>',
    to: ['new@shop.test'],
    subject: 'You are invited to Ligandry',
    text: `Ada Ferro invited you.\nOpen ${link}.\nThe link works for 7 days.`,
  },
  {
    id: 1,
    receivedAt: '2026-03-01T08:30:00.000Z',
    from: 'Ligandry <no-reply@shop.test>',
    to: ['cora@shop.test'],
    subject: 'Choose a new password',
    text: 'No links here.',
  },
];

afterEach(() => {
  Dimensions.set({ window: phone, screen: phone });
});

describe('splitLinks', () => {
  it('keeps trailing punctuation out of the link', () => {
    expect(splitLinks(`Open ${link}. Bye`)).toEqual([
      { kind: 'text', text: 'Open ' },
      { kind: 'link', text: link },
      { kind: 'text', text: '. Bye' },
    ]);
  });
});

describe('Outbox screen', () => {
  it('tells a non-admin that it needs the admin role', async () => {
    mockApi({ '/api/auth/options': { status: 200, body: { outbox: true } } });
    renderRouter('./app', { initialUrl: '/account/outbox' });
    expect(await screen.findByText('Needs the admin role')).toBeOnTheScreen();
  });

  it('says there is no outbox when the server sends real mail', async () => {
    const fetchMock = mockApi({ '/api/me': { status: 200, body: admin } });
    renderRouter('./app', { initialUrl: '/account/outbox' });
    expect(await screen.findByText('No outbox here')).toBeOnTheScreen();
    expect(fetchMock.mock.calls.some(([p]) => p === '/api/dev/outbox')).toBe(false);
  });

  it('shows loading, then the empty state', async () => {
    mockApi({ ...withOutbox, '/api/dev/outbox': 'pending' });
    renderRouter('./app', { initialUrl: '/account/outbox' });
    expect(await screen.findByText('Loading mail…')).toBeOnTheScreen();

    mockApi({ ...withOutbox, '/api/dev/outbox': { status: 200, body: [] } });
    renderRouter('./app', { initialUrl: '/account/outbox' });
    expect(await screen.findByText('No mail sent yet')).toBeOnTheScreen();
  });

  it('lists mail newest first on a phone and opens one with a pressable link', async () => {
    const open = jest.spyOn(Linking, 'openURL').mockResolvedValue(true);
    mockApi({ ...withOutbox, '/api/dev/outbox': { status: 200, body: mail } });
    renderRouter('./app', { initialUrl: '/account/outbox' });
    const items = await screen.findAllByRole('button', { name: /, to / });
    expect(items.map((i) => i.props.accessibilityLabel)).toEqual([
      'You are invited to Ligandry, to new@shop.test',
      'Choose a new password, to cora@shop.test',
    ]);
    fireEvent.press(items[0]!);
    const message = within(await screen.findByTestId('outbox-message'));
    expect(message.getByText('From Ligandry <no-reply@shop.test>')).toBeOnTheScreen();
    fireEvent.press(message.getByRole('link', { name: link }));
    expect(open).toHaveBeenCalledWith(link);
    fireEvent.press(screen.getByRole('button', { name: 'Back to all mail' }));
    expect(await screen.findAllByRole('button', { name: /, to / })).toHaveLength(2);
    open.mockRestore();
  });

  it('shows the list beside the message on a wide screen', async () => {
    Dimensions.set({ window: { width: 1280, height: 800, scale: 1, fontScale: 1 }, screen: { width: 1280, height: 800, scale: 1, fontScale: 1 } });
    mockApi({ ...withOutbox, '/api/dev/outbox': { status: 200, body: mail } });
    renderRouter('./app', { initialUrl: '/account/outbox' });
    expect(await screen.findByText('Choose a message to read it.')).toBeOnTheScreen();
    fireEvent.press(screen.getByRole('button', { name: 'Choose a new password, to cora@shop.test' }));
    expect(await screen.findByText('No links here.')).toBeOnTheScreen();
    expect(screen.getAllByRole('button', { name: /, to / })).toHaveLength(2);
  });
});
