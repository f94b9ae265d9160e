import { useCallback, useEffect, useRef } from 'react';

import { type FileKinds, type PickedFile } from './file-picker';

export type { FileKinds, PickedFile } from './file-picker';

/**
 * Opens the browser's file chooser for one file of the kinds through a hidden <input type="file">,
 * kept in the page while the screen is open; resolves null when the person cancels.
 */
export function useFilePicker(kinds: FileKinds): () => Promise<PickedFile | null> {
  const { accept } = kinds;
  const input = useRef<HTMLInputElement | null>(null);
  const settle = useRef<((file: PickedFile | null) => void) | null>(null);

  useEffect(() => {
    const el = document.createElement('input');
    el.type = 'file';
    el.accept = accept;
    el.hidden = true;
    el.tabIndex = -1;
    el.setAttribute('aria-hidden', 'true');
    const done = (file: PickedFile | null) => {
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
  }, [accept]);

  return useCallback(
    () =>
      new Promise<PickedFile | null>((resolve) => {
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
