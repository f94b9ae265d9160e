import { ActivityIndicator, StyleSheet, View } from 'react-native';

import { space } from '@/components/theme/tokens';
import { useTheme } from '@/components/theme/use-theme';
import { ThemedText } from '@/components/ui/themed-text';

/** A quiet spinner with words, for while a request is on its way. */
export function LoadingState({ label, fill = false }: { label: string; fill?: boolean }) {
  const { palette } = useTheme();
  return (
    <View
      style={[styles.box, fill && [styles.fill, { backgroundColor: palette.background }]]}
      accessibilityRole="progressbar"
      accessibilityLabel={label}
      accessibilityLiveRegion="polite"
    >
      <ActivityIndicator color={palette.primary} />
      <ThemedText variant="label" weight="regular" tone="textMuted">
        {label}
      </ThemedText>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { flexDirection: 'row', alignItems: 'center', gap: space.sm, paddingVertical: space.lg },
  fill: { flex: 1, justifyContent: 'center' },
});
