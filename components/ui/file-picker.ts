import { getDocumentAsync } from 'expo-document-picker';
import { useCallback } from 'react';

import { type UploadFile } from '@/lib/api/use-import';

/** A chosen file: its name, size in bytes and type when known, and the part to upload. */
export type PickedFile = { name: string; size: number | null; type: string | null; part: UploadFile };

/** What a chooser offers: `accept` for the browser, `types` for the phone, and the type to send when the phone names none. */
export type FileKinds = { accept: string; types: readonly string[]; fallbackType: string };

/** Opens the phone's document chooser for one file of the kinds; resolves null when the person cancels. */
export function useFilePicker(kinds: FileKinds): () => Promise<PickedFile | null> {
  const { types, fallbackType } = kinds;
  return useCallback(async () => {
    const picked = await getDocumentAsync({ type: [...types], copyToCacheDirectory: true, multiple: false });
    const asset = picked.canceled ? undefined : picked.assets[0];
    if (!asset) return null;
    const type = asset.mimeType ?? null;
    return {
      name: asset.name,
      size: typeof asset.size === 'number' ? asset.size : null,
      type,
      part: { uri: asset.uri, name: asset.name, type: type ?? fallbackType },
    };
  }, [types, fallbackType]);
}
