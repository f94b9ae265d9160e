import { type ComponentType, type ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';

import { type IconProps } from '@/components/shell/icons';
import { radius, space } from '@/components/theme/tokens';
import { useTheme } from '@/components/theme/use-theme';
import { ThemedText } from '@/components/ui/themed-text';

type Props = { Icon: ComponentType<IconProps>; title: string; body: string; children?: ReactNode };

/** Says plainly that there is nothing here yet and why, instead of showing invented data. */
export function EmptyState({ Icon, title, body, children }: Props) {
  const { palette } = useTheme();
  return (
    <View style={[styles.box, { borderColor: palette.border, backgroundColor: palette.surfaceRaised }]}>
      <View style={[styles.badge, { backgroundColor: palette.primarySoft }]}>
        <Icon color={palette.primary} size={30} />
      </View>
      <ThemedText variant="title" style={styles.centered}>
        {title}
      </ThemedText>
      <ThemedText variant="body" tone="textMuted" style={[styles.centered, styles.body]}>
        {body}
      </ThemedText>
      {children}
    </View>
  );
}

const styles = StyleSheet.create({
  box: {
    alignItems: 'center',
    gap: space.md,
    paddingVertical: space.xxl,
    paddingHorizontal: space.xl,
    borderRadius: radius.lg,
    borderWidth: StyleSheet.hairlineWidth * 2,
    borderStyle: 'dashed',
  },
  badge: {
    width: 64,
    height: 64,
    borderRadius: radius.pill,
    alignItems: 'center',
    justifyContent: 'center',
  },
  centered: { textAlign: 'center' },
  body: { maxWidth: 560 },
});
