import { StyleSheet, View } from 'react-native';

import { space } from '@/components/theme/tokens';
import { ErrorState } from '@/components/ui/error-state';
import { formatWhen } from '@/components/ui/format-date';
import { LoadingState } from '@/components/ui/loading-state';
import { TextLink } from '@/components/ui/text-link';
import { ThemedText } from '@/components/ui/themed-text';
import { useThresholds } from '@/lib/api/use-safety';
import { type HazardThresholds, THRESHOLD_LABELS } from '@/shared/safety';

/** A threshold's value as read: a pH, a percentage, mol/L, or whether it goes to the desk. */
export function thresholdText(key: keyof HazardThresholds, value: HazardThresholds[keyof HazardThresholds]): string {
  if (typeof value === 'boolean') return value ? 'Yes' : 'No';
  if (key === 'hcnFractionMax') return `${+(value * 100).toPrecision(3)} %`;
  if (key === 'ammoniaVapourMolPerL') return `${value} mol/L`;
  return `pH ${value}`;
}

/** The thresholds in force, with the version and who set them. */
export function ThresholdsSummary({ canEdit }: { canEdit: boolean }) {
  const { data, error, isLoading, mutate } = useThresholds();
  if (error) return <ErrorState message={error.message} onRetry={() => void mutate()} />;
  if (isLoading || !data) return <LoadingState label="Loading the thresholds…" />;
  const keys = Object.keys(THRESHOLD_LABELS) as (keyof HazardThresholds)[];
  return (
    <View style={styles.box} testID="thresholds-summary">
      <ThemedText variant="caption" tone="textMuted">
        {`Version ${data.version}, ${data.createdBy ? `set by ${data.createdBy.name}` : 'the built-in defaults'}, ${formatWhen(data.createdAt)}`}
      </ThemedText>
      {keys.map((k) => (
        <View key={k} style={styles.row} accessible accessibilityLabel={`${THRESHOLD_LABELS[k].label}: ${thresholdText(k, data.values[k])}`}>
          <ThemedText variant="label" weight="regular" style={styles.label}>
            {THRESHOLD_LABELS[k].label}
          </ThemedText>
          <ThemedText variant="label" weight="semibold">
            {thresholdText(k, data.values[k])}
          </ThemedText>
        </View>
      ))}
      <TextLink href="/safety/thresholds" label={canEdit ? 'Change the thresholds' : 'Thresholds and their history'} />
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.xs },
  row: { flexDirection: 'row', justifyContent: 'space-between', gap: space.md, flexWrap: 'wrap' },
  label: { flexShrink: 1 },
});
