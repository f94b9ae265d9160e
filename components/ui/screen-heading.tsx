import { ThemedText } from '@/components/ui/themed-text';

/** A screen's one h1 and the line under it. */
export function ScreenHeading({ title, subtitle }: { title: string; subtitle?: string }) {
  return (
    <>
      <ThemedText variant="display" accessibilityRole="header">
        {title}
      </ThemedText>
      {subtitle ? (
        <ThemedText variant="body" tone="textMuted">
          {subtitle}
        </ThemedText>
      ) : null}
    </>
  );
}
