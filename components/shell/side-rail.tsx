import { StyleSheet, View } from 'react-native';
import { useSafeAreaInsets } from 'react-native-safe-area-context';

import { APP_VERSION } from '@/components/shell/app-version';
import { BrandMark } from '@/components/shell/brand-mark';
import { NavItems } from '@/components/shell/nav-item';
import { ServerStatus } from '@/components/shell/server-status';
import { space } from '@/components/theme/tokens';
import { useTheme } from '@/components/theme/use-theme';
import { ThemedText } from '@/components/ui/themed-text';

/** Width of the wide-screen side rail in pixels. */
export const RAIL_WIDTH = 220;

/** Wide-screen navigation: wordmark on top, the five sections, server status and version below. */
export function SideRail() {
  const { palette } = useTheme();
  const insets = useSafeAreaInsets();
  return (
    <View
      style={[
        styles.rail,
        { backgroundColor: palette.rail, borderRightColor: palette.border, paddingTop: insets.top + space.xl, paddingBottom: insets.bottom + space.lg },
      ]}
      testID="side-rail"
    >
      <View style={styles.brand}>
        <BrandMark ring={palette.onRail} core={palette.accent} />
        <ThemedText variant="title" tone="onRail" style={styles.wordmark}>
          Ligandry
        </ThemedText>
      </View>
      <View style={styles.nav} accessibilityRole="tablist" accessibilityLabel="Sections">
        <NavItems variant="rail" />
      </View>
      <View style={[styles.footer, { borderTopColor: palette.railActive }]}>
        <ServerStatus />
        <ThemedText variant="caption" tone="onRailMuted">{`Version ${APP_VERSION}`}</ThemedText>
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  rail: {
    width: RAIL_WIDTH,
    borderRightWidth: 1,
    paddingHorizontal: space.md,
    gap: space.xxl,
  },
  brand: {
    flexDirection: 'row',
    alignItems: 'center',
    gap: space.sm + space.xxs,
    paddingHorizontal: space.sm,
  },
  wordmark: { letterSpacing: 0.3 },
  nav: { gap: space.xs, flexGrow: 1 },
  footer: {
    gap: space.xs,
    paddingTop: space.md,
    paddingHorizontal: space.sm,
    borderTopWidth: 1,
  },
});
