import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { BATH_STATUS_FILTERS, PROCESS_CHOICES } from '@/components/screens/baths/bath-words';
import { DEFAULT_BATH_LIST, type BathListState } from '@/components/screens/baths/use-bath-filter';
import { ChoiceChips } from '@/components/screens/calculate/choice-chips';
import { space } from '@/components/theme/tokens';
import { Button } from '@/components/ui/button';
import { ToggleChip } from '@/components/ui/chip';
import { TextField } from '@/components/ui/text-field';
import { ThemedText } from '@/components/ui/themed-text';

type Props = {
  state: BathListState;
  onChange: (patch: Partial<BathListState>) => void;
  onClear: () => void;
  wide: boolean;
};

/** How many filters narrow the list beyond the opening view (for the phone's "Show filters (1 on)"). */
function activeFilters(state: BathListState): number {
  return [state.process, state.status !== DEFAULT_BATH_LIST.status ? state.status : undefined].filter(Boolean).length;
}

/** Search, then process and status filters; on a phone the chips fold away behind one button. */
export function BathFilters({ state, onChange, onClear, wide }: Props) {
  const [open, setOpen] = useState(false);
  const count = activeFilters(state);
  const shown = wide || open;
  return (
    <View style={styles.box}>
      <TextField
        label="Search"
        hint="Words in the name, the site or the notes"
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
        {count > 0 || state.q.trim() !== '' ? (
          <Button label="Clear filters" onPress={onClear} />
        ) : null}
      </View>
      {shown ? (
        <>
          <View style={styles.group} role="group" aria-label="Process">
            <ThemedText variant="label">Process</ThemedText>
            <View style={styles.chips}>
              {PROCESS_CHOICES.map((p) => (
                <ToggleChip
                  key={p.value}
                  label={p.label}
                  hint={`Only ${p.label.toLowerCase()} baths; press again for every process`}
                  checked={state.process === p.value}
                  onToggle={() => onChange({ process: state.process === p.value ? undefined : p.value })}
                />
              ))}
            </View>
          </View>
          <ChoiceChips
            label="Status"
            options={BATH_STATUS_FILTERS}
            value={state.status}
            onChange={(status) => onChange({ status })}
          />
        </>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.md },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  group: { gap: space.xs },
  chips: { flexDirection: 'row', flexWrap: 'wrap', gap: space.xs },
});
