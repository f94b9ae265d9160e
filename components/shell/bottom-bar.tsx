import { StyleSheet, View } from 'react-native';
import { TabTrigger } from 'expo-router/ui';
import { useSafeAreaInsets } from 'react-native-safe-area-context';

import { NavItem } from '@/components/shell/nav-item';
import { TABS } from '@/components/shell/tabs';
import { space } from '@/components/theme/tokens';
import { useTheme } from '@/components/theme/use-theme';

/** Phone navigation: the five sections along the bottom, clear of the home indicator. */
export function BottomBar() {
  const { palette } = useTheme();
  const insets = useSafeAreaInsets();
  return (
    <View
      style={[
        styles.bar,
        { backgroundColor: palette.surface, borderTopColor: palette.border, paddingBottom: insets.bottom + space.xs },
      ]}
      accessibilityRole="tablist"
      accessibilityLabel="Sections"
      testID="bottom-bar"
    >
      {TABS.map((tab) => (
        <TabTrigger key={tab.name} name={tab.name} href={tab.href} asChild>
          <NavItem tab={tab} variant="bar" />
        </TabTrigger>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  bar: {
    flexDirection: 'row',
    borderTopWidth: 1,
    paddingHorizontal: space.xs,
  },
});
