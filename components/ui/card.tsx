import { StyleSheet, View, type ViewProps } from 'react-native';

import { radius, space } from '@/components/theme/tokens';
import { useTheme } from '@/components/theme/use-theme';

/** A bordered surface that groups related content on a screen. */
export function Card({ style, ...rest }: ViewProps) {
  const { palette } = useTheme();
  return (
    <View {...rest} style={[styles.card, { backgroundColor: palette.surface, borderColor: palette.border }, style]} />
  );
}

const styles = StyleSheet.create({
  card: {
    borderWidth: StyleSheet.hairlineWidth * 2,
    borderRadius: radius.lg,
    padding: space.lg,
    gap: space.sm,
  },
});
