import { StyleSheet, View } from 'react-native';

import { ChoiceChips } from '@/components/screens/calculate/choice-chips';
import { COUNTER_CHOICES, LIGAND_CHOICES, METAL_CHOICES } from '@/components/screens/calculate/speciation-summary';
import { type ComponentGroup } from '@/components/screens/calculate/use-system-form';
import { stoichText } from '@/components/screens/calculators/dosing-plan/reagent-stoich';
import { TANK_UNITS, type TankUnit, type VolumeField } from '@/components/screens/calculators/dosing-plan/use-bath-volume';
import { type ParamsSlotContext } from '@/components/screens/calculators/frame/types';
import { space } from '@/components/theme/tokens';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/text-field';
import { ThemedText } from '@/components/ui/themed-text';

import { MASS_CHOICES, SALTS, type MassChoice } from './make-up-words';
import { type MakeUpDraft, type MakeUpResolved, type TargetUnit } from './use-make-up-form';

type Props = {
  ctx: ParamsSlotContext;
  tank: VolumeField;
  draft: MakeUpDraft;
  set: (patch: Partial<MakeUpDraft>) => void;
  resolved: MakeUpResolved;
  massUnit: MassChoice;
  onMassUnit: (u: MassChoice) => void;
};

function FieldError({ message }: { message?: string }) {
  return message ? (
    <ThemedText variant="label" weight="regular" tone="danger" accessibilityLiveRegion="polite">
      {message}
    </ThemedText>
  ) : null;
}

/** The builder group an ion is offered in, for a button that adds it to the solution. */
function groupOf(ion: string): ComponentGroup | null {
  if (METAL_CHOICES.some((c) => c.formula === ion)) return 'metals';
  if (LIGAND_CHOICES.some((c) => c.formula === ion)) return 'ligands';
  if (COUNTER_CHOICES.some((c) => c.formula === ion)) return 'counterIons';
  return null;
}

function SaltFields({ ctx, draft, set, resolved }: Pick<Props, 'ctx' | 'draft' | 'set' | 'resolved'>) {
  const addable = (resolved.derived?.leftOut ?? []).flatMap((l) => {
    const group = groupOf(l.ion);
    return group && !ctx.form.groups[group].includes(l.ion) ? [{ ion: l.ion, group }] : [];
  });
  const others = (resolved.derived?.leftOut ?? []).filter((l) => groupOf(l.ion) === null);
  return (
    <View style={styles.group}>
      <ChoiceChips label="Salt to add" options={[...SALTS.map((s) => ({ value: s.key, label: s.label, hint: s.hint })), { value: 'other', label: 'Another salt', hint: 'Give its formula' }]} value={draft.salt} onChange={(salt) => set({ salt, stoich: null, component: null })} disabled={ctx.disabled} />
      {draft.salt === 'other' ? <TextField label="Formula of the salt" value={draft.other} onChangeText={(other) => set({ other })} onSubmit={ctx.submit} hint="Such as CuCN or K[Ag(CN)2]" /> : null}
      {resolved.choice?.stock ? (
        <View style={styles.row}>
          <View style={styles.cell}>
            <TextField label="Strength (% NH3 by mass)" value={draft.percent} onChangeText={(percent) => set({ percent })} onSubmit={ctx.submit} inputMode="decimal" />
          </View>
          <View style={styles.cell}>
            <TextField label="Density (kg/L)" value={draft.density} onChangeText={(density) => set({ density })} onSubmit={ctx.submit} inputMode="decimal" />
          </View>
        </View>
      ) : null}
      {draft.stoich !== null ? (
        <>
          <TextField label="What one mole brings (component: count)" value={draft.stoich} onChangeText={(stoich) => set({ stoich })} onSubmit={ctx.submit} hint={`Components of the solution: ${ctx.built?.problem.components.join(', ') ?? ctx.form.chosen.join(', ')}`} />
          <Button label="Read it from the formula" disabled={ctx.disabled} onPress={() => set({ stoich: null })} />
        </>
      ) : (
        <>
          <ThemedText variant="caption" tone="textMuted">
            {resolved.brings ? `One mole brings ${stoichText(resolved.brings).replace(/:/g, '')}.` : ''}
            {others.length > 0 ? ` Left out: ${others.map((l) => `${l.ion} (${l.why})`).join(', ')}.` : ''}
          </ThemedText>
          <Button label="Write what it brings" accessibilityLabel="Write what one mole of the salt brings" disabled={ctx.disabled} onPress={() => set({ stoich: resolved.brings ? stoichText(resolved.brings) : '' })} />
        </>
      )}
      {addable.length > 0 ? (
        <View style={styles.group}>
          <ThemedText variant="caption" tone="caution" weight="semibold">{`${addable.map((a) => a.ion).join(' and ')} from the salt ${addable.length === 1 ? 'is' : 'are'} not in the solution, so ${addable.length === 1 ? 'it is' : 'they are'} left out.`}</ThemedText>
          <Button label={`Add ${addable.map((a) => a.ion).join(' and ')}`} accessibilityLabel={`Add ${addable.map((a) => a.ion).join(' and ')} to the solution`} disabled={ctx.disabled} onPress={() => addable.forEach((a) => ctx.form.toggle(a.group, a.ion))} />
        </View>
      ) : null}
      <FieldError message={ctx.errors.salt} />
    </View>
  );
}

function TargetFields({ ctx, draft, set, resolved }: Pick<Props, 'ctx' | 'draft' | 'set' | 'resolved'>) {
  const free = draft.kind === 'free';
  return (
    <View style={styles.group}>
      <ChoiceChips
        label="Target"
        options={[
          { value: 'free', label: 'Free ligand', hint: 'A free ligand concentration to reach' },
          { value: 'headroom', label: 'Headroom for a solid', hint: 'How much more of a solid the bath should take' },
        ]}
        value={draft.kind}
        onChange={(kind) => set({ kind })}
        disabled={ctx.disabled}
      />
      {free ? (
        resolved.ligands.length > 0 ? (
          <ChoiceChips label="Free ligand to reach" options={resolved.ligands.map((l) => ({ value: l, label: l }))} value={resolved.component ?? ''} onChange={(component) => set({ component })} disabled={ctx.disabled} />
        ) : (
          <ThemedText variant="caption" tone="textMuted">Choose the ligand above.</ThemedText>
        )
      ) : resolved.solids.length > 0 ? (
        <ChoiceChips label="Solid" options={resolved.solids.map((s) => ({ value: s, label: s }))} value={resolved.solid ?? ''} onChange={(solid) => set({ solid })} disabled={ctx.disabled} />
      ) : (
        <ThemedText variant="caption" tone="textMuted">The solids the ions can form appear here once the system is built.</ThemedText>
      )}
      <TextField label={free ? `Target free ${resolved.component ?? 'ligand'} (${draft.unit === 'g/L' ? `g/L of ${resolved.formula || 'the salt'}` : 'mol/L'})` : 'Target headroom (mol/L of the solid)'} value={draft.value} onChangeText={(value) => set({ value })} onSubmit={ctx.submit} inputMode="decimal" />
      {free ? <ChoiceChips<TargetUnit> label="Target in" options={[{ value: 'mol/L', label: 'mol/L' }, { value: 'g/L', label: 'g/L of the salt' }]} value={draft.unit} onChange={(unit) => set({ unit })} disabled={ctx.disabled} /> : null}
      <FieldError message={ctx.errors.target} />
    </View>
  );
}

/** Make-up's own fields: the tank, the salt and what it brings, the target, and the unit to weigh in. */
export function MakeUpFields({ ctx, tank, draft, set, resolved, massUnit, onMassUnit }: Props) {
  return (
    <View style={styles.fields}>
      <View style={styles.group}>
        <TextField label={`Tank volume (${tank.unit})`} value={tank.text} onChangeText={tank.setText} onSubmit={ctx.submit} inputMode="decimal" error={ctx.errors.volume} hint={tank.fromBath ? `From ${tank.fromBath}.` : 'The volume of the bath as it is.'} />
        <ChoiceChips<TankUnit> label="Tank volume in" options={TANK_UNITS} value={tank.unit} onChange={tank.setUnit} disabled={ctx.disabled} />
      </View>
      <SaltFields ctx={ctx} draft={draft} set={set} resolved={resolved} />
      <TargetFields ctx={ctx} draft={draft} set={set} resolved={resolved} />
      <ChoiceChips<MassChoice> label="Weigh out in" options={MASS_CHOICES.map((u) => ({ value: u, label: u }))} value={massUnit} onChange={onMassUnit} disabled={ctx.disabled} />
    </View>
  );
}

const styles = StyleSheet.create({
  fields: { gap: space.lg },
  group: { gap: space.xs },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  cell: { flexGrow: 1, flexBasis: 140, minWidth: 0 },
});
