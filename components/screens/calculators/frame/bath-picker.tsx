import { StyleSheet, View } from 'react-native';

import { ChoiceChips } from '@/components/screens/calculate/choice-chips';
import { type BathStart } from '@/components/screens/calculators/frame/use-bath-start';
import { space } from '@/components/theme/tokens';
import { formatWhen } from '@/components/ui/format-date';
import { Notice } from '@/components/ui/notice';
import { ThemedText } from '@/components/ui/themed-text';
import { useBaths } from '@/lib/api/use-baths';
import { PROCESS_INFO } from '@/shared/baths';

const ACTIVE = { status: 'active' } as const;
const NONE = '';

function BathChoices({ start, disabled }: { start: BathStart; disabled: boolean }) {
  const baths = useBaths(ACTIVE);
  if (baths.error) {
    return (
      <ThemedText variant="caption" tone="danger">
        {`The baths could not be listed: ${baths.error.message}`}
      </ThemedText>
    );
  }
  if (!baths.data) {
    return (
      <ThemedText variant="caption" tone="textMuted">
        Loading the baths in service…
      </ThemedText>
    );
  }
  const options = [
    { value: NONE, label: 'No bath', hint: 'Enter the solution by hand' },
    ...baths.data.map((b) => ({ value: b.id, label: b.name, hint: PROCESS_INFO[b.process].label })),
  ];
  // A bath opened by link may be archived: it is still the one used, so it is listed too.
  if (start.bath && !baths.data.some((b) => b.id === start.bath?.id)) {
    options.push({ value: start.bath.id, label: start.bath.name, hint: 'Not in service' });
  }
  return <ChoiceChips label="Bath" options={options} value={start.bathId ?? NONE} onChange={(id) => start.pick(id === NONE ? null : id)} disabled={disabled} />;
}

/** "Start from a bath": the baths in service as choices; picking one fills the solution from its latest analysis and says what was estimated. */
export function BathPicker({ start, disabled }: { start: BathStart; disabled: boolean }) {
  const { prefill } = start;
  return (
    <View style={styles.box} testID="bath-picker">
      <ThemedText variant="label" accessibilityRole="header" aria-level={3}>
        Start from a bath
      </ThemedText>
      <ThemedText variant="caption" tone="textMuted">
        Fills the solution below from the bath’s latest analysis. You can still change any value.
      </ThemedText>
      <BathChoices start={start} disabled={disabled} />
      {start.loading ? (
        <ThemedText variant="caption" tone="textMuted" accessibilityLiveRegion="polite">
          Reading the bath and its analyses…
        </ThemedText>
      ) : null}
      {start.error ? <Notice kind="error" message={`That bath could not be read: ${start.error}`} /> : null}
      {prefill && start.bath ? (
        <View style={styles.notes} testID="bath-notes" accessibilityLiveRegion="polite">
          <ThemedText variant="caption" weight="semibold">
            {prefill.analysis
              ? `Filled from ${start.bath.name}, analysis of ${formatWhen(prefill.analysis.sampledAt)}.`
              : `Filled from ${start.bath.name}.`}
          </ThemedText>
          {prefill.notes.map((note) => (
            <ThemedText key={note} variant="caption" tone="textMuted">
              {`• ${note}`}
            </ThemedText>
          ))}
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.xs },
  notes: { gap: space.xxs },
});
