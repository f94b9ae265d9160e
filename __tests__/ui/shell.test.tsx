import { fireEvent, renderRouter, screen } from 'expo-router/testing-library';

import { mockApi } from './helpers';

const TAB_NAMES = ['Baths', 'Calculate', 'Library', 'Safety', 'Account'];

beforeEach(() => {
  mockApi();
});

describe('app shell on a phone', () => {
  it('opens on Baths and shows five labelled tabs in a tab list', async () => {
    const view = renderRouter('./app', { initialUrl: '/' });
    expect(await screen.findByText('No baths recorded yet')).toBeOnTheScreen();
    expect(view.getPathname()).toBe('/baths');
    expect(screen.getByTestId('bottom-bar')).toBeOnTheScreen();
    expect(screen.queryByTestId('side-rail')).toBeNull();
    expect(screen.getByTestId('bottom-bar')).toHaveProp('accessibilityRole', 'tablist');
    const tabs = screen.getAllByRole('tab');
    expect(tabs).toHaveLength(5);
    for (const name of TAB_NAMES) {
      expect(screen.getByRole('tab', { name })).toBeOnTheScreen();
    }
    expect(screen.getByRole('tab', { name: 'Baths', selected: true })).toBeOnTheScreen();
    expect(screen.getByRole('tab', { name: 'Safety', selected: false })).toBeOnTheScreen();
  });

  it('moves between sections when tabs are pressed', async () => {
    const view = renderRouter('./app', { initialUrl: '/baths' });
    await screen.findByText('No baths recorded yet');

    fireEvent.press(screen.getByRole('tab', { name: 'Calculate' }));
    expect(await screen.findByText('Headroom')).toBeOnTheScreen();
    expect(view.getPathname()).toBe('/calculate');
    expect(screen.queryByText('Not available yet')).toBeNull();
    expect(screen.getByRole('tab', { name: 'Calculate', selected: true })).toBeOnTheScreen();

    fireEvent.press(screen.getByRole('tab', { name: 'Library' }));
    expect(await screen.findByText('No constants yet')).toBeOnTheScreen();
    expect(view.getPathname()).toBe('/library');

    fireEvent.press(screen.getByRole('tab', { name: 'Safety' }));
    expect(await screen.findByText('Nothing on the desk')).toBeOnTheScreen();
    expect(view.getPathname()).toBe('/safety');

    fireEvent.press(screen.getByRole('tab', { name: 'Account' }));
    expect(await screen.findByText('cora@shop.test')).toBeOnTheScreen();
    expect(view.getPathname()).toBe('/account');

    fireEvent.press(screen.getByRole('tab', { name: 'Baths' }));
    expect(await screen.findByText('No baths recorded yet')).toBeOnTheScreen();
    expect(view.getPathname()).toBe('/baths');
  });

  it('shows the standing cautions with their severity in words', async () => {
    renderRouter('./app', { initialUrl: '/safety' });
    expect(await screen.findByText('Standing cautions')).toBeOnTheScreen();
    expect(screen.getByText('Cyanide and acid release hydrogen cyanide gas')).toBeOnTheScreen();
    expect(screen.getByText(/H300, H310 and H330/)).toBeOnTheScreen();
    expect(screen.getByText(/EUH032/)).toBeOnTheScreen();
    expect(screen.getByText('Ammoniacal silver can leave explosive residues')).toBeOnTheScreen();
    expect(screen.getByText(/discard it the same day/)).toBeOnTheScreen();
    expect(screen.getByText('Acidified thiosulfate fixer gives off sulfur dioxide')).toBeOnTheScreen();
    expect(screen.getAllByText('DANGER')).toHaveLength(2);
    expect(screen.getAllByText('CAUTION')).toHaveLength(1);
    expect(screen.getByText(/safety data sheet \(SDS\), local codes and licensed practice/)).toBeOnTheScreen();
  });

  it('answers unknown addresses with its own page and a way back to Baths', async () => {
    const view = renderRouter('./app', { initialUrl: '/no-such-place' });
    expect(await screen.findByText('Page not found')).toBeOnTheScreen();
    fireEvent.press(screen.getByText('Go to Baths'));
    expect(await screen.findByText('No baths recorded yet')).toBeOnTheScreen();
    expect(view.getPathname()).toBe('/baths');
  });
});
