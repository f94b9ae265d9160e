import { Pressable, StyleSheet } from 'react-native';

import { radius, space } from '@/components/theme/tokens';
import { useTheme } from '@/components/theme/use-theme';
import { ThemedText } from '@/components/ui/themed-text';
import { useFocusVisible } from '@/components/ui/use-focus-visible';

type Props = { label: string; onPress: () => void; accessibilityHint?: string };

/** A quiet outlined action button, for secondary actions such as retrying a request. */
export function Button({ label, onPress, accessibilityHint }: Props) {
  const { palette } = useTheme();
  const focus = useFocusVisible();
  return (
    <Pressable
      accessibilityRole="button"
      accessibilityHint={accessibilityHint}
      onPress={onPress}
      onFocus={focus.onFocus}
      onBlur={focus.onBlur}
      style={(state) => [
        styles.button,
        { borderColor: palette.primary },
        (state.pressed || (state as { hovered?: boolean }).hovered) && { backgroundColor: palette.primarySoft },
        focus.visible && [styles.focusRing, { outlineColor: palette.primary }],
      ]}
    >
      <ThemedText variant="label" tone="primary">
        {label}
      </ThemedText>
    </Pressable>
  );
}

const styles = StyleSheet.create({
  button: {
    alignSelf: 'flex-start',
    paddingHorizontal: space.lg,
    paddingVertical: space.sm,
    borderRadius: radius.md,
    borderWidth: 1.5,
  },
  focusRing: { outlineStyle: 'solid', outlineWidth: 2, outlineOffset: 2 },
});
