import { Pressable, StyleSheet } from 'react-native';

import { radius, space } from '@/components/theme/tokens';
import { useTheme } from '@/components/theme/use-theme';
import { ThemedText } from '@/components/ui/themed-text';
import { useFocusVisible } from '@/components/ui/use-focus-visible';

/** How loud a button is: outlined (secondary), filled (the form's main action) or danger (ends something). */
export type ButtonVariant = 'outline' | 'primary' | 'danger';

type Props = {
  label: string;
  onPress: () => void;
  accessibilityHint?: string;
  accessibilityLabel?: string;
  variant?: ButtonVariant;
  disabled?: boolean;
  /** While true the button is disabled and shows busyLabel; screen readers keep hearing label. */
  busy?: boolean;
  busyLabel?: string;
  testID?: string;
};

/** An action button; outlined by default, for secondary actions such as retrying a request. */
export function Button({
  label,
  onPress,
  accessibilityHint,
  accessibilityLabel,
  variant = 'outline',
  disabled: disabledProp = false,
  busy = false,
  busyLabel,
  testID,
}: Props) {
  const disabled = disabledProp || busy;
  const { palette } = useTheme();
  const focus = useFocusVisible();
  const filled = variant === 'primary';
  const ink = variant === 'danger' ? palette.danger : palette.primary;
  return (
    <Pressable
      accessibilityRole="button"
      accessibilityHint={accessibilityHint}
      accessibilityLabel={accessibilityLabel ?? (busy && busyLabel ? label : undefined)}
      accessibilityState={{ disabled }}
      aria-disabled={disabled}
      disabled={disabled}
      testID={testID}
      onPress={onPress}
      onFocus={focus.onFocus}
      onBlur={focus.onBlur}
      style={(state) => [
        styles.button,
        { borderColor: ink },
        filled && { backgroundColor: ink },
        !filled &&
          (state.pressed || (state as { hovered?: boolean }).hovered) && {
            backgroundColor: variant === 'danger' ? palette.dangerSoft : palette.primarySoft,
          },
        disabled && styles.disabled,
        focus.ring(ink),
      ]}
    >
      <ThemedText variant="label" tone={filled ? 'onPrimary' : variant === 'danger' ? 'danger' : 'primary'}>
        {busy && busyLabel ? busyLabel : label}
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
  disabled: { opacity: 0.55 },
});
