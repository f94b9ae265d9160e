import { StyleSheet, View } from 'react-native';

import { ActivePill, lastSignIn, PersonActions, PersonFeedback, RoleToggles } from '@/components/screens/team/person-parts';
import { usePersonEdit } from '@/components/screens/team/use-person-edit';
import { PersonIcon } from '@/components/shell/icons';
import { space } from '@/components/theme/tokens';
import { useIsWide } from '@/components/theme/use-is-wide';
import { useTheme } from '@/components/theme/use-theme';
import { Card } from '@/components/ui/card';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { ThemedText } from '@/components/ui/themed-text';
import { useMe } from '@/lib/api/use-me';
import { usePeople } from '@/lib/api/use-team';
import { type Person } from '@/shared/auth';

type EntryProps = { person: Person; isMe: boolean };

function Who({ person, isMe }: EntryProps) {
  return (
    <View style={styles.who}>
      <ThemedText variant="label">{isMe ? `${person.name} (you)` : person.name}</ThemedText>
      <ThemedText variant="caption" tone="textMuted" selectable>
        {person.email}
      </ThemedText>
    </View>
  );
}

/** One person as a table row (wide screens). */
function PersonRow({ person, isMe }: EntryProps) {
  const { palette } = useTheme();
  const edit = usePersonEdit(person);
  return (
    <View style={[styles.row, { borderTopColor: palette.border }]} testID={`person-${person.id}`}>
      <View style={styles.cells}>
        <View style={styles.colPerson}>
          <Who person={person} isMe={isMe} />
        </View>
        <View style={styles.colRoles}>
          <RoleToggles person={person} edit={edit} isMe={isMe} />
        </View>
        <View style={styles.colStatus}>
          <ActivePill person={person} />
        </View>
        <ThemedText variant="label" weight="regular" style={styles.colLast}>
          {lastSignIn(person)}
        </ThemedText>
        <View style={styles.colActions}>
          <PersonActions person={person} edit={edit} isMe={isMe} />
        </View>
      </View>
      <PersonFeedback person={person} edit={edit} />
    </View>
  );
}

/** One person as a stacked card (phones). */
function PersonCard({ person, isMe }: EntryProps) {
  const edit = usePersonEdit(person);
  return (
    <Card style={styles.card} testID={`person-${person.id}`}>
      <View style={styles.cardHead}>
        <Who person={person} isMe={isMe} />
        <ActivePill person={person} />
      </View>
      <ThemedText variant="caption" tone="textMuted">{`Last signed in: ${lastSignIn(person)}`}</ThemedText>
      <RoleToggles person={person} edit={edit} isMe={isMe} />
      <PersonActions person={person} edit={edit} isMe={isMe} />
      <PersonFeedback person={person} edit={edit} />
    </Card>
  );
}

const HEADINGS = [
  ['Person', 'colPerson'],
  ['Roles', 'colRoles'],
  ['Status', 'colStatus'],
  ['Last sign-in', 'colLast'],
  ['', 'colActions'],
] as const;

/** Everyone on the team: a table on a wide screen, stacked cards on a phone. */
export function PeopleSection() {
  const { data, error, isLoading, mutate } = usePeople();
  const me = useMe().data;
  const wide = useIsWide();

  let body;
  if (error) body = <ErrorState message={error.message} onRetry={() => void mutate()} />;
  else if (isLoading || !data) body = <LoadingState label="Loading the team…" />;
  else if (data.length === 0) body = <EmptyState Icon={PersonIcon} title="Nobody here yet" body="Invite the first person below." />;
  else if (wide) {
    body = (
      <Card style={styles.table} accessibilityLabel="People">
        <View style={styles.cells}>
          {HEADINGS.map(([label, col]) => (
            <ThemedText key={col} variant="caption" weight="semibold" tone="textMuted" style={styles[col]}>
              {label}
            </ThemedText>
          ))}
        </View>
        {data.map((p) => (
          <PersonRow key={p.id} person={p} isMe={p.id === me?.id} />
        ))}
      </Card>
    );
  } else body = data.map((p) => <PersonCard key={p.id} person={p} isMe={p.id === me?.id} />);

  return (
    <View style={styles.section}>
      <ThemedText variant="title" accessibilityRole="header" aria-level={2}>
        People
      </ThemedText>
      {body}
    </View>
  );
}

const styles = StyleSheet.create({
  section: { gap: space.md },
  table: { gap: 0, paddingVertical: space.sm },
  row: { borderTopWidth: 1, paddingVertical: space.md, gap: space.sm },
  cells: { flexDirection: 'row', alignItems: 'center', gap: space.md },
  colPerson: { flex: 2.2, minWidth: 0 },
  colRoles: { flex: 3.4, minWidth: 0 },
  colStatus: { flex: 1.3, minWidth: 0 },
  colLast: { flex: 1.5, minWidth: 0 },
  colActions: { flex: 1.6, minWidth: 0, alignItems: 'flex-end' },
  who: { gap: space.xxs, flexShrink: 1 },
  card: { gap: space.sm },
  cardHead: { flexDirection: 'row', justifyContent: 'space-between', alignItems: 'flex-start', gap: space.sm },
});
