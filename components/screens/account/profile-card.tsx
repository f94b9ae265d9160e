import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { space } from '@/components/theme/tokens';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { Chip } from '@/components/ui/chip';
import { Notice } from '@/components/ui/notice';
import { TextField } from '@/components/ui/text-field';
import { ThemedText } from '@/components/ui/themed-text';
import { checkForm, errorsFromApi, NO_ERRORS, type FormErrors } from '@/lib/api/form-errors';
import { useUpdateMe } from '@/lib/api/use-me';
import { ROLE_LABELS, updateMeSchema, type User } from '@/shared/auth';

const FIELDS = ['name'] as const;

/** Who is signed in: name (editable), e-mail and roles. */
export function ProfileCard({ user }: { user: User }) {
  const [name, setName] = useState(user.name);
  const [errors, setErrors] = useState<FormErrors>(NO_ERRORS);
  const [saved, setSaved] = useState(false);
  const { trigger, isMutating } = useUpdateMe();
  const changed = name.trim() !== user.name;

  const submit = async () => {
    if (isMutating) return;
    setSaved(false);
    const check = checkForm(updateMeSchema, { name }, FIELDS);
    if (!check.ok) return setErrors(check.errors);
    setErrors(NO_ERRORS);
    try {
      const updated = await trigger(check.data);
      setName(updated.name);
      setSaved(true);
    } catch (error) {
      setErrors(errorsFromApi(error, FIELDS));
    }
  };

  return (
    <Card testID="profile-card" style={styles.card}>
      <ThemedText variant="title" accessibilityRole="header" aria-level={2}>
        You
      </ThemedText>
      <View style={styles.fact}>
        <ThemedText variant="label" weight="regular" tone="textMuted">
          E-mail
        </ThemedText>
        <ThemedText variant="body" weight="semibold" selectable>
          {user.email}
        </ThemedText>
      </View>
      <View style={styles.fact}>
        <ThemedText variant="label" weight="regular" tone="textMuted">
          Roles
        </ThemedText>
        <View style={styles.chips}>
          {user.roles.length === 0 ? (
            <ThemedText variant="label" weight="regular">
              No roles yet
            </ThemedText>
          ) : (
            user.roles.map((role) => <Chip key={role} label={ROLE_LABELS[role].label} />)
          )}
        </View>
      </View>
      {errors.form ? <Notice kind="error" message={errors.form} /> : null}
      {saved ? <Notice kind="success" message="Name saved" /> : null}
      <TextField
        label="Name"
        value={name}
        onChangeText={(text) => {
          setName(text);
          setSaved(false);
        }}
        onSubmit={() => void submit()}
        error={errors.fields.name}
        autoComplete="name"
        autoCapitalize="words"
      />
      <Button
        label="Save name"
        busyLabel="Saving…"
        busy={isMutating}
        disabled={!changed}
        onPress={() => void submit()}
      />
    </Card>
  );
}

const styles = StyleSheet.create({
  card: { maxWidth: 600, gap: space.md },
  fact: { gap: space.xxs },
  chips: { flexDirection: 'row', flexWrap: 'wrap', gap: space.xs },
});
