import { Redirect, usePathname } from 'expo-router';
import { useCallback, useMemo, useRef, type ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';
import { SWRConfig, useSWRConfig } from 'swr';

import { PublicFrame } from '@/components/shell/public-frame';
import { space } from '@/components/theme/tokens';
import { Button } from '@/components/ui/button';
import { LoadingState } from '@/components/ui/loading-state';
import { ThemedText } from '@/components/ui/themed-text';
import { ApiError } from '@/lib/api/fetcher';
import { keys } from '@/lib/api/keys';
import { useMe } from '@/lib/api/use-me';

function Unavailable({ error, onRetry }: { error: ApiError; onRetry: () => void }) {
  const network = error.status === 0;
  return (
    <PublicFrame
      title={network ? 'Cannot reach the server' : 'The server had a problem'}
      subtitle={network ? 'Ligandry could not check who is signed in.' : undefined}
      testID="auth-unavailable"
    >
      <View style={styles.body}>
        <ThemedText variant="body">{error.message}</ThemedText>
        <Button label="Retry" variant="primary" accessibilityHint="Asks the server again" onPress={onRetry} />
      </View>
    </PublicFrame>
  );
}

type Props = {
  /** The shell; told whether a person is signed in, so it can keep its screens mounted but hidden until then. */
  children: (open: boolean) => ReactNode;
};

/**
 * Lets the app shell through only for a signed-in person; sends everyone else to sign in, keeping
 * where they were going. While it checks, the shell's screens stay mounted but hidden: the router
 * then keeps the full address (an unmounted nested stack would collapse /account/team to /account).
 */
export function AuthGate({ children }: Props) {
  const { data, error, mutate } = useMe();
  const pathname = usePathname();
  const { mutate: mutateKey } = useSWRConfig();
  // Any request that answers 401 means the session ended: ask /api/me again, which sends the gate to sign-in.
  const onError = useCallback(
    (err: unknown, key: string) => {
      if (err instanceof ApiError && err.status === 401 && key !== keys.me) void mutateKey(keys.me);
    },
    [mutateKey],
  );
  const config = useMemo(() => ({ onError }), [onError]);
  // Keep the path seen at the first 401: the navigator may re-render the gate elsewhere while the redirect runs.
  const kept = useRef<string | null>(null);

  let cover: ReactNode = null;
  if (error?.status === 401) {
    kept.current ??= pathname;
    const next = kept.current;
    cover = <Redirect href={{ pathname: '/sign-in', params: next && next !== '/' ? { next } : {} }} />;
  } else {
    kept.current = null;
    if (!data) {
      cover = error ? (
        <Unavailable error={error} onRetry={() => void mutate()} />
      ) : (
        <LoadingState fill label="Checking who is signed in…" />
      );
    }
  }
  const open = !!data && error?.status !== 401;
  return (
    <SWRConfig value={config}>
      {children(open)}
      {open ? null : <View style={StyleSheet.absoluteFill}>{cover}</View>}
    </SWRConfig>
  );
}

const styles = StyleSheet.create({
  body: { gap: space.lg },
});
