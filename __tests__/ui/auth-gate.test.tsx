import { fireEvent, renderRouter, screen, waitFor } from 'expo-router/testing-library';

import { chemist, errorBody, mockApi } from './helpers';

const unauthenticated = { status: 401, body: errorBody('unauthenticated', 'Sign in first.') };

describe('auth gate', () => {
  it('shows a quiet loading state and no tabs while it asks who is signed in', async () => {
    mockApi({ '/api/me': 'pending' });
    renderRouter('./app', { initialUrl: '/baths' });
    expect(await screen.findByText('Checking who is signed in…')).toBeOnTheScreen();
    expect(screen.queryByRole('tab')).toBeNull();
    expect(screen.queryByText('No baths recorded yet')).toBeNull();
  });

  it('sends a signed-out visitor to sign-in, keeping where they were going', async () => {
    mockApi({ '/api/me': unauthenticated });
    const view = renderRouter('./app', { initialUrl: '/library' });
    expect(await screen.findByRole('header', { name: 'Sign in' })).toBeOnTheScreen();
    expect(view.getPathname()).toBe('/sign-in');
    expect(view.getSearchParams()).toEqual({ next: '/library' });
    expect(screen.queryByRole('tab')).toBeNull();
  });

  it('goes on to the kept destination after signing in', async () => {
    let signedIn = false;
    const fetchMock = mockApi({
      '/api/me': () => (signedIn ? { status: 200, body: chemist } : unauthenticated),
      'POST /api/auth/sign-in': () => {
        signedIn = true;
        return { status: 200, body: chemist };
      },
    });
    const view = renderRouter('./app', { initialUrl: '/safety' });
    await screen.findByRole('header', { name: 'Sign in' });
    fireEvent.changeText(screen.getByLabelText('E-mail'), 'Cora@Shop.test ');
    fireEvent.changeText(screen.getByLabelText('Password'), 'a-good-password');
    fireEvent.press(screen.getByRole('button', { name: 'Sign in' }));
    expect(await screen.findByText('Nothing on the desk')).toBeOnTheScreen();
    expect(view.getPathname()).toBe('/safety');
    expect(screen.getAllByRole('tab')).toHaveLength(5);
    const call = fetchMock.mock.calls.find(([p]) => p === '/api/auth/sign-in');
    expect(call?.[1]).toEqual(
      expect.objectContaining({ method: 'POST', credentials: 'same-origin', headers: expect.objectContaining({ 'Content-Type': 'application/json' }) }),
    );
    expect(JSON.parse(call?.[1].body as string)).toEqual({ email: 'cora@shop.test', password: 'a-good-password' });
  });

  it('says the server cannot be reached (no redirect) and recovers on retry', async () => {
    const fetchMock = mockApi({ '/api/me': 'network' });
    const view = renderRouter('./app', { initialUrl: '/baths' });
    expect(await screen.findByText('Cannot reach the server')).toBeOnTheScreen();
    expect(screen.getByText('Cannot reach the Ligandry server. Check that it is running.')).toBeOnTheScreen();
    expect(view.getPathname()).toBe('/baths');
    expect(screen.queryByRole('tab')).toBeNull();

    mockApi();
    fireEvent.press(screen.getByRole('button', { name: 'Retry' }));
    expect(await screen.findByText('No baths recorded yet')).toBeOnTheScreen();
    expect(fetchMock).toHaveBeenCalled();
  });

  it('shows the server’s words when /api/me fails with a server error', async () => {
    mockApi({ '/api/me': { status: 503, body: errorBody('db_unavailable', 'The database is not answering.') } });
    renderRouter('./app', { initialUrl: '/baths' });
    expect(await screen.findByText('The server had a problem')).toBeOnTheScreen();
    expect(screen.getByText('The database is not answering.')).toBeOnTheScreen();
  });

  it('returns to sign-in when a later request finds the session gone', async () => {
    let me: unknown = { status: 200, body: { ...chemist, roles: ['admin'] } };
    mockApi({
      '/api/me': () => me as never,
      '/api/team/people': () => {
        me = unauthenticated;
        return unauthenticated;
      },
      '/api/team/invitations': { status: 200, body: [] },
    });
    const view = renderRouter('./app', { initialUrl: '/account/team' });
    await waitFor(() => expect(view.getPathname()).toBe('/sign-in'));
    expect(view.getSearchParams()).toEqual({ next: '/account/team' });
  });
});
