import { Link } from 'expo-router';
import { Pressable, StyleSheet, View, type ViewStyle } from 'react-native';

import { HazardChips } from '@/components/hazards/hazard-chips';
import { PROCESS_INFO } from '@/shared/baths';
import { CALCULATOR_LABELS, type CalculatorKey } from '@/shared/calculators';
import { radius, space } from '@/components/theme/tokens';
import { useTheme } from '@/components/theme/use-theme';
import { formatWhen } from '@/components/ui/format-date';
import { ThemedText } from '@/components/ui/themed-text';
import { useFocusVisible } from '@/components/ui/use-focus-visible';
import { type User } from '@/shared/auth';
import { REVIEW_STATUS_LABELS, type ReviewSummary } from '@/shared/safety';

/** "Run · Speciation" or "Bath · Silver strike". */
export function subjectKindText(review: Pick<ReviewSummary, 'subject'>): string {
  const s = review.subject;
  if (s.kind === 'run') return `Run · ${CALCULATOR_LABELS[s.calculator as CalculatorKey]?.label ?? s.calculator}`;
  return `Bath · ${PROCESS_INFO[s.process as keyof typeof PROCESS_INFO]?.label ?? s.process}`;
}

/** The subject's title, or what it is when it has none. */
export function subjectTitle(review: Pick<ReviewSummary, 'subject'>): string {
  return review.subject.title.trim() || (review.subject.kind === 'run' ? 'Untitled run' : 'Unnamed bath');
}

function ReviewItem({ review, me }: { review: ReviewSummary; me: User }) {
  const { palette } = useTheme();
  const focus = useFocusVisible();
  const mine = review.submittedBy.id === me.id;
  const who = mine ? 'you' : review.submittedBy.name;
  return (
    <Link href={`/safety/review/${review.id}`} asChild>
      <Pressable
        accessibilityRole="link"
        accessibilityHint="Opens the review with its evidence"
        testID={`review-${review.id}`}
        onFocus={focus.onFocus}
        onBlur={focus.onBlur}
        style={StyleSheet.flatten<ViewStyle>([styles.item, { borderColor: palette.border, backgroundColor: palette.surface }, focus.ring(palette.primary)])}
      >
        <ThemedText variant="label" tone="primary">
          {subjectTitle(review)}
        </ThemedText>
        <ThemedText variant="caption">{`${subjectKindText(review)} · sent by ${who}, ${formatWhen(review.submittedAt)}`}</ThemedText>
        <HazardChips hazards={review.flags.map((rule) => ({ rule, severity: 'danger' as const }))} review={review} />
        <ThemedText variant="caption" tone="textMuted">
          {REVIEW_STATUS_LABELS[review.status]}
          {review.decidedBy && review.decidedAt ? ` · ${review.decidedBy.name}, ${formatWhen(review.decidedAt)}` : ''}
        </ThemedText>
        {review.status === 'signed_off' && review.conditions ? <ThemedText variant="caption">{`Conditions: ${review.conditions}`}</ThemedText> : null}
        {review.status === 'sent_back' && review.note ? <ThemedText variant="caption">{`Note: ${review.note}`}</ThemedText> : null}
        {mine && review.status === 'pending' ? (
          <ThemedText variant="caption" tone="caution">
            Your own work: another safety officer decides on it.
          </ThemedText>
        ) : null}
      </Pressable>
    </Link>
  );
}

/** Reviews as a list of links to their detail. */
export function ReviewList({ reviews, me }: { reviews: readonly ReviewSummary[]; me: User }) {
  return (
    <View style={styles.list}>
      {reviews.map((r) => (
        <ReviewItem key={r.id} review={r} me={me} />
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: space.sm },
  item: { borderWidth: 1, borderRadius: radius.md, paddingHorizontal: space.md, paddingVertical: space.sm, gap: space.xs },
});
