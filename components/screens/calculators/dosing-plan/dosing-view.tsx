import { StyleSheet, View } from 'react-native';

import { DataTable, type Column } from '@/components/screens/calculate/data-table';
import { formatNumber } from '@/components/screens/calculate/speciation-summary';
import type { ResultViewProps } from '@/components/screens/calculators/result-views';
import { space } from '@/components/theme/tokens';
import { Notice } from '@/components/ui/notice';
import { ThemedText } from '@/components/ui/themed-text';

import { dosingRows, isDosingResult, ligandsAndMetals, litresIn, planCautions, unitOf, volumeNumber, type DosingRow } from './dosing-words';
import { type TankUnit } from './use-bath-volume';

function columns(unit: TankUnit, ligands: readonly string[], metals: readonly string[]): Column<DosingRow>[] {
  return [
    { key: 'step', label: 'Step', flex: 2, cell: (r) => r.step },
    { key: 'volume', label: `Volume (${unit})`, flex: 1, align: 'right', cell: (r) => volumeNumber(litresIn(r.volume, unit)) },
    { key: 'pH', label: 'pH', flex: 0.7, align: 'right', cell: (r) => formatNumber(r.pH) },
    ...ligands.map((c): Column<DosingRow> => ({ key: `free:${c}`, label: `Free ${c} (mol/L)`, flex: 1.1, align: 'right', cell: (r) => formatNumber(r.free[c]) })),
    ...metals.map((c): Column<DosingRow> => ({ key: `metal:${c}`, label: `Dissolved ${c} (mol/L)`, flex: 1.1, align: 'right', cell: (r) => formatNumber(r.metal[c]) })),
    { key: 'solids', label: 'Solids', flex: 1.5, cell: (r) => r.solids },
    { key: 'notes', label: 'Notes', flex: 2, cell: (r) => r.notes },
  ];
}

/** Dosing plan: any cyanide-and-acid caution first, then the state of the vessel before the first step and after each one. */
export function DosingView({ problem, output, params }: ResultViewProps) {
  if (!isDosingResult(output)) return null;
  const unit = unitOf(params);
  const { ligands, metals } = ligandsAndMetals(problem);
  const cautions = planCautions(problem, output, params);
  return (
    <View style={styles.view} testID="dosing-view">
      {cautions.map((c) => (
        <Notice key={c.step} kind="error" message={c.text} testID={`dosing-acid-caution-${c.step}`} />
      ))}
      <ThemedText variant="body" weight="bold" accessibilityRole="header" aria-level={3}>
        The vessel step by step
      </ThemedText>
      <DataTable label="The vessel after each step" columns={columns(unit, ligands, metals)} rows={dosingRows(problem, output, params)} rowKey={(r) => r.key} testID="dosing-table" />
      <ThemedText variant="caption" tone="textMuted">
        A closed vessel: solids stay in it, so they can dissolve again later. Dissolved metal counts every dissolved form; the pH shows where it is held.
      </ThemedText>
    </View>
  );
}

const styles = StyleSheet.create({
  view: { gap: space.md },
});
