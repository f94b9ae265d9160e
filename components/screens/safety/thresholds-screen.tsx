import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { thresholdText } from '@/components/screens/safety/thresholds-summary';
import { radius, space } from '@/components/theme/tokens';
import { useTheme } from '@/components/theme/use-theme';
import { Button } from '@/components/ui/button';
import { ToggleChip } from '@/components/ui/chip';
import { ErrorState } from '@/components/ui/error-state';
import { formatWhen } from '@/components/ui/format-date';
import { LoadingState } from '@/components/ui/loading-state';
import { Notice } from '@/components/ui/notice';
import { ScreenContainer } from '@/components/ui/screen-container';
import { TextField } from '@/components/ui/text-field';
import { ThemedText } from '@/components/ui/themed-text';
import { checkForm, errorsFromApi, NO_ERRORS, type FormErrors } from '@/lib/api/form-errors';
import { useMe } from '@/lib/api/use-me';
import { useSaveThresholds, useThresholds, useThresholdsHistory } from '@/lib/api/use-safety';
import { hasRole } from '@/shared/auth';
import { type HazardThresholds, THRESHOLD_LABELS, thresholdsInputSchema, type ThresholdsVersion } from '@/shared/safety';

const NUMBER_KEYS = ['cyanideMinPh', 'hcnFractionMax', 'thiosulfateMinPh', 'ammoniaVapourMolPerL'] as const;
const SWITCH_KEYS = ['deskAmmoniacalSilver', 'deskAcidifiedThiosulfate'] as const;
const KNOWN = [...NUMBER_KEYS.map((k) => `values.${k}`), ...SWITCH_KEYS.map((k) => `values.${k}`), 'note'];

/** Typed text as a number; what is not one stays text, so the schema names the field. */
function numberOf(text: string): number | string {
  const t = text.trim().replace(',', '.');
  return t !== '' && Number.isFinite(Number(t)) ? Number(t) : t;
}

function ThresholdsForm({ current, onSaved }: { current: ThresholdsVersion; onSaved: (message: string | null) => void }) {
  const { trigger, isMutating } = useSaveThresholds();
  const [texts, setTexts] = useState<Record<(typeof NUMBER_KEYS)[number], string>>(() => Object.fromEntries(NUMBER_KEYS.map((k) => [k, String(current.values[k])])) as never);
  const [switches, setSwitches] = useState(() => Object.fromEntries(SWITCH_KEYS.map((k) => [k, current.values[k]])) as Record<(typeof SWITCH_KEYS)[number], boolean>);
  const [note, setNote] = useState('');
  const [errors, setErrors] = useState<FormErrors>(NO_ERRORS);

  const save = async () => {
    if (isMutating) return;
    onSaved(null);
    const values = { ...Object.fromEntries(NUMBER_KEYS.map((k) => [k, numberOf(texts[k])])), ...switches };
    const check = checkForm(thresholdsInputSchema, { values, note }, KNOWN);
    if (!check.ok) return setErrors(check.errors);
    setErrors(NO_ERRORS);
    try {
      const made = await trigger(check.data);
      setNote('');
      onSaved(`Saved as version ${made.version}. New calculations, runs and analyses are checked against it; earlier reviews keep the version they used.`);
    } catch (error) {
      setErrors(errorsFromApi(error, KNOWN));
    }
  };

  return (
    <View style={styles.form} testID="thresholds-form">
      {errors.form ? <Notice kind="error" message={errors.form} /> : null}
      {NUMBER_KEYS.map((k) => (
        <TextField
          key={k}
          label={THRESHOLD_LABELS[k].label}
          value={texts[k]}
          onChangeText={(v) => setTexts((t) => ({ ...t, [k]: v }))}
          onSubmit={() => void save()}
          inputMode="decimal"
          error={errors.fields[`values.${k}`]}
          hint={THRESHOLD_LABELS[k].help}
        />
      ))}
      {SWITCH_KEYS.map((k) => (
        <View key={k} style={styles.switchRow}>
          <ToggleChip label={THRESHOLD_LABELS[k].label} checked={switches[k]} onToggle={() => setSwitches((s) => ({ ...s, [k]: !s[k] }))} hint={THRESHOLD_LABELS[k].help} />
          <ThemedText variant="caption" tone="textMuted">
            {THRESHOLD_LABELS[k].help}
          </ThemedText>
        </View>
      ))}
      <TextField label="Why they change" value={note} onChangeText={setNote} onSubmit={() => void save()} error={errors.fields.note} hint="Kept with the new version and in the audit log" autoCapitalize="sentences" />
      <Button label="Save as a new version" variant="primary" busy={isMutating} onPress={() => void save()} testID="save-thresholds" />
    </View>
  );
}

function History() {
  const { palette } = useTheme();
  const { data, error, isLoading, mutate } = useThresholdsHistory();
  if (error) return <ErrorState message={error.message} onRetry={() => void mutate()} />;
  if (isLoading || !data) return <LoadingState label="Loading the history…" />;
  return (
    <View style={styles.history} testID="thresholds-history">
      {data.map((v, i) => {
        const before = data[i + 1];
        const changed = before ? (Object.keys(v.values) as (keyof HazardThresholds)[]).filter((k) => v.values[k] !== before.values[k]).map((k) => ({ k, from: before.values[k] })) : [];
        return (
          <View key={v.version} style={[styles.version, { borderColor: palette.border }]} accessible>
            <ThemedText variant="label">{`Version ${v.version}${i === 0 ? ' (in force)' : ''}`}</ThemedText>
            <ThemedText variant="caption" tone="textMuted">
              {`${v.createdBy ? v.createdBy.name : 'Built-in defaults'}, ${formatWhen(v.createdAt)}`}
            </ThemedText>
            <ThemedText variant="caption">{v.note}</ThemedText>
            {changed.map(({ k, from }) => (
              <ThemedText key={k} variant="caption">{`${THRESHOLD_LABELS[k].label}: ${thresholdText(k, from)} → ${thresholdText(k, v.values[k])}`}</ThemedText>
            ))}
          </View>
        );
      })}
    </View>
  );
}

/** The shop's hazard thresholds: the form for the safety role, read-only for everyone else, and every version. */
export function ThresholdsScreen() {
  const me = useMe();
  const { data, error, isLoading, mutate } = useThresholds();
  const canEdit = hasRole(me.data, 'safety');
  // Kept here: a saved version remounts the form (its key is the version in force).
  const [saved, setSaved] = useState<string | null>(null);
  return (
    <ScreenContainer title="Hazard thresholds" subtitle="What the hazard rules flag. Each change is a new version; none is overwritten." back={{ href: '/safety', label: 'Safety' }}>
      {error ? (
        <ErrorState message={error.message} onRetry={() => void mutate()} />
      ) : isLoading || !data || !me.data ? (
        <LoadingState label="Loading the thresholds…" />
      ) : canEdit ? (
        <>
          {saved ? <Notice kind="success" message={saved} testID="thresholds-saved" /> : null}
          <ThresholdsForm key={data.version} current={data} onSaved={setSaved} />
        </>
      ) : (
        <Notice kind="info" message="Only the safety role changes the thresholds. The history below shows every version and who set it." />
      )}
      <View style={styles.section}>
        <ThemedText variant="title" accessibilityRole="header" aria-level={2}>
          History
        </ThemedText>
        <History />
      </View>
    </ScreenContainer>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.md },
  section: { gap: space.sm },
  switchRow: { gap: space.xxs },
  history: { gap: space.sm },
  version: { gap: space.xxs, borderLeftWidth: 3, paddingLeft: space.sm, borderRadius: radius.sm },
});
