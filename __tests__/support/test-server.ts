// Runs createApp() on its own loopback port per test file, with an agent that sends a matching Origin.
import fs from 'node:fs';
import type { Server } from 'node:http';
import os from 'node:os';
import path from 'node:path';

import type { Express } from 'express';
import request from 'supertest';

import { createDb, type DbHandle } from '@/db/client';
import { seedLibrary } from '@/db/seed/library';
import { createApp } from '@/server/app';
import type { SignInLimits } from '@/server/auth/context';
import { createLogger } from '@/server/logger';
import { type FakeSmtp, startFakeSmtp } from '@/server/mail/fake-smtp';
import { createMailer } from '@/server/mail/mailer';

import { createTestDatabase, dropTestDatabase } from './test-db';

export type TestServer = {
  app: Express;
  /** Where this server keeps bath attachments (a temporary folder, removed on close). */
  uploadsDir: string;
  server: Server;
  origin: string;
  db: DbHandle;
  webDir: string;
  /** The local fake SMTP server; its messages land in outbox_messages. */
  smtp: FakeSmtp;
  agent: () => ReturnType<typeof request.agent>;
  close: () => Promise<void>;
};

/**
 * Starts the app against DATABASE_URL (or `dbUrl`) with a throwaway web build folder.
 * `ownDatabase`: a fresh migrated database for this file alone, dropped on close, for suites whose
 * requests change what every suite reads (new thresholds versions, retired library constants).
 */
export async function startTestServer(
  options: { dbUrl?: string; ownDatabase?: boolean; webDir?: string; uploadsDir?: string; signInLimits?: SignInLimits; outbox?: boolean } = {},
): Promise<TestServer> {
  const own = options.ownDatabase ? await createTestDatabase('ligandry_own') : null;
  const url = own ?? options.dbUrl ?? process.env.DATABASE_URL;
  if (!url) throw new Error('DATABASE_URL is not set: the server project global setup makes it.');
  const db = createDb(url, { max: 4, connectTimeoutS: 2 });
  const ownWebDir = !options.webDir;
  const webDir = options.webDir ?? fs.mkdtempSync(path.join(os.tmpdir(), 'ligandry-web-'));
  // The starting constants library, as every start loads it (once per database).
  await seedLibrary(db.db);
  const ownUploads = !options.uploadsDir;
  const uploadsDir = options.uploadsDir ?? fs.mkdtempSync(path.join(os.tmpdir(), 'ligandry-uploads-'));
  const smtp = await startFakeSmtp(db.db);
  const mailer = createMailer(smtp.url, 'Ligandry test <no-reply@ligandry.test>');
  let origin = '';
  const app = createApp({
    db,
    logger: createLogger('silent'),
    version: '0.0.0-test',
    webDir,
    uploadsDir,
    mailer,
    outbox: options.outbox ?? true,
    publicUrl: () => origin,
    ...(options.signInLimits ? { signInLimits: options.signInLimits } : {}),
  });
  const server = app.listen(0, '127.0.0.1');
  await new Promise<void>((resolve) => server.once('listening', () => resolve()));
  const address = server.address();
  if (!address || typeof address === 'string') throw new Error('test server has no port');
  origin = `http://127.0.0.1:${address.port}`;
  return {
    app,
    uploadsDir,
    server,
    origin,
    db,
    webDir,
    smtp,
    agent: () => request.agent(server).set('Origin', origin),
    close: async () => {
      server.closeAllConnections();
      await new Promise<void>((resolve) => server.close(() => resolve()));
      mailer.close();
      await smtp.close();
      await db.close();
      if (own) await dropTestDatabase(own);
      if (ownWebDir) fs.rmSync(webDir, { recursive: true, force: true });
      if (ownUploads) fs.rmSync(uploadsDir, { recursive: true, force: true });
    },
  };
}

/** One folder per test database for the demo seed's files, so every test file that seeds the demo shop finds them. */
export function demoUploadsDir(): string {
  const name = new URL(process.env.DATABASE_URL as string).pathname.slice(1);
  const dir = path.join(os.tmpdir(), `${name}-demo-uploads`);
  fs.mkdirSync(dir, { recursive: true });
  return dir;
}
