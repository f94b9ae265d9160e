import { getDocumentAsync } from 'expo-document-picker';
import { useCallback } from 'react';

import { type UploadFile } from '@/lib/api/use-import';
import { ATTACHMENT_TYPES } from '@/shared/baths';

/** A file chosen to attach: its name, size in bytes and type when known, and the part to upload. */
export type PickedAttachment = { name: string; size: number | null; type: string | null; part: UploadFile };

/** Opens the phone's document chooser for one PDF, PNG or JPEG; resolves null when the person cancels. */
export function useAttachmentPicker(): () => Promise<PickedAttachment | null> {
  return useCallback(async () => {
    const picked = await getDocumentAsync({ type: [...ATTACHMENT_TYPES], copyToCacheDirectory: true, multiple: false });
    const asset = picked.canceled ? undefined : picked.assets[0];
    if (!asset) return null;
    const type = asset.mimeType ?? null;
    return {
      name: asset.name,
      size: typeof asset.size === 'number' ? asset.size : null,
      type,
      part: { uri: asset.uri, name: asset.name, type: type ?? 'application/octet-stream' },
    };
  }, []);
}
