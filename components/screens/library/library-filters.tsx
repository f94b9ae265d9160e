import { useState, type ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';

import { activeFilters, type ListState } from '@/components/screens/library/use-library-filter';
import { LIGAND_CHOICES, METAL_CHOICES, STATUS_FILTERS, type SpeciesChoice } from '@/components/screens/library/words';
import { space } from '@/components/theme/tokens';
import { Button } from '@/components/ui/button';
import { ToggleChip } from '@/components/ui/chip';
import { TextField } from '@/components/ui/text-field';
import { ThemedText } from '@/components/ui/themed-text';
import { CONSTANT_KINDS, KIND_LABELS, type ConstantSort } from '@/shared/constants';

/** Sort choices for phones, where there are no column headers to press. */
export const SORT_CHOICES: readonly { key: ConstantSort; label: string }[] = [
  { key: 'reaction', label: 'Reaction' },
  { key: 'defines', label: 'Species defined' },
  { key: 'kind', label: 'Kind' },
  { key: 'logValue', label: 'Log value' },
  { key: 'status', label: 'Status' },
  { key: 'proposedAt', label: 'Date proposed' },
];

function ChipGroup({ label, children }: { label: string; children: ReactNode }) {
  return (
    <View style={styles.group} role="group" aria-label={label}>
      <ThemedText variant="label" weight="regular" tone="textMuted">
        {label}
      </ThemedText>
      <View style={styles.chips}>{children}</View>
    </View>
  );
}

type Update = (patch: Partial<ListState>) => void;

function SpeciesChips({ label, what, choices, value, onPick }: {
  label: string;
  what: string;
  choices: readonly SpeciesChoice[];
  value: string | undefined;
  onPick: (formula: string | undefined) => void;
}) {
  return (
    <ChipGroup label={label}>
      {choices.map((c) => (
        <ToggleChip
          key={c.formula}
          label={c.label}
          accessibilityLabel={`${c.label}, ${c.name}`}
          hint={`Only constants with ${what} ${c.formula}; press again for all`}
          checked={value === c.formula}
          onToggle={() => onPick(value === c.formula ? undefined : c.formula)}
        />
      ))}
    </ChipGroup>
  );
}

function SortChips({ state, onChange }: { state: ListState; onChange: Update }) {
  const ascending = state.dir === 'asc';
  return (
    <ChipGroup label="Sort by">
      {SORT_CHOICES.map((s) => (
        <ToggleChip
          key={s.key}
          label={s.label}
          accessibilityLabel={`Sort by ${s.label.toLowerCase()}`}
          checked={state.sort === s.key}
          onToggle={() => onChange({ sort: s.key })}
        />
      ))}
      <Button
        label={ascending ? 'Ascending ↑' : 'Descending ↓'}
        accessibilityLabel={ascending ? 'Sorted ascending; sort descending' : 'Sorted descending; sort ascending'}
        onPress={() => onChange({ dir: ascending ? 'desc' : 'asc' })}
      />
    </ChipGroup>
  );
}

type Props = { state: ListState; onChange: Update; onClear: () => void; wide: boolean };

/** Search, then metal, ligand, kind and status filters; on a phone the chips fold away behind one button. */
export function LibraryFilters({ state, onChange, onClear, wide }: Props) {
  const [open, setOpen] = useState(false);
  const count = activeFilters(state);
  const shown = wide || open;
  return (
    <View style={styles.box}>
      <TextField
        label="Search"
        hint="Words in the reaction, a formula, the source or the note"
        value={state.q}
        onChangeText={(q) => onChange({ q })}
        autoComplete="off"
      />
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
          <SpeciesChips label="Metal ion" what="metal" choices={METAL_CHOICES} value={state.metal} onPick={(metal) => onChange({ metal })} />
          <SpeciesChips label="Ligand" what="ligand" choices={LIGAND_CHOICES} value={state.ligand} onPick={(ligand) => onChange({ ligand })} />
          <ChipGroup label="Kind">
            {CONSTANT_KINDS.map((k) => (
              <ToggleChip
                key={k}
                label={KIND_LABELS[k].label}
                hint={KIND_LABELS[k].explain}
                checked={state.kind === k}
                onToggle={() => onChange({ kind: state.kind === k ? undefined : k })}
              />
            ))}
          </ChipGroup>
          <ChipGroup label="Status">
            {STATUS_FILTERS.map((s) => (
              <ToggleChip
                key={s.value}
                label={s.label}
                accessibilityLabel={`Status: ${s.label}`}
                checked={state.status === s.value}
                onToggle={() => onChange({ status: s.value })}
              />
            ))}
          </ChipGroup>
          {wide ? null : <SortChips state={state} onChange={onChange} />}
        </>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.md },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  group: { gap: space.xs },
  chips: { flexDirection: 'row', flexWrap: 'wrap', gap: space.xs, alignItems: 'center' },
});
