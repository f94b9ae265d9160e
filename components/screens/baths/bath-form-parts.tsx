import { type ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';

import { MAX_MAKE_UP, type MakeUpText } from '@/components/screens/baths/bath-form-texts';
import { holdsText, PROCESS_CHOICES } from '@/components/screens/baths/bath-words';
import { type BathFormState } from '@/components/screens/baths/use-bath-form';
import { ChoiceChips } from '@/components/screens/calculate/choice-chips';
import { Half, Pair } from '@/components/screens/library/form-parts';
import { radius, space } from '@/components/theme/tokens';
import { useTheme } from '@/components/theme/use-theme';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { TextField } from '@/components/ui/text-field';
import { ThemedText } from '@/components/ui/themed-text';
import { MAKE_UP_UNITS, type Process } from '@/shared/baths';

/** One titled part of the form. */
export function Section({ title, children, testID }: { title: string; children: ReactNode; testID?: string }) {
  return (
    <Card style={styles.section} testID={testID}>
      <ThemedText variant="title" accessibilityRole="header">
        {title}
      </ThemedText>
      {children}
    </Card>
  );
}

/** An error under a group of chips, or else a quiet line explaining it. */
export function GroupMessage({ error, hint }: { error?: string; hint?: string }) {
  if (error) {
    return (
      <ThemedText variant="label" weight="regular" tone="danger" accessibilityLiveRegion="polite">
        {error}
      </ThemedText>
    );
  }
  return hint ? (
    <ThemedText variant="caption" tone="textMuted">
      {hint}
    </ThemedText>
  ) : null;
}

/** The processes as one-of chips; the chosen one says which metal and ligand it holds. */
export function ProcessChips({ form }: { form: BathFormState }) {
  const process = form.texts.process;
  return (
    <View style={styles.group}>
      <ChoiceChips<Process | ''>
        label="Process"
        options={PROCESS_CHOICES.map((p) => ({ ...p, hint: holdsText(p.value) }))}
        value={process ?? ''}
        onChange={(p) => {
          if (p !== '') form.setProcess(p);
        }}
      />
      <GroupMessage
        error={form.errors.fields.process}
        hint={process ? holdsText(process) : 'Choosing a process sets the metal, the ligand and the usual units.'}
      />
    </View>
  );
}

const UNIT_CHOICES = MAKE_UP_UNITS.map((u) => ({ value: u, label: u }));

function MakeUpLine({ form, line, n }: { form: BathFormState; line: MakeUpText; n: number }) {
  const { palette } = useTheme();
  const error = (field: string) => form.errors.fields[`makeUp.${n - 1}.${field}`];
  return (
    <View style={[styles.line, { borderColor: palette.border }]} testID={`make-up-line-${n}`}>
      <Pair>
        <Half>
          <TextField
            label={`Salt, line ${n}`}
            value={line.salt}
            onChangeText={(salt) => form.setLine(line.key, { salt })}
            error={error('salt')}
            hint="A formula or a catalogue name: KCN, K[Ag(CN)2], Na2S2O3·5H2O"
          />
        </Half>
        <Half>
          <TextField
            label={`Amount, line ${n}`}
            value={line.amount}
            onChangeText={(amount) => form.setLine(line.key, { amount })}
            error={error('amount')}
            inputMode="decimal"
          />
        </Half>
      </Pair>
      <ChoiceChips label={`Unit, line ${n}`} options={UNIT_CHOICES} value={line.unit} onChange={(unit) => form.setLine(line.key, { unit })} />
      <GroupMessage error={error('unit')} />
      <Button label="Remove" accessibilityLabel={`Remove make-up line ${n}`} variant="danger" onPress={() => form.removeLine(line.key)} />
    </View>
  );
}

/** The salts the bath was made up with, one line each, added and removed freely. */
export function MakeUpLines({ form }: { form: BathFormState }) {
  const lines = form.texts.makeUp;
  return (
    <View style={styles.group}>
      {lines.length === 0 ? (
        <ThemedText variant="caption" tone="textMuted">
          No make-up lines yet. Add one per salt, in g/L, oz/gal or mL/L of bath.
        </ThemedText>
      ) : (
        lines.map((line, i) => <MakeUpLine key={line.key} form={form} line={line} n={i + 1} />)
      )}
      <GroupMessage error={form.errors.fields.makeUp} />
      {lines.length < MAX_MAKE_UP ? (
        <Button label="Add a make-up line" onPress={form.addLine} />
      ) : (
        <ThemedText variant="caption" tone="textMuted">{`A bath takes at most ${MAX_MAKE_UP} make-up lines.`}</ThemedText>
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  section: { gap: space.md },
  group: { gap: space.sm },
  line: { gap: space.sm, borderWidth: 1, borderRadius: radius.md, padding: space.md },
});
