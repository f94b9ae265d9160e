/** Saves a text file (CSV) made in the browser through a temporary object URL and anchor. */
export function downloadText(file: { filename: string; text: string }, type = 'text/csv'): void {
  const url = URL.createObjectURL(new Blob([file.text], { type: `${type};charset=utf-8` }));
  const anchor = document.createElement('a');
  anchor.href = url;
  anchor.download = file.filename;
  anchor.rel = 'noopener';
  document.body.appendChild(anchor);
  anchor.click();
  anchor.remove();
  // NOTE: revoked on the next tick; revoking at once can cancel the download in some browsers.
  setTimeout(() => URL.revokeObjectURL(url), 0);
}
