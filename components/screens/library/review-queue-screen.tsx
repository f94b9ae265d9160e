import { Link } from 'expo-router';
import { Pressable, StyleSheet, View, type ViewStyle } from 'react-native';

import { RequireRole } from '@/components/screens/library/require-role';
import { constantHref, formatLog, logSymbol } from '@/components/screens/library/words';
import { TrayIcon } from '@/components/shell/icons';
import { radius, space } from '@/components/theme/tokens';
import { useTheme } from '@/components/theme/use-theme';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { formatWhen } from '@/components/ui/format-date';
import { LoadingState } from '@/components/ui/loading-state';
import { ScreenContainer } from '@/components/ui/screen-container';
import { ThemedText } from '@/components/ui/themed-text';
import { useFocusVisible } from '@/components/ui/use-focus-visible';
import { useConstant, useReviewQueue } from '@/lib/api/use-library';
import { type User } from '@/shared/auth';
import { KIND_LABELS, type ConstantSummary } from '@/shared/constants';

/** "New constant", or the value of the version a revision replaces once it has loaded. */
function Replaces({ draft }: { draft: ConstantSummary }) {
  const { data } = useConstant(draft.replacesId);
  if (draft.replacesId == null) return 'New constant';
  if (!data) return 'Revision of an earlier version';
  const old = data.constant;
  return `Revision of version ${old.version}, which has ${logSymbol(old.kind)} ${formatLog(old.logValue)}`;
}

function QueueItem({ draft, me }: { draft: ConstantSummary; me: User }) {
  const { palette } = useTheme();
  const focus = useFocusVisible();
  const who = draft.proposedBy ? (draft.proposedBy.id === me.id ? 'you' : draft.proposedBy.name) : 'someone';
  const proposed = `Proposed ${logSymbol(draft.kind)} ${formatLog(draft.logValue)} by ${who}, ${formatWhen(draft.proposedAt)}`;
  return (
    <Link href={constantHref(draft.id)} asChild>
      <Pressable
        accessibilityRole="link"
        accessibilityHint="Opens the draft, where you approve or reject it"
        testID={`draft-${draft.id}`}
        onFocus={focus.onFocus}
        onBlur={focus.onBlur}
        style={StyleSheet.flatten<ViewStyle>([
          styles.item,
          { borderColor: palette.border, backgroundColor: palette.surface },
          focus.ring(palette.primary),
        ])}
      >
        <ThemedText variant="label" tone="primary">
          {draft.reaction}
        </ThemedText>
        <ThemedText variant="caption">{`${KIND_LABELS[draft.kind].label} · ${proposed}`}</ThemedText>
        <ThemedText variant="caption" tone="textMuted">
          <Replaces draft={draft} />
        </ThemedText>
        {who === 'you' ? (
          <ThemedText variant="caption" tone="caution">
            Your own proposal: another reviewer decides on it.
          </ThemedText>
        ) : null}
      </Pressable>
    </Link>
  );
}

function Queue({ me }: { me: User }) {
  const { data, error, isLoading, mutate } = useReviewQueue(true);
  if (error) return <ErrorState message={error.message} onRetry={() => void mutate()} />;
  if (isLoading || !data) return <LoadingState label="Loading drafts…" />;
  if (data.length === 0) {
    return <EmptyState Icon={TrayIcon} title="Nothing to review" body="No drafts are waiting. New proposals and imports show up here." />;
  }
  return (
    <View style={styles.list}>
      <ThemedText variant="label" weight="regular" tone="textMuted">
        {data.length === 1 ? '1 draft waiting, oldest first' : `${data.length} drafts waiting, oldest first`}
      </ThemedText>
      {data.map((d) => (
        <QueueItem key={d.id} draft={d} me={me} />
      ))}
    </View>
  );
}

/** Drafts waiting for a reviewer's decision, oldest first; each opens the detail where the decision is made. */
export function ReviewQueueScreen() {
  return (
    <ScreenContainer
      title="Review queue"
      subtitle="Proposed constants and revisions waiting for a decision."
      back={{ href: '/library', label: 'Library' }}
    >
      <RequireRole role="reviewer" why="Reviewers approve or reject proposed constants. You can still read every draft in the library with the Drafts filter.">
        {(me) => <Queue me={me} />}
      </RequireRole>
    </ScreenContainer>
  );
}

const styles = StyleSheet.create({
  list: { gap: space.sm },
  item: { borderWidth: 1, borderRadius: radius.md, paddingHorizontal: space.md, paddingVertical: space.sm, gap: space.xxs },
});
