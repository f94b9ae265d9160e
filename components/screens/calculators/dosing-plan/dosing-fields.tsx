import { StyleSheet, View } from 'react-native';

import { ChoiceChips } from '@/components/screens/calculate/choice-chips';
import { parseAmount } from '@/components/screens/calculate/use-system-form';
import { type ParamsSlotContext } from '@/components/screens/calculators/frame/types';
import { space } from '@/components/theme/tokens';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/text-field';
import { ThemedText } from '@/components/ui/themed-text';

import { DosingStepCard } from './dosing-step-card';
import { TANK_UNITS, type TankUnit, type VolumeField } from './use-bath-volume';
import { MAX_STEPS, type DosingSteps, type StepDraft } from './use-dosing-form';

type Props = { ctx: ParamsSlotContext; volume: VolumeField; steps: DosingSteps; components: readonly string[] };

/** The pH before each step, when known: the solution's, then each set point in turn. */
function pHsBefore(start: string, drafts: readonly StepDraft[]): (number | null)[] {
  const first = parseAmount(start);
  let pH = first !== undefined && Number.isFinite(first) ? first : null;
  return drafts.map((d) => {
    const was = pH;
    const set = d.kind === 'set-ph' ? parseAmount(d.pH) : undefined;
    if (set !== undefined && Number.isFinite(set)) pH = set;
    return was;
  });
}

/** The dosing plan's own fields: the volume in the vessel, then the steps in order, each movable and removable. */
export function DosingFields({ ctx, volume, steps, components }: Props) {
  const full = steps.steps.length >= MAX_STEPS;
  const before = pHsBefore(ctx.form.pH, steps.steps);
  return (
    <View style={styles.fields}>
      <TextField
        label={`Volume in the vessel (${volume.unit})`}
        value={volume.text}
        onChangeText={volume.setText}
        onSubmit={ctx.submit}
        inputMode="decimal"
        error={ctx.errors.volumeL}
        hint={volume.fromBath ? `From ${volume.fromBath}.` : 'The solution above, before the first step.'}
      />
      <ChoiceChips<TankUnit> label="Volumes in" options={TANK_UNITS} value={volume.unit} onChange={volume.setUnit} disabled={ctx.disabled} />
      <View style={styles.group} role="list" aria-label="Steps">
        <ThemedText variant="label" accessibilityRole="header" aria-level={3}>
          Steps, in order
        </ThemedText>
        {steps.steps.length === 0 ? (
          <ThemedText variant="caption" tone="textMuted">
            No steps yet: add a reagent, set the pH or add water.
          </ThemedText>
        ) : null}
        {steps.steps.map((step, i) => (
          <View key={step.id} role="listitem">
            <DosingStepCard ctx={ctx} step={step} index={i} count={steps.steps.length} actions={steps} unit={volume.unit} components={components} pHBefore={before[i] ?? null} />
          </View>
        ))}
        {ctx.errors.steps ? (
          <ThemedText variant="label" weight="regular" tone="danger" accessibilityLiveRegion="polite">
            {ctx.errors.steps}
          </ThemedText>
        ) : null}
      </View>
      <View style={styles.buttons}>
        <Button label="Add a reagent" disabled={ctx.disabled || full} onPress={() => steps.add('add')} />
        <Button label="Set the pH" disabled={ctx.disabled || full} onPress={() => steps.add('set-ph')} />
        <Button label="Add water / make up to volume" disabled={ctx.disabled || full} onPress={() => steps.add('dilute')} />
      </View>
      {full ? <ThemedText variant="caption" tone="textMuted">{`A plan takes at most ${MAX_STEPS} steps.`}</ThemedText> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  fields: { gap: space.lg },
  group: { gap: space.sm },
  buttons: { flexDirection: 'row', flexWrap: 'wrap', gap: space.xs },
});
