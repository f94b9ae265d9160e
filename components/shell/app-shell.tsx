import { StyleSheet, View } from 'react-native';
import { TabSlot, useTabsWithTriggers } from 'expo-router/ui';

import { AuthGate } from '@/components/shell/auth-gate';
import { BottomBar } from '@/components/shell/bottom-bar';
import { SideRail } from '@/components/shell/side-rail';
import { TAB_TRIGGERS } from '@/components/shell/tabs';
import { useIsWide } from '@/components/theme/use-is-wide';
import { useTheme } from '@/components/theme/use-theme';

/** The app frame around every section: side rail on wide screens, bottom tabs on phones; signed-in people only. */
export function AppShell() {
  const { NavigationContent } = useTabsWithTriggers({ triggers: TAB_TRIGGERS });
  const { palette } = useTheme();
  const wide = useIsWide();

  return (
    // The gate sits inside the navigator so the address stays as asked while it checks the session.
    <NavigationContent>
      <AuthGate>
        {(open) => (
          <View
            style={[styles.root, wide && styles.row, { backgroundColor: palette.background }, !open && styles.hidden]}
            aria-hidden={!open}
          >
            {open && wide ? <SideRail /> : null}
            <TabSlot style={styles.slot} />
            {open && !wide ? <BottomBar /> : null}
          </View>
        )}
      </AuthGate>
    </NavigationContent>
  );
}

const styles = StyleSheet.create({
  root: { flex: 1 },
  row: { flexDirection: 'row' },
  slot: { flex: 1, minWidth: 0, minHeight: 0 },
  hidden: { display: 'none' },
});
