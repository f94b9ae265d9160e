import { StyleSheet, View } from 'react-native';

import { ChoiceChips } from '@/components/screens/calculate/choice-chips';
import { type ParamsSlotContext } from '@/components/screens/calculators/frame/types';
import { space } from '@/components/theme/tokens';
import { ThemedText } from '@/components/ui/themed-text';

import { HEADROOM_UNITS, isPrecious, type HeadroomUnit } from './headroom-words';

const AUTOMATIC = '';

type Props = {
  ctx: ParamsSlotContext;
  solid: string | null;
  onSolid: (solid: string) => void;
  metal: string;
  metals: readonly string[];
  onMetal: (metal: string) => void;
  unit: HeadroomUnit;
  onUnit: (unit: HeadroomUnit) => void;
};

function FieldError({ message }: { message?: string }) {
  if (!message) return null;
  return (
    <ThemedText variant="label" weight="regular" tone="danger" accessibilityLiveRegion="polite">
      {message}
    </ThemedText>
  );
}

/** Headroom's own fields: the solid to offer the bath, the metal to count it as, and the unit of the answer. */
export function HeadroomFields({ ctx, solid, onSolid, metal, metals, onMetal, unit, onUnit }: Props) {
  const solids = ctx.built?.availableSolids ?? [];
  const precious = metals.some(isPrecious) || (metal !== AUTOMATIC && isPrecious(metal));
  const units = HEADROOM_UNITS.filter((u) => u !== 'troy oz/gal' || precious).map((u) => ({
    value: u,
    label: u,
    hint: u === 'troy oz/gal' ? 'Troy ounces of the metal per US gallon' : u === 'mol/L' ? 'Moles of the solid per litre' : `Mass of the solid per ${u === 'g/L' ? 'litre' : 'US gallon'}`,
  }));
  return (
    <View style={styles.fields}>
      <View style={styles.group}>
        {solids.length === 0 ? (
          <>
            <ThemedText variant="label">Solid to offer the bath</ThemedText>
            <ThemedText variant="caption" tone="textMuted">
              Choose the metal ion and ligands first: the solids they can form appear here.
            </ThemedText>
          </>
        ) : (
          <ChoiceChips
            label="Solid to offer the bath"
            options={solids.map((s) => ({ value: s, label: s }))}
            value={solid ?? ''}
            onChange={onSolid}
            disabled={ctx.disabled}
          />
        )}
        <FieldError message={ctx.errors.solid} />
      </View>
      {metals.length > 1 || ctx.errors.metal ? (
        <View style={styles.group}>
          <ChoiceChips
            label="Count it as metal"
            options={[{ value: AUTOMATIC, label: 'Automatic', hint: 'The first metal the solid holds' }, ...metals.map((m) => ({ value: m, label: m }))]}
            value={metal}
            onChange={onMetal}
            disabled={ctx.disabled}
          />
          <FieldError message={ctx.errors.metal} />
        </View>
      ) : null}
      <ChoiceChips<HeadroomUnit> label="Answer in" options={units} value={unit} onChange={onUnit} disabled={ctx.disabled} />
    </View>
  );
}

const styles = StyleSheet.create({
  fields: { gap: space.lg },
  group: { gap: space.xs },
});
