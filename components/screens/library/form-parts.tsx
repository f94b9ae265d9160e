import { type ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';

import { type ConstantFormState } from '@/components/screens/library/use-constant-form';
import { space } from '@/components/theme/tokens';
import { ToggleChip } from '@/components/ui/chip';
import { ThemedText } from '@/components/ui/themed-text';
import { CONSTANT_KINDS, KIND_LABELS } from '@/shared/constants';

/** Fields side by side when there is room, one under the other on a phone. */
export function Pair({ children }: { children: ReactNode }) {
  return <View style={styles.pair}>{children}</View>;
}

/** One field of a Pair: half the row when there is room. */
export function Half({ children }: { children: ReactNode }) {
  return <View style={styles.half}>{children}</View>;
}

/** The four kinds as chips, with the chosen kind explained or the error below. */
export function KindChips({ form }: { form: ConstantFormState }) {
  const error = form.errors.fields.kind;
  return (
    <View style={styles.group} role="group" aria-label="Kind of constant">
      <ThemedText variant="label">Kind of constant</ThemedText>
      <View style={styles.chips}>
        {CONSTANT_KINDS.map((k) => (
          <ToggleChip
            key={k}
            label={KIND_LABELS[k].label}
            hint={KIND_LABELS[k].explain}
            checked={form.texts.kind === k}
            onToggle={() => form.setKind(k)}
          />
        ))}
      </View>
      {error ? (
        <ThemedText variant="label" weight="regular" tone="danger" accessibilityLiveRegion="polite">
          {error}
        </ThemedText>
      ) : form.texts.kind ? (
        <ThemedText variant="caption" tone="textMuted">
          {KIND_LABELS[form.texts.kind].explain}
        </ThemedText>
      ) : null}
    </View>
  );
}

/** A value the form shows but cannot change (the reaction and kind of a revision). */
export function ReadOnly({ label, value }: { label: string; value: string }) {
  return (
    <View style={styles.fact}>
      <ThemedText variant="label" weight="regular" tone="textMuted">
        {label}
      </ThemedText>
      <ThemedText variant="body" weight="semibold" selectable>
        {value}
      </ThemedText>
    </View>
  );
}

const styles = StyleSheet.create({
  pair: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  half: { flexGrow: 1, flexBasis: 240, minWidth: 0 },
  group: { gap: space.xs },
  chips: { flexDirection: 'row', flexWrap: 'wrap', gap: space.xs },
  fact: { gap: space.xxs },
});
