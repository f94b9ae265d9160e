import { Linking } from 'react-native';

import { Button } from '@/components/ui/button';

/** Props of the download control: the same-origin path (under /api), the file's name and what it is. */
export type AttachmentLinkProps = { path: string; fileName: string; title: string };

/** Download on a phone: opens the file's address in the system browser, which keeps the session cookie. */
export function AttachmentLink({ path, title }: AttachmentLinkProps) {
  return (
    <Button
      label="Download"
      accessibilityLabel={`Download ${title}`}
      accessibilityHint="Opens the file"
      onPress={() => void Linking.openURL(path)}
    />
  );
}
