import { type FileKinds, type PickedFile, useFilePicker } from '@/components/ui/file-picker';
import { ATTACHMENT_TYPES } from '@/shared/baths';

/** A file chosen to attach: its name, size in bytes and type when known, and the part to upload. */
export type PickedAttachment = PickedFile;

/** PDF, PNG and JPEG, in the browser and on a phone. */
const ATTACHMENT_KINDS: FileKinds = { accept: ATTACHMENT_TYPES.join(','), types: ATTACHMENT_TYPES, fallbackType: 'application/octet-stream' };

/** Opens the file chooser for one PDF, PNG or JPEG; resolves null when the person cancels. */
export function useAttachmentPicker(): () => Promise<PickedFile | null> {
  return useFilePicker(ATTACHMENT_KINDS);
}
