// Links in mailed texts, for server and browser tests.

/** The path of the first link in a mail's text that goes to `route` (e.g. "/welcome/"). */
export function linkPath(text: string, route: string): string {
  const m = new RegExp(`https?://[^\\s/]+(${route}[A-Za-z0-9_-]+)`).exec(text);
  if (!m) throw new Error(`no ${route} link in mail:\n${text}`);
  return m[1] as string;
}
