import { Link, type Href } from 'expo-router';
import { Pressable, StyleSheet, type ViewStyle } from 'react-native';

import { useTheme } from '@/components/theme/use-theme';
import { ThemedText, type TextVariant } from '@/components/ui/themed-text';
import { useFocusVisible } from '@/components/ui/use-focus-visible';

type Props = {
  href: Href;
  label: string;
  variant?: TextVariant;
  replace?: boolean;
  hint?: string;
  accessibilityLabel?: string;
};

/** An underlined in-app link (a real anchor on the web, so it opens with the keyboard and middle click). */
export function TextLink({ href, label, variant = 'label', replace, hint, accessibilityLabel }: Props) {
  const { palette } = useTheme();
  const focus = useFocusVisible();
  return (
    <Link href={href} replace={replace} asChild>
      <Pressable
        accessibilityRole="link"
        accessibilityHint={hint}
        accessibilityLabel={accessibilityLabel}
        onFocus={focus.onFocus}
        onBlur={focus.onBlur}
        style={StyleSheet.flatten<ViewStyle>([
          styles.link,
          focus.ring(palette.primary),
        ])}
      >
        <ThemedText variant={variant} tone="primary" style={styles.text}>
          {label}
        </ThemedText>
      </Pressable>
    </Link>
  );
}

const styles = StyleSheet.create({
  link: { alignSelf: 'flex-start', borderRadius: 2 },
  text: { textDecorationLine: 'underline' },
});
