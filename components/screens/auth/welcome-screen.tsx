import { useRouter } from 'expo-router';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { LinkChecking, LinkGone, useDeadLink } from '@/components/screens/auth/link-states';
import { NewPasswordFields, withConfirm } from '@/components/screens/auth/new-password-fields';
import { HOME_PATH } from '@/components/shell/next-path';
import { PublicFrame } from '@/components/shell/public-frame';
import { space } from '@/components/theme/tokens';
import { Button } from '@/components/ui/button';
import { Chip } from '@/components/ui/chip';
import { Notice } from '@/components/ui/notice';
import { TextField } from '@/components/ui/text-field';
import { ThemedText } from '@/components/ui/themed-text';
import { checkForm, errorsFromApi, NO_ERRORS, type FormErrors } from '@/lib/api/form-errors';
import { useAcceptInvitation, useInvitationToken } from '@/lib/api/use-auth';
import { acceptInvitationSchema, ROLE_LABELS, tokenSchema } from '@/shared/auth';

const FIELDS = ['name', 'password', 'confirm'] as const;

/** Accepts a mailed invitation: shows who invited whom with which roles, then name and password. */
export function WelcomeScreen({ token }: { token: string }) {
  const valid = tokenSchema.safeParse(token).success;
  const info = useInvitationToken(valid ? token : null);
  const router = useRouter();
  const [name, setName] = useState('');
  const [password, setPassword] = useState('');
  const [confirm, setConfirm] = useState('');
  const [errors, setErrors] = useState<FormErrors>(NO_ERRORS);
  const { trigger, isMutating } = useAcceptInvitation(token);

  const link = useDeadLink(valid, info.error);

  if (link.dead) {
    return (
      <LinkGone
        title="This invitation no longer works"
        body={link.reason ?? 'It was already used or has expired. Ask an admin of your team to send you a new invitation.'}
        linkHref="/sign-in"
        linkLabel="Go to sign in"
      />
    );
  }
  if (!info.data) return <LinkChecking title="Welcome to Ligandry" error={info.error} onRetry={() => void info.mutate()} />;
  const { email, roles, invitedBy } = info.data;

  const submit = async () => {
    if (isMutating) return;
    const check = withConfirm(checkForm(acceptInvitationSchema, { name, password }, FIELDS), password, confirm);
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
    <PublicFrame title="Welcome to Ligandry" subtitle={`${invitedBy} invited you to join the team.`}>
      <View style={styles.form}>
        <View style={styles.facts}>
          <ThemedText variant="label" tone="textMuted" weight="regular">
            Your e-mail
          </ThemedText>
          <ThemedText variant="body" weight="semibold">
            {email}
          </ThemedText>
          <ThemedText variant="label" tone="textMuted" weight="regular">
            Your roles
          </ThemedText>
          <View style={styles.chips} accessibilityLabel={`Roles: ${roles.map((r) => ROLE_LABELS[r].label).join(', ')}`}>
            {roles.map((role) => (
              <Chip key={role} label={ROLE_LABELS[role].label} />
            ))}
          </View>
        </View>
        {errors.form ? <Notice kind="error" message={errors.form} testID="form-error" /> : null}
        <TextField
          label="Your name"
          value={name}
          onChangeText={setName}
          onSubmit={() => void submit()}
          error={errors.fields.name}
          hint="As your colleagues will see it."
          autoComplete="name"
          autoCapitalize="words"
          autoFocus
        />
        <NewPasswordFields
          label="Password"
          password={password}
          confirm={confirm}
          onPassword={setPassword}
          onConfirm={setConfirm}
          onSubmit={() => void submit()}
          errors={{ password: errors.fields.password, confirm: errors.fields.confirm }}
        />
        <Button
          label="Join the team"
          busyLabel="Joining…"
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
  facts: { gap: space.xs },
  chips: { flexDirection: 'row', flexWrap: 'wrap', gap: space.xs, marginBottom: space.xs },
});
