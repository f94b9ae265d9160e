import { StyleSheet, View } from 'react-native';

import { type PersonEdit } from '@/components/screens/team/use-person-edit';
import { space } from '@/components/theme/tokens';
import { Button } from '@/components/ui/button';
import { ToggleChip } from '@/components/ui/chip';
import { ConfirmBar } from '@/components/ui/confirm-bar';
import { formatWhen } from '@/components/ui/format-date';
import { Notice } from '@/components/ui/notice';
import { StatusPill } from '@/components/ui/status-dot';
import { ROLE_LABELS, ROLES, type Person } from '@/shared/auth';

/** The five roles as toggle chips for one person (an admin cannot drop their own admin role). */
export function RoleToggles({ person, edit, isMe }: { person: Person; edit: PersonEdit; isMe: boolean }) {
  return (
    <View style={styles.chips} role="group" aria-label={`Roles of ${person.name}`}>
      {ROLES.map((role) => {
        const ownAdmin = isMe && role === 'admin';
        return (
          <ToggleChip
            key={role}
            label={ROLE_LABELS[role].label}
            accessibilityLabel={`${ROLE_LABELS[role].label} role for ${person.name}`}
            hint={ownAdmin ? 'You cannot remove your own admin role; another admin can.' : ROLE_LABELS[role].does}
            checked={edit.roles.includes(role)}
            disabled={edit.busy || ownAdmin}
            onToggle={() => edit.toggle(role)}
          />
        );
      })}
    </View>
  );
}

/** Active or deactivated, in words as well as colour. */
export function ActivePill({ person }: { person: Person }) {
  return <StatusPill kind={person.active ? 'ok' : 'unknown'} label={person.active ? 'Active' : 'Deactivated'} />;
}

/** When the person last signed in, or that they never have. */
export function lastSignIn(person: Person): string {
  return person.lastSignInAt ? formatWhen(person.lastSignInAt) : 'Never';
}

/** Save / undo for changed roles, and deactivate or reactivate (never one's own account). */
export function PersonActions({ person, edit, isMe }: { person: Person; edit: PersonEdit; isMe: boolean }) {
  return (
    <View style={styles.actions}>
      {edit.dirty ? (
        <>
          <Button
            label={edit.busy ? 'Saving…' : 'Save roles'}
            accessibilityLabel={`Save roles of ${person.name}`}
            variant="primary"
            disabled={edit.busy}
            onPress={edit.saveRoles}
          />
          <Button label="Undo" accessibilityLabel={`Undo role changes for ${person.name}`} disabled={edit.busy} onPress={edit.undo} />
        </>
      ) : null}
      {edit.confirming || isMe ? null : (
        <Button
          label={person.active ? 'Deactivate' : 'Reactivate'}
          accessibilityLabel={`${person.active ? 'Deactivate' : 'Reactivate'} ${person.name}`}
          variant={person.active ? 'danger' : 'outline'}
          disabled={edit.busy}
          onPress={edit.askActive}
        />
      )}
    </View>
  );
}

/** The confirmation and the last message, shown under the person. */
export function PersonFeedback({ person, edit }: { person: Person; edit: PersonEdit }) {
  return (
    <>
      {edit.confirming ? (
        <ConfirmBar
          question={
            person.active
              ? `Deactivate ${person.name}? They are signed out at once and cannot sign in until reactivated.`
              : `Reactivate ${person.name}? They can sign in again with their password.`
          }
          confirmLabel={person.active ? 'Deactivate' : 'Reactivate'}
          busy={edit.busy}
          onConfirm={edit.confirmActive}
          onCancel={edit.cancel}
        />
      ) : null}
      {edit.message ? <Notice kind={edit.message.kind} message={edit.message.text} /> : null}
    </>
  );
}

const styles = StyleSheet.create({
  chips: { flexDirection: 'row', flexWrap: 'wrap', gap: space.xs },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
});
