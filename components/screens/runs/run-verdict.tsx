import { StyleSheet, View } from 'react-native';

import { radius, space } from '@/components/theme/tokens';
import { useTheme } from '@/components/theme/use-theme';
import { ThemedText } from '@/components/ui/themed-text';

/** A run's one-line answer, large, on its screen and on paper; says so when an older run stored none. */
export function RunVerdict({ verdict }: { verdict: string }) {
  const { palette } = useTheme();
  const text = verdict.trim();
  return (
    <View style={[styles.box, { borderLeftColor: palette.primary }]} testID="run-verdict">
      <ThemedText variant="caption" weight="semibold" tone="textMuted">
        Verdict
      </ThemedText>
      {text ? (
        <ThemedText variant="title" weight="semibold" selectable>
          {text}
        </ThemedText>
      ) : (
        <ThemedText variant="label" weight="regular" tone="textMuted">
          No one-line answer was stored with this run.
        </ThemedText>
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.xxs, borderLeftWidth: 4, borderRadius: radius.sm, paddingLeft: space.md, paddingVertical: space.xs },
});
