import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { CautionCard } from '@/components/screens/safety/caution-card';
import { STANDING_CAUTIONS } from '@/components/screens/safety/cautions';
import { ReviewList } from '@/components/screens/safety/review-list';
import { ThresholdsSummary } from '@/components/screens/safety/thresholds-summary';
import { TrayIcon } from '@/components/shell/icons';
import { space } from '@/components/theme/tokens';
import { ToggleChip } from '@/components/ui/chip';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { ScreenContainer } from '@/components/ui/screen-container';
import { ThemedText } from '@/components/ui/themed-text';
import { useMe } from '@/lib/api/use-me';
import { useReviews } from '@/lib/api/use-safety';
import { hasRole, type User } from '@/shared/auth';
import { DEFER_TO_SDS } from '@/shared/safety';

const FILTERS = [
  { key: 'pending', label: 'Waiting', title: 'Nothing waiting for review', empty: 'Runs and baths the hazard rules flag arrive here.' },
  { key: 'sent_back', label: 'Sent back', title: 'Nothing sent back', empty: 'Nothing is sent back at the moment.' },
  { key: 'signed_off', label: 'Signed off', title: 'Nothing signed off yet', empty: 'Nothing has been signed off yet.' },
  { key: 'all', label: 'All', title: 'Nothing on the desk', empty: 'No flagged work has reached the safety desk yet. Runs and baths the hazard rules flag go there.' },
] as const;
type FilterKey = (typeof FILTERS)[number]['key'];

function Desk({ me }: { me: User }) {
  const desk = hasRole(me, 'safety', 'admin');
  const [filter, setFilter] = useState<FilterKey>(desk ? 'pending' : 'all');
  const { data, error, isLoading, mutate } = useReviews(filter);
  const chosen = FILTERS.find((f) => f.key === filter) ?? FILTERS[0];
  return (
    <View style={styles.section} testID="safety-desk">
      <ThemedText variant="title" accessibilityRole="header" aria-level={2}>
        {desk ? 'Safety desk' : 'Your work on the safety desk'}
      </ThemedText>
      <ThemedText variant="label" weight="regular" tone="textMuted">
        {desk
          ? 'Runs and baths flagged by the hazard rules. Open one to see its evidence, then sign it off with conditions or send it back with a note.'
          : 'Runs and baths of yours that the hazard rules flagged, and what the safety desk decided.'}
      </ThemedText>
      <View style={styles.filters} accessibilityRole="radiogroup" accessibilityLabel="Show reviews">
        {FILTERS.map((f) => (
          <ToggleChip key={f.key} label={f.label} checked={filter === f.key} onToggle={() => setFilter(f.key)} accessibilityLabel={`Show ${f.label.toLowerCase()}`} />
        ))}
      </View>
      {error ? (
        <ErrorState message={error.message} onRetry={() => void mutate()} />
      ) : isLoading || !data ? (
        <LoadingState label="Loading the desk…" />
      ) : data.length === 0 ? (
        <EmptyState Icon={TrayIcon} title={chosen.title} body={chosen.empty} />
      ) : (
        <>
          <ThemedText variant="label" weight="regular" tone="textMuted">
            {data.length === 1 ? '1 review' : `${data.length} reviews`}
            {filter === 'pending' ? ', oldest first' : ', newest first'}
          </ThemedText>
          <ReviewList reviews={data} me={me} />
        </>
      )}
    </View>
  );
}

/** Safety section: the desk (or one's own flagged work), the thresholds in force and the standing cautions. */
export function SafetyScreen() {
  const { data: me, error, mutate } = useMe();
  return (
    <ScreenContainer title="Safety" subtitle="Flagged work, the shop's hazard thresholds, and the cautions that apply to all of it.">
      {me ? <Desk me={me} /> : error ? <ErrorState message={error.message} onRetry={() => void mutate()} /> : <LoadingState label="Loading…" />}
      <View style={styles.section}>
        <ThemedText variant="title" accessibilityRole="header" aria-level={2}>
          Thresholds in force
        </ThemedText>
        <ThresholdsSummary canEdit={hasRole(me, 'safety')} />
      </View>
      <View style={styles.section}>
        <ThemedText variant="title" accessibilityRole="header" aria-level={2}>
          Standing cautions
        </ThemedText>
        {STANDING_CAUTIONS.map((caution) => (
          <CautionCard key={caution.key} caution={caution} />
        ))}
        <ThemedText variant="label" weight="semibold" tone="textMuted">
          {DEFER_TO_SDS}
        </ThemedText>
      </View>
    </ScreenContainer>
  );
}

const styles = StyleSheet.create({
  section: { gap: space.md },
  filters: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
});
