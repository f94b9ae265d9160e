import { type Href } from 'expo-router';
import Head from 'expo-router/head';
import { type ReactNode } from 'react';
import { ScrollView, StyleSheet, View } from 'react-native';
import { useSafeAreaInsets } from 'react-native-safe-area-context';

import { space } from '@/components/theme/tokens';
import { useIsWide } from '@/components/theme/use-is-wide';
import { useTheme } from '@/components/theme/use-theme';
import { TextLink } from '@/components/ui/text-link';
import { ScreenHeading } from '@/components/ui/screen-heading';

/** Widest the reading column grows on large screens, so lines stay a readable length. */
export const MAX_CONTENT_WIDTH = 960;

type Props = { title: string; subtitle?: string; children?: ReactNode; back?: { href: Href; label: string } };

/** Frame for every screen body: optional way back, page title, optional subtitle, scrolling column and the tab title. */
export function ScreenContainer({ title, subtitle, children, back }: Props) {
  const { palette } = useTheme();
  const insets = useSafeAreaInsets();
  const wide = useIsWide();
  const padding = wide ? space.xxxl : space.lg;
  return (
    <View style={[styles.root, { backgroundColor: palette.background }]}>
      <Head>
        <title>{`${title} · Ligandry`}</title>
      </Head>
      <ScrollView
        style={styles.scroll}
        contentContainerStyle={[
          styles.content,
          { paddingHorizontal: padding, paddingTop: (wide ? space.xxxl : space.xl) + insets.top },
        ]}
      >
        <View style={styles.column}>
          <View style={styles.header}>
            {back ? <TextLink href={back.href} label={`‹ ${back.label}`} accessibilityLabel={`Back to ${back.label}`} /> : null}
            <ScreenHeading title={title} subtitle={subtitle} />
          </View>
          {children}
        </View>
      </ScrollView>
    </View>
  );
}

const styles = StyleSheet.create({
  root: { flex: 1 },
  scroll: { flex: 1 },
  content: { paddingBottom: space.xxxl, alignItems: 'center' },
  column: { width: '100%', maxWidth: MAX_CONTENT_WIDTH, gap: space.xl },
  header: { gap: space.xs },
});
