import { StyleSheet, View } from 'react-native';

import { CALCULATORS } from '@/components/screens/calculate/calculators';
import { space } from '@/components/theme/tokens';
import { Card } from '@/components/ui/card';
import { NavRow } from '@/components/ui/nav-row';
import { ScreenContainer } from '@/components/ui/screen-container';
import { StatusPill } from '@/components/ui/status-dot';
import { TextLink } from '@/components/ui/text-link';
import { ThemedText } from '@/components/ui/themed-text';

/** Calculate section: every calculator (with a link) and saved runs. */
export function CalculateScreen() {
  return (
    <ScreenContainer
      title="Calculate"
      subtitle="Equilibrium tools for solutions that hold metals as complex ions, on the reviewed constants library. Start from a bath to fill in its latest analysis."
    >
      <NavRow href="/calculate/runs" title="Saved runs" body="Calculations kept with the constant versions they used." />
      <View style={styles.grid}>
        {CALCULATORS.map((calc) => (
          <Card key={calc.key} style={styles.card} testID={`calculator-${calc.key}`}>
            <ThemedText variant="body" weight="bold" accessibilityRole="header" aria-level={2}>
              {calc.name}
            </ThemedText>
            <ThemedText variant="label" weight="regular" tone="textMuted" style={styles.description}>
              {calc.description}
            </ThemedText>
            {calc.href ? (
              <TextLink href={calc.href} label={`Open ${calc.name.toLowerCase()}`} accessibilityLabel={`Open ${calc.name}`} />
            ) : (
              <StatusPill kind="unknown" label="Not available yet" />
            )}
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
