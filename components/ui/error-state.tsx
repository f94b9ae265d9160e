import { StyleSheet, View } from 'react-native';

import { space } from '@/components/theme/tokens';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';

type Props = { message: string; onRetry?: () => void };

/** A failed load: the reason in words and, when trying again can help, a Retry button. */
export function ErrorState({ message, onRetry }: Props) {
  return (
    <View style={styles.box}>
      <Notice kind="error" message={message} />
      {onRetry ? <Button label="Retry" accessibilityHint="Asks the server again" onPress={onRetry} /> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.sm, alignSelf: 'stretch' },
});
