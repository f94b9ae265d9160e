import { StyleSheet, View } from 'react-native';

import { type CautionSpec } from '@/components/screens/safety/cautions';
import { CautionIcon } from '@/components/shell/icons';
import { radius, space } from '@/components/theme/tokens';
import { useTheme } from '@/components/theme/use-theme';
import { ThemedText } from '@/components/ui/themed-text';

const severityLabel = { danger: 'Danger', caution: 'Caution' } as const;

/** One standing caution, coloured by severity and always labelled with the severity in words. */
export function CautionCard({ caution }: { caution: CautionSpec }) {
  const { palette } = useTheme();
  const strong = caution.severity === 'danger' ? palette.danger : palette.caution;
  const soft = caution.severity === 'danger' ? palette.dangerSoft : palette.cautionSoft;
  const label = severityLabel[caution.severity];
  return (
    <View
      style={[styles.card, { backgroundColor: soft, borderColor: strong }]}
      accessibilityLabel={`${label}: ${caution.title}`}
      testID={`caution-${caution.key}`}
    >
      <View style={styles.head}>
        <CautionIcon color={strong} size={20} />
        <ThemedText variant="caption" weight="bold" style={[styles.severity, { color: strong }]}>
          {label.toUpperCase()}
        </ThemedText>
      </View>
      <ThemedText variant="body" weight="bold">
        {caution.title}
      </ThemedText>
      <ThemedText variant="label" weight="regular">
        {caution.body}
      </ThemedText>
    </View>
  );
}

const styles = StyleSheet.create({
  card: {
    gap: space.sm,
    padding: space.lg,
    borderRadius: radius.md,
    borderLeftWidth: 5,
  },
  head: { flexDirection: 'row', alignItems: 'center', gap: space.sm },
  severity: { letterSpacing: 1 },
});
