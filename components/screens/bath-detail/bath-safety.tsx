import { StyleSheet, View } from 'react-native';

import { HazardBanner } from '@/components/hazards/hazard-banner';
import { space } from '@/components/theme/tokens';
import { formatWhen } from '@/components/ui/format-date';
import { TextLink } from '@/components/ui/text-link';
import { ThemedText } from '@/components/ui/themed-text';
import { hasRole, type User } from '@/shared/auth';
import { type Bath } from '@/shared/baths';
import { REVIEW_STATUS_LABELS } from '@/shared/safety';

/** The hazards the rules find on the bath's latest analysis and its latest safety review. */
export function BathSafety({ bath, me }: { bath: Bath; me: User | undefined }) {
  const safety = bath.safety;
  if (!safety || (safety.hazards.length === 0 && !safety.review)) return null;
  const review = safety.review;
  const canOpen = !!review && !!me && (review.submittedBy.id === me.id || hasRole(me, 'safety', 'admin'));
  return (
    <View style={styles.stack} testID="bath-safety">
      <HazardBanner hazards={safety.hazards} review={review} compact />
      {review ? (
        <View style={styles.review}>
          <ThemedText variant="label" weight="regular">
            {`Safety desk: ${REVIEW_STATUS_LABELS[review.status]}, sent ${formatWhen(review.submittedAt)}`}
          </ThemedText>
          {review.status === 'signed_off' && review.conditions ? <ThemedText variant="label" weight="semibold">{`Conditions: ${review.conditions}`}</ThemedText> : null}
          {review.status === 'sent_back' && review.note ? <ThemedText variant="label" weight="semibold">{`Note from the desk: ${review.note}`}</ThemedText> : null}
          {canOpen ? <TextLink href={`/safety/review/${review.id}`} label="Open the review" /> : null}
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  stack: { gap: space.sm },
  review: { gap: space.xxs },
});
