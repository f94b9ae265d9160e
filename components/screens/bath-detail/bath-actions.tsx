import { useRouter } from 'expo-router';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { space } from '@/components/theme/tokens';
import { Button } from '@/components/ui/button';
import { ConfirmBar } from '@/components/ui/confirm-bar';
import { Notice } from '@/components/ui/notice';
import { useArchiveBath, useRestoreBath } from '@/lib/api/use-baths';
import { hasRole, type User } from '@/shared/auth';
import { type Bath } from '@/shared/baths';

/** Whether a person may edit a bath and log its analyses and files (the server checks again). */
export function canWriteBaths(me: User | undefined): boolean {
  return hasRole(me, 'chemist', 'technician');
}

/** Archive (active bath) or Restore (archived bath), for admins, behind an inline "are you sure". */
function StatusAction({ bath }: { bath: Bath }) {
  const archive = useArchiveBath(bath.id);
  const restore = useRestoreBath(bath.id);
  const [asking, setAsking] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const [done, setDone] = useState<string | null>(null);
  const archived = bath.status === 'archived';
  const action = archived ? restore : archive;

  const confirm = async () => {
    setError(null);
    try {
      await action.trigger();
      setAsking(false);
      setDone(archived ? 'Bath restored: it is back in the active list.' : 'Bath archived: its record and log are kept.');
    } catch (cause) {
      setError(cause instanceof Error ? cause.message : 'That did not work.');
    }
  };

  return (
    <>
      {asking ? (
        <View style={styles.line}>
          <ConfirmBar
            question={
              archived
                ? `Restore ${bath.name}? It comes back to the active list and can be logged again.`
                : `Archive ${bath.name}? It leaves the active list; its record, analyses and files are kept.`
            }
            confirmLabel={archived ? 'Restore the bath' : 'Archive the bath'}
            busy={action.isMutating}
            onConfirm={() => void confirm()}
            onCancel={() => setAsking(false)}
          />
        </View>
      ) : (
        <Button
          label={archived ? 'Restore' : 'Archive'}
          variant={archived ? 'outline' : 'danger'}
          accessibilityHint={archived ? 'Asks before putting the bath back in service' : 'Asks before taking the bath out of service'}
          onPress={() => {
            setDone(null);
            setAsking(true);
          }}
        />
      )}
      {done ? (
        <View style={styles.line}>
          <Notice kind="success" message={done} />
        </View>
      ) : null}
      {error ? (
        <View style={styles.line}>
          <Notice kind="error" message={error} />
        </View>
      ) : null}
    </>
  );
}

/** What the signed-in person may do with the bath record: Edit (chemists, technicians), Archive or Restore (admins). */
export function BathActions({ bath, me }: { bath: Bath; me: User | undefined }) {
  const router = useRouter();
  const edit = canWriteBaths(me);
  const admin = hasRole(me, 'admin');
  if (!edit && !admin) return null;
  return (
    <View style={styles.row} testID="bath-actions">
      {edit ? (
        <Button
          label="Edit"
          accessibilityLabel={`Edit ${bath.name}`}
          accessibilityHint="Opens the bath's form: name, tank, units, targets, make-up and notes"
          onPress={() => router.push(`/baths/edit/${encodeURIComponent(bath.id)}`)}
        />
      ) : null}
      {admin ? <StatusAction bath={bath} /> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  // Buttons side by side; the confirm bar and notices take a line of their own.
  row: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'flex-start', gap: space.sm },
  line: { width: '100%' },
});
