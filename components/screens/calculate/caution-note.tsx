import { StyleSheet, View } from 'react-native';

import { radius, space } from '@/components/theme/tokens';
import { useTheme } from '@/components/theme/use-theme';
import { ThemedText } from '@/components/ui/themed-text';

/** A caution in the caution colours (drafts in use, a result to read with care); polite, not an alert. */
export function CautionNote({ message, testID }: { message: string; testID?: string }) {
  const { palette } = useTheme();
  return (
    <View
      testID={testID}
      accessibilityLiveRegion="polite"
      style={[styles.box, { backgroundColor: palette.cautionSoft, borderLeftColor: palette.caution }]}
    >
      <ThemedText variant="label" weight="semibold" tone="caution">
        {message}
      </ThemedText>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { alignSelf: 'stretch', borderLeftWidth: 4, borderRadius: radius.sm, paddingHorizontal: space.md, paddingVertical: space.sm },
});
