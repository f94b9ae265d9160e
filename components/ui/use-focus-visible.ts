import { useCallback, useState } from 'react';
import { Platform, type NativeSyntheticEvent, type TargetedEvent, type ViewStyle } from 'react-native';

type FocusTarget = { matches?: (selector: string) => boolean };

function isKeyboardFocus(event: NativeSyntheticEvent<TargetedEvent>): boolean {
  if (Platform.OS !== 'web') return false;
  const target = (event as unknown as { target?: FocusTarget }).target;
  try {
    return Boolean(target?.matches?.(':focus-visible'));
  } catch {
    return true;
  }
}

/**
 * Shows a focus ring only for keyboard focus (the browser's :focus-visible), not after a click.
 * `ring(colour, offset)` is the ring's style while it shows, else false (for a style array).
 */
export function useFocusVisible() {
  const [visible, setVisible] = useState(false);
  const onFocus = useCallback((event: NativeSyntheticEvent<TargetedEvent>) => {
    setVisible(isKeyboardFocus(event));
  }, []);
  const onBlur = useCallback(() => setVisible(false), []);
  const ring = (color: string, offset = 2): ViewStyle | false =>
    visible && { outlineStyle: 'solid', outlineWidth: 2, outlineOffset: offset, outlineColor: color };
  return { visible, onFocus, onBlur, ring };
}
