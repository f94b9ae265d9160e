import { StyleSheet, View } from 'react-native';

import { radius, space } from '@/components/theme/tokens';
import { useTheme } from '@/components/theme/use-theme';
import { ThemedText } from '@/components/ui/themed-text';

/** What a notice reports: a failure, a success, or a plain fact. */
export type NoticeKind = 'error' | 'success' | 'info';

type Props = { kind: NoticeKind; message: string; testID?: string };

/** A tinted box with one message, announced to screen readers when it appears (form errors, results). */
export function Notice({ kind, message, testID }: Props) {
  const { palette } = useTheme();
  const colours = {
    error: { bg: palette.dangerSoft, edge: palette.danger, tone: 'danger' as const },
    success: { bg: palette.okSoft, edge: palette.ok, tone: 'ok' as const },
    info: { bg: palette.primarySoft, edge: palette.primary, tone: 'text' as const },
  }[kind];
  return (
    <View
      testID={testID}
      accessibilityRole={kind === 'error' ? 'alert' : 'text'}
      accessibilityLiveRegion={kind === 'error' ? 'assertive' : 'polite'}
      style={[styles.box, { backgroundColor: colours.bg, borderLeftColor: colours.edge }]}
    >
      <ThemedText variant="label" weight="semibold" tone={colours.tone}>
        {message}
      </ThemedText>
    </View>
  );
}

const styles = StyleSheet.create({
  box: {
    alignSelf: 'stretch',
    borderLeftWidth: 4,
    borderRadius: radius.sm,
    paddingHorizontal: space.md,
    paddingVertical: space.sm,
  },
});
