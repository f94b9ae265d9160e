import { Dimensions } from 'react-native';
import { fireEvent, renderRouter, screen } from 'expo-router/testing-library';

import { mockApi } from './helpers';

const phone = Dimensions.get('window');

beforeEach(() => {
  mockApi();
  Dimensions.set({
    window: { width: 1280, height: 800, scale: 1, fontScale: 1 },
    screen: { width: 1280, height: 800, scale: 1, fontScale: 1 },
  });
});

afterEach(() => {
  Dimensions.set({ window: phone, screen: phone });
});

describe('app shell on a wide screen', () => {
  it('shows the side rail with wordmark, tabs, server status and version instead of a bottom bar', async () => {
    renderRouter('./app', { initialUrl: '/library' });
    expect(await screen.findByText('No constants yet')).toBeOnTheScreen();
    expect(screen.getByTestId('side-rail')).toBeOnTheScreen();
    expect(screen.queryByTestId('bottom-bar')).toBeNull();
    expect(screen.getByText('Ligandry')).toBeOnTheScreen();
    expect(screen.getAllByRole('tab')).toHaveLength(5);
    expect(screen.getByRole('tab', { name: 'Library', selected: true })).toBeOnTheScreen();
    expect(screen.getByText('Version 0.1.0')).toBeOnTheScreen();
    expect(await screen.findByText('Server online')).toBeOnTheScreen();
  });

  it('navigates from the rail', async () => {
    const view = renderRouter('./app', { initialUrl: '/baths' });
    await screen.findByText('No baths recorded yet');
    fireEvent.press(screen.getByRole('tab', { name: 'Safety' }));
    expect(await screen.findByText('Nothing on the desk')).toBeOnTheScreen();
    expect(view.getPathname()).toBe('/safety');
  });

  it('reports a server that cannot be reached in the rail footer', async () => {
    mockApi({ '/api/health': 'network' });
    renderRouter('./app', { initialUrl: '/baths' });
    expect(await screen.findByText('Server not reachable')).toBeOnTheScreen();
  });
});
