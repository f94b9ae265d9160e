import { StyleSheet, View } from 'react-native';

import { DataTable, type Column } from '@/components/screens/calculate/data-table';
import { formatNumber } from '@/components/screens/calculate/speciation-summary';
import type { ResultViewProps } from '@/components/screens/calculators/result-views';
import { space } from '@/components/theme/tokens';
import { ThemedText } from '@/components/ui/themed-text';
import { type HeadroomResult } from '@/lib/calculators/headroom';

import { elementOf, HEADROOM_UNITS, headroomAmount, headroomRows, isPrecious, usableUnit, type HeadroomRow } from './headroom-words';

const COLUMNS: readonly Column<HeadroomRow>[] = [
  { key: 'label', label: 'Quantity', flex: 2, cell: (r) => r.label },
  { key: 'now', label: 'Now (mol/L)', flex: 1.5, align: 'right', cell: (r) => formatNumber(r.now) },
  { key: 'saturated', label: 'At saturation (mol/L)', flex: 1.5, align: 'right', cell: (r) => formatNumber(r.saturated) },
];

/** Whether a stored output looks like a headroom result (older runs have none). */
export function isHeadroomResult(output: unknown): output is HeadroomResult {
  return typeof output === 'object' && output !== null && 'solid' in output && 'outcome' in output && 'now' in output;
}

/** The headroom in every unit that applies, in one line. */
function AllUnits({ r, lead }: { r: HeadroomResult; lead: string }) {
  const metal = r.metal?.component ?? null;
  const others = HEADROOM_UNITS.filter((u) => u !== lead && (u !== 'troy oz/gal' || isPrecious(metal)))
    .map((u) => headroomAmount(r, u))
    .filter((a) => a.value !== null)
    .map((a) => `${a.text} ${a.what}`);
  const asMetal = r.metal && Number.isFinite(r.metal.gramsPerL ?? Number.NaN) ? `; as metal ${formatNumber(r.metal.gramsPerL)} g/L ${elementOf(r.metal.component)}` : '';
  return (
    <ThemedText variant="caption" tone="textMuted" testID="headroom-units">
      {`The same: ${others.join(' · ') || '—'}${asMetal}.`}
    </ThemedText>
  );
}

/** Headroom: how much more of the solid the bath takes, in the chosen unit and the others, and the bath now against saturated. */
export function HeadroomView({ problem, output, params }: ResultViewProps) {
  if (!isHeadroomResult(output)) return null;
  const r = output;
  const unit = usableUnit(params.unit, r.metal?.component);
  const lead = headroomAmount(r, unit);
  const present = Object.entries((r.atSaturation?.solids ?? {}) as Record<string, number | null>).filter(([, v]) => typeof v === 'number' && v > 0).map(([k]) => k);
  return (
    <View style={styles.view} testID="headroom-view">
      <View style={styles.lead}>
        <ThemedText variant="label" tone="textMuted">{`More ${lead.what} the bath takes`}</ThemedText>
        <ThemedText variant="display" testID="headroom-amount">
          {r.outcome === 'already_saturated' ? `0 ${unit}` : lead.text}
        </ThemedText>
        <AllUnits r={r} lead={unit} />
      </View>
      <ThemedText variant="body" weight="bold" accessibilityRole="header" aria-level={3}>
        Now and at saturation
      </ThemedText>
      <DataTable label="The bath now and at saturation" columns={COLUMNS} rows={headroomRows(problem, r)} rowKey={(row) => row.key} testID="headroom-table" />
      <ThemedText variant="caption" tone="textMuted">
        {present.length > 0
          ? `At saturation the solid present is ${present.join(', ')}.`
          : 'At saturation the solid is on the point of forming.'}
        {r.freeH !== null && Number.isFinite(r.freeH) ? ` The pH is held: free [H+] ${formatNumber(r.freeH)} mol/L.` : ''}
      </ThemedText>
    </View>
  );
}

const styles = StyleSheet.create({
  view: { gap: space.sm },
  lead: { gap: space.xxs },
});
