import { renderRouter, screen } from 'expo-router/testing-library';

import { mockApi } from './helpers';

let mockFontState: [boolean, Error | null] = [true, null];

jest.mock('expo-font', () => ({
  ...jest.requireActual('expo-font'),
  useFonts: () => mockFontState,
}));

beforeEach(() => {
  mockApi();
});

describe('font loading in the root layout', () => {
  it('shows only a plain background while the faces load', () => {
    mockFontState = [false, null];
    renderRouter('./app', { initialUrl: '/baths' });
    expect(screen.queryByText('No baths recorded yet')).toBeNull();
    expect(screen.queryByRole('tab')).toBeNull();
  });

  it('renders with bundled faces once they are loaded', async () => {
    mockFontState = [true, null];
    renderRouter('./app', { initialUrl: '/baths' });
    const title = await screen.findByText('No baths recorded yet');
    expect(title).toHaveStyle({ fontFamily: 'SourceSans3_700Bold' });
  });

  it('still renders, in the system font, when the faces fail to load', async () => {
    mockFontState = [false, new Error('font file missing')];
    renderRouter('./app', { initialUrl: '/baths' });
    const title = await screen.findByText('No baths recorded yet');
    expect(title).toHaveStyle({ fontWeight: '700' });
    expect(screen.getAllByRole('tab')).toHaveLength(5);
  });
});
