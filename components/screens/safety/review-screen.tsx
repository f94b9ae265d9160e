import { useLocalSearchParams } from 'expo-router';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { HazardBanner } from '@/components/hazards/hazard-banner';
import { DecideReview, ResubmitReview } from '@/components/screens/safety/review-forms';
import { subjectKindText, subjectTitle } from '@/components/screens/safety/review-list';
import { LostIcon } from '@/components/shell/icons';
import { space } from '@/components/theme/tokens';
import { useIsWide } from '@/components/theme/use-is-wide';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { formatWhen } from '@/components/ui/format-date';
import { LoadingState } from '@/components/ui/loading-state';
import { Notice } from '@/components/ui/notice';
import { ScreenContainer } from '@/components/ui/screen-container';
import { TextLink } from '@/components/ui/text-link';
import { ThemedText } from '@/components/ui/themed-text';
import { useMe } from '@/lib/api/use-me';
import { useReview } from '@/lib/api/use-safety';
import { hasRole, type User } from '@/shared/auth';
import { type Review, type ReviewAction, REVIEW_STATUS_LABELS } from '@/shared/safety';

const ACTION_WORDS: Record<ReviewAction, string> = {
  submitted: 'Sent to the desk',
  signed_off: 'Signed off',
  sent_back: 'Sent back',
  resubmitted: 'Resubmitted',
};

function Events({ review }: { review: Review }) {
  return (
    <View style={styles.section} testID="review-events">
      <ThemedText variant="title" accessibilityRole="header" aria-level={2}>
        History
      </ThemedText>
      {review.events.map((e, i) => (
        <View key={`${e.at}-${i}`} style={styles.event} accessible>
          <ThemedText variant="label">{`${ACTION_WORDS[e.action]} by ${e.actor.name}`}</ThemedText>
          <ThemedText variant="caption" tone="textMuted">
            {formatWhen(e.at)}
          </ThemedText>
          {e.note ? <ThemedText variant="caption">{e.action === 'signed_off' ? `Conditions: ${e.note}` : `Note: ${e.note}`}</ThemedText> : null}
        </View>
      ))}
    </View>
  );
}

function Body({ review, me }: { review: Review; me: User }) {
  const [done, setDone] = useState<string | null>(null);
  const mine = review.submittedBy.id === me.id;
  const officer = hasRole(me, 'safety');
  const wide = useIsWide();
  const subjectHref = review.subject.kind === 'run' ? `/calculate/runs/${review.subject.id}` : `/baths/${review.subject.id}`;
  const status = (
    <View style={styles.section} testID="review-status">
      <ThemedText variant="title" weight="semibold" accessibilityLiveRegion="polite">
        {REVIEW_STATUS_LABELS[review.status]}
      </ThemedText>
      <ThemedText variant="label" weight="regular">
        {`Sent by ${mine ? 'you' : review.submittedBy.name}, ${formatWhen(review.submittedAt)}; checked against thresholds version ${review.thresholdsVersion}.`}
      </ThemedText>
      {review.decidedBy && review.decidedAt ? (
        <ThemedText variant="label" weight="regular">{`${review.status === 'signed_off' ? 'Signed off' : 'Sent back'} by ${review.decidedBy.name}, ${formatWhen(review.decidedAt)}.`}</ThemedText>
      ) : null}
      {review.status === 'signed_off' ? (
        <ThemedText variant="label" weight="semibold" testID="review-conditions">
          {review.conditions ? `Conditions: ${review.conditions}` : 'No conditions were set.'}
        </ThemedText>
      ) : null}
      {review.status !== 'signed_off' && review.note ? <ThemedText variant="label" weight="semibold">{`Note: ${review.note}`}</ThemedText> : null}
      <TextLink href={subjectHref} label={review.subject.kind === 'run' ? 'Open the run' : 'Open the bath'} />
    </View>
  );
  const actions = (
    <>
      {review.status === 'pending' && officer && !mine ? <DecideReview id={review.id} onDone={setDone} /> : null}
      {review.status === 'pending' && officer && mine ? <Notice kind="info" message="This is your own work: another safety officer signs it off or sends it back." /> : null}
      {review.status === 'sent_back' && mine ? <ResubmitReview id={review.id} onDone={setDone} /> : null}
    </>
  );
  const evidence = (
    <>
      <HazardBanner hazards={review.hazards} />
      <Events review={review} />
    </>
  );
  return (
    <>
      {done ? <Notice kind="success" message={done} testID="review-done" /> : null}
      {wide ? (
        // Wide: the evidence on the left, the status and the decision beside it, so neither scrolls away.
        <View style={styles.columns}>
          <View style={[styles.column, styles.evidence]}>{evidence}</View>
          <View style={[styles.column, styles.decision]}>
            {status}
            {actions}
          </View>
        </View>
      ) : (
        <>
          {status}
          <HazardBanner hazards={review.hazards} />
          {actions}
          <Events review={review} />
        </>
      )}
    </>
  );
}

/** /safety/review/:id: a flagged run or bath with its evidence, the decision, and its history. */
export function ReviewScreen() {
  const { id } = useLocalSearchParams<{ id?: string }>();
  const me = useMe();
  const { data, error, isLoading, mutate } = useReview(typeof id === 'string' ? id : null);
  const title = data ? subjectTitle(data) : 'Safety review';
  return (
    <ScreenContainer title={title} subtitle={data ? `${subjectKindText(data)} · safety review` : undefined} back={{ href: '/safety', label: 'Safety' }}>
      {error?.status === 404 ? (
        <EmptyState Icon={LostIcon} title="No such review" body="This review does not exist. It may have been mistyped in the address.">
          <TextLink href="/safety" label="Back to the safety desk" />
        </EmptyState>
      ) : error ? (
        <ErrorState message={error.message} onRetry={() => void mutate()} />
      ) : isLoading || !data || !me.data ? (
        <LoadingState label="Loading the review…" />
      ) : (
        <Body review={data} me={me.data} />
      )}
    </ScreenContainer>
  );
}

const styles = StyleSheet.create({
  section: { gap: space.sm },
  event: { gap: space.xxs },
  columns: { flexDirection: 'row', alignItems: 'flex-start', gap: space.xl },
  column: { gap: space.md, minWidth: 0 },
  evidence: { flex: 1.6 },
  decision: { flex: 1 },
});
