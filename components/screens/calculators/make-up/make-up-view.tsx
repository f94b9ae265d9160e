import { StyleSheet, View } from 'react-native';

import { DataTable, type Column } from '@/components/screens/calculate/data-table';
import { formatNumber } from '@/components/screens/calculate/speciation-summary';
import { volumeText } from '@/components/screens/calculators/dosing-plan/dosing-words';
import type { ResultViewProps } from '@/components/screens/calculators/result-views';
import { space } from '@/components/theme/tokens';
import { ThemedText } from '@/components/ui/themed-text';
import { type MakeUpResult } from '@/lib/calculators/make-up';

import { isMakeUpResult, makeUpRows, massText, massUnitOf, stockAmount, stockMassText, stockText, tankText, targetWhat, type MakeUpRow } from './make-up-words';

const COLUMNS: readonly Column<MakeUpRow>[] = [
  { key: 'label', label: 'Quantity', flex: 2, cell: (r) => r.label },
  { key: 'before', label: 'Before', flex: 1, align: 'right', cell: (r) => (r.before === null ? '' : formatNumber(r.before)) },
  { key: 'after', label: 'After', flex: 1, align: 'right', cell: (r) => formatNumber(r.after) },
];

function saltOf(params: Record<string, unknown>): string {
  const salt = params.salt as { name?: unknown } | undefined;
  return typeof salt?.name === 'string' ? salt.name : 'the salt';
}

/** What happened when there is nothing to add: already there, or out of reach and how far it gets. */
function Outcome({ outcome, atMost, params }: { outcome: string; atMost: number | null; params: Record<string, unknown> }) {
  if (outcome === 'already_met') {
    return <ThemedText variant="body" testID="make-up-amount">{`Nothing to add: the ${targetWhat(params)} is already at or past the target.`}</ThemedText>;
  }
  return (
    <ThemedText variant="body" tone="danger" testID="make-up-amount">
      {`Out of reach: ${saltOf(params)} brings the ${targetWhat(params)} at most to ${formatNumber(atMost)} mol/L (with up to 10 mol of it per litre of bath).`}
    </ThemedText>
  );
}

/** The moles, the stock's weight, and the tank after, in one line. */
function detail(r: MakeUpResult, params: Record<string, unknown>, mass: string | null): string {
  const stock = stockAmount(r, params);
  const unit = (params.volume as { unit?: unknown } | undefined)?.unit === 'gal' ? 'gal' : 'L';
  const extra = stock && !r.stock ? stock.volumeL : 0;
  const parts = [
    `${formatNumber(r.addMol)} mol in all, ${formatNumber(r.addMolPerL)} mol per litre of bath`,
    stock ? `the stock at ${formatNumber(stock.percent)} % by mass and ${formatNumber(stock.densityKgPerL)} kg/L weighs ${stockMassText(r, params)} (${mass ?? '—'} of the substance itself)` : null,
    extra > 0 ? `its own ${formatNumber(extra)} L are not counted as dilution` : null,
    `the tank holds ${volumeText(r.finalVolumeL + extra, unit)} after`,
  ];
  return `${parts.filter(Boolean).join('; ')}.`;
}

/** Make-up: the amount to weigh (or the stock to pour), the moles, the target before and after, and the limit when it cannot be reached. */
export function MakeUpView({ output, params }: ResultViewProps) {
  if (!isMakeUpResult(output)) return null;
  const r = output;
  const unit = massUnitOf(params);
  const mass = massText(r, unit);
  const stock = stockAmount(r, params);
  const salt = saltOf(params);
  const lead = stock ? `${stockText(r, params)} of ${salt}` : mass ? `${mass} of ${salt}` : `${formatNumber(r.addMol)} mol of ${salt}`;
  return (
    <View style={styles.view} testID="make-up-view">
      {r.outcome === 'add' ? (
        <View style={styles.lead}>
          <ThemedText variant="label" tone="textMuted">{`Add to the ${tankText(params)} tank`}</ThemedText>
          <ThemedText variant="display" testID="make-up-amount">
            {lead}
          </ThemedText>
          <ThemedText variant="caption" tone="textMuted" testID="make-up-detail">
            {detail(r, params, mass)}
          </ThemedText>
        </View>
      ) : (
        <Outcome outcome={r.outcome} atMost={r.atMost} params={params} />
      )}
      <ThemedText variant="body" weight="bold" accessibilityRole="header" aria-level={3}>
        Before and after
      </ThemedText>
      <DataTable label="The target before and after the addition" columns={COLUMNS} rows={makeUpRows(r, params)} rowKey={(row) => row.key} testID="make-up-table" />
    </View>
  );
}

const styles = StyleSheet.create({
  view: { gap: space.md },
  lead: { gap: space.xxs },
});
