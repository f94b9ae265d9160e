import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { TrayIcon } from '@/components/shell/icons';
import { space } from '@/components/theme/tokens';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { Chip } from '@/components/ui/chip';
import { ConfirmBar } from '@/components/ui/confirm-bar';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { formatWhen } from '@/components/ui/format-date';
import { LoadingState } from '@/components/ui/loading-state';
import { Notice } from '@/components/ui/notice';
import { ThemedText } from '@/components/ui/themed-text';
import { useInvitations, useResendInvitation, useWithdrawInvitation } from '@/lib/api/use-team';
import { ROLE_LABELS, type Invitation } from '@/shared/auth';

function InvitationItem({ invitation }: { invitation: Invitation }) {
  const resend = useResendInvitation();
  const withdraw = useWithdrawInvitation();
  const [confirming, setConfirming] = useState(false);
  const [message, setMessage] = useState<{ kind: 'error' | 'success'; text: string } | null>(null);
  const busy = resend.isMutating || withdraw.isMutating;

  const run = async (action: () => Promise<unknown>, done: string) => {
    setMessage(null);
    try {
      await action();
      setMessage({ kind: 'success', text: done });
    } catch (error) {
      setMessage({ kind: 'error', text: error instanceof Error ? error.message : 'That did not work.' });
    }
  };

  return (
    <Card style={styles.item} testID={`invitation-${invitation.id}`}>
      <ThemedText variant="body" weight="semibold" selectable>
        {invitation.email}
      </ThemedText>
      <View style={styles.chips}>
        {invitation.roles.map((role) => (
          <Chip key={role} label={ROLE_LABELS[role].label} />
        ))}
      </View>
      <ThemedText variant="caption" tone="textMuted">
        {`Invited by ${invitation.invitedBy} on ${formatWhen(invitation.createdAt)} · link works until ${formatWhen(invitation.expiresAt)}`}
      </ThemedText>
      {message ? <Notice kind={message.kind} message={message.text} /> : null}
      {confirming ? (
        <ConfirmBar
          question={`Withdraw the invitation to ${invitation.email}? The link in their mail stops working.`}
          confirmLabel="Withdraw"
          busy={busy}
          onConfirm={() => {
            setConfirming(false);
            void run(() => withdraw.trigger(invitation.id), 'Withdrawn');
          }}
          onCancel={() => setConfirming(false)}
        />
      ) : (
        <View style={styles.actions}>
          <Button
            label="Send again"
            accessibilityLabel={`Send the invitation to ${invitation.email} again`}
            disabled={busy}
            onPress={() => void run(() => resend.trigger(invitation.id), `Sent again to ${invitation.email}; the earlier link no longer works`)}
          />
          <Button
            label="Withdraw"
            accessibilityLabel={`Withdraw the invitation to ${invitation.email}`}
            variant="danger"
            disabled={busy}
            onPress={() => setConfirming(true)}
          />
        </View>
      )}
    </Card>
  );
}

/** Invitations nobody has accepted yet, each with send again and withdraw. */
export function InvitationsSection() {
  const { data, error, isLoading, mutate } = useInvitations();
  return (
    <View style={styles.section}>
      <ThemedText variant="title" accessibilityRole="header" aria-level={2}>
        Waiting invitations
      </ThemedText>
      {error ? (
        <ErrorState message={error.message} onRetry={() => void mutate()} />
      ) : isLoading || !data ? (
        <LoadingState label="Loading invitations…" />
      ) : data.length === 0 ? (
        <EmptyState Icon={TrayIcon} title="No invitations waiting" body="Everyone you invited has joined, or you have not invited anyone yet." />
      ) : (
        data.map((invitation) => <InvitationItem key={invitation.id} invitation={invitation} />)
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  section: { gap: space.md },
  item: { gap: space.sm },
  chips: { flexDirection: 'row', flexWrap: 'wrap', gap: space.xs },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
});
