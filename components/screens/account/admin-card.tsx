import { StyleSheet } from 'react-native';

import { space } from '@/components/theme/tokens';
import { Card } from '@/components/ui/card';
import { NavRow } from '@/components/ui/nav-row';
import { ThemedText } from '@/components/ui/themed-text';
import { useAuthOptions } from '@/lib/api/use-auth';

/** Links to the admin screens; the outbox only where this installation keeps one. */
export function AdminCard() {
  const options = useAuthOptions();
  return (
    <Card testID="admin-card" style={styles.card}>
      <ThemedText variant="title" accessibilityRole="header" aria-level={2}>
        Administration
      </ThemedText>
      <NavRow href="/account/team" title="Team" body="People, their roles, and invitations" />
      <NavRow href="/account/activity" title="Activity" body="Who did what, newest first" />
      {options.data?.outbox ? (
        <NavRow href="/account/outbox" title="Outbox" body="Mail this development server has sent" />
      ) : null}
    </Card>
  );
}

const styles = StyleSheet.create({
  card: { maxWidth: 600, gap: space.sm },
});
