import { fireEvent, renderRouter, screen } from 'expo-router/testing-library';

import { chemist, errorBody, mockApi, sentBodies, type Reply } from './helpers';

const signedOut = { '/api/me': { status: 401, body: errorBody('unauthenticated', 'Sign in first.') } };

function fill(email: string, password: string) {
  fireEvent.changeText(screen.getByLabelText('E-mail'), email);
  fireEvent.changeText(screen.getByLabelText('Password'), password);
}

describe('sign-in screen', () => {
  it('checks the fields before sending anything', async () => {
    const fetchMock = mockApi(signedOut);
    renderRouter('./app', { initialUrl: '/sign-in' });
    await screen.findByRole('header', { name: 'Sign in' });
    fill('not-an-address', '');
    fireEvent.press(screen.getByRole('button', { name: 'Sign in' }));
    expect(await screen.findByText('Is not an e-mail address (for example name@example.com)')).toBeOnTheScreen();
    expect(screen.getByText('Enter your password')).toBeOnTheScreen();
    expect(sentBodies(fetchMock, 'POST', '/api/auth/sign-in')).toHaveLength(0);
  });

  it.each<[string, Reply, string]>([
    ['a wrong password', { status: 401, body: errorBody('unauthenticated', 'E-mail or password is wrong.') }, 'E-mail or password is wrong.'],
    ['too many tries', { status: 429, body: errorBody('rate_limited', 'Too many attempts; try again in 15 minutes.') }, 'Too many attempts; try again in 15 minutes.'],
    ['no server', 'network', 'Cannot reach the Ligandry server. Check that it is running.'],
  ])('shows %s as a form error', async (_name, reply, words) => {
    mockApi({ ...signedOut, 'POST /api/auth/sign-in': reply });
    const view = renderRouter('./app', { initialUrl: '/sign-in' });
    await screen.findByRole('header', { name: 'Sign in' });
    fill('cora@shop.test', 'wrong-password');
    fireEvent.press(screen.getByRole('button', { name: 'Sign in' }));
    expect(await screen.findByText(words)).toBeOnTheScreen();
    expect(screen.getByTestId('form-error')).toBeOnTheScreen();
    expect(view.getPathname()).toBe('/sign-in');
  });

  it('puts server validation details beside their fields', async () => {
    const details = [{ path: 'email', message: 'is too long for an e-mail address' }];
    mockApi({ ...signedOut, 'POST /api/auth/sign-in': { status: 400, body: errorBody('validation_failed', 'Check the fields', details) } });
    renderRouter('./app', { initialUrl: '/sign-in' });
    await screen.findByRole('header', { name: 'Sign in' });
    fill('cora@shop.test', 'x');
    fireEvent.press(screen.getByRole('button', { name: 'Sign in' }));
    expect(await screen.findByText('Is too long for an e-mail address')).toBeOnTheScreen();
    expect(screen.queryByTestId('form-error')).toBeNull();
  });

  it('submits with Enter from the password field and opens the app', async () => {
    let signedIn = false;
    mockApi({
      '/api/me': () => (signedIn ? { status: 200, body: chemist } : signedOut['/api/me']),
      'POST /api/auth/sign-in': () => {
        signedIn = true;
        return { status: 200, body: chemist };
      },
    });
    const view = renderRouter('./app', { initialUrl: '/sign-in?next=//evil.example' });
    await screen.findByRole('header', { name: 'Sign in' });
    fill('cora@shop.test', 'a-good-password');
    fireEvent(screen.getByLabelText('Password'), 'submitEditing');
    expect(await screen.findByText('No baths recorded yet')).toBeOnTheScreen();
    expect(view.getPathname()).toBe('/baths');
  });

  it('links to the forgotten-password screen', async () => {
    mockApi(signedOut);
    const view = renderRouter('./app', { initialUrl: '/sign-in' });
    fireEvent.press(await screen.findByRole('link', { name: 'Forgot your password?' }));
    expect(await screen.findByRole('header', { name: 'Forgot your password?' })).toBeOnTheScreen();
    expect(view.getPathname()).toBe('/forgot-password');
  });
});

describe('forgot-password screen', () => {
  it('shows the server’s neutral answer after sending', async () => {
    const message = 'If that address belongs to someone here, a link is on its way.';
    const fetchMock = mockApi({ 'POST /api/auth/password-resets': { status: 202, body: { message } } });
    renderRouter('./app', { initialUrl: '/forgot-password' });
    fireEvent.changeText(await screen.findByLabelText('E-mail'), 'nobody@shop.test');
    fireEvent.press(screen.getByRole('button', { name: 'Send the link' }));
    expect(await screen.findByText(message)).toBeOnTheScreen();
    expect(sentBodies(fetchMock, 'POST', '/api/auth/password-resets')).toEqual([{ email: 'nobody@shop.test' }]);
  });

  it('shows a field error for an empty address and a form error when rate limited', async () => {
    mockApi({ 'POST /api/auth/password-resets': { status: 429, body: errorBody('rate_limited', 'Too many requests; try again in 5 minutes.') } });
    renderRouter('./app', { initialUrl: '/forgot-password' });
    await screen.findByLabelText('E-mail');
    fireEvent.press(screen.getByRole('button', { name: 'Send the link' }));
    expect(await screen.findByText('Is not an e-mail address (for example name@example.com)')).toBeOnTheScreen();
    fireEvent.changeText(screen.getByLabelText('E-mail'), 'cora@shop.test');
    fireEvent.press(screen.getByRole('button', { name: 'Send the link' }));
    expect(await screen.findByText('Too many requests; try again in 5 minutes.')).toBeOnTheScreen();
  });
});
