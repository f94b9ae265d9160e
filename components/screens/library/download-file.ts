import { Linking } from 'react-native';

/** Opens a same-origin download (`path` under /api) in the system browser, which keeps the session cookie. */
export function downloadFile(path: string, _filename: string): void {
  void Linking.openURL(path);
}
