import { fireEvent, renderRouter, screen, waitFor, within } from 'expo-router/testing-library';

import { admin, chemist, errorBody, healthyReply, mockApi, sentBodies } from './helpers';

describe('Account screen: this installation', () => {
  it('shows the app version', async () => {
    mockApi();
    renderRouter('./app', { initialUrl: '/account' });
    expect(await screen.findByText('This installation')).toBeOnTheScreen();
    expect(screen.getByText('0.1.0')).toBeOnTheScreen();
  });

  it('shows a loading state while the health check is pending', async () => {
    mockApi({ '/api/health': 'pending' });
    renderRouter('./app', { initialUrl: '/account' });
    expect(await screen.findByText('Checking server…')).toBeOnTheScreen();
  });

  it('shows server, database and version once the health check answers', async () => {
    const fetchMock = mockApi();
    renderRouter('./app', { initialUrl: '/account' });
    expect(await screen.findByText('9.9.9-test')).toBeOnTheScreen();
    expect(screen.getByText('Server')).toBeOnTheScreen();
    expect(screen.getByText('Database')).toBeOnTheScreen();
    expect(screen.getAllByText('Up')).toHaveLength(2);
    expect(fetchMock).toHaveBeenCalledWith('/api/health', expect.objectContaining({ credentials: 'same-origin' }));
  });

  it('shows a degraded server with its database down', async () => {
    // The server answers 503 with its report when its database is down.
    mockApi({ '/api/health': { status: 503, body: { status: 'degraded', db: 'down', version: '2.0.0' } } });
    renderRouter('./app', { initialUrl: '/account' });
    expect(await screen.findByText('Up, degraded')).toBeOnTheScreen();
    expect(screen.getByText('Down')).toBeOnTheScreen();
  });

  it('shows an error with a retry that recovers once the server answers', async () => {
    mockApi({ '/api/health': 'network' });
    renderRouter('./app', { initialUrl: '/account' });
    expect(
      await screen.findByText('Server not reachable: Cannot reach the Ligandry server. Check that it is running.'),
    ).toBeOnTheScreen();

    mockApi({ '/api/health': { status: 200, body: healthyReply } });
    fireEvent.press(within(screen.getByTestId('installation-card')).getByRole('button', { name: 'Retry' }));
    expect(await screen.findByText('9.9.9-test')).toBeOnTheScreen();
    expect(screen.queryByText(/Server not reachable/)).toBeNull();
  });

  it('shows the server’s own words when it answers with an error', async () => {
    mockApi({ '/api/health': { status: 404, body: 'Not Found' } });
    renderRouter('./app', { initialUrl: '/account' });
    expect(await screen.findByText('Server check failed: The server answered 404')).toBeOnTheScreen();
  });
});

describe('Account screen: you', () => {
  it('shows e-mail, name and roles, and no admin links for a non-admin', async () => {
    mockApi();
    renderRouter('./app', { initialUrl: '/account' });
    expect(await screen.findByText('cora@shop.test')).toBeOnTheScreen();
    expect(screen.getByLabelText('Name')).toHaveProp('value', 'Cora Quill');
    expect(screen.getByText('Chemist')).toBeOnTheScreen();
    expect(screen.queryByText('Administration')).toBeNull();
  });

  it('renames you with PATCH /api/me and shows field errors from the schema', async () => {
    const fetchMock = mockApi({ 'PATCH /api/me': (body) => ({ status: 200, body: { ...chemist, ...(body as object) } }) });
    renderRouter('./app', { initialUrl: '/account' });
    const field = await screen.findByLabelText('Name');
    fireEvent.changeText(field, '   ');
    fireEvent.press(screen.getByRole('button', { name: 'Save name' }));
    expect(await screen.findByText('Enter a name')).toBeOnTheScreen();

    fireEvent.changeText(field, 'Cora Quill-Marsh');
    fireEvent(field, 'submitEditing');
    expect(await screen.findByText('Name saved')).toBeOnTheScreen();
    expect(sentBodies(fetchMock, 'PATCH', '/api/me')).toEqual([{ name: 'Cora Quill-Marsh' }]);
  });

  it('changes the password and says other sessions were signed out', async () => {
    const fetchMock = mockApi({ 'POST /api/me/password': { status: 200, body: chemist } });
    renderRouter('./app', { initialUrl: '/account' });
    const card = within(await screen.findByTestId('password-card'));
    fireEvent.changeText(card.getByLabelText('Current password'), 'old-password-1');
    fireEvent.changeText(card.getByLabelText('New password'), 'new-password-22');
    fireEvent.changeText(card.getByLabelText('New password again'), 'new-password-2');
    fireEvent.press(card.getByRole('button', { name: 'Change password' }));
    expect(await card.findByText('Does not match the password above')).toBeOnTheScreen();

    fireEvent.changeText(card.getByLabelText('New password again'), 'new-password-22');
    fireEvent.press(card.getByRole('button', { name: 'Change password' }));
    expect(await card.findByText('Password changed; other sessions were signed out')).toBeOnTheScreen();
    expect(sentBodies(fetchMock, 'POST', '/api/me/password')).toEqual([
      { currentPassword: 'old-password-1', newPassword: 'new-password-22' },
    ]);
    expect(card.getByLabelText('Current password')).toHaveProp('value', '');
  });

  it('shows a wrong current password beside its field', async () => {
    const details = [{ path: 'currentPassword', message: 'is not your current password' }];
    mockApi({ 'POST /api/me/password': { status: 400, body: errorBody('validation_failed', 'Check the fields', details) } });
    renderRouter('./app', { initialUrl: '/account' });
    const card = within(await screen.findByTestId('password-card'));
    fireEvent.changeText(card.getByLabelText('Current password'), 'old-password-1');
    fireEvent.changeText(card.getByLabelText('New password'), 'new-password-22');
    fireEvent.changeText(card.getByLabelText('New password again'), 'new-password-22');
    fireEvent.press(card.getByRole('button', { name: 'Change password' }));
    expect(await card.findByText('Is not your current password')).toBeOnTheScreen();
  });

  it('signs out and lands on sign-in', async () => {
    let signedIn = true;
    const fetchMock = mockApi({
      '/api/me': () => (signedIn ? { status: 200, body: chemist } : { status: 401, body: errorBody('unauthenticated', 'Sign in first.') }),
      'POST /api/auth/sign-out': () => {
        signedIn = false;
        return { status: 204 };
      },
    });
    const view = renderRouter('./app', { initialUrl: '/account' });
    fireEvent.press(await screen.findByRole('button', { name: 'Sign out' }));
    expect(await screen.findByRole('header', { name: 'Sign in' })).toBeOnTheScreen();
    expect(view.getPathname()).toBe('/sign-in');
    expect(sentBodies(fetchMock, 'POST', '/api/auth/sign-out')).toHaveLength(1);
    expect(screen.queryByRole('tab')).toBeNull();
  });

  it('asks before signing out everywhere, and can be cancelled', async () => {
    const fetchMock = mockApi({ 'POST /api/me/sign-out-everywhere': { status: 204 } });
    const view = renderRouter('./app', { initialUrl: '/account' });
    fireEvent.press(await screen.findByRole('button', { name: 'Sign out everywhere' }));
    expect(screen.getByText('Sign out on every device, this one included?')).toBeOnTheScreen();
    fireEvent.press(screen.getByRole('button', { name: 'Cancel' }));
    expect(screen.queryByText('Sign out on every device, this one included?')).toBeNull();
    expect(sentBodies(fetchMock, 'POST', '/api/me/sign-out-everywhere')).toHaveLength(0);

    fireEvent.press(screen.getByRole('button', { name: 'Sign out everywhere' }));
    fireEvent.press(screen.getByRole('button', { name: 'Yes, sign out everywhere' }));
    await waitFor(() => expect(view.getPathname()).toBe('/sign-in'));
    expect(sentBodies(fetchMock, 'POST', '/api/me/sign-out-everywhere')).toHaveLength(1);
  });

  it('keeps you here with the reason when signing out fails', async () => {
    mockApi({ 'POST /api/auth/sign-out': 'network' });
    const view = renderRouter('./app', { initialUrl: '/account' });
    fireEvent.press(await screen.findByRole('button', { name: 'Sign out' }));
    expect(await screen.findByText('Cannot reach the Ligandry server. Check that it is running.')).toBeOnTheScreen();
    expect(view.getPathname()).toBe('/account');
  });
});

describe('Account screen: admin links', () => {
  it.each([
    [true, ['Team', 'Activity', 'Outbox']],
    [false, ['Team', 'Activity']],
  ])('with outbox %s shows %j', async (outbox, links) => {
    mockApi({ '/api/me': { status: 200, body: admin }, '/api/auth/options': { status: 200, body: { outbox } } });
    renderRouter('./app', { initialUrl: '/account' });
    const card = within(await screen.findByTestId('admin-card'));
    await waitFor(() => expect(card.getAllByRole('link').map((l) => l.props.accessibilityLabel)).toEqual(links));
  });

  it('opens the team screen from its link', async () => {
    mockApi({
      '/api/me': { status: 200, body: admin },
      '/api/team/people': 'pending',
      '/api/team/invitations': 'pending',
    });
    const view = renderRouter('./app', { initialUrl: '/account' });
    fireEvent.press(await screen.findByRole('link', { name: 'Team' }));
    expect(await screen.findByText('Loading the team…')).toBeOnTheScreen();
    expect(view.getPathname()).toBe('/account/team');
  });
});
