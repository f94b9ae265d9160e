import { useRouter } from 'expo-router';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { LinkChecking, LinkGone, useDeadLink } from '@/components/screens/auth/link-states';
import { NewPasswordFields, withConfirm } from '@/components/screens/auth/new-password-fields';
import { HOME_PATH } from '@/components/shell/next-path';
import { PublicFrame } from '@/components/shell/public-frame';
import { space } from '@/components/theme/tokens';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { ThemedText } from '@/components/ui/themed-text';
import { checkForm, errorsFromApi, NO_ERRORS, type FormErrors } from '@/lib/api/form-errors';
import { usePasswordResetToken, useSetNewPassword } from '@/lib/api/use-auth';
import { newPasswordSchema, tokenSchema } from '@/shared/auth';

const FIELDS = ['password', 'confirm'] as const;

/** Chooses a new password through a mailed reset link; on success the person is signed in and goes home. */
export function NewPasswordScreen({ token }: { token: string }) {
  const valid = tokenSchema.safeParse(token).success;
  const info = usePasswordResetToken(valid ? token : null);
  const router = useRouter();
  const [password, setPassword] = useState('');
  const [confirm, setConfirm] = useState('');
  const [errors, setErrors] = useState<FormErrors>(NO_ERRORS);
  const { trigger, isMutating } = useSetNewPassword(token);

  const link = useDeadLink(valid, info.error);

  if (link.dead) {
    return (
      <LinkGone
        title="This link no longer works"
        body={link.reason ?? 'Reset links work once and only for a short time. This one was used, has expired, or was copied incompletely.'}
        linkHref="/forgot-password"
        linkLabel="Ask for a new link"
      />
    );
  }
  if (!info.data) return <LinkChecking title="Choose a new password" error={info.error} onRetry={() => void info.mutate()} />;

  const submit = async () => {
    if (isMutating) return;
    const check = withConfirm(checkForm(newPasswordSchema, { password }, FIELDS), password, confirm);
    if (!check.ok) return setErrors(check.errors);
    setErrors(NO_ERRORS);
    try {
      await trigger(check.data);
      router.replace(HOME_PATH);
    } catch (error) {
      if (!link.caught(error)) setErrors(errorsFromApi(error, FIELDS));
    }
  };

  return (
    <PublicFrame title="Choose a new password">
      <View style={styles.form}>
        <ThemedText variant="body">
          {'For '}
          <ThemedText variant="body" weight="semibold">
            {info.data.email}
          </ThemedText>
        </ThemedText>
        {errors.form ? <Notice kind="error" message={errors.form} testID="form-error" /> : null}
        <NewPasswordFields
          password={password}
          confirm={confirm}
          onPassword={setPassword}
          onConfirm={setConfirm}
          onSubmit={() => void submit()}
          errors={{ password: errors.fields.password, confirm: errors.fields.confirm }}
          autoFocus
        />
        <Button
          label="Save and sign in"
          busyLabel="Saving…"
          busy={isMutating}
          variant="primary"
          onPress={() => void submit()}
        />
      </View>
    </PublicFrame>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.lg },
});
