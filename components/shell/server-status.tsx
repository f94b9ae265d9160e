import { StyleSheet, View } from 'react-native';

import { space } from '@/components/theme/tokens';
import { StatusDot, type StatusKind } from '@/components/ui/status-dot';
import { ThemedText } from '@/components/ui/themed-text';
import { type ApiError } from '@/lib/api/fetcher';
import { useHealth } from '@/lib/api/use-health';
import { type Health } from '@/shared/health';

/** A one-line reading of the health check: which dot to show and what to say. */
export type ServerSummary = { kind: StatusKind; text: string };

/** Turns the health hook's state into words, so the rail and the account card agree. */
export function summarizeHealth(data: Health | undefined, error: ApiError | undefined): ServerSummary {
  if (error && error.status > 0) return { kind: 'bad', text: `Server check failed (${error.status})` };
  if (error) return { kind: 'bad', text: 'Server not reachable' };
  if (!data) return { kind: 'unknown', text: 'Checking server…' };
  if (data.db === 'down') return { kind: 'warn', text: 'Server up, database down' };
  if (data.status === 'degraded') return { kind: 'warn', text: 'Server degraded' };
  return { kind: 'ok', text: 'Server online' };
}

/** Compact dot-and-words server status for the side rail footer. */
export function ServerStatus() {
  const { data, error } = useHealth();
  const summary = summarizeHealth(data, error);
  return (
    <View style={styles.row} accessibilityRole="text" accessibilityLiveRegion="polite">
      <StatusDot kind={summary.kind} size={8} onRail />
      <ThemedText variant="caption" tone="onRail">
        {summary.text}
      </ThemedText>
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', alignItems: 'center', gap: space.sm },
});
