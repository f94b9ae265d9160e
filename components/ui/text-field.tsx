import { useId, useState } from 'react';
import { StyleSheet, TextInput, View, type TextInputProps } from 'react-native';

import { radius, space, type } from '@/components/theme/tokens';
import { useTheme } from '@/components/theme/use-theme';
import { ThemedText } from '@/components/ui/themed-text';

type Props = Pick<
  TextInputProps,
  'autoComplete' | 'inputMode' | 'secureTextEntry' | 'autoFocus' | 'maxLength' | 'autoCapitalize' | 'testID'
> & {
  label: string;
  value: string;
  onChangeText: (text: string) => void;
  /** Called on Enter (web) or the keyboard's submit key, so every form submits from any field. */
  onSubmit?: () => void;
  error?: string;
  hint?: string;
};

/** A labelled single-line input with its error right below it; the label is also its accessible name. */
export function TextField({ label, value, onChangeText, onSubmit, error, hint, autoCapitalize = 'none', ...input }: Props) {
  const { palette, typeface } = useTheme();
  const [focused, setFocused] = useState(false);
  const id = useId().replace(/[^A-Za-z0-9_-]/g, '');
  const labelId = `${id}-label`;
  const messageId = `${id}-message`;
  const describedBy = error || hint ? { 'aria-describedby': messageId } : {};
  return (
    <View style={styles.field}>
      <ThemedText variant="label" nativeID={labelId}>
        {label}
      </ThemedText>
      <TextInput
        {...input}
        {...describedBy}
        value={value}
        onChangeText={onChangeText}
        onSubmitEditing={onSubmit}
        onFocus={() => setFocused(true)}
        onBlur={() => setFocused(false)}
        autoCapitalize={autoCapitalize}
        autoCorrect={false}
        accessibilityLabel={label}
        aria-labelledby={labelId}
        aria-invalid={!!error}
        placeholderTextColor={palette.textMuted}
        style={[
          styles.input,
          type.body,
          typeface('regular'),
          {
            color: palette.text,
            backgroundColor: palette.surface,
            borderColor: error ? palette.danger : focused ? palette.primary : palette.border,
            outlineColor: palette.primary,
          },
          focused && styles.focused,
        ]}
      />
      {error ? (
        <ThemedText variant="label" weight="regular" tone="danger" nativeID={messageId} accessibilityLiveRegion="polite">
          {error}
        </ThemedText>
      ) : hint ? (
        <ThemedText variant="caption" tone="textMuted" nativeID={messageId}>
          {hint}
        </ThemedText>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  field: { gap: space.xs, alignSelf: 'stretch' },
  input: {
    borderWidth: 1.5,
    borderRadius: radius.md,
    paddingHorizontal: space.md,
    paddingVertical: space.sm,
    minHeight: 44,
    minWidth: 0,
  },
  focused: { outlineStyle: 'solid', outlineWidth: 2, outlineOffset: 1 },
});
