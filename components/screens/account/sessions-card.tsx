import { useRouter } from 'expo-router';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { space } from '@/components/theme/tokens';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { ConfirmBar } from '@/components/ui/confirm-bar';
import { Notice } from '@/components/ui/notice';
import { ThemedText } from '@/components/ui/themed-text';
import { ApiError } from '@/lib/api/fetcher';
import { useClearCache, useSignOut, useSignOutEverywhere } from '@/lib/api/use-me';

/** Sign out here, or everywhere after a confirmation; both end on the sign-in screen with nothing cached. */
export function SessionsCard() {
  const router = useRouter();
  const clear = useClearCache();
  const signOut = useSignOut();
  const everywhere = useSignOutEverywhere();
  const [confirming, setConfirming] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const busy = signOut.isMutating || everywhere.isMutating;

  const leave = async (send: () => Promise<unknown>) => {
    setError(null);
    try {
      await send();
    } catch (err) {
      // A 401 means the session had already ended: that is what was asked for.
      if (!(err instanceof ApiError && err.status === 401)) {
        setError(err instanceof Error ? err.message : 'Signing out failed.');
        return;
      }
    }
    router.replace('/sign-in');
    await clear();
  };

  return (
    <Card testID="sessions-card" style={styles.card}>
      <ThemedText variant="title" accessibilityRole="header" aria-level={2}>
        Sessions
      </ThemedText>
      <ThemedText variant="label" weight="regular" tone="textMuted">
        Signing out everywhere also ends sessions on other computers and phones, for example after a device was lost.
      </ThemedText>
      {error ? <Notice kind="error" message={error} /> : null}
      {confirming ? (
        <ConfirmBar
          question="Sign out on every device, this one included?"
          confirmLabel="Yes, sign out everywhere"
          busy={busy}
          onConfirm={() => void leave(() => everywhere.trigger())}
          onCancel={() => setConfirming(false)}
        />
      ) : null}
      <View style={styles.actions}>
        <Button label="Sign out" variant="primary" disabled={busy} onPress={() => void leave(() => signOut.trigger())} />
        {confirming ? null : (
          <Button label="Sign out everywhere" variant="danger" disabled={busy} onPress={() => setConfirming(true)} />
        )}
      </View>
    </Card>
  );
}

const styles = StyleSheet.create({
  card: { maxWidth: 600, gap: space.md },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
});
