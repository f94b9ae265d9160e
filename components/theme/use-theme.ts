import { use } from 'react';

import { ThemeContext, type Theme } from '@/components/theme/theme-provider';

/** The one way components read colours and typefaces, so a scheme change reaches all of them. */
export function useTheme(): Theme {
  return use(ThemeContext);
}
