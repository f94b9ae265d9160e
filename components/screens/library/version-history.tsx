import { StyleSheet, View } from 'react-native';

import { constantHref, formatDay, formatLog, logSymbol, statusShort } from '@/components/screens/library/words';
import { space } from '@/components/theme/tokens';
import { useTheme } from '@/components/theme/use-theme';
import { Card } from '@/components/ui/card';
import { Chip } from '@/components/ui/chip';
import { TextLink } from '@/components/ui/text-link';
import { ThemedText } from '@/components/ui/themed-text';
import { type ConstantSummary } from '@/shared/constants';

function Version({ v, shown }: { v: ConstantSummary; shown: boolean }) {
  const { palette } = useTheme();
  const title = `Version ${v.version}`;
  const line = [`${logSymbol(v.kind)} ${formatLog(v.logValue)}`, statusShort(v.status), formatDay(v.proposedAt)];
  if (v.proposedBy) line.push(v.proposedBy.name);
  return (
    <View style={[styles.row, { borderTopColor: palette.border }]} testID={`version-${v.id}`}>
      <View style={styles.title}>
        {shown ? (
          <ThemedText variant="label">{title}</ThemedText>
        ) : (
          <TextLink href={constantHref(v.id)} label={title} accessibilityLabel={`Open version ${v.version}`} />
        )}
        {v.status === 'approved' ? <Chip label="In use now" /> : null}
        {shown ? <Chip label="Shown here" /> : null}
      </View>
      <ThemedText variant="caption" tone="textMuted">
        {line.join(' · ')}
      </ThemedText>
    </View>
  );
}

/** Every version of the lineage, newest first; marks the approved one and the one on this page. */
export function VersionHistory({ history, shownId }: { history: ConstantSummary[]; shownId: number }) {
  return (
    <Card style={styles.card} testID="version-history">
      <ThemedText variant="title" accessibilityRole="header" aria-level={2}>
        Versions
      </ThemedText>
      {history.length <= 1 ? (
        <ThemedText variant="label" weight="regular" tone="textMuted">
          This is the only version so far.
        </ThemedText>
      ) : null}
      {history.map((v) => (
        <Version key={v.id} v={v} shown={v.id === shownId} />
      ))}
    </Card>
  );
}

const styles = StyleSheet.create({
  card: { gap: space.xs },
  row: { borderTopWidth: 1, paddingVertical: space.sm, gap: space.xxs },
  title: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.sm },
});
