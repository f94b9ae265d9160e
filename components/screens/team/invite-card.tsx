import { useState } from 'react';
import { StyleSheet } from 'react-native';

import { RoleCheckboxes } from '@/components/screens/team/role-checkboxes';
import { space } from '@/components/theme/tokens';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { Notice } from '@/components/ui/notice';
import { TextField } from '@/components/ui/text-field';
import { ThemedText } from '@/components/ui/themed-text';
import { checkForm, errorsFromApi, NO_ERRORS, type FormErrors } from '@/lib/api/form-errors';
import { useInvite } from '@/lib/api/use-team';
import { inviteSchema, type Role } from '@/shared/auth';

const FIELDS = ['email', 'roles'] as const;

/** Invites someone by e-mail with at least one role; the server mails them a link. */
export function InviteCard() {
  const [email, setEmail] = useState('');
  const [roles, setRoles] = useState<Role[]>([]);
  const [errors, setErrors] = useState<FormErrors>(NO_ERRORS);
  const [sentTo, setSentTo] = useState<string | null>(null);
  const { trigger, isMutating } = useInvite();

  const submit = async () => {
    if (isMutating) return;
    setSentTo(null);
    const check = checkForm(inviteSchema, { email, roles }, FIELDS);
    if (!check.ok) return setErrors(check.errors);
    setErrors(NO_ERRORS);
    try {
      const invitation = await trigger(check.data);
      setSentTo(invitation.email);
      setEmail('');
      setRoles([]);
    } catch (error) {
      setErrors(errorsFromApi(error, FIELDS));
    }
  };

  return (
    <Card testID="invite-card" style={styles.card}>
      <ThemedText variant="title" accessibilityRole="header" aria-level={2}>
        Invite someone
      </ThemedText>
      {sentTo ? <Notice kind="success" message={`Invitation sent to ${sentTo}`} /> : null}
      {errors.form ? <Notice kind="error" message={errors.form} /> : null}
      <TextField
        label="E-mail of the person to invite"
        value={email}
        onChangeText={setEmail}
        onSubmit={() => void submit()}
        error={errors.fields.email}
        autoComplete="off"
        inputMode="email"
      />
      <RoleCheckboxes value={roles} onChange={setRoles} error={errors.fields.roles} />
      <Button
        label="Send invitation"
        busyLabel="Sending…"
        busy={isMutating}
        variant="primary"
        onPress={() => void submit()}
      />
    </Card>
  );
}

const styles = StyleSheet.create({
  card: { gap: space.md, maxWidth: 600 },
});
