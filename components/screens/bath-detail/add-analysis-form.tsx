import { StyleSheet, View } from 'react-native';

import { ChoiceChips } from '@/components/screens/calculate/choice-chips';
import { sampleDay } from '@/components/screens/bath-detail/bath-words';
import { measuredError, useAnalysisForm, type AnalysisFormState, type Measured } from '@/components/screens/bath-detail/use-analysis-form';
import { Half, Pair } from '@/components/screens/library/form-parts';
import { space } from '@/components/theme/tokens';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { TextField } from '@/components/ui/text-field';
import { quantityLabel } from '@/lib/baths/quantities';
import { BATH_UNITS, type Bath, type BathUnit } from '@/shared/baths';

const UNIT_OPTIONS = BATH_UNITS.map((u) => ({ value: u, label: u }));

function MeasuredField({ bath, q, form }: { bath: Bath; q: Measured; form: AnalysisFormState }) {
  const label = quantityLabel(q, bath);
  return (
    <View testID={`field-${q}`}>
      <Pair>
        <Half>
          <TextField
            label={label}
            value={form.texts.values[q] ?? ''}
            onChangeText={form.setValue(q)}
            onSubmit={() => void form.submit()}
            inputMode="decimal"
            hint={`In ${form.units[q]}; leave empty if not measured`}
            error={measuredError(form.errors, q)}
          />
        </Half>
        <Half>
          <ChoiceChips<BathUnit> label={`Unit of ${label}`} options={UNIT_OPTIONS} value={form.units[q]} onChange={form.setUnit(q)} disabled={form.saving} />
        </Half>
      </Pair>
    </View>
  );
}

/** Logs one analysis: date, analyst, the results each in a unit of choice (the bath's by default), pH, notes. */
export function AddAnalysisForm({ bath, analystName }: { bath: Bath; analystName: string }) {
  const form = useAnalysisForm(bath, analystName);
  const submit = () => void form.submit();
  return (
    <View style={styles.stack} testID="add-analysis-form">
      {form.saved ? <Notice kind="success" message={`Analysis of ${sampleDay(form.saved.sampledAt)} saved; the trends and the log include it.`} /> : null}
      <Pair>
        <Half>
          <TextField label="Date sampled" value={form.texts.sampledAt} onChangeText={form.set('sampledAt')} onSubmit={submit} hint="YYYY-MM-DD" maxLength={30} error={form.errors.fields.sampledAt} />
        </Half>
        <Half>
          <TextField label="Analyst" value={form.texts.analyst} onChangeText={form.set('analyst')} onSubmit={submit} autoCapitalize="words" maxLength={100} error={form.errors.fields.analyst} />
        </Half>
      </Pair>
      {form.measured.map((q) => (
        <MeasuredField key={q} bath={bath} q={q} form={form} />
      ))}
      <TextField label="pH" value={form.texts.pH} onChangeText={form.set('pH')} onSubmit={submit} inputMode="decimal" hint="Leave empty if not measured" error={form.errors.fields.pH} />
      <TextField label="Notes" value={form.texts.notes} onChangeText={form.set('notes')} onSubmit={submit} autoCapitalize="sentences" maxLength={2000} error={form.errors.fields.notes} />
      {form.errors.form ? <Notice kind="error" message={form.errors.form} /> : null}
      <Button label="Save the analysis" busyLabel="Saving…" busy={form.saving} variant="primary" accessibilityHint="Adds the analysis to the bath's log" onPress={submit} />
    </View>
  );
}

const styles = StyleSheet.create({
  stack: { gap: space.md },
});
