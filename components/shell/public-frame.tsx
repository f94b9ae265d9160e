import Head from 'expo-router/head';
import { type ReactNode } from 'react';
import { ScrollView, StyleSheet, View } from 'react-native';
import { useSafeAreaInsets } from 'react-native-safe-area-context';

import { BrandMark } from '@/components/shell/brand-mark';
import { space } from '@/components/theme/tokens';
import { useTheme } from '@/components/theme/use-theme';
import { Card } from '@/components/ui/card';
import { ScreenHeading } from '@/components/ui/screen-heading';
import { ThemedText } from '@/components/ui/themed-text';

/** Widest the public card grows, in pixels: one short form per screen. */
export const PUBLIC_CARD_WIDTH = 440;

type Props = { title: string; subtitle?: string; children?: ReactNode; testID?: string };

/** Frame for the screens outside the app shell (sign-in, links from mails): brand mark over one centred card. */
export function PublicFrame({ title, subtitle, children, testID }: Props) {
  const { palette } = useTheme();
  const insets = useSafeAreaInsets();
  return (
    <View style={[styles.root, { backgroundColor: palette.background }]} testID={testID}>
      <Head>
        <title>{`${title} · Ligandry`}</title>
      </Head>
      <ScrollView
        style={styles.root}
        contentContainerStyle={[styles.content, { paddingTop: insets.top + space.xxl, paddingBottom: insets.bottom + space.xxl }]}
        keyboardShouldPersistTaps="handled"
      >
        <View style={styles.brand}>
          <BrandMark ring={palette.primary} core={palette.accent} size={36} />
          <ThemedText variant="title" style={styles.wordmark}>
            Ligandry
          </ThemedText>
        </View>
        <Card style={styles.card}>
          <View style={styles.header}>
            <ScreenHeading title={title} subtitle={subtitle} />
          </View>
          {children}
        </Card>
      </ScrollView>
    </View>
  );
}

const styles = StyleSheet.create({
  root: { flex: 1 },
  content: { flexGrow: 1, alignItems: 'center', justifyContent: 'center', paddingHorizontal: space.lg, gap: space.xl },
  brand: { flexDirection: 'row', alignItems: 'center', gap: space.sm },
  wordmark: { letterSpacing: 0.3 },
  card: { width: '100%', maxWidth: PUBLIC_CARD_WIDTH, gap: space.lg, padding: space.xl },
  header: { gap: space.xs },
});
