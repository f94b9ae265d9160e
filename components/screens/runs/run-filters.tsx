import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { ChoiceChips, type Choice } from '@/components/screens/calculate/choice-chips';
import { CALCULATOR_LABELS } from '@/components/screens/calculate/run-words';
import { activeFilterCount, type AuthorChoice, type DateProblems, type RunListState } from '@/components/screens/runs/use-run-filter';
import { space } from '@/components/theme/tokens';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/text-field';
import { ThemedText } from '@/components/ui/themed-text';
import { useBaths } from '@/lib/api/use-baths';
import { CALCULATOR_KEYS, type CalculatorKey } from '@/shared/calculators';

const CALCULATOR_CHOICES: readonly Choice<CalculatorKey | ''>[] = [
  { value: '', label: 'All', hint: 'Runs of every calculator' },
  ...CALCULATOR_KEYS.map((k) => ({ value: k, label: CALCULATOR_LABELS[k], hint: `Only ${CALCULATOR_LABELS[k].toLowerCase()} runs` })),
];

type AuthorValue = 'everyone' | 'mine' | 'person';

function authorValue(author: AuthorChoice): AuthorValue {
  return typeof author === 'object' ? 'person' : author;
}

function AuthorChips({ author, personName, onChange }: { author: AuthorChoice; personName?: string; onChange: (a: AuthorChoice) => void }) {
  const options: Choice<AuthorValue>[] = [
    { value: 'everyone', label: 'Everyone', hint: 'Runs saved by anyone on the team' },
    { value: 'mine', label: 'Mine', hint: 'Only the runs you saved' },
  ];
  if (typeof author === 'object') options.push({ value: 'person', label: `By ${personName ?? 'one person'}`, hint: 'Runs of the person the link named' });
  return (
    <ChoiceChips
      label="Saved by"
      options={options}
      value={authorValue(author)}
      onChange={(v) => {
        if (v !== 'person') onChange(v);
      }}
    />
  );
}

/** The bath filter: every bath on record (archived ones too), or any bath. */
function BathChips({ bath, linkedName, onChange }: { bath: string; linkedName?: string; onChange: (id: string) => void }) {
  const { data, error } = useBaths({ status: 'all' });
  if (error) {
    return (
      <ThemedText variant="label" weight="regular" tone="danger">
        {`Baths could not be loaded: ${error.message}`}
      </ThemedText>
    );
  }
  if (!data) {
    return (
      <ThemedText variant="label" weight="regular" tone="textMuted">
        Loading baths…
      </ThemedText>
    );
  }
  const options: Choice<string>[] = [
    { value: '', label: 'Any bath', hint: 'Runs for any bath, or none' },
    ...data.map((b) => ({ value: b.id, label: b.status === 'archived' ? `${b.name} (archived)` : b.name, hint: `Only runs made for ${b.name}` })),
  ];
  if (bath !== '' && !data.some((b) => b.id === bath)) options.push({ value: bath, label: linkedName ?? 'The bath in the link' });
  return <ChoiceChips label="Bath" options={options} value={bath} onChange={onChange} />;
}

type Props = {
  state: RunListState;
  problems: DateProblems;
  onChange: (patch: Partial<RunListState>) => void;
  onClear: () => void;
  wide: boolean;
  /** Names seen in the list, for a person or bath named by id in the link. */
  names: { person?: string; bath?: string };
};

/** Whose runs, then bath, calculator and dates; on a phone all but "Saved by" fold away behind one button. */
export function RunFilters({ state, problems, onChange, onClear, wide, names }: Props) {
  const [open, setOpen] = useState(false);
  const count = activeFilterCount(state);
  const shown = wide || open;
  return (
    <View style={styles.box} testID="run-filters">
      <AuthorChips author={state.author} personName={names.person} onChange={(author) => onChange({ author })} />
      <View style={styles.row}>
        {wide ? null : (
          <Button
            label={`${open ? 'Hide' : 'Show'} filters${count > 0 ? ` (${count} on)` : ''}`}
            accessibilityLabel={`${open ? 'Hide' : 'Show'} filters${count > 0 ? `, ${count} on` : ''}`}
            onPress={() => setOpen(!open)}
          />
        )}
        {count > 0 ? <Button label="Clear filters" onPress={onClear} /> : null}
      </View>
      {shown ? (
        <>
          <BathChips bath={state.bath} linkedName={names.bath} onChange={(bath) => onChange({ bath })} />
          <ChoiceChips label="Calculator" options={CALCULATOR_CHOICES} value={state.calculator} onChange={(calculator) => onChange({ calculator })} />
          <View style={wide ? styles.dates : styles.box}>
            <View style={wide ? styles.date : undefined}>
              <TextField label="From" hint="YYYY-MM-DD, the first day counted" value={state.from} onChangeText={(from) => onChange({ from })} error={problems.from} maxLength={10} autoComplete="off" />
            </View>
            <View style={wide ? styles.date : undefined}>
              <TextField label="To" hint="YYYY-MM-DD, the last day counted" value={state.to} onChangeText={(to) => onChange({ to })} error={problems.to} maxLength={10} autoComplete="off" />
            </View>
          </View>
        </>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.md },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  dates: { flexDirection: 'row', gap: space.md, alignItems: 'flex-start' },
  date: { flex: 1, maxWidth: 260 },
});
