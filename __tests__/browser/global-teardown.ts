// Stops the browser tests' server and drops their database.
import { setTimeout as sleep } from 'node:timers/promises';

import { dropTestDatabase } from '../support/test-db';

export default async function globalTeardown(): Promise<void> {
  const child = globalThis.__ligandryBrowserServer;
  if (child && child.exitCode === null) {
    const exited = new Promise((resolve) => child.once('exit', resolve));
    child.kill('SIGTERM');
    const giveUp = new AbortController();
    await Promise.race([exited, sleep(10_000, undefined, { signal: giveUp.signal }).catch(() => undefined)]);
    giveUp.abort();
    if (child.exitCode === null) child.kill('SIGKILL');
  }
  await dropTestDatabase(process.env.LIGANDRY_BROWSER_DB);
}
