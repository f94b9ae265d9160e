import { StyleSheet, View } from 'react-native';

import { RequireAdmin } from '@/components/screens/admin/require-admin';
import { actionWords, actorWords, payloadWords, subjectWords } from '@/components/screens/activity/audit-words';
import { TrayIcon } from '@/components/shell/icons';
import { space } from '@/components/theme/tokens';
import { useTheme } from '@/components/theme/use-theme';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { formatWhen } from '@/components/ui/format-date';
import { LoadingState } from '@/components/ui/loading-state';
import { ScreenContainer } from '@/components/ui/screen-container';
import { ThemedText } from '@/components/ui/themed-text';
import { useAudit } from '@/lib/api/use-audit';
import { type AuditEntry } from '@/shared/auth';

function EntryRow({ entry, first }: { entry: AuditEntry; first: boolean }) {
  const { palette } = useTheme();
  const detail = payloadWords(entry.payload);
  const subject = subjectWords(entry);
  return (
    <View style={[styles.entry, !first && { borderTopColor: palette.border, borderTopWidth: 1 }]} testID={`audit-${entry.id}`}>
      <ThemedText variant="caption" tone="textMuted">
        {formatWhen(entry.at)}
      </ThemedText>
      <ThemedText variant="body">
        <ThemedText variant="body" weight="semibold">
          {actorWords(entry)}
        </ThemedText>
        {` · ${actionWords(entry.action)}`}
        {subject ? ` · ${subject}` : ''}
      </ThemedText>
      {detail ? (
        <ThemedText variant="caption" tone="textMuted">
          {detail}
        </ThemedText>
      ) : null}
    </View>
  );
}

function AuditList() {
  const { entries, error, isLoading, hasMore, loadingMore, loadMore, retry } = useAudit();
  if (entries.length === 0) {
    if (error) return <ErrorState message={error.message} onRetry={retry} />;
    if (isLoading) return <LoadingState label="Loading activity…" />;
    return <EmptyState Icon={TrayIcon} title="Nothing recorded yet" body="Sign-ins, invitations and role changes will be listed here." />;
  }
  return (
    <>
      <Card style={styles.list}>
        {entries.map((entry, i) => (
          <EntryRow key={entry.id} entry={entry} first={i === 0} />
        ))}
      </Card>
      {error ? <ErrorState message={error.message} onRetry={retry} /> : null}
      {loadingMore ? (
        <LoadingState label="Loading older entries…" />
      ) : hasMore && !error ? (
        <Button label="Load more" accessibilityHint="Shows older entries" onPress={loadMore} />
      ) : !hasMore ? (
        <ThemedText variant="caption" tone="textMuted">
          That is the beginning of the log.
        </ThemedText>
      ) : null}
    </>
  );
}

/** Activity: the audit log newest first, in words, a page at a time (admins only). */
export function ActivityScreen() {
  return (
    <ScreenContainer title="Activity" subtitle="Who did what, newest first." back={{ href: '/account', label: 'Account' }}>
      <RequireAdmin>
        <AuditList />
      </RequireAdmin>
    </ScreenContainer>
  );
}

const styles = StyleSheet.create({
  list: { gap: 0, paddingVertical: space.xs },
  entry: { gap: space.xxs, paddingVertical: space.sm },
});
