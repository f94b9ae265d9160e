import { StyleSheet, View } from 'react-native';

import { ChoiceChips } from '@/components/screens/calculate/choice-chips';
import { type ParamsSlotContext } from '@/components/screens/calculators/frame/types';
import { space } from '@/components/theme/tokens';
import { ToggleChip } from '@/components/ui/chip';
import { TextField } from '@/components/ui/text-field';
import { ThemedText } from '@/components/ui/themed-text';
import { CURVE_MAX_POINTS } from '@/shared/calculations';

import { namesFor, SERIES_KINDS, seriesKey } from './curve-options';
import { LIVE_MAX_POINTS } from './run-in-chunks';
import { MAX_SERIES, type CurvesFields, type CurvesForm, type Spacing } from './use-curves-form';

type Props = { ctx: ParamsSlotContext; form: CurvesForm; fields: CurvesFields };

const SPACINGS = [
  { value: 'linear', label: 'Linear', hint: 'Points evenly spaced' },
  { value: 'log', label: 'Log', hint: 'Points evenly spaced in powers of ten' },
] as const;

function variableLabel(v: string): string {
  return v === 'pH' ? 'pH' : `Total ${v.slice(6)}`;
}

function SeriesPicker({ ctx, form, fields }: Props) {
  const chosen = new Set(fields.series.map(seriesKey));
  const full = fields.series.length >= MAX_SERIES;
  return (
    <View style={styles.group} role="group" aria-label="What to draw">
      <ThemedText variant="label" accessibilityRole="header" aria-level={3}>
        What to draw
      </ThemedText>
      <ThemedText variant="caption" tone="textMuted">
        {`Pick up to ${MAX_SERIES}. Concentrations share one chart, fractions and saturation indices their own.`}
      </ThemedText>
      {SERIES_KINDS.map(({ kind, title }) => {
        const names = namesFor(kind, fields.choices);
        if (names.length === 0) return null;
        return (
          <View key={kind} style={styles.kind}>
            <ThemedText variant="caption" weight="semibold">
              {title}
            </ThemedText>
            <View style={styles.chips}>
              {names.map((name) => {
                const on = chosen.has(`${kind}:${name}`);
                return (
                  <ToggleChip
                    key={name}
                    label={name}
                    accessibilityLabel={`${title}: ${name}`}
                    checked={on}
                    disabled={ctx.disabled || (full && !on)}
                    onToggle={() => form.toggleSeries(kind, name, fields.series)}
                  />
                );
              })}
            </View>
          </View>
        );
      })}
      {fields.choices.species.length === 0 && fields.choices.components.length > 0 ? (
        <ThemedText variant="caption" tone="textMuted">
          Species and solids appear once the library has built the system.
        </ThemedText>
      ) : null}
      {ctx.errors.series ? (
        <ThemedText variant="label" weight="regular" tone="danger" accessibilityLiveRegion="polite">
          {ctx.errors.series}
        </ThemedText>
      ) : null}
    </View>
  );
}

/** Curves' own fields: the swept input and its range, the number and spacing of points, and the series to draw. */
export function CurvesFieldsView({ ctx, form, fields }: Props) {
  const unit = fields.variable === 'pH' ? 'pH' : 'mol/L';
  if (fields.choices.components.length === 0) {
    return (
      <ThemedText variant="caption" tone="textMuted">
        Choose the ions first: what can be swept and drawn appears here.
      </ThemedText>
    );
  }
  return (
    <View style={styles.fields}>
      <View style={styles.group}>
        <ChoiceChips label="Swept input" options={fields.variables.map((v) => ({ value: v, label: variableLabel(v) }))} value={fields.variable} onChange={form.setVariable} disabled={ctx.disabled} />
        {ctx.errors.variable ? (
          <ThemedText variant="label" weight="regular" tone="danger">
            {ctx.errors.variable}
          </ThemedText>
        ) : null}
      </View>
      <View style={styles.row}>
        <View style={styles.cell}>
          <TextField label={`From (${unit})`} value={fields.from} onChangeText={form.setFrom} onSubmit={ctx.submit} error={ctx.errors.from} inputMode="decimal" />
        </View>
        <View style={styles.cell}>
          <TextField label={`To (${unit})`} value={fields.to} onChangeText={form.setTo} onSubmit={ctx.submit} error={ctx.errors.to} inputMode="decimal" />
        </View>
      </View>
      <TextField
        label="Points"
        value={fields.points}
        onChangeText={form.setPoints}
        onSubmit={ctx.submit}
        error={ctx.errors.points}
        hint={`2 to ${CURVE_MAX_POINTS}. Up to ${LIVE_MAX_POINTS} the chart redraws as you type; longer sweeps run on Calculate, with progress.`}
        inputMode="numeric"
      />
      {fields.variable === 'pH' ? (
        <ThemedText variant="caption" tone="textMuted">
          pH is already a logarithm, so its points are evenly spaced.
        </ThemedText>
      ) : (
        <View style={styles.group}>
          <ChoiceChips<Spacing> label="Spacing" options={SPACINGS} value={fields.spacing} onChange={form.setSpacing} disabled={ctx.disabled} />
          {ctx.errors.spacing ? (
            <ThemedText variant="label" weight="regular" tone="danger">
              {ctx.errors.spacing}
            </ThemedText>
          ) : null}
        </View>
      )}
      <SeriesPicker ctx={ctx} form={form} fields={fields} />
    </View>
  );
}

const styles = StyleSheet.create({
  fields: { gap: space.lg },
  group: { gap: space.xs },
  kind: { gap: space.xxs },
  chips: { flexDirection: 'row', flexWrap: 'wrap', gap: space.xs },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  cell: { flexGrow: 1, flexBasis: 130, minWidth: 0 },
});
