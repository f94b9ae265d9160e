import { useRouter } from 'expo-router';
import { useState } from 'react';
import { StyleSheet } from 'react-native';

import { type SystemForm } from '@/components/screens/calculate/use-system-form';
import { space } from '@/components/theme/tokens';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { Notice } from '@/components/ui/notice';
import { TextField } from '@/components/ui/text-field';
import { ThemedText } from '@/components/ui/themed-text';
import { ApiError } from '@/lib/api/fetcher';
import { errorsFromApi } from '@/lib/api/form-errors';
import { useSaveRun } from '@/lib/api/use-runs';

/** The run input nests the system under "system": its error paths are put back on the form's own field names. */
function unnest(error: unknown): unknown {
  if (!(error instanceof ApiError) || !Array.isArray(error.details)) return error;
  const details = (error.details as { path?: unknown; message?: unknown }[]).map((d) =>
    typeof d.path === 'string' ? { ...d, path: d.path.replace(/^system\./, '') } : d,
  );
  return new ApiError(error.status, error.code, error.message, details);
}

/** Saves the inputs as a run (chemists and technicians); the server works it out again and keeps its own result. */
export function SaveRunCard({ form, disabled }: { form: SystemForm; disabled: boolean }) {
  const router = useRouter();
  const { trigger, isMutating } = useSaveRun();
  const [title, setTitle] = useState('');
  const [titleError, setTitleError] = useState<string | undefined>();
  const [message, setMessage] = useState<string | undefined>();

  const save = async () => {
    if (isMutating) return;
    setMessage(undefined);
    setTitleError(undefined);
    const check = form.toRequest();
    if (!check.ok) {
      form.setErrors(check.errors);
      setMessage('Fix the marked inputs first.');
      return;
    }
    form.setErrors({ fields: {} });
    try {
      const run = await trigger({ title: title.trim(), calculator: 'speciation', system: check.request });
      router.push(`/calculate/runs/${encodeURIComponent(run.id)}`);
    } catch (error) {
      const errors = errorsFromApi(unnest(error), [...form.knownFields(), 'title']);
      const { title: forTitle, ...fields } = errors.fields;
      setTitleError(forTitle);
      form.setErrors({ fields });
      setMessage(errors.form ?? (Object.keys(fields).length > 0 ? 'Fix the marked inputs.' : undefined));
    }
  };

  return (
    <Card style={styles.card} testID="save-run">
      <ThemedText variant="title" accessibilityRole="header" aria-level={2}>
        Save run
      </ThemedText>
      <ThemedText variant="caption" tone="textMuted">
        The server works the run out again from today’s library and keeps that result with the constant versions it used.
      </ThemedText>
      {message ? <Notice kind="error" message={message} /> : null}
      <TextField label="Title of the run" value={title} onChangeText={setTitle} onSubmit={() => void save()} error={titleError} maxLength={200} autoCapitalize="sentences" />
      <Button label="Save run" busyLabel="Saving…" busy={isMutating} disabled={disabled} variant="primary" onPress={() => void save()} />
    </Card>
  );
}

const styles = StyleSheet.create({
  card: { gap: space.sm },
});
