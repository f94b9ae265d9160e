import { StyleSheet, View } from 'react-native';

import { CautionNote } from '@/components/screens/calculate/caution-note';
import { DataTable, type Column } from '@/components/screens/calculate/data-table';
import {
  formatNumber,
  formatPercent,
  notSettledMessage,
  solidRows,
  speciesRows,
  verdict,
  type SolidRow,
  type SpeciesRow,
} from '@/components/screens/calculate/speciation-summary';
import { space } from '@/components/theme/tokens';
import { Notice } from '@/components/ui/notice';
import { ThemedText } from '@/components/ui/themed-text';
import { type ProblemJson, type SolveResultJson } from '@/shared/constants';

const SPECIES_COLUMNS: readonly Column<SpeciesRow>[] = [
  { key: 'name', label: 'Species', flex: 2, cell: (r) => r.name },
  { key: 'molL', label: 'mol/L', flex: 1.5, align: 'right', cell: (r) => formatNumber(r.molL) },
  {
    key: 'share',
    label: 'Share of its metal',
    flex: 1.5,
    align: 'right',
    cell: (r) => (r.metal && r.pctOfMetal !== null ? `${formatPercent(r.pctOfMetal)} % of ${r.metal}` : '—'),
  },
];

/** A saturation index in log units, two decimals; -∞ when an ion of the solid is absent. */
function saturationText(si: number): string {
  if (si === Number.NEGATIVE_INFINITY) return 'none (an ion of it is absent)';
  return Number.isFinite(si) ? si.toFixed(2) : '—';
}

const SOLID_COLUMNS: readonly Column<SolidRow>[] = [
  { key: 'name', label: 'Solid', flex: 2, cell: (r) => r.name },
  { key: 'present', label: 'Present (mol/L)', flex: 1.5, align: 'right', cell: (r) => (r.present ? formatNumber(r.molL) : 'not present') },
  { key: 'si', label: 'Saturation index', flex: 1.5, align: 'right', cell: (r) => saturationText(r.saturationIndex) },
];

function Heading({ children }: { children: string }) {
  return (
    <ThemedText variant="body" weight="bold" accessibilityRole="header" aria-level={3}>
      {children}
    </ThemedText>
  );
}

type Props = { problem: ProblemJson; result: SolveResultJson; metals: readonly string[] };

/** A speciation result: a one-line verdict, species and solids tables, the solver's numbers and its cautions. */
export function SpeciationResult({ problem, result, metals }: Props) {
  const unsettled = notSettledMessage(result);
  const solids = solidRows(problem, result, metals);
  const activity = result.activity === 'davies' ? 'Davies' : 'ideal';
  return (
    <View style={styles.result} testID="speciation-result">
      {unsettled ? (
        <Notice kind="error" message={unsettled} testID="not-settled" />
      ) : (
        <>
          <ThemedText variant="body" weight="semibold" testID="verdict" accessibilityLiveRegion="polite">
            {verdict(problem, result, metals)}
          </ThemedText>
          <Heading>Species</Heading>
          <DataTable label="Species" columns={SPECIES_COLUMNS} rows={speciesRows(problem, result, metals)} rowKey={(r) => r.name} testID="species" />
          <Heading>Solids</Heading>
          {solids.length === 0 ? (
            <ThemedText variant="label" weight="regular" tone="textMuted">
              No solid was allowed in this calculation.
            </ThemedText>
          ) : (
            <DataTable label="Solids" columns={SOLID_COLUMNS} rows={solids} rowKey={(r) => r.name} testID="solids" />
          )}
        </>
      )}
      <View style={styles.facts}>
        <ThemedText variant="label" weight="regular">{`Ionic strength: ${unsettled ? '—' : `${formatNumber(result.ionicStrength)} mol/L`}`}</ThemedText>
        <ThemedText variant="label" weight="regular">{`Largest mass-balance residual: ${formatNumber(result.residual, 2)}`}</ThemedText>
        <ThemedText variant="caption" tone="textMuted">
          {`Activity: ${activity} · ${Number.isFinite(result.temperatureC) ? result.temperatureC : '—'} °C · ${result.iterations} iterations`}
        </ThemedText>
      </View>
      {result.warnings.length > 0 ? (
        <View style={styles.warnings}>
          <Heading>Cautions</Heading>
          {result.warnings.map((w) => (
            <CautionNote key={w} message={w} />
          ))}
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  result: { gap: space.md },
  facts: { gap: space.xxs },
  warnings: { gap: space.xs },
});
