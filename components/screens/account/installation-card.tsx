import { type ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';

import { APP_VERSION } from '@/components/shell/app-version';
import { space } from '@/components/theme/tokens';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { StatusPill } from '@/components/ui/status-dot';
import { ThemedText } from '@/components/ui/themed-text';
import { useHealth } from '@/lib/api/use-health';

function Row({ label, children }: { label: string; children: ReactNode }) {
  return (
    <View style={styles.row}>
      <ThemedText variant="label" weight="regular" tone="textMuted" style={styles.rowLabel}>
        {label}
      </ThemedText>
      <View style={styles.rowValue}>{children}</View>
    </View>
  );
}

function ServerRows() {
  const { data, error, isLoading, mutate } = useHealth();
  if (error) {
    // Status 0 means no answer at all; any other status means the server answered with an error.
    const answered = error.status > 0;
    return (
      <View style={styles.block}>
        <Row label="Server">
          <StatusPill kind="bad" label={answered ? 'Check failed' : 'Not reachable'} />
        </Row>
        <ThemedText variant="label" weight="regular">
          {answered ? `Server check failed: ${error.message}` : `Server not reachable: ${error.message}`}
        </ThemedText>
        <Button label="Retry" accessibilityHint="Checks the server again" onPress={() => void mutate()} />
      </View>
    );
  }
  if (isLoading || !data) {
    return (
      <ThemedText variant="label" weight="regular" tone="textMuted">
        Checking server…
      </ThemedText>
    );
  }
  return (
    <>
      <Row label="Server">
        <StatusPill
          kind={data.status === 'ok' ? 'ok' : 'warn'}
          label={data.status === 'ok' ? 'Up' : 'Up, degraded'}
        />
      </Row>
      <Row label="Database">
        <StatusPill kind={data.db === 'up' ? 'ok' : 'bad'} label={data.db === 'up' ? 'Up' : 'Down'} />
      </Row>
      <Row label="Server version">
        <ThemedText variant="label" weight="semibold">
          {data.version}
        </ThemedText>
      </Row>
    </>
  );
}

/** Facts about this copy of Ligandry: client version and what the server reports about itself. */
export function InstallationCard() {
  return (
    <Card testID="installation-card" style={styles.card}>
      <ThemedText variant="title" accessibilityRole="header" aria-level={2}>
        This installation
      </ThemedText>
      <Row label="App version">
        <ThemedText variant="label" weight="semibold">
          {APP_VERSION}
        </ThemedText>
      </Row>
      <ServerRows />
    </Card>
  );
}

const styles = StyleSheet.create({
  row: {
    flexDirection: 'row',
    alignItems: 'center',
    justifyContent: 'space-between',
    gap: space.md,
    paddingVertical: space.xs,
  },
  rowLabel: { flexShrink: 1 },
  rowValue: { alignItems: 'flex-end' },
  block: { gap: space.sm },
  card: { maxWidth: 600 },
});
