import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { space } from '@/components/theme/tokens';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { TextField } from '@/components/ui/text-field';
import { ThemedText } from '@/components/ui/themed-text';
import { checkForm, errorsFromApi, NO_ERRORS, type FormErrors } from '@/lib/api/form-errors';
import { useRetireConstant, useReviewConstant } from '@/lib/api/use-library';
import { retireSchema, reviewSchema, type ConstantSummary } from '@/shared/constants';

const NOTE = ['note'] as const;

type Props = { c: ConstantSummary; onDone: (message: string) => void };

/** Approve or reject a draft with a note for the proposer (reviewers other than the proposer). */
export function DecideDraft({ c, onDone }: Props) {
  const { trigger, isMutating } = useReviewConstant(c.id);
  const [note, setNote] = useState('');
  const [errors, setErrors] = useState<FormErrors>(NO_ERRORS);

  const decide = async (decision: 'approve' | 'reject') => {
    if (isMutating) return;
    const check = checkForm(reviewSchema, { decision, note }, NOTE);
    if (!check.ok) return setErrors(check.errors);
    setErrors(NO_ERRORS);
    try {
      await trigger(check.data);
      setNote('');
      onDone(
        decision === 'approve'
          ? `Approved: version ${c.version} now feeds calculations${c.replacesId == null ? '' : ' and the version it replaces is retired'}.`
          : `Rejected: version ${c.version} stays in the history and no calculation uses it.`,
      );
    } catch (error) {
      setErrors(errorsFromApi(error, NOTE));
    }
  };

  return (
    <View style={styles.box} testID="decide-draft">
      <ThemedText variant="label" weight="regular">
        {c.replacesId == null
          ? 'Approving adds this constant to the library used by calculations.'
          : 'Approving replaces the version in use now; that version is retired and kept in the history.'}
      </ThemedText>
      {errors.form ? <Notice kind="error" message={errors.form} /> : null}
      <TextField
        label="Note for the proposer"
        value={note}
        onChangeText={setNote}
        error={errors.fields.note}
        hint="Required: what you checked, or why not"
        autoCapitalize="sentences"
      />
      <View style={styles.actions}>
        <Button
          label="Approve"
          accessibilityLabel={`Approve version ${c.version}`}
          variant="primary"
          busy={isMutating}
          onPress={() => void decide('approve')}
        />
        <Button
          label="Reject"
          accessibilityLabel={`Reject version ${c.version}`}
          variant="danger"
          busy={isMutating}
          onPress={() => void decide('reject')}
        />
      </View>
    </View>
  );
}

/** Retires an approved version with a note saying why; calculations stop using it (reviewers). */
export function RetireVersion({ c, onDone }: Props) {
  const { trigger, isMutating } = useRetireConstant(c.id);
  const [open, setOpen] = useState(false);
  const [note, setNote] = useState('');
  const [errors, setErrors] = useState<FormErrors>(NO_ERRORS);

  const retire = async () => {
    if (isMutating) return;
    const check = checkForm(retireSchema, { note }, NOTE);
    if (!check.ok) return setErrors(check.errors);
    setErrors(NO_ERRORS);
    try {
      await trigger(check.data);
      setOpen(false);
      onDone(`Retired: version ${c.version} stays in the history and no calculation uses it any more.`);
    } catch (error) {
      setErrors(errorsFromApi(error, NOTE));
    }
  };

  if (!open) {
    return (
      <Button
        label="Retire…"
        accessibilityLabel={`Retire version ${c.version}`}
        accessibilityHint="Asks for a note first"
        variant="danger"
        onPress={() => setOpen(true)}
      />
    );
  }
  return (
    <View style={styles.box} testID="retire-version">
      <ThemedText variant="label" weight="regular">
        Retiring takes this value out of every calculation; the history keeps it.
      </ThemedText>
      {errors.form ? <Notice kind="error" message={errors.form} /> : null}
      <TextField
        label="Why it is retired"
        value={note}
        onChangeText={setNote}
        error={errors.fields.note}
        autoCapitalize="sentences"
        onSubmit={() => void retire()}
      />
      <View style={styles.actions}>
        <Button label="Retire" accessibilityLabel="Retire now" variant="danger" busy={isMutating} busyLabel="Retiring…" onPress={() => void retire()} />
        <Button label="Cancel" disabled={isMutating} onPress={() => setOpen(false)} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.sm },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
});
