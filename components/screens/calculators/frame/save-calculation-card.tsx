import { useRouter } from 'expo-router';
import { useState } from 'react';
import { StyleSheet } from 'react-native';

import { space } from '@/components/theme/tokens';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { Notice } from '@/components/ui/notice';
import { TextField } from '@/components/ui/text-field';
import { ThemedText } from '@/components/ui/themed-text';
import { useSaveRun } from '@/lib/api/use-runs';

import { type Calculation } from './use-calculation';

type Props = { calculation: Pick<Calculation, 'runBody' | 'showSaveError'>; disabled: boolean; bathName?: string | null };

/** Saves the calculation as a run (POST /api/runs with calculator, system, params and bath); the server works it out again and keeps its own result; then opens the run. */
export function SaveCalculationCard({ calculation, disabled, bathName }: Props) {
  const router = useRouter();
  const { trigger, isMutating } = useSaveRun();
  const [title, setTitle] = useState('');
  const [titleError, setTitleError] = useState<string | undefined>();
  const [message, setMessage] = useState<string | undefined>();

  const save = async () => {
    if (isMutating) return;
    setMessage(undefined);
    setTitleError(undefined);
    const body = calculation.runBody();
    if (!body) {
      setMessage('Fix the marked inputs first.');
      return;
    }
    try {
      const run = await trigger({ ...body, title: title.trim() });
      router.push(`/calculate/runs/${encodeURIComponent(run.id)}`);
    } catch (error) {
      const shown = calculation.showSaveError(error);
      setTitleError(shown.title);
      setMessage(shown.top ?? (shown.title ? undefined : 'Fix the marked inputs.'));
    }
  };

  return (
    <Card style={styles.card} testID="save-run">
      <ThemedText variant="title" accessibilityRole="header" aria-level={2}>
        Save run
      </ThemedText>
      <ThemedText variant="caption" tone="textMuted">
        {`The server works the run out again from today’s library and keeps that result with the constant versions it used${bathName ? `, filed under ${bathName}` : ''}.`}
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
