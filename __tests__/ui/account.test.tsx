import { fireEvent, renderRouter, screen } from 'expo-router/testing-library';

import { healthyReply, jsonResponse, mockFetch } from './helpers';

describe('Account screen', () => {
  it('says nobody is signed in and shows the app version', async () => {
    mockFetch().mockResolvedValue(jsonResponse(200, healthyReply));
    renderRouter('./app', { initialUrl: '/account' });
    expect(await screen.findByText('Not signed in')).toBeOnTheScreen();
    expect(screen.getByText('Team sign-in is not set up in this build.')).toBeOnTheScreen();
    expect(screen.getByText('This installation')).toBeOnTheScreen();
    expect(screen.getByText('0.1.0')).toBeOnTheScreen();
  });

  it('shows a loading state while the health check is pending', async () => {
    mockFetch().mockReturnValue(new Promise(() => undefined));
    renderRouter('./app', { initialUrl: '/account' });
    expect(await screen.findByText('Checking server…')).toBeOnTheScreen();
  });

  it('shows server, database and version once the health check answers', async () => {
    const fetchMock = mockFetch().mockResolvedValue(jsonResponse(200, healthyReply));
    renderRouter('./app', { initialUrl: '/account' });
    expect(await screen.findByText('9.9.9-test')).toBeOnTheScreen();
    expect(screen.getByText('Server')).toBeOnTheScreen();
    expect(screen.getByText('Database')).toBeOnTheScreen();
    expect(screen.getAllByText('Up')).toHaveLength(2);
    expect(fetchMock).toHaveBeenCalledWith('/api/health', expect.objectContaining({ credentials: 'same-origin' }));
  });

  it('shows a degraded server with its database down', async () => {
    // The server answers 503 with its report when its database is down.
    mockFetch().mockResolvedValue(jsonResponse(503, { status: 'degraded', db: 'down', version: '2.0.0' }));
    renderRouter('./app', { initialUrl: '/account' });
    expect(await screen.findByText('Up, degraded')).toBeOnTheScreen();
    expect(screen.getByText('Down')).toBeOnTheScreen();
  });

  it('shows an error with a retry that recovers once the server answers', async () => {
    const fetchMock = mockFetch().mockRejectedValue(new TypeError('Network request failed'));
    renderRouter('./app', { initialUrl: '/account' });
    expect(
      await screen.findByText('Server not reachable: Cannot reach the Ligandry server. Check that it is running.'),
    ).toBeOnTheScreen();

    fetchMock.mockResolvedValue(jsonResponse(200, healthyReply));
    fireEvent.press(screen.getByRole('button', { name: 'Retry' }));
    expect(await screen.findByText('9.9.9-test')).toBeOnTheScreen();
    expect(screen.queryByText(/Server not reachable/)).toBeNull();
  });

  it('shows the server’s own words when it answers with an error', async () => {
    mockFetch().mockResolvedValue(jsonResponse(404, 'Not Found'));
    renderRouter('./app', { initialUrl: '/account' });
    expect(await screen.findByText('Server check failed: The server answered 404')).toBeOnTheScreen();
  });
});
