import { useState } from 'react';
import { Pressable, StyleSheet, View } from 'react-native';

import { RequireAdmin } from '@/components/screens/admin/require-admin';
import { MessageText } from '@/components/screens/outbox/message-text';
import { TrayIcon } from '@/components/shell/icons';
import { radius, space } from '@/components/theme/tokens';
import { useIsWide } from '@/components/theme/use-is-wide';
import { useTheme } from '@/components/theme/use-theme';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { formatWhen } from '@/components/ui/format-date';
import { LoadingState } from '@/components/ui/loading-state';
import { ScreenContainer } from '@/components/ui/screen-container';
import { ThemedText } from '@/components/ui/themed-text';
import { useFocusVisible } from '@/components/ui/use-focus-visible';
import { useAuthOptions } from '@/lib/api/use-auth';
import { useOutbox } from '@/lib/api/use-outbox';
import { type OutboxMessage } from '@/shared/auth';

function MessageItem({ message, selected, onPress }: { message: OutboxMessage; selected: boolean; onPress: () => void }) {
  const { palette } = useTheme();
  const focus = useFocusVisible();
  return (
    <Pressable
      accessibilityRole="button"
      accessibilityState={{ selected }}
      aria-selected={selected}
      accessibilityLabel={`${message.subject}, to ${message.to.join(', ')}`}
      onPress={onPress}
      onFocus={focus.onFocus}
      onBlur={focus.onBlur}
      style={[
        styles.item,
        { borderColor: selected ? palette.primary : palette.border, backgroundColor: selected ? palette.primarySoft : palette.surface },
        focus.ring(palette.primary),
      ]}
    >
      <ThemedText variant="label">{message.subject}</ThemedText>
      <ThemedText variant="caption" tone="textMuted">{`To ${message.to.join(', ')}`}</ThemedText>
      <ThemedText variant="caption" tone="textMuted">
        {formatWhen(message.receivedAt)}
      </ThemedText>
    </Pressable>
  );
}

function MessageView({ message }: { message: OutboxMessage }) {
  return (
    <Card style={styles.message} testID="outbox-message">
      <ThemedText variant="title" accessibilityRole="header" aria-level={2}>
        {message.subject}
      </ThemedText>
      <ThemedText variant="caption" tone="textMuted">{`From ${message.from}`}</ThemedText>
      <ThemedText variant="caption" tone="textMuted">{`To ${message.to.join(', ')}`}</ThemedText>
      <ThemedText variant="caption" tone="textMuted">{`Received ${formatWhen(message.receivedAt)}`}</ThemedText>
      <MessageText text={message.text} />
    </Card>
  );
}

function Mailbox() {
  const { data, error, isLoading, isValidating, mutate } = useOutbox();
  const wide = useIsWide();
  const [openId, setOpenId] = useState<number | null>(null);
  if (error) return <ErrorState message={error.message} onRetry={() => void mutate()} />;
  if (isLoading || !data) return <LoadingState label="Loading mail…" />;
  const refresh = (
    <Button label={isValidating ? 'Refreshing…' : 'Refresh'} accessibilityLabel="Refresh" disabled={isValidating} onPress={() => void mutate()} />
  );
  if (data.length === 0) {
    return (
      <EmptyState Icon={TrayIcon} title="No mail sent yet" body="Invitations and reset links this server sends show up here.">
        {refresh}
      </EmptyState>
    );
  }
  const open = data.find((m) => m.id === openId) ?? null;
  if (!wide && open) {
    return (
      <View style={styles.pane}>
        <Button label="‹ All mail" accessibilityLabel="Back to all mail" onPress={() => setOpenId(null)} />
        <MessageView message={open} />
      </View>
    );
  }
  const list = (
    <View style={[styles.pane, wide && styles.listPane]} accessibilityLabel="Messages">
      {refresh}
      {data.map((m) => (
        <MessageItem key={m.id} message={m} selected={m.id === openId} onPress={() => setOpenId(m.id)} />
      ))}
    </View>
  );
  if (!wide) return list;
  return (
    <View style={styles.split}>
      {list}
      <View style={[styles.pane, styles.detailPane]}>
        {open ? (
          <MessageView message={open} />
        ) : (
          <ThemedText variant="body" tone="textMuted">
            Choose a message to read it.
          </ThemedText>
        )}
      </View>
    </View>
  );
}

function OutboxGate() {
  const options = useAuthOptions();
  if (options.error) return <ErrorState message={options.error.message} onRetry={() => void options.mutate()} />;
  if (!options.data) return <LoadingState label="Loading…" />;
  if (!options.data.outbox) {
    return <EmptyState Icon={TrayIcon} title="No outbox here" body="This server sends real mail, so there is no local outbox to read." />;
  }
  return <Mailbox />;
}

/** Outbox: mail the development server caught, list beside message on wide screens (admins only). */
export function OutboxScreen() {
  return (
    <ScreenContainer title="Outbox" subtitle="Mail sent by this development server, newest first." back={{ href: '/account', label: 'Account' }}>
      <RequireAdmin>
        <OutboxGate />
      </RequireAdmin>
    </ScreenContainer>
  );
}

const styles = StyleSheet.create({
  split: { flexDirection: 'row', alignItems: 'flex-start', gap: space.lg },
  pane: { gap: space.sm },
  listPane: { width: 340 },
  detailPane: { flex: 1, minWidth: 0 },
  item: { gap: space.xxs, padding: space.md, borderRadius: radius.md, borderWidth: 1 },
  message: { gap: space.xs },
});
