import { useRouter } from 'expo-router';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { runTitle } from '@/components/screens/calculate/run-words';
import { ShareMessage, useShareLink } from '@/components/screens/runs/share-link';
import { space } from '@/components/theme/tokens';
import { Button } from '@/components/ui/button';
import { ConfirmBar } from '@/components/ui/confirm-bar';
import { Notice } from '@/components/ui/notice';
import { ThemedText } from '@/components/ui/themed-text';
import { useDeleteRun } from '@/lib/api/use-runs';
import { hasRole, type User } from '@/shared/auth';
import { type RunSummary } from '@/shared/constants';

/** The path of a run's print view (outside the tab shell, so the page carries no navigation). */
export function printPath(id: string): string {
  return `/print/run/${encodeURIComponent(id)}`;
}

/** Whether a person may delete a run: its author or an admin (the server checks again). */
export function canDeleteRun(me: User | undefined, run: Pick<RunSummary, 'author'>): boolean {
  return !!me && (me.id === run.author.id || hasRole(me, 'admin'));
}

/** Delete behind an inline "are you sure"; back to the list when done, the server's words when it refuses. */
function DeleteAction({ run }: { run: RunSummary }) {
  const router = useRouter();
  const remove = useDeleteRun(run.id);
  const [asking, setAsking] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const title = runTitle(run);

  const confirm = async () => {
    setError(null);
    try {
      await remove.trigger();
      router.dismissTo('/calculate/runs');
    } catch (cause) {
      setAsking(false);
      setError(cause instanceof Error ? cause.message : 'The run could not be deleted.');
    }
  };

  return (
    <>
      {asking ? (
        <View style={styles.line}>
          <ConfirmBar
            question={`Delete "${title}"? It leaves the saved runs for everyone on the team.`}
            confirmLabel="Delete the run"
            busy={remove.isMutating}
            onConfirm={() => void confirm()}
            onCancel={() => setAsking(false)}
          />
        </View>
      ) : (
        <Button label="Delete" variant="danger" accessibilityLabel={`Delete ${title}`} accessibilityHint="Asks before deleting the run" onPress={() => setAsking(true)} />
      )}
      {error ? (
        <View style={styles.line}>
          <Notice kind="error" message={error} />
        </View>
      ) : null}
    </>
  );
}

/** What can be done with a saved run: copy its share link, open the print view, and delete it (author or admin). */
export function RunActions({ run, me }: { run: RunSummary; me: User | undefined }) {
  const router = useRouter();
  const { outcome, share } = useShareLink(run.id, runTitle(run));
  return (
    <View style={styles.box} testID="run-actions">
      <View style={styles.row}>
        <Button label="Copy share link" accessibilityHint="Copies the address of this run for someone on the team" onPress={share} />
        <Button label="Print" accessibilityHint="Opens a clean page of this run to print or save as PDF" onPress={() => router.push(printPath(run.id))} />
        {canDeleteRun(me, run) ? <DeleteAction run={run} /> : null}
      </View>
      {outcome ? <ShareMessage outcome={outcome} /> : null}
      <ThemedText variant="caption" tone="textMuted">
        Only people on the team can open a share link: it asks them to sign in first.
      </ThemedText>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.sm },
  // Buttons side by side; the confirm bar and notices take a line of their own.
  row: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'flex-start', gap: space.sm },
  line: { width: '100%' },
});
