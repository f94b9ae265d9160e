import { Link, type Href } from 'expo-router';
import { Pressable, StyleSheet, View, type ViewStyle } from 'react-native';

import { radius, space } from '@/components/theme/tokens';
import { useTheme } from '@/components/theme/use-theme';
import { ThemedText } from '@/components/ui/themed-text';
import { useFocusVisible } from '@/components/ui/use-focus-visible';

type Props = { href: Href; title: string; body: string };

/** A full-width link to another screen: title, one line on what is there, and an arrow. */
export function NavRow({ href, title, body }: Props) {
  const { palette } = useTheme();
  const focus = useFocusVisible();
  return (
    <Link href={href} asChild>
      <Pressable
        accessibilityRole="link"
        accessibilityLabel={title}
        accessibilityHint={body}
        onFocus={focus.onFocus}
        onBlur={focus.onBlur}
        style={StyleSheet.flatten<ViewStyle>([
          styles.row,
          { borderColor: palette.border, backgroundColor: palette.surfaceRaised },
          focus.ring(palette.primary),
        ])}
      >
        <View style={styles.words}>
          <ThemedText variant="label" tone="primary">
            {title}
          </ThemedText>
          <ThemedText variant="caption" tone="textMuted">
            {body}
          </ThemedText>
        </View>
        <ThemedText variant="title" tone="primary" aria-hidden>
          ›
        </ThemedText>
      </Pressable>
    </Link>
  );
}

const styles = StyleSheet.create({
  row: {
    flexDirection: 'row',
    alignItems: 'center',
    gap: space.md,
    paddingHorizontal: space.md,
    paddingVertical: space.sm,
    borderRadius: radius.md,
    borderWidth: 1,
  },
  words: { flex: 1, gap: space.xxs },
});
