import { StyleSheet, View } from 'react-native';

import { space } from '@/components/theme/tokens';
import { ToggleChip } from '@/components/ui/chip';
import { ThemedText } from '@/components/ui/themed-text';

type Props = {
  available: readonly string[];
  /** null while untouched: every solid allowed. */
  chosen: readonly string[] | null;
  onToggle: (name: string) => void;
  disabled: boolean;
};

/** Which solids may form: every one the chosen ions can form, each a checkbox (all on until changed). */
export function SolidsChoice({ available, chosen, onToggle, disabled }: Props) {
  if (available.length === 0) return null;
  return (
    <View style={styles.group} role="group" aria-label="Solids allowed to form">
      <ThemedText variant="label">Solids allowed to form</ThemedText>
      <ThemedText variant="caption" tone="textMuted">
        {chosen === null
          ? 'Every solid these ions can form is allowed. Turn one off to leave it out, then calculate again.'
          : 'Your choice is sent with the next calculation.'}
      </ThemedText>
      <View style={styles.chips}>
        {available.map((name) => (
          <ToggleChip
            key={name}
            label={name}
            accessibilityLabel={`Allow ${name}`}
            checked={chosen === null || chosen.includes(name)}
            disabled={disabled}
            onToggle={() => onToggle(name)}
          />
        ))}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  group: { gap: space.xs },
  chips: { flexDirection: 'row', flexWrap: 'wrap', gap: space.xs },
});
