import { StyleSheet, View } from 'react-native';

import { space } from '@/components/theme/tokens';
import { useTheme } from '@/components/theme/use-theme';
import { StatusPill, type StatusKind } from '@/components/ui/status-dot';
import { TextLink } from '@/components/ui/text-link';
import { ThemedText } from '@/components/ui/themed-text';
import { KIND_LABELS, type ConstantStatus, type ConstantUse } from '@/shared/constants';

/** A constant version as a result used it; a saved run adds what has become of it since. */
export type UsedConstant = ConstantUse & {
  supersededBy?: { id: number; version: number; logValue: number } | null;
  statusNow?: ConstantStatus;
};

const STATUS_WORDS: Record<ConstantStatus, { label: string; kind: StatusKind }> = {
  approved: { label: 'Approved', kind: 'ok' },
  draft: { label: 'Draft, not reviewed', kind: 'warn' },
  rejected: { label: 'Rejected', kind: 'bad' },
  retired: { label: 'Retired', kind: 'unknown' },
};

/** A stored log value as written: at least two decimals (7.40), more when the value has them. */
export function formatLog(value: number): string {
  if (!Number.isFinite(value)) return '—';
  return Math.abs(value * 100 - Math.round(value * 100)) < 1e-9 ? value.toFixed(2) : String(value);
}

function Item({ c }: { c: UsedConstant }) {
  const { palette } = useTheme();
  const log = `log ${KIND_LABELS[c.kind].short}`;
  const status = STATUS_WORDS[c.status];
  return (
    <View style={[styles.item, { borderTopColor: palette.border }]} testID={`constant-${c.id}`} role="listitem">
      <ThemedText variant="label" selectable>
        {c.reaction}
      </ThemedText>
      <View style={styles.line}>
        <ThemedText variant="caption">{`v${c.version} · ${log} ${formatLog(c.logValue)} · ${c.temperatureC} °C`}</ThemedText>
        <StatusPill kind={status.kind} label={status.label} />
      </View>
      {c.supersededBy ? (
        <ThemedText variant="caption" tone="caution" weight="semibold">
          {`v${c.version} (${log} ${formatLog(c.logValue)}) — since replaced by v${c.supersededBy.version} (${log} ${formatLog(c.supersededBy.logValue)})`}
        </ThemedText>
      ) : null}
      {c.statusNow ? (
        <ThemedText variant="caption" tone="textMuted">{`Status now: ${STATUS_WORDS[c.statusNow].label.toLowerCase()}`}</ThemedText>
      ) : null}
      <ThemedText variant="caption" tone="textMuted" selectable>
        {`Source: ${c.source}`}
      </ThemedText>
      <TextLink href={`/library/constant/${c.id}`} label="Version and history" variant="caption" accessibilityLabel={`Version ${c.version} of ${c.reaction} and its history`} />
    </View>
  );
}

type Props = { constants: readonly UsedConstant[]; note?: string };

/** The constant versions behind a result: reaction, version, log value and status, drafts marked. */
export function ConstantsUsed({ constants, note }: Props) {
  return (
    <View style={styles.section}>
      <ThemedText variant="title" accessibilityRole="header" aria-level={2}>
        Constants used
      </ThemedText>
      {note ? (
        <ThemedText variant="caption" tone="textMuted">
          {note}
        </ThemedText>
      ) : null}
      {constants.length === 0 ? (
        <ThemedText variant="label" weight="regular" tone="textMuted">
          No constant from the library was needed.
        </ThemedText>
      ) : (
        <View role="list" aria-label="Constants used">
          {constants.map((c) => (
            <Item key={c.id} c={c} />
          ))}
        </View>
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  section: { gap: space.sm },
  item: { borderTopWidth: 1, paddingVertical: space.sm, gap: space.xxs },
  line: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.sm },
});
