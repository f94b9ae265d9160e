import { createContext, useMemo, type ReactNode } from 'react';
import { Platform, useColorScheme } from 'react-native';

import { fonts, palettes, type Palette, type SchemeName } from '@/components/theme/tokens';

/** Font weights the app asks for; each maps to one bundled face. */
export type FontWeightName = keyof typeof fonts;

/** What every themed component reads: the active scheme, its colours and how to set a typeface. */
export type Theme = {
  scheme: SchemeName;
  palette: Palette;
  typeface: (weight: FontWeightName) => { fontFamily?: string; fontWeight?: '400' | '600' | '700' };
};

const systemWeights = { regular: '400', semibold: '600', bold: '700' } as const;
const systemFamily = Platform.select({ web: 'system-ui, -apple-system, "Segoe UI", Roboto, sans-serif' });

/** Builds a theme; with `systemFont` the bundled faces are skipped so text still renders if they failed. */
export function buildTheme(scheme: SchemeName, systemFont: boolean): Theme {
  return {
    scheme,
    palette: palettes[scheme],
    typeface: (weight) =>
      systemFont ? { fontFamily: systemFamily, fontWeight: systemWeights[weight] } : { fontFamily: fonts[weight] },
  };
}

/** Context holding the theme; defaults to light with bundled faces so isolated renders still work. */
export const ThemeContext = createContext<Theme>(buildTheme('light', false));

type Props = { children: ReactNode; systemFont?: boolean };

/** Follows the device colour scheme and hands the matching palette to everything below. */
export function ThemeProvider({ children, systemFont = false }: Props) {
  const scheme: SchemeName = useColorScheme() === 'dark' ? 'dark' : 'light';
  const theme = useMemo(() => buildTheme(scheme, systemFont), [scheme, systemFont]);
  return <ThemeContext.Provider value={theme}>{children}</ThemeContext.Provider>;
}
