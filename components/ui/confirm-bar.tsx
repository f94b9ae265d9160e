import { StyleSheet, View } from 'react-native';

import { radius, space } from '@/components/theme/tokens';
import { useTheme } from '@/components/theme/use-theme';
import { Button } from '@/components/ui/button';
import { ThemedText } from '@/components/ui/themed-text';

type Props = {
  question: string;
  confirmLabel: string;
  onConfirm: () => void;
  onCancel: () => void;
  busy?: boolean;
};

/** An inline "are you sure" for actions that are hard to undo: the question, the action in red, and Cancel. */
export function ConfirmBar({ question, confirmLabel, onConfirm, onCancel, busy = false }: Props) {
  const { palette } = useTheme();
  return (
    <View
      style={[styles.box, { backgroundColor: palette.dangerSoft, borderColor: palette.danger }]}
      accessibilityRole="alert"
    >
      <ThemedText variant="label">{question}</ThemedText>
      <View style={styles.actions}>
        <Button label={confirmLabel} variant="danger" onPress={onConfirm} disabled={busy} />
        <Button label="Cancel" onPress={onCancel} disabled={busy} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.sm, padding: space.md, borderRadius: radius.md, borderWidth: 1, alignSelf: 'stretch' },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
});
