import { StyleSheet, View } from 'react-native';

import { space } from '@/components/theme/tokens';
import { TextLink } from '@/components/ui/text-link';
import { ThemedText } from '@/components/ui/themed-text';
import { CALCULATOR_LABELS, type CalculatorKey } from '@/shared/calculators';
import { type Bath } from '@/shared/baths';

// The calculators a bath of each kind is usually checked with, first the one asked most often.
const FOR_FIXER: readonly CalculatorKey[] = ['fixer_loading', 'speciation', 'curves', 'make_up'];
const FOR_BATH: readonly CalculatorKey[] = ['headroom', 'speciation', 'curves', 'make_up', 'dosing_plan'];

const ROUTE: Record<CalculatorKey, string> = {
  headroom: 'headroom',
  fixer_loading: 'fixer-loading',
  speciation: 'speciation',
  curves: 'curves',
  precipitation_order: 'precipitation-order',
  dosing_plan: 'dosing-plan',
  make_up: 'make-up',
};

/** Links that open a calculator with this bath's latest analysis filled in. */
export function BathCalculations({ bath }: { bath: Bath }) {
  const keys = bath.process === 'thiosulfate_fixer' ? FOR_FIXER : FOR_BATH;
  return (
    <View style={styles.block} testID="bath-calculations">
      <ThemedText variant="label" accessibilityRole="header" aria-level={3}>
        Calculate from the latest analysis
      </ThemedText>
      <View style={styles.row}>
        {keys.map((key) => (
          <TextLink
            key={key}
            href={`/calculate/${ROUTE[key]}?bath=${encodeURIComponent(bath.id)}`}
            label={CALCULATOR_LABELS[key].label}
            accessibilityLabel={`${CALCULATOR_LABELS[key].label} for ${bath.name}`}
            hint={CALCULATOR_LABELS[key].does}
          />
        ))}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  block: { gap: space.xs },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.lg },
});
