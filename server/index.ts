import type { Server } from 'node:http';

import { createDb } from '@/db/client';
import { describePrepare, prepareDatabase, prepareDemoDatabase } from '@/db/prepare';
import { createApp } from '@/server/app';
import { startFakeSmtp, type FakeSmtp } from '@/server/mail/fake-smtp';
import { createMailer, type Mailer } from '@/server/mail/mailer';
import { ConfigError, parseEnv } from '@/server/env';
import { createLogger } from '@/server/logger';
import { APP_VERSION } from '@/server/version';

// How long open requests get to finish after SIGTERM before connections are cut, in milliseconds.
const SHUTDOWN_GRACE_MS = 10_000;

function fail(message: string): never {
  process.stderr.write(`\n${message}\n\n`);
  process.exit(1);
}

function describeDbFailure(err: unknown, url: string): string {
  // Drizzle wraps the driver's error; the useful code (ECONNREFUSED, 28P01...) is on its cause.
  const outer = err as { cause?: unknown };
  const e = (outer.cause ?? err) as { code?: string; message?: string };
  let where = 'the configured address';
  try {
    const u = new URL(url);
    where = `${u.hostname}:${u.port || '5432'}`;
  } catch {
    // the URL was already validated by the env schema; keep the generic wording
  }
  return [
    `Cannot reach PostgreSQL at ${where}: ${[e.code, e.message].filter(Boolean).join(' ') || 'unknown error'}.`,
    'Start it with `npm run db:start` (or use `npm start`, which starts it);',
    'its log is .data/pg-log/postgres.log.',
  ].join('\n');
}

async function main(): Promise<void> {
  let env;
  try {
    env = parseEnv();
  } catch (err) {
    if (err instanceof ConfigError) fail(err.message);
    throw err;
  }
  const logger = createLogger(env.LOG_LEVEL);

  try {
    if (env.SEED_DEMO) {
      process.stdout.write(describePrepare(await prepareDemoDatabase(env.DATABASE_URL, env.UPLOADS_DIR)));
    } else {
      process.stdout.write(describePrepare(await prepareDatabase(env.DATABASE_URL, { demo: false })));
    }
  } catch (err) {
    fail(describeDbFailure(err, env.DATABASE_URL));
  }

  const db = createDb(env.DATABASE_URL);
  let fakeSmtp: FakeSmtp | null = null;
  let mailer: Mailer | null = null;
  if (env.SMTP_URL) {
    mailer = createMailer(env.SMTP_URL, env.MAIL_FROM);
  } else if (env.NODE_ENV !== 'production') {
    try {
      fakeSmtp = await startFakeSmtp(db.db, { port: env.LOCAL_SMTP_PORT });
    } catch (err) {
      fail(`The local mail server could not listen on 127.0.0.1:${env.LOCAL_SMTP_PORT}: ${(err as Error).message}. Set LOCAL_SMTP_PORT to a free port (0 picks one).`);
    }
    mailer = createMailer(fakeSmtp.url, env.MAIL_FROM);
    logger.info({ port: fakeSmtp.port }, 'local mail server: messages are kept for the outbox screen');
  } else {
    logger.warn('SMTP_URL is not set: invitations and password links cannot be mailed');
  }
  const app = createApp({
    db,
    logger,
    version: APP_VERSION,
    webDir: env.WEB_DIR,
    uploadsDir: env.UPLOADS_DIR,
    jsonLimit: env.JSON_LIMIT,
    mailer,
    outbox: fakeSmtp !== null,
    publicUrl: env.PUBLIC_URL,
    // Served over HTTPS (a TLS proxy in front): Secure cookie, HSTS.
    https: env.PUBLIC_URL?.startsWith('https://') === true,
    signInLimits: { perAccount: env.SIGNIN_LIMIT_ACCOUNT, perIp: env.SIGNIN_LIMIT_IP, windowMinutes: env.SIGNIN_WINDOW_MINUTES },
  });
  const server: Server = app.listen(env.PORT, env.HOST);

  server.on('error', (err: NodeJS.ErrnoException) => {
    if (err.code === 'EADDRINUSE') {
      fail(`Port ${env.PORT} on ${env.HOST} is taken by another program. Stop it, or start with PORT=<free port>.`);
    }
    if (err.code === 'EACCES') fail(`Not allowed to listen on ${env.HOST}:${env.PORT}. Choose a port above 1024.`);
    fail(`The server could not listen on ${env.HOST}:${env.PORT}: ${err.message}`);
  });

  server.on('listening', () => {
    const address = server.address();
    const port = typeof address === 'object' && address ? address.port : env.PORT;
    logger.info({ port, version: APP_VERSION }, 'listening');
    process.stdout.write(`\nLigandry ${APP_VERSION} is running at http://${env.HOST}:${port}\n\n`);
  });

  let stopping = false;
  const shutdown = (signal: string) => {
    if (stopping) process.exit(1);
    stopping = true;
    logger.info({ signal }, 'shutting down');
    setTimeout(() => server.closeAllConnections(), SHUTDOWN_GRACE_MS);
    server.close(() => {
      mailer?.close();
      Promise.all([fakeSmtp?.close(), db.close()]).finally(() => process.exit(0));
    });
    server.closeIdleConnections();
  };
  process.on('SIGTERM', () => shutdown('SIGTERM'));
  process.on('SIGINT', () => shutdown('SIGINT'));
}

main().catch((err) => {
  process.stderr.write(`Ligandry failed to start: ${err instanceof Error ? err.stack : String(err)}\n`);
  process.exit(1);
});
