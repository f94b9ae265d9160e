import { StyleSheet, View } from 'react-native';

import { conditionsText, STATUS_WORDS, valueText } from '@/components/screens/library/words';
import { space } from '@/components/theme/tokens';
import { Card } from '@/components/ui/card';
import { formatWhen } from '@/components/ui/format-date';
import { StatusPill } from '@/components/ui/status-dot';
import { ThemedText } from '@/components/ui/themed-text';
import { KIND_LABELS, type ConstantSummary } from '@/shared/constants';

function Fact({ label, value, detail }: { label: string; value: string; detail?: string }) {
  return (
    <View style={styles.fact}>
      <ThemedText variant="label" weight="regular" tone="textMuted">
        {label}
      </ThemedText>
      <ThemedText variant="body" selectable>
        {value}
      </ThemedText>
      {detail ? (
        <ThemedText variant="caption" tone="textMuted">
          {detail}
        </ThemedText>
      ) : null}
    </View>
  );
}

/** The value of one version and what it rests on: kind, conditions, enthalpy, source and note. */
export function ConstantFacts({ c }: { c: ConstantSummary }) {
  const status = STATUS_WORDS[c.status];
  return (
    <Card style={styles.card} testID="constant-facts">
      <View style={styles.head}>
        <StatusPill kind={status.kind} label={status.label} />
        <ThemedText variant="caption" tone="textMuted">{`Version ${c.version}`}</ThemedText>
      </View>
      <ThemedText variant="title" selectable>
        {valueText(c)}
      </ThemedText>
      <Fact label="Kind" value={KIND_LABELS[c.kind].label} detail={KIND_LABELS[c.kind].explain} />
      <Fact label="Defines" value={c.defines} />
      <Fact label="Conditions" value={conditionsText(c)} />
      {c.enthalpyKjMol == null ? null : <Fact label="Enthalpy of reaction" value={`ΔH = ${c.enthalpyKjMol} kJ/mol`} />}
      <Fact label="Source" value={c.source} />
      {c.note.trim() === '' ? null : <Fact label="Proposer's note" value={c.note} />}
    </Card>
  );
}

/** Who proposed and who reviewed this version, when, and the reviewer's note. */
export function ConstantPeople({ c }: { c: ConstantSummary }) {
  const proposed = `${c.proposedBy ? c.proposedBy.name : 'Starting library'}, ${formatWhen(c.proposedAt)}`;
  const reviewed = c.reviewedAt
    ? `${c.reviewedBy ? c.reviewedBy.name : 'Checked before loading'}, ${formatWhen(c.reviewedAt)}`
    : 'Not reviewed yet';
  const retired = c.retiredAt ? `${c.retiredBy ? `${c.retiredBy.name}, ` : ''}${formatWhen(c.retiredAt)}` : null;
  return (
    <Card style={styles.card} testID="constant-people">
      <ThemedText variant="title" accessibilityRole="header" aria-level={2}>
        Review
      </ThemedText>
      <Fact label="Proposed by" value={proposed} />
      <Fact label={c.status === 'rejected' ? 'Rejected by' : 'Reviewed by'} value={reviewed} />
      {c.reviewNote ? <Fact label="Review note" value={c.reviewNote} /> : null}
      {retired ? <Fact label="Retired by" value={retired} /> : null}
      {c.retireNote ? <Fact label="Why retired" value={c.retireNote} /> : null}
    </Card>
  );
}

const styles = StyleSheet.create({
  card: { gap: space.md },
  head: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.sm },
  fact: { gap: space.xxs },
});
