import { Link } from 'expo-router';
import { Pressable, StyleSheet, type ViewStyle } from 'react-native';

import { constantHref, formatLog, logSymbol, statusShort } from '@/components/screens/library/words';
import { radius, space } from '@/components/theme/tokens';
import { useTheme } from '@/components/theme/use-theme';
import { ThemedText } from '@/components/ui/themed-text';
import { useFocusVisible } from '@/components/ui/use-focus-visible';
import { KIND_LABELS, type ConstantSummary } from '@/shared/constants';

/** The second line of a compact row: kind · log value · status · version. */
export function summaryLine(c: ConstantSummary): string {
  return [KIND_LABELS[c.kind].label, `${logSymbol(c.kind)} ${formatLog(c.logValue)}`, statusShort(c.status), `v${c.version}`].join(' · ');
}

/** One constant as a two-line card that opens its detail (phones: no sideways scrolling). */
export function ConstantCard({ c }: { c: ConstantSummary }) {
  const { palette } = useTheme();
  const focus = useFocusVisible();
  const line = summaryLine(c);
  return (
    <Link href={constantHref(c.id)} asChild>
      <Pressable
        accessibilityRole="link"
        accessibilityLabel={`${c.reaction}. ${line}`}
        testID={`constant-${c.id}`}
        onFocus={focus.onFocus}
        onBlur={focus.onBlur}
        style={StyleSheet.flatten<ViewStyle>([
          styles.card,
          { borderColor: palette.border, backgroundColor: palette.surface },
          focus.ring(palette.primary),
        ])}
      >
        <ThemedText variant="label" tone="primary">
          {c.reaction}
        </ThemedText>
        <ThemedText variant="caption" tone="textMuted">
          {line}
        </ThemedText>
      </Pressable>
    </Link>
  );
}

const styles = StyleSheet.create({
  card: {
    borderWidth: 1,
    borderRadius: radius.md,
    paddingHorizontal: space.md,
    paddingVertical: space.sm,
    gap: space.xxs,
  },
});
