/** Starts a same-origin download (`path` under /api) through a temporary anchor; the browser sends the session cookie. */
export function downloadFile(path: string, filename: string): void {
  const anchor = document.createElement('a');
  anchor.href = path;
  anchor.download = filename;
  anchor.rel = 'noopener';
  document.body.appendChild(anchor);
  anchor.click();
  anchor.remove();
}
