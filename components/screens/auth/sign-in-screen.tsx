import { useRouter } from 'expo-router';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { safeNext } from '@/components/shell/next-path';
import { PublicFrame } from '@/components/shell/public-frame';
import { space } from '@/components/theme/tokens';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { TextField } from '@/components/ui/text-field';
import { TextLink } from '@/components/ui/text-link';
import { checkForm, errorsFromApi, NO_ERRORS, type FormErrors } from '@/lib/api/form-errors';
import { useSignIn } from '@/lib/api/use-auth';
import { signInSchema } from '@/shared/auth';

const FIELDS = ['email', 'password'] as const;

/** Sign-in with e-mail and password; afterwards goes where the person was heading (`next`). */
export function SignInScreen({ next }: { next?: string }) {
  const router = useRouter();
  const [email, setEmail] = useState('');
  const [password, setPassword] = useState('');
  const [errors, setErrors] = useState<FormErrors>(NO_ERRORS);
  const { trigger, isMutating } = useSignIn();

  const submit = async () => {
    if (isMutating) return;
    const check = checkForm(signInSchema, { email, password }, FIELDS);
    if (!check.ok) return setErrors(check.errors);
    setErrors(NO_ERRORS);
    try {
      await trigger(check.data);
      router.replace(safeNext(next));
    } catch (error) {
      setErrors(errorsFromApi(error, FIELDS));
    }
  };

  return (
    <PublicFrame title="Sign in" subtitle="Use the e-mail address your team invited.">
      <View style={styles.form}>
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
        <TextField
          label="Password"
          value={password}
          onChangeText={setPassword}
          onSubmit={() => void submit()}
          error={errors.fields.password}
          autoComplete="current-password"
          secureTextEntry
        />
        <Button
          label="Sign in"
          busyLabel="Signing in…"
          busy={isMutating}
          variant="primary"
          onPress={() => void submit()}
        />
        <TextLink href="/forgot-password" label="Forgot your password?" />
      </View>
    </PublicFrame>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.lg },
});
