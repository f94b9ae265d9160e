import { Link } from 'expo-router';
import { Pressable, StyleSheet } from 'react-native';

import { LostIcon } from '@/components/shell/icons';
import { radius, space } from '@/components/theme/tokens';
import { useTheme } from '@/components/theme/use-theme';
import { EmptyState } from '@/components/ui/empty-state';
import { ScreenContainer } from '@/components/ui/screen-container';
import { ThemedText } from '@/components/ui/themed-text';
import { useFocusVisible } from '@/components/ui/use-focus-visible';

/** Shown for any address the app does not know, with a way back to the bath list. */
export function NotFoundScreen() {
  const { palette } = useTheme();
  const focus = useFocusVisible();
  return (
    <ScreenContainer title="Page not found">
      <EmptyState
        Icon={LostIcon}
        title="Nothing lives at this address"
        body="The link may be mistyped, or the page may belong to a later build of Ligandry."
      >
        <Link href="/baths" asChild>
          <Pressable
            accessibilityRole="link"
            onFocus={focus.onFocus}
            onBlur={focus.onBlur}
            style={StyleSheet.flatten([
              styles.link,
              { backgroundColor: palette.primary },
              focus.ring(palette.text),
            ])}
          >
            <ThemedText variant="label" tone="onPrimary">
              Go to Baths
            </ThemedText>
          </Pressable>
        </Link>
      </EmptyState>
    </ScreenContainer>
  );
}

const styles = StyleSheet.create({
  link: {
    paddingHorizontal: space.lg,
    paddingVertical: space.sm + space.xxs,
    borderRadius: radius.md,
  },
});
