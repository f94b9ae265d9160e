import { StyleSheet, View } from 'react-native';

import { CALCULATORS } from '@/components/screens/calculate/calculators';
import { space } from '@/components/theme/tokens';
import { Card } from '@/components/ui/card';
import { ScreenContainer } from '@/components/ui/screen-container';
import { StatusPill } from '@/components/ui/status-dot';
import { ThemedText } from '@/components/ui/themed-text';

/** Calculate section: lists the planned calculators, each honestly marked as not yet available. */
export function CalculateScreen() {
  return (
    <ScreenContainer
      title="Calculate"
      subtitle="Equilibrium tools for solutions that hold metals as complex ions. None of them run in this build yet."
    >
      <View style={styles.grid}>
        {CALCULATORS.map((calc) => (
          <Card key={calc.key} style={styles.card} testID={`calculator-${calc.key}`}>
            <ThemedText variant="body" weight="bold" accessibilityRole="header" aria-level={2}>
              {calc.name}
            </ThemedText>
            <ThemedText variant="label" weight="regular" tone="textMuted" style={styles.description}>
              {calc.description}
            </ThemedText>
            <StatusPill kind="unknown" label="Not available yet" />
          </Card>
        ))}
      </View>
    </ScreenContainer>
  );
}

const styles = StyleSheet.create({
  grid: { flexDirection: 'row', flexWrap: 'wrap', gap: space.lg },
  card: { flexGrow: 1, flexBasis: 260, justifyContent: 'space-between' },
  description: { flexGrow: 1 },
});
