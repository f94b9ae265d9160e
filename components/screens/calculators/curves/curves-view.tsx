import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import type { ResultViewProps } from '@/components/screens/calculators/result-views';
import { space } from '@/components/theme/tokens';
import { ToggleChip } from '@/components/ui/chip';
import { ThemedText } from '@/components/ui/themed-text';

import { CurveChart } from './curve-chart';
import { type AxisScale } from './curve-model';
import { chartGroups, isCurve, type ChartGroup } from './curve-groups';

/** Width of a chart in print, px. */
export const PRINT_CHART_WIDTH = 640;

function GroupChart({ group, print, xs, keep, xTitle, xScale }: { group: ChartGroup; print: boolean; xs: number[]; keep: boolean[]; xTitle: string; xScale: AxisScale }) {
  const [log, setLog] = useState(group.defaultScale === 'log');
  const yScale: AxisScale = group.canLog && log ? 'log' : 'linear';
  return (
    <View style={styles.group}>
      <CurveChart
        title={group.title}
        yTitle={`${group.title} (${yScale === 'log' ? `${group.axisUnit}, log scale` : group.axisUnit})`}
        xTitle={xTitle}
        xs={xs}
        keep={keep}
        series={group.series}
        xScale={xScale}
        yScale={yScale}
        yDomain={group.fixedDomain}
        width={print ? PRINT_CHART_WIDTH : undefined}
        testID={`curve-chart-${group.id}`}
      />
      {group.canLog && !print ? (
        <ToggleChip label="Log scale" accessibilityLabel={`Log scale for ${group.title.toLowerCase()}`} checked={log} onToggle={() => setLog(!log)} />
      ) : null}
    </View>
  );
}

/** Curves: one chart per kind of quantity (concentrations on a log scale by default, fractions and saturation indices linear), gaps where a point did not settle. */
export function CurvesView({ output, params, print = false }: ResultViewProps) {
  if (!isCurve(output)) return null;
  const xs = output.points.map((p) => p.x);
  const keep = output.points.map((p) => p.status === 'converged');
  const unsettled = keep.filter((k) => !k).length;
  const xScale: AxisScale = params.spacing === 'log' ? 'log' : 'linear';
  const xTitle = `${output.axis.label} (${output.axis.unit}${xScale === 'log' ? ', log scale' : ''})`;
  return (
    <View style={styles.view} testID="curves-view">
      {chartGroups(output).map((group) => (
        <GroupChart key={group.id} group={group} print={print} xs={xs} keep={keep} xTitle={xTitle} xScale={xScale} />
      ))}
      {unsettled > 0 ? (
        <ThemedText variant="caption" tone="caution" weight="semibold">
          {`${unsettled} of ${xs.length} points did not settle; they are left out of the charts as gaps and marked in the CSV.`}
        </ThemedText>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  view: { gap: space.lg },
  group: { gap: space.xs },
});
