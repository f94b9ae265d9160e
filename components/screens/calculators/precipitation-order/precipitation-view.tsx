import { StyleSheet, View } from 'react-native';

import { DataTable, type Column } from '@/components/screens/calculate/data-table';
import { formatNumber } from '@/components/screens/calculate/speciation-summary';
import { CurveChart } from '@/components/screens/calculators/curves/curve-chart';
import type { ResultViewProps } from '@/components/screens/calculators/result-views';
import { space } from '@/components/theme/tokens';
import { ThemedText } from '@/components/ui/themed-text';

import { cationsOf, isPrecipitationResult, orderChart, orderItems, thresholdRows, type ThresholdRow } from './precipitation-words';

/** Width of the chart in print, px. */
const PRINT_WIDTH = 640;

const OUTCOME: Record<ThresholdRow['outcome'], string> = { reached: '', already: 'saturated at the start', not_reached: 'not reached' };

function columns(precipitant: string, cations: readonly string[]): Column<ThresholdRow>[] {
  return [
    { key: 'solid', label: 'Solid', flex: 1.4, cell: (r) => `${r.order}. ${r.solid}${OUTCOME[r.outcome] ? ` (${OUTCOME[r.outcome]})` : ''}` },
    { key: 'total', label: `${precipitant} total (mol/L)`, flex: 1.2, align: 'right', cell: (r) => formatNumber(r.total) },
    { key: 'free', label: `Free ${precipitant} (mol/L)`, flex: 1.2, align: 'right', cell: (r) => formatNumber(r.free) },
    ...cations.map((c): Column<ThresholdRow> => ({ key: `left:${c}`, label: `${c} left (mol/L)`, flex: 1.2, align: 'right', cell: (r) => formatNumber(r.left[c]) })),
  ];
}

/** Precipitation order: the order in words, the thresholds table and a chart of what is left of each ion as the precipitant rises. */
export function PrecipitationView({ problem, output, params, print = false }: ResultViewProps) {
  if (!isPrecipitationResult(output)) return null;
  const r = output;
  const max = typeof params.maxPrecipitantMolPerL === 'number' ? params.maxPrecipitantMolPerL : 10;
  const items = orderItems(r, max);
  const cations = cationsOf(r);
  const chart = orderChart(problem, r);
  const p = r.precipitant;
  return (
    <View style={styles.view} testID="precipitation-view">
      <ThemedText variant="body" weight="bold" accessibilityRole="header" aria-level={3}>
        {`The order as ${p} is added`}
      </ThemedText>
      {items.length === 0 ? (
        <ThemedText variant="body" tone="textMuted">{`No solid of the system holds ${p}.`}</ThemedText>
      ) : (
        <View role="list" aria-label="The order the solids appear" style={styles.list} testID="precipitation-order-list">
          {items.map((item, i) => (
            <View key={item.key} role="listitem" style={styles.item}>
              <ThemedText variant="body" selectable>{`${i + 1}. ${item.text}`}</ThemedText>
              {item.then ? (
                <ThemedText variant="caption" tone="textMuted" selectable style={styles.indent}>
                  {item.then}
                </ThemedText>
              ) : null}
            </View>
          ))}
        </View>
      )}
      <ThemedText variant="body" weight="bold" accessibilityRole="header" aria-level={3}>
        Thresholds
      </ThemedText>
      <DataTable label="Where each solid starts and what is left dissolved" columns={columns(p, cations)} rows={thresholdRows(r)} rowKey={(row) => row.key} testID="precipitation-table" />
      {chart.xs.length >= 2 && chart.series.length > 0 ? (
        <View style={styles.chart}>
          <CurveChart
            title="Left dissolved"
            yTitle="Each metal left dissolved (mol/L, log scale)"
            xTitle={`Free ${p} (mol/L, log scale)`}
            xs={chart.xs}
            keep={chart.xs.map(() => true)}
            series={chart.series}
            xScale="log"
            yScale="log"
            width={print ? PRINT_WIDTH : undefined}
            testID="precipitation-chart"
          />
          <ThemedText variant="caption" tone="textMuted">
            Lines join the start (every metal dissolved) and each threshold worked out; between them the curve is drawn straight, not worked out.
          </ThemedText>
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  view: { gap: space.md },
  list: { gap: space.sm },
  item: { gap: space.xxs },
  indent: { paddingLeft: space.lg },
  chart: { gap: space.xs },
});
