import { StyleSheet, View } from 'react-native';

import { ChoiceChips } from '@/components/screens/calculate/choice-chips';
import { type ParamsSlotContext } from '@/components/screens/calculators/frame/types';
import { space } from '@/components/theme/tokens';
import { ToggleChip } from '@/components/ui/chip';
import { TextField } from '@/components/ui/text-field';
import { ThemedText } from '@/components/ui/themed-text';

type Props = {
  ctx: ParamsSlotContext;
  /** Ligands of the system that can be dosed, and the one chosen (null: none to choose). */
  precipitants: readonly string[];
  precipitant: string | null;
  onPrecipitant: (p: string) => void;
  /** Metal ions of the system and those followed. */
  metals: readonly string[];
  cations: readonly string[];
  onToggleCation: (c: string) => void;
  max: string;
  onMax: (text: string) => void;
};

function FieldError({ message }: { message?: string }) {
  return message ? (
    <ThemedText variant="label" weight="regular" tone="danger" accessibilityLiveRegion="polite">
      {message}
    </ThemedText>
  ) : null;
}

/** Precipitation order's own fields: the precipitant dosed, the metal ions followed, and how far to dose. */
export function PrecipitationFields({ ctx, precipitants, precipitant, onPrecipitant, metals, cations, onToggleCation, max, onMax }: Props) {
  return (
    <View style={styles.fields}>
      <View style={styles.group}>
        {precipitants.length === 0 ? (
          <>
            <ThemedText variant="label">Precipitant dosed</ThemedText>
            <ThemedText variant="caption" tone="textMuted">
              Choose the ligand you dose (chloride, iodide, thiocyanate, cyanide…) among the ligands above, with its total (0 is fine).
            </ThemedText>
          </>
        ) : (
          <ChoiceChips label="Precipitant dosed" options={precipitants.map((p) => ({ value: p, label: p }))} value={precipitant ?? ''} onChange={onPrecipitant} disabled={ctx.disabled} />
        )}
        <FieldError message={ctx.errors.precipitant} />
      </View>
      <View style={styles.group} role="group" aria-label="Metal ions to follow">
        <ThemedText variant="label">Metal ions to follow</ThemedText>
        {metals.length === 0 ? (
          <ThemedText variant="caption" tone="textMuted">
            Choose two or more metal ions above, with their totals.
          </ThemedText>
        ) : (
          <View style={styles.chips}>
            {metals.map((m) => (
              <ToggleChip key={m} label={m} accessibilityLabel={`Follow ${m}`} checked={cations.includes(m)} disabled={ctx.disabled} onToggle={() => onToggleCation(m)} />
            ))}
          </View>
        )}
        <FieldError message={ctx.errors.cations} />
      </View>
      <TextField
        label="Most precipitant to consider (mol/L, optional)"
        value={max}
        onChangeText={onMax}
        onSubmit={ctx.submit}
        inputMode="decimal"
        hint="The search stops at this total; 10 mol/L when left empty."
        error={ctx.errors.maxPrecipitantMolPerL}
      />
    </View>
  );
}

const styles = StyleSheet.create({
  fields: { gap: space.lg },
  group: { gap: space.xs },
  chips: { flexDirection: 'row', flexWrap: 'wrap', gap: space.xs },
});
