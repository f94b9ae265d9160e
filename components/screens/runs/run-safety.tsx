import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { HazardBanner } from '@/components/hazards/hazard-banner';
import { radius, space } from '@/components/theme/tokens';
import { useTheme } from '@/components/theme/use-theme';
import { Button } from '@/components/ui/button';
import { formatWhen } from '@/components/ui/format-date';
import { Notice } from '@/components/ui/notice';
import { TextField } from '@/components/ui/text-field';
import { TextLink } from '@/components/ui/text-link';
import { ThemedText } from '@/components/ui/themed-text';
import { useReleaseRun } from '@/lib/api/use-safety';
import { hasRole, type User } from '@/shared/auth';
import { type Run } from '@/shared/constants';
import { REVIEW_STATUS_LABELS } from '@/shared/safety';

/** Whether the desk still holds the run back: flagged and not signed off. */
export function heldByDesk(run: Pick<Run, 'safety'>): boolean {
  return run.safety.flagged && run.safety.review?.status !== 'signed_off';
}

function Release({ run, me }: { run: Run; me: User | undefined }) {
  const release = useReleaseRun(run.id);
  const [note, setNote] = useState('');
  const [error, setError] = useState<string | null>(null);
  const mayRelease = !!me && (me.id === run.author.id || hasRole(me, 'admin'));
  if (run.safety.released) {
    const r = run.safety.released;
    return (
      <ThemedText variant="label" weight="semibold" tone="ok" testID="run-released">
        {`Released by ${r.by.name}, ${formatWhen(r.at)}${r.note ? `: ${r.note}` : ''}`}
      </ThemedText>
    );
  }
  if (!mayRelease) {
    return (
      <ThemedText variant="label" weight="regular" tone="textMuted">
        Not released yet. Its author or an admin releases it.
      </ThemedText>
    );
  }
  const held = heldByDesk(run);
  const send = async () => {
    setError(null);
    try {
      await release.trigger({ note });
    } catch (cause) {
      setError(cause instanceof Error ? cause.message : 'The run could not be released.');
    }
  };
  return (
    <View style={styles.release}>
      {held ? (
        <Notice kind="info" testID="release-held" message="This run can be released once the safety desk signs it off." />
      ) : (
        <TextField label="Release note (optional)" value={note} onChangeText={setNote} onSubmit={() => void send()} autoCapitalize="sentences" maxLength={2000} />
      )}
      {error ? <Notice kind="error" message={error} testID="release-error" /> : null}
      <Button
        label="Release the run"
        variant="primary"
        disabled={held}
        busy={release.isMutating}
        accessibilityHint={held ? 'Waits for the safety desk to sign it off' : 'Marks the run as released for use on the line'}
        onPress={() => void send()}
        testID="release-run"
      />
    </View>
  );
}

/** A run's hazards, where it stands with the safety desk, and its release. */
export function RunSafety({ run, me }: { run: Run; me: User | undefined }) {
  const { palette } = useTheme();
  const review = run.safety.review;
  const canOpenReview = !!review && !!me && (review.submittedBy.id === me.id || hasRole(me, 'safety', 'admin'));
  return (
    <View style={styles.stack}>
      <HazardBanner hazards={run.safety.hazards} review={review} compact />
      <View style={[styles.box, { borderColor: palette.border }]} testID="run-safety">
        <ThemedText variant="label" weight="semibold" accessibilityRole="header" aria-level={2}>
          Safety desk and release
        </ThemedText>
        {review ? (
          <>
            <ThemedText variant="label" weight="regular" testID="run-review-status">
              {`${REVIEW_STATUS_LABELS[review.status]}${review.decidedBy && review.decidedAt ? ` (${review.decidedBy.name}, ${formatWhen(review.decidedAt)})` : ''}`}
            </ThemedText>
            {review.status === 'signed_off' ? (
              <ThemedText variant="label" weight="semibold" testID="run-review-conditions">
                {review.conditions ? `Conditions: ${review.conditions}` : 'Signed off without conditions.'}
              </ThemedText>
            ) : null}
            {review.status === 'sent_back' && review.note ? <ThemedText variant="label" weight="semibold">{`Note from the desk: ${review.note}`}</ThemedText> : null}
            {canOpenReview ? <TextLink href={`/safety/review/${review.id}`} label={review.status === 'sent_back' && review.submittedBy.id === me?.id ? 'Open the review to resubmit' : 'Open the review'} /> : null}
          </>
        ) : (
          <ThemedText variant="label" weight="regular" tone="textMuted">
            {run.safety.flagged ? 'Flagged, but no review is on record.' : 'No hazard rule sends this run to the safety desk.'}
          </ThemedText>
        )}
        <Release run={run} me={me} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  stack: { gap: space.md },
  box: { gap: space.sm, borderWidth: 1, borderRadius: radius.md, padding: space.md },
  release: { gap: space.sm },
});
