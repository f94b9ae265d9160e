import { Slot } from 'expo-router';
import { StyleSheet, View } from 'react-native';

import { AuthGate } from '@/components/shell/auth-gate';

/** Print pages: outside the tab shell (no navigation on paper) but behind the same sign-in gate. */
export default function PrintLayout() {
  return (
    <AuthGate>
      {(open) => (
        // Mounted but hidden while the gate checks, as the shell does, so the address stays as asked.
        <View style={[styles.fill, !open && styles.hidden]} aria-hidden={!open}>
          <Slot />
        </View>
      )}
    </AuthGate>
  );
}

const styles = StyleSheet.create({
  fill: { flex: 1 },
  hidden: { display: 'none' },
});
