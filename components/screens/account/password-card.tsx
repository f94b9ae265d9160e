import { useState } from 'react';
import { StyleSheet } from 'react-native';

import { NewPasswordFields, withConfirm } from '@/components/screens/auth/new-password-fields';
import { space } from '@/components/theme/tokens';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { Notice } from '@/components/ui/notice';
import { TextField } from '@/components/ui/text-field';
import { ThemedText } from '@/components/ui/themed-text';
import { checkForm, errorsFromApi, NO_ERRORS, type FormErrors } from '@/lib/api/form-errors';
import { useChangePassword } from '@/lib/api/use-me';
import { changePasswordSchema } from '@/shared/auth';

const FIELDS = ['currentPassword', 'newPassword', 'confirm'] as const;

/** Words shown once the password is changed. */
export const PASSWORD_CHANGED = 'Password changed; other sessions were signed out';

/** Changes the password: current, new and new again; the server signs out every other session. */
export function PasswordCard() {
  const [currentPassword, setCurrent] = useState('');
  const [newPassword, setNew] = useState('');
  const [confirm, setConfirm] = useState('');
  const [errors, setErrors] = useState<FormErrors>(NO_ERRORS);
  const [done, setDone] = useState(false);
  const { trigger, isMutating } = useChangePassword();

  const submit = async () => {
    if (isMutating) return;
    setDone(false);
    const check = withConfirm(checkForm(changePasswordSchema, { currentPassword, newPassword }, FIELDS), newPassword, confirm);
    if (!check.ok) return setErrors(check.errors);
    setErrors(NO_ERRORS);
    try {
      await trigger(check.data);
      setCurrent('');
      setNew('');
      setConfirm('');
      setDone(true);
    } catch (error) {
      setErrors(errorsFromApi(error, FIELDS));
    }
  };
  const onSubmit = () => void submit();

  return (
    <Card testID="password-card" style={styles.card}>
      <ThemedText variant="title" accessibilityRole="header" aria-level={2}>
        Change password
      </ThemedText>
      {errors.form ? <Notice kind="error" message={errors.form} /> : null}
      {done ? <Notice kind="success" message={PASSWORD_CHANGED} /> : null}
      <TextField
        label="Current password"
        value={currentPassword}
        onChangeText={setCurrent}
        onSubmit={onSubmit}
        error={errors.fields.currentPassword}
        autoComplete="current-password"
        secureTextEntry
      />
      <NewPasswordFields
        password={newPassword}
        confirm={confirm}
        onPassword={setNew}
        onConfirm={setConfirm}
        onSubmit={onSubmit}
        errors={{ password: errors.fields.newPassword, confirm: errors.fields.confirm }}
      />
      <Button
        label="Change password"
        busyLabel="Changing…"
        busy={isMutating}
        onPress={onSubmit}
      />
    </Card>
  );
}

const styles = StyleSheet.create({
  card: { maxWidth: 600, gap: space.md },
});
