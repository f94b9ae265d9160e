// Stops the browser tests' server and drops their database.
import { dropTestDatabase } from '../support/test-db';

export default async function globalTeardown(): Promise<void> {
  const child = globalThis.__ligandryBrowserServer;
  if (child && child.exitCode === null) {
    const exited = new Promise((resolve) => child.once('exit', resolve));
    child.kill('SIGTERM');
    let timer: ReturnType<typeof setTimeout> | undefined;
    await Promise.race([exited, new Promise((r) => (timer = setTimeout(r, 10_000)))]);
    clearTimeout(timer);
    if (child.exitCode === null) child.kill('SIGKILL');
  }
  await dropTestDatabase(process.env.LIGANDRY_BROWSER_DB);
}
