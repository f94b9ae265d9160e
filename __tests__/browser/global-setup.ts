// Starts the real server (built web app + API) on a free loopback port against a fresh database.
// NOTE: relative imports: jest loads global setup files without the @/ module mapping.
import { spawn, type ChildProcess } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';

import { freePort } from '../../scripts/lib/free-port';
import { testDatabaseUrl } from '../support/test-db';

const ROOT = path.resolve(__dirname, '../..');

declare global {
  // eslint-disable-next-line no-var
  var __ligandryBrowserServer: ChildProcess | undefined;
}

async function waitHealthy(url: string, child: ChildProcess, output: () => string): Promise<void> {
  const deadline = Date.now() + 60_000;
  while (Date.now() < deadline) {
    if (child.exitCode !== null) throw new Error(`The server exited during start-up:\n${output()}`);
    try {
      const res = await fetch(`${url}/api/health`);
      if (res.status === 200) return;
    } catch {
      // not listening yet
    }
    await new Promise((r) => setTimeout(r, 200));
  }
  throw new Error(`The server did not become healthy within 60 s:\n${output()}`);
}

export default async function globalSetup(): Promise<void> {
  if (!fs.existsSync(path.join(ROOT, 'dist/index.html'))) {
    throw new Error('No web build in dist/: run `npm run build:web` (npm test does it first).');
  }
  // The server makes, migrates and seeds this database itself, as it does under npm start.
  const dbUrl = testDatabaseUrl('ligandry_browser');
  const port = await freePort();
  const url = `http://127.0.0.1:${port}`;
  let log = '';
  const child = spawn(process.execPath, ['--import', 'tsx', 'server/index.ts'], {
    cwd: ROOT,
    env: { ...process.env, PORT: String(port), HOST: '127.0.0.1', DATABASE_URL: dbUrl, LOG_LEVEL: 'warn', NODE_ENV: 'test', SEED_DEMO: '1', UPLOADS_DIR: fs.mkdtempSync(path.join(os.tmpdir(), 'ligandry-browser-uploads-')) },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  child.stdout?.on('data', (d: Buffer) => (log += d.toString()));
  child.stderr?.on('data', (d: Buffer) => (log += d.toString()));
  globalThis.__ligandryBrowserServer = child;
  process.env.LIGANDRY_BROWSER_URL = url;
  process.env.LIGANDRY_BROWSER_DB = dbUrl;
  await waitHealthy(url, child, () => log);
}
