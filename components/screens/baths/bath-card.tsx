import { Link } from 'expo-router';
import { Pressable, StyleSheet, View, type ViewStyle } from 'react-native';

import { HAZARD_SHORT_LABELS, HazardChips } from '@/components/hazards/hazard-chips';
import { analysedText, bathFlags, bathHref, volumeText } from '@/components/screens/baths/bath-words';
import { radius, space } from '@/components/theme/tokens';
import { useTheme } from '@/components/theme/use-theme';
import { StatusPill } from '@/components/ui/status-dot';
import { ThemedText } from '@/components/ui/themed-text';
import { useFocusVisible } from '@/components/ui/use-focus-visible';
import { PROCESS_INFO, type BathSummary } from '@/shared/baths';

/** "Cyanide silver plate · Line 2 · 120 L": what the bath is and where. */
export function bathLine(b: BathSummary): string {
  return [PROCESS_INFO[b.process].label, b.site.trim() || null, volumeText(b.volume, b.volumeUnit)].filter(Boolean).join(' · ');
}

/** The bath's state flags as small pills, each one in words, then its hazard chips (nothing when there is nothing to flag). */
export function BathFlags({ bath }: { bath: BathSummary }) {
  const flags = bathFlags(bath);
  if (flags.length === 0 && bath.hazards.length === 0 && !bath.review) return null;
  return (
    <View style={styles.flags}>
      {flags.map((f) => (
        <View key={f.label} style={styles.flag}>
          <StatusPill kind={f.kind} label={f.label} />
        </View>
      ))}
      <HazardChips hazards={bath.hazards} review={bath.review} />
    </View>
  );
}

/** One bath as a card that opens its detail (phones: no sideways scrolling). */
export function BathCard({ bath }: { bath: BathSummary }) {
  const { palette } = useTheme();
  const focus = useFocusVisible();
  const line = bathLine(bath);
  const analysed = analysedText(bath);
  const flags = [...bathFlags(bath).map((f) => f.label), ...bath.hazards.map((h) => HAZARD_SHORT_LABELS[h.rule])];
  return (
    <Link href={bathHref(bath.id)} asChild>
      <Pressable
        accessibilityRole="link"
        accessibilityLabel={[bath.name, line, analysed, ...flags].join('. ')}
        testID={`bath-${bath.id}`}
        onFocus={focus.onFocus}
        onBlur={focus.onBlur}
        style={StyleSheet.flatten<ViewStyle>([
          styles.card,
          { borderColor: palette.border, backgroundColor: palette.surface },
          focus.ring(palette.primary),
        ])}
      >
        <ThemedText variant="label" tone="primary">
          {bath.name}
        </ThemedText>
        <ThemedText variant="caption" tone="textMuted">
          {line}
        </ThemedText>
        <ThemedText variant="caption" tone="textMuted">
          {analysed}
        </ThemedText>
        <BathFlags bath={bath} />
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
    gap: space.xs,
  },
  flags: { flexDirection: 'row', flexWrap: 'wrap', gap: space.xs },
  // Keeps a long flag inside a narrow table cell: its words wrap instead.
  flag: { maxWidth: '100%' },
});
