import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { TrendChart, type TrendPoint } from '@/components/charts/trend-chart';
import { shownValue, targetOf } from '@/components/screens/bath-detail/bath-words';
import { ChoiceChips } from '@/components/screens/calculate/choice-chips';
import { space } from '@/components/theme/tokens';
import { quantityLabel, unitOf } from '@/lib/baths/quantities';
import { type Analysis, type Bath, type Quantity } from '@/shared/baths';

/** One quantity's results in the bath's units, as chart points. */
export function trendPoints(bath: Bath, analyses: readonly Analysis[], q: Quantity): TrendPoint[] {
  const points: TrendPoint[] = [];
  for (const a of analyses) {
    const value = shownValue(bath, q, a.values[q]);
    if (value !== null) points.push({ at: a.sampledAt, value, key: a.id });
  }
  return points;
}

function QuantityChart({ bath, analyses, q }: { bath: Bath; analyses: readonly Analysis[]; q: Quantity }) {
  return (
    <TrendChart
      title={quantityLabel(q, bath)}
      unit={unitOf(bath, q)}
      points={trendPoints(bath, analyses, q)}
      band={targetOf(bath, q) ?? null}
      testID={`trend-${q}`}
    />
  );
}

type Props = { bath: Bath; analyses: readonly Analysis[]; quantities: readonly Quantity[]; oneAtATime: boolean };

/**
 * One trend chart per quantity the bath logs, with its target band. On a phone, chips choose the one
 * chart shown; on a wide screen every chart is shown, one under the other.
 */
export function BathTrends({ bath, analyses, quantities, oneAtATime }: Props) {
  const [chosen, setChosen] = useState<Quantity>(quantities[0] ?? 'metal');
  if (!oneAtATime) {
    return (
      <View style={styles.stack} testID="bath-trends">
        {quantities.map((q) => (
          <QuantityChart key={q} bath={bath} analyses={analyses} q={q} />
        ))}
      </View>
    );
  }
  const shown = quantities.includes(chosen) ? chosen : (quantities[0] ?? 'metal');
  return (
    <View style={styles.stack} testID="bath-trends">
      <ChoiceChips<Quantity> label="Show the trend of" options={quantities.map((q) => ({ value: q, label: quantityLabel(q, bath) }))} value={shown} onChange={setChosen} />
      <QuantityChart bath={bath} analyses={analyses} q={shown} />
    </View>
  );
}

const styles = StyleSheet.create({
  stack: { gap: space.lg, minWidth: 0 },
});
