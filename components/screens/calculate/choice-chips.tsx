import { Pressable, StyleSheet, View } from 'react-native';

import { radius, space } from '@/components/theme/tokens';
import { useTheme } from '@/components/theme/use-theme';
import { ThemedText } from '@/components/ui/themed-text';
import { useFocusVisible } from '@/components/ui/use-focus-visible';

/** One option of a ChoiceChips group. */
export type Choice<T extends string> = { value: T; label: string; hint?: string };

type Props<T extends string> = {
  label: string;
  options: readonly Choice<T>[];
  value: T;
  onChange: (value: T) => void;
  disabled?: boolean;
};

function Option<T extends string>({ option, selected, onPress, disabled }: { option: Choice<T>; selected: boolean; onPress: () => void; disabled: boolean }) {
  const { palette } = useTheme();
  const focus = useFocusVisible();
  return (
    <Pressable
      accessibilityRole="radio"
      accessibilityState={{ checked: selected, disabled }}
      aria-checked={selected}
      accessibilityLabel={option.label}
      accessibilityHint={option.hint}
      disabled={disabled}
      onPress={onPress}
      onFocus={focus.onFocus}
      onBlur={focus.onBlur}
      style={[
        styles.chip,
        selected ? { backgroundColor: palette.primary, borderColor: palette.primary } : { backgroundColor: palette.surface, borderColor: palette.border },
        disabled && styles.disabled,
        focus.ring(palette.primary),
      ]}
    >
      {/* The dot is drawn as text so the choice does not rest on colour alone. */}
      <ThemedText variant="label" weight="semibold" tone={selected ? 'onPrimary' : 'textMuted'}>
        {`${selected ? '●' : '○'} ${option.label}`}
      </ThemedText>
    </Pressable>
  );
}

/** One-of-several choice drawn as chips (a radio group): exactly one option is on at a time. */
export function ChoiceChips<T extends string>({ label, options, value, onChange, disabled = false }: Props<T>) {
  return (
    <View style={styles.group}>
      <ThemedText variant="label">{label}</ThemedText>
      <View style={styles.row} role="radiogroup" aria-label={label}>
        {options.map((option) => (
          <Option key={option.value} option={option} selected={option.value === value} disabled={disabled} onPress={() => onChange(option.value)} />
        ))}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  group: { gap: space.xs },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.xs },
  chip: {
    maxWidth: '100%',
    paddingHorizontal: space.md,
    paddingVertical: space.xs + space.xxs,
    minHeight: 36,
    justifyContent: 'center',
    borderRadius: radius.pill,
    borderWidth: 1.5,
  },
  disabled: { opacity: 0.55 },
});
