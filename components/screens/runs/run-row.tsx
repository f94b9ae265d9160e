import { Link } from 'expo-router';
import { Pressable, StyleSheet, View, type ViewStyle } from 'react-native';

import { HAZARD_SHORT_LABELS, HazardChips } from '@/components/hazards/hazard-chips';
import { CALCULATOR_LABELS, runStatus, runTitle } from '@/components/screens/calculate/run-words';
import { radius, space } from '@/components/theme/tokens';
import { useTheme } from '@/components/theme/use-theme';
import { formatWhen } from '@/components/ui/format-date';
import { StatusPill } from '@/components/ui/status-dot';
import { ThemedText } from '@/components/ui/themed-text';
import { useFocusVisible } from '@/components/ui/use-focus-visible';
import { type RunSummary } from '@/shared/constants';

/** The path of a saved run's detail screen (also the share link's path). */
export function runPath(id: string): string {
  return `/calculate/runs/${encodeURIComponent(id)}`;
}

/** One saved run in the list: title, calculator, bath, author, date, status, drafts and its one-line answer. */
export function RunRow({ run, wide }: { run: RunSummary; wide: boolean }) {
  const { palette } = useTheme();
  const focus = useFocusVisible();
  const status = runStatus(run.status);
  const title = runTitle(run);
  const byline = `${CALCULATOR_LABELS[run.calculator]} · ${run.author.name} · ${formatWhen(run.createdAt)}`;
  const bath = run.bath ? `Bath: ${run.bath.name}` : null;
  const hazards = run.hazards.length ? `Hazards: ${run.hazards.map((h) => HAZARD_SHORT_LABELS[h.rule]).join(', ')}` : null;
  const hint = [byline, bath, status.label, run.usesDrafts ? 'Uses drafts' : null, hazards, run.released ? 'Released' : null, run.verdict || null].filter(Boolean).join('. ');
  return (
    <Link href={runPath(run.id)} asChild>
      <Pressable
        accessibilityRole="link"
        accessibilityLabel={title}
        accessibilityHint={hint}
        onFocus={focus.onFocus}
        onBlur={focus.onBlur}
        testID={`run-${run.id}`}
        style={StyleSheet.flatten<ViewStyle>([
          styles.row,
          { borderColor: palette.border, backgroundColor: palette.surfaceRaised },
          focus.ring(palette.primary),
        ])}
      >
        <View style={styles.words}>
          <ThemedText variant="label" tone="primary">
            {title}
          </ThemedText>
          <ThemedText variant="caption" tone="textMuted">
            {byline}
          </ThemedText>
          {bath ? (
            <ThemedText variant="caption" tone="textMuted">
              {bath}
            </ThemedText>
          ) : null}
          {run.verdict ? (
            // One line on a phone, cut with an ellipsis; the whole answer is in the hint and on the run's screen.
            <ThemedText variant="label" weight="regular" numberOfLines={wide ? undefined : 1} testID={`run-${run.id}-verdict`}>
              {run.verdict}
            </ThemedText>
          ) : null}
          <View style={styles.pills}>
            <StatusPill kind={status.kind} label={status.label} />
            {run.usesDrafts ? <StatusPill kind="warn" label="Uses drafts" /> : null}
            {run.released ? <StatusPill kind="ok" label="Released" /> : null}
          </View>
          <HazardChips hazards={run.hazards} review={run.review} />
        </View>
        <ThemedText variant="title" tone="primary" aria-hidden>
          ›
        </ThemedText>
      </Pressable>
    </Link>
  );
}

const styles = StyleSheet.create({
  row: {
    flexDirection: 'row',
    alignItems: 'center',
    gap: space.md,
    paddingHorizontal: space.md,
    paddingVertical: space.sm,
    borderRadius: radius.md,
    borderWidth: 1,
  },
  words: { flex: 1, gap: space.xxs, minWidth: 0 },
  pills: { flexDirection: 'row', flexWrap: 'wrap', gap: space.xs },
});
