import { StyleSheet, View } from 'react-native';

import { formatLog, type UsedConstant } from '@/components/screens/calculate/constants-used';
import { space } from '@/components/theme/tokens';
import { useTheme } from '@/components/theme/use-theme';
import { ThemedText } from '@/components/ui/themed-text';
import { KIND_LABELS } from '@/shared/constants';

function Item({ c }: { c: UsedConstant }) {
  const { palette } = useTheme();
  const log = `log ${KIND_LABELS[c.kind].short}`;
  return (
    <View style={[styles.item, { borderTopColor: palette.border }]} role="listitem" testID={`print-constant-${c.id}`}>
      <ThemedText variant="label">{c.reaction}</ThemedText>
      <ThemedText variant="caption">{`Version ${c.version} · ${log} ${formatLog(c.logValue)} · ${c.temperatureC} °C · ${c.status === 'draft' ? 'draft, not reviewed' : c.status}`}</ThemedText>
      {c.supersededBy ? (
        <ThemedText variant="caption" weight="semibold" tone="caution">
          {`Since replaced by version ${c.supersededBy.version} (${log} ${formatLog(c.supersededBy.logValue)}); this run kept version ${c.version}.`}
        </ThemedText>
      ) : null}
      <ThemedText variant="caption" tone="textMuted">{`Source: ${c.source}`}</ThemedText>
    </View>
  );
}

/** The constant versions a run used, for paper: no links, each entry kept whole on one page. */
export function PrintConstants({ constants }: { constants: readonly UsedConstant[] }) {
  return (
    <View style={styles.section}>
      <ThemedText variant="title" accessibilityRole="header" aria-level={2}>
        Constants used
      </ThemedText>
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
  section: { gap: space.xs },
  item: { borderTopWidth: 1, paddingVertical: space.xs, gap: space.xxs },
});
