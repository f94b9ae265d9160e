import { StyleSheet, View } from 'react-native';

import { CautionNote } from '@/components/screens/calculate/caution-note';
import { ConstantsUsed } from '@/components/screens/calculate/constants-used';
import { formatNumber } from '@/components/screens/calculate/speciation-summary';
import { space } from '@/components/theme/tokens';
import { ThemedText } from '@/components/ui/themed-text';

import { type FrameOutcome } from './types';

/** Each message once, in the order first met. */
function unique(...lists: readonly (readonly string[] | undefined)[]): string[] {
  return [...new Set(lists.flatMap((l) => l ?? []))];
}

/** Under a calculator's answer: the activity model, temperature, ionic strength and residual of the bath, every caution, drafts, and the constant versions used. */
export function ModelNotes({ outcome }: { outcome: FrameOutcome }) {
  const { built, bath, run } = outcome;
  const draftIds = new Set(built.drafts.map((d) => d.id));
  const constants = built.constants.map((c) => (draftIds.has(c.id) ? { ...c, status: 'draft' as const } : c));
  const warnings = unique(built.warnings, bath?.warnings, run?.warnings);
  const activity = (bath?.activity ?? built.problem.activity) === 'davies' ? 'Davies (activities corrected for ionic strength)' : 'ideal (activities taken as concentrations)';
  const temperature = bath?.temperatureC ?? built.problem.temperatureC;
  return (
    <View style={styles.section} testID="model-notes">
      <ThemedText variant="title" accessibilityRole="header" aria-level={2}>
        Model notes
      </ThemedText>
      <View style={styles.facts}>
        <ThemedText variant="label" weight="regular">{`Activity model: ${activity}`}</ThemedText>
        <ThemedText variant="label" weight="regular">{`Temperature: ${typeof temperature === 'number' && Number.isFinite(temperature) ? `${temperature} °C` : '—'}`}</ThemedText>
        <ThemedText variant="label" weight="regular">{`Ionic strength of the bath: ${bath ? `${formatNumber(bath.ionicStrength)} mol/L` : '—'}`}</ThemedText>
        <ThemedText variant="label" weight="regular">{`Largest mass-balance residual: ${bath ? formatNumber(bath.residual, 2) : '—'}`}</ThemedText>
      </View>
      {built.drafts.length > 0 ? (
        <CautionNote
          testID="uses-drafts"
          message={`This result uses ${built.drafts.length} draft value${built.drafts.length === 1 ? '' : 's'} not yet reviewed. Do not use it to run a bath.`}
        />
      ) : null}
      {warnings.map((w) => (
        <CautionNote key={w} message={w} />
      ))}
      <ConstantsUsed constants={constants} note="Worked out in this browser from the library as it is now; saving a run works it out again on the server." />
    </View>
  );
}

const styles = StyleSheet.create({
  section: { gap: space.sm },
  facts: { gap: space.xxs },
});
