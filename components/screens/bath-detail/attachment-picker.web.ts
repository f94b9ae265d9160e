import { useCallback, useEffect, useRef } from 'react';

import { type UploadFile } from '@/lib/api/use-import';
import { ATTACHMENT_TYPES } from '@/shared/baths';

/** A file chosen to attach: its name, size in bytes and type when known, and the part to upload. */
export type PickedAttachment = { name: string; size: number | null; type: string | null; part: UploadFile };

/** What the browser's file chooser offers: PDF, PNG and JPEG. */
export const ATTACHMENT_ACCEPT = ATTACHMENT_TYPES.join(',');

/**
 * Opens the browser's file chooser for one PDF, PNG or JPEG through a hidden <input type="file">,
 * kept in the page while the screen is open; resolves null when the person cancels.
 */
export function useAttachmentPicker(): () => Promise<PickedAttachment | null> {
  const input = useRef<HTMLInputElement | null>(null);
  const settle = useRef<((file: PickedAttachment | null) => void) | null>(null);

  useEffect(() => {
    const el = document.createElement('input');
    el.type = 'file';
    el.accept = ATTACHMENT_ACCEPT;
    el.hidden = true;
    el.tabIndex = -1;
    el.setAttribute('aria-hidden', 'true');
    const done = (file: PickedAttachment | null) => {
      settle.current?.(file);
      settle.current = null;
    };
    const onChange = () => {
      const file = el.files?.[0];
      done(file ? { name: file.name, size: file.size, type: file.type || null, part: file } : null);
    };
    const onCancel = () => done(null);
    el.addEventListener('change', onChange);
    el.addEventListener('cancel', onCancel);
    document.body.appendChild(el);
    input.current = el;
    return () => {
      el.removeEventListener('change', onChange);
      el.removeEventListener('cancel', onCancel);
      el.remove();
      input.current = null;
    };
  }, []);

  return useCallback(
    () =>
      new Promise<PickedAttachment | null>((resolve) => {
        const el = input.current;
        if (!el) return resolve(null);
        settle.current?.(null);
        settle.current = resolve;
        // Cleared first so choosing the same file again still fires "change".
        el.value = '';
        el.click();
      }),
    [],
  );
}
