import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { radius, space } from '@/components/theme/tokens';
import { useTheme } from '@/components/theme/use-theme';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { TextField } from '@/components/ui/text-field';
import { ThemedText } from '@/components/ui/themed-text';
import { checkForm, errorsFromApi, NO_ERRORS, type FormErrors } from '@/lib/api/form-errors';
import { useReviewAction } from '@/lib/api/use-safety';
import { resubmitSchema, sendBackSchema, signOffSchema } from '@/shared/safety';

const CONDITIONS = ['conditions'] as const;
const NOTE = ['note'] as const;

type Props = { id: string; onDone: (message: string) => void };

function Box({ children, testID }: { children: React.ReactNode; testID: string }) {
  const { palette } = useTheme();
  return (
    <View style={[styles.box, { borderColor: palette.border, backgroundColor: palette.surfaceRaised }]} testID={testID}>
      {children}
    </View>
  );
}

/** Sign off with conditions, or send back with a note (safety officers, not on their own work). */
export function DecideReview({ id, onDone }: Props) {
  const signOff = useReviewAction(id, 'sign-off');
  const sendBack = useReviewAction(id, 'send-back');
  const [conditions, setConditions] = useState('');
  const [note, setNote] = useState('');
  const [signErrors, setSignErrors] = useState<FormErrors>(NO_ERRORS);
  const [backErrors, setBackErrors] = useState<FormErrors>(NO_ERRORS);
  const busy = signOff.isMutating || sendBack.isMutating;

  const sign = async () => {
    if (busy) return;
    const check = checkForm(signOffSchema, { conditions }, CONDITIONS);
    if (!check.ok) return setSignErrors(check.errors);
    setSignErrors(NO_ERRORS);
    try {
      await signOff.trigger(check.data);
      onDone(check.data.conditions ? 'Signed off with your conditions; the submitter has been mailed.' : 'Signed off; the submitter has been mailed.');
    } catch (error) {
      setSignErrors(errorsFromApi(error, CONDITIONS));
    }
  };
  const back = async () => {
    if (busy) return;
    const check = checkForm(sendBackSchema, { note }, NOTE);
    if (!check.ok) return setBackErrors(check.errors);
    setBackErrors(NO_ERRORS);
    try {
      await sendBack.trigger(check.data);
      onDone('Sent back with your note; the submitter has been mailed.');
    } catch (error) {
      setBackErrors(errorsFromApi(error, NOTE));
    }
  };

  return (
    <View style={styles.forms}>
      <Box testID="sign-off-form">
        <ThemedText variant="label" weight="semibold">
          Sign off
        </ThemedText>
        <ThemedText variant="caption" tone="textMuted">
          The work may go ahead on the conditions you write here; they are shown with the run or bath and mailed to the submitter.
        </ThemedText>
        {signErrors.form ? <Notice kind="error" message={signErrors.form} /> : null}
        <TextField
          label="Conditions"
          value={conditions}
          onChangeText={setConditions}
          onSubmit={() => void sign()}
          error={signErrors.fields.conditions}
          hint="For example: extraction on, HCN monitor in the room, second person present"
          autoCapitalize="sentences"
          maxLength={2000}
        />
        <Button label="Sign off" variant="primary" busy={signOff.isMutating} disabled={busy} onPress={() => void sign()} testID="sign-off" />
      </Box>
      <Box testID="send-back-form">
        <ThemedText variant="label" weight="semibold">
          Send back
        </ThemedText>
        <ThemedText variant="caption" tone="textMuted">
          Say what has to change; the submitter resubmits when it has.
        </ThemedText>
        {backErrors.form ? <Notice kind="error" message={backErrors.form} /> : null}
        <TextField
          label="What has to change"
          value={note}
          onChangeText={setNote}
          onSubmit={() => void back()}
          error={backErrors.fields.note}
          autoCapitalize="sentences"
          maxLength={2000}
        />
        <Button label="Send back" variant="danger" busy={sendBack.isMutating} disabled={busy} onPress={() => void back()} testID="send-back" />
      </Box>
    </View>
  );
}

/** Resubmit work the desk sent back, saying what changed (its submitter). */
export function ResubmitReview({ id, onDone }: Props) {
  const resubmit = useReviewAction(id, 'resubmit');
  const [note, setNote] = useState('');
  const [errors, setErrors] = useState<FormErrors>(NO_ERRORS);
  const send = async () => {
    if (resubmit.isMutating) return;
    const check = checkForm(resubmitSchema, { note }, NOTE);
    if (!check.ok) return setErrors(check.errors);
    setErrors(NO_ERRORS);
    try {
      await resubmit.trigger(check.data);
      onDone('Resubmitted: the safety desk has been mailed.');
    } catch (error) {
      setErrors(errorsFromApi(error, NOTE));
    }
  };
  return (
    <Box testID="resubmit-form">
      <ThemedText variant="label" weight="semibold">
        Resubmit to the desk
      </ThemedText>
      {errors.form ? <Notice kind="error" message={errors.form} /> : null}
      <TextField label="What changed" value={note} onChangeText={setNote} onSubmit={() => void send()} error={errors.fields.note} autoCapitalize="sentences" maxLength={2000} />
      <Button label="Resubmit" variant="primary" busy={resubmit.isMutating} onPress={() => void send()} testID="resubmit" />
    </Box>
  );
}

const styles = StyleSheet.create({
  forms: { gap: space.md },
  box: { gap: space.sm, padding: space.md, borderWidth: 1, borderRadius: radius.md },
});
