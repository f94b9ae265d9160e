import { StyleSheet, View } from 'react-native';

import { radius, space } from '@/components/theme/tokens';
import { useTheme } from '@/components/theme/use-theme';
import { Button } from '@/components/ui/button';
import { ThemedText } from '@/components/ui/themed-text';

/** Height kept free under the content on a phone so the sticky bar never covers the last field (px). */
export const STICKY_BAR_SPACE = 96;

type Props = {
  onCalculate: () => void;
  onCancel: () => void;
  running: boolean;
  /** 0..1 while a long calculation reports progress; null otherwise. */
  progress: number | null;
  /** Pinned to the bottom of the screen (phone) instead of sitting under the inputs. */
  sticky: boolean;
};

function Progress({ fraction }: { fraction: number }) {
  const { palette } = useTheme();
  const percent = Math.max(0, Math.min(100, Math.round(fraction * 100)));
  return (
    <View
      style={styles.progress}
      accessibilityRole="progressbar"
      accessibilityLabel="Calculation progress"
      accessibilityValue={{ min: 0, max: 100, now: percent }}
      testID="calculation-progress"
    >
      <View style={[styles.track, { backgroundColor: palette.primarySoft }]}>
        <View style={[styles.fill, { width: `${percent}%`, backgroundColor: palette.primary }]} />
      </View>
      <ThemedText variant="caption" tone="textMuted">{`${percent} % done`}</ThemedText>
    </View>
  );
}

/** The primary Calculate action, with progress and Cancel while a long calculation runs. */
export function CalculateBar({ onCalculate, onCancel, running, progress, sticky }: Props) {
  const { palette } = useTheme();
  return (
    <View style={[styles.bar, sticky && [styles.sticky, { backgroundColor: palette.surface, borderTopColor: palette.border }]]} testID="calculate-bar">
      <View style={styles.row}>
        <Button label="Calculate" busyLabel="Calculating…" busy={running} variant="primary" onPress={onCalculate} />
        {running && progress !== null ? <Button label="Cancel" accessibilityLabel="Cancel the calculation" onPress={onCancel} /> : null}
      </View>
      {running && progress !== null ? <Progress fraction={progress} /> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  bar: { gap: space.xs },
  sticky: {
    position: 'absolute',
    left: 0,
    right: 0,
    bottom: 0,
    borderTopWidth: 1,
    paddingHorizontal: space.lg,
    paddingVertical: space.sm,
  },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm, alignItems: 'center' },
  progress: { gap: space.xxs },
  track: { height: 6, borderRadius: radius.pill, overflow: 'hidden' },
  fill: { height: 6 },
});
