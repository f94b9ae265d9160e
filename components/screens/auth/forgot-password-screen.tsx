import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { PublicFrame } from '@/components/shell/public-frame';
import { space } from '@/components/theme/tokens';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { TextField } from '@/components/ui/text-field';
import { TextLink } from '@/components/ui/text-link';
import { checkForm, errorsFromApi, NO_ERRORS, type FormErrors } from '@/lib/api/form-errors';
import { useRequestPasswordReset } from '@/lib/api/use-auth';
import { resetRequestSchema } from '@/shared/auth';

const FIELDS = ['email'] as const;

/** Asks for a reset link by e-mail; shows the server's answer, which is the same whether or not the address is known. */
export function ForgotPasswordScreen() {
  const [email, setEmail] = useState('');
  const [errors, setErrors] = useState<FormErrors>(NO_ERRORS);
  const [sent, setSent] = useState<string | null>(null);
  const { trigger, isMutating } = useRequestPasswordReset();

  const submit = async () => {
    if (isMutating) return;
    const check = checkForm(resetRequestSchema, { email }, FIELDS);
    if (!check.ok) return setErrors(check.errors);
    setErrors(NO_ERRORS);
    try {
      const reply = await trigger(check.data);
      setSent(reply.message);
    } catch (error) {
      setErrors(errorsFromApi(error, FIELDS));
    }
  };

  return (
    <PublicFrame title="Forgot your password?" subtitle="We will mail you a link to choose a new one.">
      <View style={styles.form}>
        {sent ? <Notice kind="success" message={sent} testID="reset-requested" /> : null}
        {errors.form ? <Notice kind="error" message={errors.form} testID="form-error" /> : null}
        <TextField
          label="E-mail"
          value={email}
          onChangeText={setEmail}
          onSubmit={() => void submit()}
          error={errors.fields.email}
          autoComplete="email"
          inputMode="email"
          autoFocus
        />
        <Button
          label={sent ? 'Send the link again' : 'Send the link'}
          busyLabel="Sending…"
          busy={isMutating}
          variant="primary"
          onPress={() => void submit()}
        />
        <TextLink href="/sign-in" label="Back to sign in" />
      </View>
    </PublicFrame>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.lg },
});
