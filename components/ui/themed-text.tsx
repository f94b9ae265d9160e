import { StyleSheet, Text, type TextProps } from 'react-native';

import { type FontWeightName } from '@/components/theme/theme-provider';
import { type Palette, type } from '@/components/theme/tokens';
import { useTheme } from '@/components/theme/use-theme';

/** Steps of the type scale a piece of text can take. */
export type TextVariant = keyof typeof type;

/** Palette roles that text may be coloured with. */
export type TextTone = Extract<
  keyof Palette,
  'text' | 'textMuted' | 'primary' | 'accent' | 'caution' | 'danger' | 'ok' | 'onRail' | 'onRailMuted' | 'onPrimary'
>;

const defaultWeight: Record<TextVariant, FontWeightName> = {
  caption: 'regular',
  body: 'regular',
  label: 'semibold',
  title: 'bold',
  display: 'bold',
};

type Props = TextProps & { variant?: TextVariant; tone?: TextTone; weight?: FontWeightName };

/** All app text goes through here so size, typeface and colour come from the tokens. */
export function ThemedText({ variant = 'body', tone = 'text', weight, style, ...rest }: Props) {
  const { palette, typeface } = useTheme();
  return (
    <Text
      {...rest}
      style={[styles.base, type[variant], typeface(weight ?? defaultWeight[variant]), { color: palette[tone] }, style]}
    />
  );
}

const styles = StyleSheet.create({
  base: { flexShrink: 1 },
});
