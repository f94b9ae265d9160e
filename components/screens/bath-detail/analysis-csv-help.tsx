import { StyleSheet, View } from 'react-native';

import { radius, space } from '@/components/theme/tokens';
import { useTheme } from '@/components/theme/use-theme';
import { ThemedText } from '@/components/ui/themed-text';
import { quantityLabel, unitOf } from '@/lib/baths/quantities';
import { ANALYSIS_CSV_COLUMNS, ANALYSIS_CSV_REQUIRED, ANALYSIS_IMPORT_MAX_ROWS, BATH_UNITS, type Bath } from '@/shared/baths';

type Column = (typeof ANALYSIS_CSV_COLUMNS)[number];
type ValueColumn = Exclude<Column, `${string}_unit`>;

/** What each column other than the unit columns holds, for this bath. */
function columnWords(bath: Bath): Record<ValueColumn, string> {
  return {
    sampled_at: 'date of sampling, YYYY-MM-DD, or date and time in ISO 8601 (2026-03-04T14:30+01:00)',
    analyst: 'who ran the analysis',
    metal: `${quantityLabel('metal', bath)}, a number`,
    free_ligand: `${quantityLabel('freeLigand', bath)}, a number`,
    total_ligand: `${quantityLabel('totalLigand', bath)}, a number`,
    ph: 'the pH',
    carbonate: `${quantityLabel('carbonate', bath)}, a number`,
    bromide: 'bromide, a number',
    notes: 'anything worth keeping with the result',
  };
}

/** The columns that apply to a bath: carbonate and bromide only for baths that log them. */
function columnsFor(bath: Bath): Column[] {
  const skipped = (['carbonate', 'bromide'] as const).filter((e) => !bath.extras.includes(e));
  return ANALYSIS_CSV_COLUMNS.filter((c) => !skipped.some((e) => c === e || c === `${e}_unit`));
}

/** An example header and line for this bath, using its own quantities and leaving the units to the bath. */
export function exampleCsv(bath: Bath): string {
  const cols: [string, string][] = [
    ['sampled_at', '2026-03-04'],
    ['analyst', 'Cora Quill'],
    ['metal', '31.2'],
    ['free_ligand', '112'],
    ['ph', '12.1'],
    ...bath.extras.map((e): [string, string] => [e, e === 'carbonate' ? '18' : '4.5']),
    ['notes', 'after top-up'],
  ];
  return `${cols.map((c) => c[0]).join(',')}\n${cols.map((c) => c[1]).join(',')}`;
}

function ColumnLine({ name, words }: { name: string; words: string }) {
  return (
    <ThemedText variant="label" weight="regular">
      <ThemedText variant="label" weight="semibold" selectable>
        {name}
      </ThemedText>
      {` — ${words}`}
    </ThemedText>
  );
}

function SubHeading({ children }: { children: string }) {
  return (
    <ThemedText variant="label" accessibilityRole="header" aria-level={3}>
      {children}
    </ThemedText>
  );
}

/** Explains the file an analyses upload reads: required and optional columns, units, and an example. */
export function AnalysisCsvHelp({ bath }: { bath: Bath }) {
  const { palette } = useTheme();
  const words = columnWords(bath);
  const required: readonly string[] = ANALYSIS_CSV_REQUIRED;
  const columns = columnsFor(bath);
  const values = columns.filter((c): c is ValueColumn => !c.endsWith('_unit') && !required.includes(c));
  const units = columns.filter((c) => c.endsWith('_unit'));
  return (
    <View style={styles.stack} testID="analysis-csv-help">
      <ThemedText variant="label" weight="regular">
        {`A CSV file with a header line naming its columns, in any order, and one analysis per line (at most ${ANALYSIS_IMPORT_MAX_ROWS} lines). Leave a cell empty for a value that was not measured.`}
      </ThemedText>
      <SubHeading>Required</SubHeading>
      {ANALYSIS_CSV_REQUIRED.map((c) => (
        <ColumnLine key={c} name={c} words={words[c]} />
      ))}
      <SubHeading>Optional</SubHeading>
      {values.map((c) => (
        <ColumnLine key={c} name={c} words={words[c]} />
      ))}
      <ThemedText variant="label" weight="regular">
        {units.map((c, i) => (
          <ThemedText key={c} variant="label" weight="semibold" selectable>
            {`${c}${i < units.length - 1 ? ', ' : ''}`}
          </ThemedText>
        ))}
        {` — the unit of the value column of the same name: one of ${BATH_UNITS.join(', ')}.`}
      </ThemedText>
      <ThemedText variant="caption" tone="textMuted">
        {`Without a unit column, or with its cell empty, values are read in the bath's units: metal in ${bath.metalUnit}, ligand in ${bath.ligandUnit} as ${bath.ligandAs}${bath.extras.length > 0 ? `, ${bath.extras.join(' and ')} in ${unitOf(bath, bath.extras[0]!)}` : ''}.`}
      </ThemedText>
      <SubHeading>Example</SubHeading>
      <View style={[styles.example, { backgroundColor: palette.surfaceRaised, borderColor: palette.border }]}>
        <ThemedText variant="caption" selectable testID="analysis-csv-example">
          {exampleCsv(bath)}
        </ThemedText>
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  stack: { gap: space.xs },
  example: { borderWidth: 1, borderRadius: radius.sm, padding: space.sm },
});
