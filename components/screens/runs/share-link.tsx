import * as Linking from 'expo-linking';
import { useState } from 'react';
import { Platform, Share, StyleSheet, View } from 'react-native';

import { runPath } from '@/components/screens/runs/run-row';
import { radius, space } from '@/components/theme/tokens';
import { useTheme } from '@/components/theme/use-theme';
import { ThemedText } from '@/components/ui/themed-text';

/** The full address of a saved run (on the web: this site's origin and the run's path). */
export function shareUrl(id: string): string {
  return Linking.createURL(runPath(id));
}

/** What pressing "Copy share link" did: copied, handed to the system's share sheet, or only shown to copy by hand. */
export type ShareOutcome = { kind: 'copied' | 'shared' | 'shown'; url: string };

async function copyOrShare(url: string, title: string): Promise<ShareOutcome['kind']> {
  if (Platform.OS === 'web') {
    const clipboard = typeof navigator === 'undefined' ? undefined : navigator.clipboard;
    if (!clipboard) return 'shown';
    try {
      await clipboard.writeText(url);
      return 'copied';
    } catch {
      // NOTE: the browser may refuse the clipboard (no permission, not a secure origin); the link is shown instead.
      return 'shown';
    }
  }
  try {
    const reply = await Share.share({ message: url, title });
    return reply.action === Share.sharedAction ? 'shared' : 'shown';
  } catch {
    return 'shown';
  }
}

/** The share link of run `id`: `share()` copies it (web) or opens the share sheet, `outcome` says what happened. */
export function useShareLink(id: string, title: string) {
  const [outcome, setOutcome] = useState<ShareOutcome | null>(null);
  const share = async () => {
    const url = shareUrl(id);
    setOutcome({ kind: await copyOrShare(url, title), url });
  };
  return { outcome, share: () => void share() };
}

const HEADLINE: Record<ShareOutcome['kind'], string> = {
  copied: 'Link copied.',
  shared: 'Link shared.',
  shown: 'Copy this link:',
};

/** After a share: what happened and the address itself, selectable, so it can always be copied by hand. */
export function ShareMessage({ outcome }: { outcome: ShareOutcome }) {
  const { palette } = useTheme();
  return (
    <View
      style={[styles.box, { backgroundColor: palette.primarySoft, borderLeftColor: palette.primary }]}
      accessibilityLiveRegion="polite"
      testID="share-message"
    >
      <ThemedText variant="label" weight="semibold">
        {HEADLINE[outcome.kind]}
      </ThemedText>
      <ThemedText variant="label" weight="regular" selectable accessibilityLabel={`Link: ${outcome.url}`}>
        {outcome.url}
      </ThemedText>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { alignSelf: 'stretch', gap: space.xxs, borderLeftWidth: 4, borderRadius: radius.sm, paddingHorizontal: space.md, paddingVertical: space.sm },
});
