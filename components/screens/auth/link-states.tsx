import { type Href } from 'expo-router';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { PublicFrame } from '@/components/shell/public-frame';
import { space } from '@/components/theme/tokens';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { ThemedText } from '@/components/ui/themed-text';
import { TextLink } from '@/components/ui/text-link';
import { ApiError } from '@/lib/api/fetcher';

type GoneProps = { title: string; body: string; linkHref: Href; linkLabel: string };

/** A mailed link that no longer works (used, expired or mistyped), and what to do instead. */
export function LinkGone({ title, body, linkHref, linkLabel }: GoneProps) {
  return (
    <PublicFrame title={title} testID="link-gone">
      <View style={styles.body}>
        <ThemedText variant="body">{body}</ThemedText>
        <TextLink href={linkHref} label={linkLabel} variant="body" />
      </View>
    </PublicFrame>
  );
}

/** True when the server says the link is no good (410 gone, or a 4xx for a token it cannot read). */
function isDeadLink(error: ApiError | undefined): boolean {
  return !!error && error.status >= 400 && error.status < 500 && error.status !== 429;
}

/**
 * Whether a mailed link is dead, and the server's reason when it gave one: a token that cannot be
 * read, a 4xx when the link was checked, or a 410 when the form was sent. `caught(error)` marks the
 * link dead when a submit answered 410, and says whether it did.
 */
export function useDeadLink(valid: boolean, checkError: ApiError | undefined) {
  const [goneOnSubmit, setGoneOnSubmit] = useState<string | null>(null);
  const dead = !valid || goneOnSubmit !== null || isDeadLink(checkError);
  const reason = goneOnSubmit ?? (checkError?.status === 410 ? checkError.message : null);
  const caught = (error: unknown): boolean => {
    if (!(error instanceof ApiError && error.status === 410)) return false;
    setGoneOnSubmit(error.message);
    return true;
  };
  return { dead, reason, caught };
}

/** Loading and failure frames while a mailed link is being checked. */
export function LinkChecking({ title, error, onRetry }: { title: string; error?: ApiError; onRetry: () => void }) {
  return (
    <PublicFrame title={title}>
      {error ? (
        <ErrorState message={error.message} onRetry={onRetry} />
      ) : (
        <LoadingState label="Checking the link…" />
      )}
    </PublicFrame>
  );
}

const styles = StyleSheet.create({
  body: { gap: space.lg },
});
