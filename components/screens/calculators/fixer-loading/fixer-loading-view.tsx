import { StyleSheet, View } from 'react-native';

import { DataTable, type Column } from '@/components/screens/calculate/data-table';
import { formatNumber } from '@/components/screens/calculate/speciation-summary';
import type { ResultViewProps } from '@/components/screens/calculators/result-views';
import { space } from '@/components/theme/tokens';
import { ThemedText } from '@/components/ui/themed-text';

import { fixerRows, isFixerResult, loadingShare, type FixerRow } from './fixer-words';
import { LoadingBar } from './loading-bar';

const COLUMNS: readonly Column<FixerRow>[] = [
  { key: 'label', label: 'Silver', flex: 2, cell: (r) => r.label },
  { key: 'g', label: 'g/L Ag', flex: 1.2, align: 'right', cell: (r) => formatNumber(r.gramsPerL) },
  { key: 'mol', label: 'mol/L', flex: 1.2, align: 'right', cell: (r) => formatNumber(r.molPerL) },
];

/** Fixer loading: the loading bar, silver now against capacity, and the halide it can still take. */
export function FixerLoadingView({ output, print }: ResultViewProps) {
  if (!isFixerResult(output)) return null;
  const share = loadingShare(output);
  const solid = output.headroom?.solid ?? 'AgBr(s)';
  const solidG = output.capacity?.solidGramsPerL;
  return (
    <View style={styles.view} testID="fixer-loading-view">
      {share !== null ? <LoadingBar percent={share} width={print ? 640 : undefined} /> : null}
      <DataTable label="Silver held and capacity" columns={COLUMNS} rows={fixerRows(output)} rowKey={(r) => r.key} testID="fixer-table" />
      <ThemedText variant="caption" tone="textMuted">
        {`As ${solid.replace(/\(s\)$/, '')}, the fixer can still take ${formatNumber(solidG)} g/L before the solid persists. Capacity is worked out on the full equilibrium at the fixer’s composition as entered.`}
      </ThemedText>
    </View>
  );
}

const styles = StyleSheet.create({
  view: { gap: space.md },
});
