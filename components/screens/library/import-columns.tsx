import { StyleSheet, View } from 'react-native';

import { space } from '@/components/theme/tokens';
import { Card } from '@/components/ui/card';
import { ThemedText } from '@/components/ui/themed-text';
import { CONSTANT_KINDS, CSV_COLUMNS, CSV_REQUIRED, IMPORT_MAX_ROWS } from '@/shared/constants';

const IGNORED = ['status', 'version', 'id', 'lineage_id'] as const;

/** What each column holds, in the words a chemist filling a sheet needs. */
const COLUMN_WORDS: Record<(typeof CSV_COLUMNS)[number], string> = {
  kind: `one of ${CONSTANT_KINDS.join(', ')}`,
  reaction: 'the equation, species separated by " + " and the sides by "=", e.g. Ag+ + 2 NH3 = Ag(NH3)2+',
  log_value: 'log10 of the constant, e.g. 7.23',
  uncertainty: '± in log units',
  temperature_c: '°C (25 when empty)',
  ionic_strength: 'mol/L the value was measured at (0 when empty)',
  medium: 'the background electrolyte, e.g. 1 M NaNO3',
  enthalpy_kj_mol: 'reaction enthalpy, kJ/mol',
  source: 'the published source: handbook, table, year',
  note: 'why this value, for the reviewer',
  status: 'ignored on import',
  version: 'ignored on import',
  id: 'ignored on import',
  lineage_id: 'ignored on import',
};

function ColumnLine({ name }: { name: (typeof CSV_COLUMNS)[number] }) {
  return (
    <ThemedText variant="label" weight="regular">
      <ThemedText variant="label" weight="semibold" selectable>
        {name}
      </ThemedText>
      {` — ${COLUMN_WORDS[name]}`}
    </ThemedText>
  );
}

/** Explains the file the import reads: required, optional and ignored columns, and what happens to each row. */
export function ImportColumns() {
  const required: readonly string[] = CSV_REQUIRED;
  const optional = CSV_COLUMNS.filter((c) => !required.includes(c) && !(IGNORED as readonly string[]).includes(c));
  return (
    <Card style={styles.card} testID="import-columns">
      <ThemedText variant="title" accessibilityRole="header" aria-level={2}>
        What the file holds
      </ThemedText>
      <ThemedText variant="body">
        {`A CSV file with a header line naming its columns, in any order, and one constant per line (at most ${IMPORT_MAX_ROWS} lines). The library's own CSV export has the same columns, so an exported file can be edited and brought back.`}
      </ThemedText>
      <ThemedText variant="label" accessibilityRole="header" aria-level={3}>
        Required
      </ThemedText>
      <View style={styles.lines}>
        {CSV_REQUIRED.map((c) => (
          <ColumnLine key={c} name={c} />
        ))}
      </View>
      <ThemedText variant="label" accessibilityRole="header" aria-level={3}>
        Optional
      </ThemedText>
      <View style={styles.lines}>
        {optional.map((c) => (
          <ColumnLine key={c} name={c} />
        ))}
      </View>
      <ThemedText variant="caption" tone="textMuted">{`Ignored if present: ${IGNORED.join(', ')}.`}</ThemedText>
      <ThemedText variant="label" accessibilityRole="header" aria-level={3}>
        What happens to each row
      </ThemedText>
      <ThemedText variant="label" weight="regular">
        Every imported row becomes a draft that a reviewer approves or rejects; nothing reaches calculations before that. A row for a reaction the library already holds becomes a proposed new version of it. A row identical to the approved value is skipped as unchanged.
      </ThemedText>
    </Card>
  );
}

const styles = StyleSheet.create({
  card: { gap: space.sm },
  lines: { gap: space.xxs },
});
