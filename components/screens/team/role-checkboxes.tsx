import { Pressable, StyleSheet, View } from 'react-native';

import { radius, space } from '@/components/theme/tokens';
import { useTheme } from '@/components/theme/use-theme';
import { ThemedText } from '@/components/ui/themed-text';
import { useFocusVisible } from '@/components/ui/use-focus-visible';
import { ROLE_LABELS, ROLES, type Role } from '@/shared/auth';

function RoleBox({ role, checked, onToggle }: { role: Role; checked: boolean; onToggle: () => void }) {
  const { palette } = useTheme();
  const focus = useFocusVisible();
  const { label, does } = ROLE_LABELS[role];
  return (
    <Pressable
      accessibilityRole="checkbox"
      accessibilityState={{ checked }}
      aria-checked={checked}
      accessibilityLabel={label}
      accessibilityHint={does}
      onPress={onToggle}
      onFocus={focus.onFocus}
      onBlur={focus.onBlur}
      style={[styles.row, focus.ring(palette.primary)]}
    >
      <View
        style={[
          styles.box,
          checked
            ? { backgroundColor: palette.primary, borderColor: palette.primary }
            : { backgroundColor: palette.surface, borderColor: palette.textMuted },
        ]}
      >
        {checked ? (
          <ThemedText variant="caption" weight="bold" tone="onPrimary">
            ✓
          </ThemedText>
        ) : null}
      </View>
      <View style={styles.words}>
        <ThemedText variant="label">{label}</ThemedText>
        <ThemedText variant="caption" tone="textMuted">
          {does}
        </ThemedText>
      </View>
    </Pressable>
  );
}

type Props = { value: readonly Role[]; onChange: (roles: Role[]) => void; error?: string };

/** The five roles as labelled checkboxes, each with what it allows; keeps the order of ROLES. */
export function RoleCheckboxes({ value, onChange, error }: Props) {
  const toggle = (role: Role) =>
    onChange(ROLES.filter((r) => (r === role ? !value.includes(r) : value.includes(r))));
  return (
    <View style={styles.group} role="group" aria-label="Roles">
      <ThemedText variant="label">Roles</ThemedText>
      {ROLES.map((role) => (
        <RoleBox key={role} role={role} checked={value.includes(role)} onToggle={() => toggle(role)} />
      ))}
      {error ? (
        <ThemedText variant="label" weight="regular" tone="danger" accessibilityLiveRegion="polite">
          {error}
        </ThemedText>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  group: { gap: space.xs },
  row: { flexDirection: 'row', alignItems: 'flex-start', gap: space.sm, paddingVertical: space.xs, borderRadius: radius.sm },
  box: {
    width: 22,
    height: 22,
    marginTop: 1,
    borderRadius: radius.sm,
    borderWidth: 2,
    alignItems: 'center',
    justifyContent: 'center',
  },
  words: { flex: 1, gap: space.xxs },
});
