import { fireEvent, renderRouter, screen } from 'expo-router/testing-library';

import { chemist, errorBody, mockApi, sentBodies } from './helpers';

const TOKEN = 'abcdefghijklmnopqrstuvwxyz012345';
const resetPath = `/api/auth/password-resets/${TOKEN}`;
const invitePath = `/api/auth/invitations/${TOKEN}`;
const gone = { status: 410, body: errorBody('gone', 'This link was used or has expired.') };
const signedOut = { status: 401, body: errorBody('unauthenticated', 'Sign in first.') };

describe('new-password screen', () => {
  it('shows a loading state while the link is checked', async () => {
    mockApi({ [resetPath]: 'pending' });
    renderRouter('./app', { initialUrl: `/new-password/${TOKEN}` });
    expect(await screen.findByText('Checking the link…')).toBeOnTheScreen();
  });

  it('says a used or expired link no longer works and offers a new one', async () => {
    mockApi({ [resetPath]: gone });
    const view = renderRouter('./app', { initialUrl: `/new-password/${TOKEN}` });
    expect(await screen.findByText('This link no longer works')).toBeOnTheScreen();
    fireEvent.press(screen.getByRole('link', { name: 'Ask for a new link' }));
    expect(await screen.findByRole('header', { name: 'Forgot your password?' })).toBeOnTheScreen();
    expect(view.getPathname()).toBe('/forgot-password');
  });

  it('treats a malformed token as a dead link without asking the server', async () => {
    const fetchMock = mockApi();
    renderRouter('./app', { initialUrl: '/new-password/short' });
    expect(await screen.findByText('This link no longer works')).toBeOnTheScreen();
    expect(fetchMock.mock.calls.some(([p]) => String(p).includes('password-resets'))).toBe(false);
  });

  it('offers a retry when the server cannot be reached', async () => {
    mockApi({ [resetPath]: 'network' });
    renderRouter('./app', { initialUrl: `/new-password/${TOKEN}` });
    expect(await screen.findByText('Cannot reach the Ligandry server. Check that it is running.')).toBeOnTheScreen();
    expect(screen.getByRole('button', { name: 'Retry' })).toBeOnTheScreen();
  });

  it('checks length and the repeated password, then signs in and goes home', async () => {
    let signedIn = false;
    const fetchMock = mockApi({
      '/api/me': () => (signedIn ? { status: 200, body: chemist } : signedOut),
      [resetPath]: { status: 200, body: { email: 'cora@shop.test', expiresAt: '2026-05-01T10:00:00.000Z' } },
      [`POST ${resetPath}`]: () => {
        signedIn = true;
        return { status: 200, body: chemist };
      },
    });
    const view = renderRouter('./app', { initialUrl: `/new-password/${TOKEN}` });
    expect(await screen.findByText('cora@shop.test')).toBeOnTheScreen();
    fireEvent.changeText(screen.getByLabelText('New password'), 'short');
    fireEvent.changeText(screen.getByLabelText('New password again'), 'other');
    fireEvent.press(screen.getByRole('button', { name: 'Save and sign in' }));
    expect(await screen.findByText('Must be at least 10 characters')).toBeOnTheScreen();
    expect(screen.getByText('Does not match the password above')).toBeOnTheScreen();
    expect(sentBodies(fetchMock, 'POST', resetPath)).toHaveLength(0);

    fireEvent.changeText(screen.getByLabelText('New password'), 'long-enough-now');
    fireEvent.changeText(screen.getByLabelText('New password again'), 'long-enough-now');
    fireEvent.press(screen.getByRole('button', { name: 'Save and sign in' }));
    expect(await screen.findByText('No baths recorded yet')).toBeOnTheScreen();
    expect(view.getPathname()).toBe('/baths');
    expect(sentBodies(fetchMock, 'POST', resetPath)).toEqual([{ password: 'long-enough-now' }]);
  });
});

describe('welcome screen (invitation)', () => {
  const info = { email: 'new@shop.test', roles: ['technician', 'safety'], invitedBy: 'Ada Ferro', expiresAt: '2026-05-01T10:00:00.000Z' };

  it('shows who was invited, by whom, with which roles', async () => {
    mockApi({ [invitePath]: { status: 200, body: info } });
    renderRouter('./app', { initialUrl: `/welcome/${TOKEN}` });
    expect(await screen.findByText('new@shop.test')).toBeOnTheScreen();
    expect(screen.getByText('Ada Ferro invited you to join the team.')).toBeOnTheScreen();
    expect(screen.getByText('Technician')).toBeOnTheScreen();
    expect(screen.getByText('Safety officer')).toBeOnTheScreen();
  });

  it('tells the person to ask an admin when the invitation is used or expired', async () => {
    mockApi({ [invitePath]: gone });
    renderRouter('./app', { initialUrl: `/welcome/${TOKEN}` });
    expect(await screen.findByText('This invitation no longer works')).toBeOnTheScreen();
    // The server's own reason is shown.
    expect(screen.getByText('This link was used or has expired.')).toBeOnTheScreen();
  });

  it('falls back to general advice when the link cannot be read', async () => {
    mockApi({ [invitePath]: { status: 404, body: errorBody('not_found', 'No such invitation.') } });
    renderRouter('./app', { initialUrl: `/welcome/${TOKEN}` });
    expect(await screen.findByText('This invitation no longer works')).toBeOnTheScreen();
    expect(screen.getByText(/Ask an admin of your team to send you a new invitation/)).toBeOnTheScreen();
  });

  it('shows field errors, then joins and opens the app', async () => {
    let signedIn = false;
    const fetchMock = mockApi({
      '/api/me': () => (signedIn ? { status: 200, body: chemist } : signedOut),
      [invitePath]: { status: 200, body: info },
      [`POST ${invitePath}`]: () => {
        signedIn = true;
        return { status: 200, body: chemist };
      },
    });
    const view = renderRouter('./app', { initialUrl: `/welcome/${TOKEN}` });
    await screen.findByText('new@shop.test');
    fireEvent.press(screen.getByRole('button', { name: 'Join the team' }));
    expect(await screen.findByText('Enter a name')).toBeOnTheScreen();
    expect(screen.getByText('Must be at least 10 characters')).toBeOnTheScreen();

    fireEvent.changeText(screen.getByLabelText('Your name'), '  Nell Piper ');
    fireEvent.changeText(screen.getByLabelText('Password'), 'plating-2026-ok');
    fireEvent.changeText(screen.getByLabelText('Password again'), 'plating-2026-ok');
    fireEvent(screen.getByLabelText('Password again'), 'submitEditing');
    expect(await screen.findByText('No baths recorded yet')).toBeOnTheScreen();
    expect(view.getPathname()).toBe('/baths');
    expect(sentBodies(fetchMock, 'POST', invitePath)).toEqual([{ name: 'Nell Piper', password: 'plating-2026-ok' }]);
  });

  it('switches to the expired state when the invitation dies before it is accepted', async () => {
    mockApi({ [invitePath]: { status: 200, body: info }, [`POST ${invitePath}`]: gone });
    renderRouter('./app', { initialUrl: `/welcome/${TOKEN}` });
    await screen.findByText('new@shop.test');
    fireEvent.changeText(screen.getByLabelText('Your name'), 'Nell Piper');
    fireEvent.changeText(screen.getByLabelText('Password'), 'plating-2026-ok');
    fireEvent.changeText(screen.getByLabelText('Password again'), 'plating-2026-ok');
    fireEvent.press(screen.getByRole('button', { name: 'Join the team' }));
    expect(await screen.findByText('This invitation no longer works')).toBeOnTheScreen();
  });
});
