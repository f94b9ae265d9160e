import { useWindowDimensions } from 'react-native';

import { WIDE_BREAKPOINT } from '@/components/theme/tokens';

/** True from WIDE_BREAKPOINT pixels of window width: side rail, wider padding, two panes. */
export function useIsWide(): boolean {
  return useWindowDimensions().width >= WIDE_BREAKPOINT;
}
