import { StyleSheet, View } from 'react-native';

import { ChoiceChips } from '@/components/screens/calculate/choice-chips';
import { parseAmount } from '@/components/screens/calculate/use-system-form';
import { type ParamsSlotContext } from '@/components/screens/calculators/frame/types';
import { radius, space } from '@/components/theme/tokens';
import { useTheme } from '@/components/theme/use-theme';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { TextField } from '@/components/ui/text-field';
import { ThemedText } from '@/components/ui/themed-text';

import { addsAcid, CYANIDE_ACID_CAUTION, CYANIDE_PH_CAUTION, stoichText } from './reagent-stoich';
import { type TankUnit } from './use-bath-volume';
import { AMOUNT_UNITS, reagentStoich, type AmountUnit, type DosingSteps, type StepDraft } from './use-dosing-form';

type Props = {
  ctx: ParamsSlotContext;
  step: StepDraft;
  index: number;
  count: number;
  actions: DosingSteps;
  unit: TankUnit;
  components: readonly string[];
  /** The pH before this step, when known (the solution's, or the last set point). */
  pHBefore: number | null;
};

const TITLES: Record<StepDraft['kind'], string> = { add: 'Add a reagent', 'set-ph': 'Set the pH', dilute: 'Add water / make up to volume' };

function AddFields({ ctx, step, index, actions, unit, components }: Omit<Props, 'step' | 'count' | 'pHBefore'> & { step: Extract<StepDraft, { kind: 'add' }> }) {
  const n = index + 1;
  const what = reagentStoich(step, components);
  const editing = step.stoich !== null;
  const cyanide = components.includes('CN-') && step.reagent.trim() !== '' && addsAcid(step.reagent, what.stoich ?? {});
  const left = what.derived?.leftOut ?? [];
  return (
    <>
      <TextField label={`Step ${n}: reagent (formula or name)`} value={step.reagent} onChangeText={(reagent) => actions.update(step.id, { reagent })} onSubmit={ctx.submit} hint="Such as NaCN, KCN, AgNO3, NaOH or Na2S2O3·5H2O" />
      {cyanide ? <Notice kind="error" message={`Step ${n} ${CYANIDE_ACID_CAUTION}`} testID={`acid-caution-${n}`} /> : null}
      {editing ? (
        <View style={styles.group}>
          <TextField label={`Step ${n}: what one mole brings (component: count)`} value={step.stoich ?? ''} onChangeText={(stoich) => actions.update(step.id, { stoich })} onSubmit={ctx.submit} hint={`Components of the solution: ${components.join(', ') || 'none yet'}. H+ -1 for a base.`} />
          {step.reagent.trim() !== '' ? <Button label="Read it from the formula" accessibilityLabel={`Step ${n}: read what it brings from the formula`} disabled={ctx.disabled} onPress={() => actions.update(step.id, { stoich: null })} /> : null}
        </View>
      ) : step.reagent.trim() !== '' ? (
        <View style={styles.group}>
          <ThemedText variant="caption" tone={what.stoich ? 'textMuted' : 'danger'}>
            {what.stoich ? `One mole brings ${stoichText(what.stoich).replace(/:/g, '')}.` : (what.message ?? '')}
            {left.length > 0 ? ` Left out: ${left.map((l) => `${l.ion} (${l.why})`).join(', ')}.` : ''}
          </ThemedText>
          <Button label="Write what it brings" accessibilityLabel={`Step ${n}: write what one mole brings`} disabled={ctx.disabled} onPress={() => actions.editStoich(step.id, what.stoich)} />
        </View>
      ) : null}
      <TextField label={`Step ${n}: amount added`} value={step.amount} onChangeText={(amount) => actions.update(step.id, { amount })} onSubmit={ctx.submit} inputMode="decimal" />
      <ChoiceChips<AmountUnit> label={`Step ${n}: amount in`} options={AMOUNT_UNITS.map((u) => ({ value: u, label: u }))} value={step.unit} onChange={(u) => actions.update(step.id, { unit: u })} disabled={ctx.disabled} />
      <TextField label={`Step ${n}: liquid it brings (${unit}, optional)`} value={step.liquid} onChangeText={(liquid) => actions.update(step.id, { liquid })} onSubmit={ctx.submit} inputMode="decimal" hint="For a solution; a dry salt brings none." />
    </>
  );
}

function OtherFields({ ctx, step, index, actions, unit, components, pHBefore }: Omit<Props, 'count'>) {
  const n = index + 1;
  if (step.kind === 'set-ph') {
    const pH = parseAmount(step.pH);
    const lowers = components.includes('CN-') && pHBefore !== null && pH !== undefined && pH < pHBefore;
    return (
      <>
        <TextField label={`Step ${n}: pH to hold from here on`} value={step.pH} onChangeText={(text) => actions.update(step.id, { pH: text })} onSubmit={ctx.submit} inputMode="decimal" />
        {lowers ? <Notice kind="error" message={`Step ${n} (pH ${step.pH.trim()}) ${CYANIDE_PH_CAUTION}`} testID={`acid-caution-${n}`} /> : null}
      </>
    );
  }
  if (step.kind !== 'dilute') return null;
  return (
    <>
      <ChoiceChips
        label={`Step ${n}: water`}
        options={[
          { value: 'add', label: 'Add water' },
          { value: 'to', label: 'Make up to volume' },
        ]}
        value={step.mode}
        onChange={(mode) => actions.update(step.id, { mode })}
        disabled={ctx.disabled}
      />
      <TextField label={step.mode === 'add' ? `Step ${n}: water added (${unit})` : `Step ${n}: final volume (${unit})`} value={step.volume} onChangeText={(volume) => actions.update(step.id, { volume })} onSubmit={ctx.submit} inputMode="decimal" />
    </>
  );
}

/** One step of the plan: its fields, a message when it cannot be read, and buttons to move it up or down or remove it. */
export function DosingStepCard(props: Props) {
  const { ctx, step, index, count, actions } = props;
  const { palette } = useTheme();
  const n = index + 1;
  const error = ctx.errors[`steps.${index}`];
  return (
    <View style={[styles.card, { borderColor: error ? palette.danger : palette.border }]} role="group" aria-label={`Step ${n}: ${TITLES[step.kind]}`} testID={`dosing-step-${n}`}>
      <ThemedText variant="label" accessibilityRole="header" aria-level={3}>{`${n}. ${TITLES[step.kind]}`}</ThemedText>
      {step.kind === 'add' ? <AddFields {...props} step={step} /> : <OtherFields {...props} />}
      {error ? (
        <ThemedText variant="label" weight="regular" tone="danger" accessibilityLiveRegion="polite">
          {error}
        </ThemedText>
      ) : null}
      <View style={styles.buttons}>
        <Button label="Up" accessibilityLabel={`Move step ${n} up`} disabled={ctx.disabled || index === 0} onPress={() => actions.move(step.id, -1)} />
        <Button label="Down" accessibilityLabel={`Move step ${n} down`} disabled={ctx.disabled || index === count - 1} onPress={() => actions.move(step.id, 1)} />
        <Button label="Remove" variant="danger" accessibilityLabel={`Remove step ${n}`} disabled={ctx.disabled} onPress={() => actions.remove(step.id)} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  card: { gap: space.sm, borderWidth: 1, borderRadius: radius.md, padding: space.md },
  group: { gap: space.xs },
  buttons: { flexDirection: 'row', flexWrap: 'wrap', gap: space.xs },
});
