import { Linking, Platform } from 'react-native';

import { ThemedText } from '@/components/ui/themed-text';

const URL_PATTERN = /https?:\/\/[^\s<>"'()]+[^\s<>"'().,;:!?]/g;

/** A piece of a mail body: plain words or a link. */
export type TextPart = { kind: 'text' | 'link'; text: string };

/** Splits mail text into plain runs and http(s) links (trailing punctuation stays outside the link). */
export function splitLinks(text: string): TextPart[] {
  const parts: TextPart[] = [];
  let last = 0;
  for (const match of text.matchAll(URL_PATTERN)) {
    const start = match.index ?? 0;
    if (start > last) parts.push({ kind: 'text', text: text.slice(last, start) });
    parts.push({ kind: 'link', text: match[0] });
    last = start + match[0].length;
  }
  if (last < text.length) parts.push({ kind: 'text', text: text.slice(last) });
  return parts;
}

/** On the web a link is a real anchor that opens in this tab; elsewhere a press hands the address to the system. */
function linkProps(url: string) {
  // NOTE: react-native-web renders Text with `href` as <a>; the prop is missing from React Native's types.
  return Platform.OS === 'web' ? ({ href: url } as object) : { onPress: () => void Linking.openURL(url) };
}

/** A mail body with its links pressable. */
export function MessageText({ text }: { text: string }) {
  return (
    <ThemedText variant="body" selectable testID="message-text">
      {splitLinks(text).map((part, i) =>
        part.kind === 'link' ? (
          <ThemedText
            key={i}
            variant="body"
            tone="primary"
            accessibilityRole="link"
            style={{ textDecorationLine: 'underline' }}
            {...linkProps(part.text)}
          >
            {part.text}
          </ThemedText>
        ) : (
          part.text
        ),
      )}
    </ThemedText>
  );
}
