import { Pressable, StyleSheet, View } from 'react-native';

import { radius, space } from '@/components/theme/tokens';
import { useTheme } from '@/components/theme/use-theme';
import { ThemedText } from '@/components/ui/themed-text';
import { useFocusVisible } from '@/components/ui/use-focus-visible';

/** A small read-only tag (a role, a state). */
export function Chip({ label }: { label: string }) {
  const { palette } = useTheme();
  return (
    <View style={[styles.chip, { backgroundColor: palette.primarySoft, borderColor: palette.primarySoft }]}>
      <ThemedText variant="caption" weight="semibold" tone="primary">
        {label}
      </ThemedText>
    </View>
  );
}

type ToggleProps = {
  label: string;
  checked: boolean;
  onToggle: () => void;
  hint?: string;
  disabled?: boolean;
  /** A fuller name for screen readers when several chips share a label ("Admin role for Ada"). */
  accessibilityLabel?: string;
};

/** A chip that turns on and off like a checkbox, with a tick drawn as text so the state is not colour alone. */
export function ToggleChip({ label, checked, onToggle, hint, disabled = false, accessibilityLabel }: ToggleProps) {
  const { palette } = useTheme();
  const focus = useFocusVisible();
  return (
    <Pressable
      accessibilityRole="checkbox"
      accessibilityState={{ checked, disabled }}
      aria-checked={checked}
      accessibilityLabel={accessibilityLabel ?? label}
      accessibilityHint={hint}
      disabled={disabled}
      onPress={onToggle}
      onFocus={focus.onFocus}
      onBlur={focus.onBlur}
      style={[
        styles.chip,
        styles.toggle,
        checked
          ? { backgroundColor: palette.primary, borderColor: palette.primary }
          : { backgroundColor: palette.surface, borderColor: palette.border },
        disabled && styles.disabled,
        focus.ring(palette.primary),
      ]}
    >
      <ThemedText variant="label" weight="semibold" tone={checked ? 'onPrimary' : 'textMuted'}>
        {checked ? `✓ ${label}` : label}
      </ThemedText>
    </Pressable>
  );
}

const styles = StyleSheet.create({
  chip: {
    alignSelf: 'flex-start',
    paddingHorizontal: space.sm + space.xxs,
    paddingVertical: space.xxs,
    borderRadius: radius.pill,
    borderWidth: 1.5,
  },
  toggle: { paddingHorizontal: space.md, paddingVertical: space.xs + space.xxs, minHeight: 36, justifyContent: 'center' },
  disabled: { opacity: 0.55 },
});
