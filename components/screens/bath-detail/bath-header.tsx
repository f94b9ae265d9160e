import { StyleSheet, View } from 'react-native';

import { BathActions } from '@/components/screens/bath-detail/bath-actions';
import { BathCalculations } from '@/components/screens/bath-detail/bath-calculations';
import { targetLines } from '@/components/screens/bath-detail/bath-words';
import { space } from '@/components/theme/tokens';
import { Card } from '@/components/ui/card';
import { formatWhen } from '@/components/ui/format-date';
import { StatusPill } from '@/components/ui/status-dot';
import { ThemedText } from '@/components/ui/themed-text';
import { formatSignificant } from '@/lib/units';
import { type User } from '@/shared/auth';
import { PROCESS_INFO, type Bath } from '@/shared/baths';

function Fact({ label, value }: { label: string; value: string }) {
  return (
    <View style={styles.fact}>
      <ThemedText variant="caption" tone="textMuted">
        {label}
      </ThemedText>
      <ThemedText variant="label" weight="regular" selectable>
        {value}
      </ThemedText>
    </View>
  );
}

function volumeText(bath: Bath): string {
  const entered = `${bath.volume} ${bath.volumeUnit}`;
  return bath.volumeUnit === 'L' ? entered : `${entered} (${formatSignificant(bath.volumeL, 3)} L)`;
}

/** The status in words and a pill; an archived bath says since when. */
export function BathStatus({ bath }: { bath: Bath }) {
  if (bath.status === 'archived') {
    const since = bath.archivedAt ? ` since ${formatWhen(bath.archivedAt)}` : '';
    return <StatusPill kind="unknown" label={`Archived${since}`} />;
  }
  return <StatusPill kind="ok" label="Active" />;
}

function SubHeading({ children }: { children: string }) {
  return (
    <ThemedText variant="label" accessibilityRole="header" aria-level={3}>
      {children}
    </ThemedText>
  );
}

/** The bath record: process, status, tank, people, target ranges, make-up and notes, and what the signed-in person may do. */
export function BathHeader({ bath, me }: { bath: Bath; me: User | undefined }) {
  const process = PROCESS_INFO[bath.process];
  return (
    <Card style={styles.card} testID="bath-header">
      <View style={styles.top}>
        <ThemedText variant="title" accessibilityRole="header" aria-level={2}>
          The bath
        </ThemedText>
        <BathStatus bath={bath} />
      </View>
      <View style={styles.facts}>
        <Fact label="Process" value={process?.label ?? bath.process} />
        <Fact label="Volume" value={volumeText(bath)} />
        <Fact label="Temperature" value={bath.temperatureC === null ? 'not set' : `${bath.temperatureC} °C`} />
        <Fact label="Site" value={bath.site || 'not set'} />
        <Fact label="Owner" value={bath.owner.name} />
        <Fact label="Units" value={`metal ${bath.metalUnit}, ligand ${bath.ligandUnit} as ${bath.ligandAs}`} />
      </View>
      <SubHeading>Target ranges</SubHeading>
      <View style={styles.lines} testID="bath-targets">
        {targetLines(bath).map((t) => (
          <ThemedText key={t.quantity} variant="label" weight="regular" selectable>
            <ThemedText variant="label">{t.label}</ThemedText>
            {` ${t.text}`}
          </ThemedText>
        ))}
      </View>
      <SubHeading>Make-up</SubHeading>
      {bath.makeUp.length === 0 ? (
        <ThemedText variant="label" weight="regular" tone="textMuted">
          No make-up recorded.
        </ThemedText>
      ) : (
        <View style={styles.lines} testID="bath-make-up">
          {bath.makeUp.map((line, i) => (
            <ThemedText key={`${line.salt}-${i}`} variant="label" weight="regular" selectable>
              {`${line.salt} ${line.amount} ${line.unit}`}
            </ThemedText>
          ))}
        </View>
      )}
      {bath.notes ? (
        <>
          <SubHeading>Notes</SubHeading>
          <ThemedText variant="body" selectable>
            {bath.notes}
          </ThemedText>
        </>
      ) : null}
      {bath.status === 'active' ? <BathCalculations bath={bath} /> : null}
      <BathActions bath={bath} me={me} />
    </Card>
  );
}

const styles = StyleSheet.create({
  card: { gap: space.sm },
  top: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', justifyContent: 'space-between', gap: space.sm },
  facts: { flexDirection: 'row', flexWrap: 'wrap', columnGap: space.lg, rowGap: space.sm },
  // Two to a row on a phone, more when there is room.
  fact: { gap: space.xxs, flexBasis: 120, flexGrow: 1, minWidth: 0 },
  lines: { gap: space.xxs },
});
