import { getDocumentAsync } from 'expo-document-picker';
import { useCallback } from 'react';

import { type UploadFile } from '@/lib/api/use-import';

/** A file chosen for import: its name, its size in bytes when known, and the part to upload. */
export type PickedFile = { name: string; size: number | null; part: UploadFile };

/** Types offered by the phone's document chooser: CSV under its usual names, and plain text. */
export const CSV_TYPES = ['text/csv', 'text/comma-separated-values', 'text/plain'];

/** Opens the phone's document chooser for one CSV file; resolves null when the person cancels. */
export function useCsvPicker(): () => Promise<PickedFile | null> {
  return useCallback(async () => {
    const picked = await getDocumentAsync({ type: CSV_TYPES, copyToCacheDirectory: true, multiple: false });
    const asset = picked.canceled ? undefined : picked.assets[0];
    if (!asset) return null;
    return {
      name: asset.name,
      size: typeof asset.size === 'number' ? asset.size : null,
      part: { uri: asset.uri, name: asset.name, type: asset.mimeType ?? 'text/csv' },
    };
  }, []);
}
