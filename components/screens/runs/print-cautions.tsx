import { StyleSheet, View } from 'react-native';

import { cautionsFor } from '@/components/screens/runs/run-cautions';
import { CautionCard } from '@/components/screens/safety/caution-card';
import { space } from '@/components/theme/tokens';
import { ThemedText } from '@/components/ui/themed-text';

/** The Safety section's standing cautions that the run's chemistry calls for, and the line that always applies. */
export function PrintCautions({ formulas }: { formulas: ReadonlySet<string> }) {
  const cautions = cautionsFor(formulas);
  return (
    <View style={styles.section} testID="print-cautions">
      <ThemedText variant="title" accessibilityRole="header" aria-level={2}>
        Safety
      </ThemedText>
      {cautions.length > 0 ? (
        <View style={styles.section} role="list" aria-label="Standing cautions">
          {cautions.map((c) => (
            <View key={c.key} role="listitem">
              <CautionCard caution={c} />
            </View>
          ))}
        </View>
      ) : null}
      <ThemedText variant="label" weight="semibold">
        Follow the SDS, local codes and licensed practice.
      </ThemedText>
    </View>
  );
}

const styles = StyleSheet.create({
  section: { gap: space.sm },
});
