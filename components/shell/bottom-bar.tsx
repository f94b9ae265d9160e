import { StyleSheet, View } from 'react-native';
import { useSafeAreaInsets } from 'react-native-safe-area-context';

import { NavItems } from '@/components/shell/nav-item';
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
      <NavItems variant="bar" />
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
