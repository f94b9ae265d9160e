import type { AddressInfo } from 'node:net';

import { simpleParser } from 'mailparser';
import { SMTPServer } from 'smtp-server';

import type { Db } from '@/db/client';
import { outboxMessages } from '@/db/schema';

/** Largest message the fake server accepts, bytes. */
const MAX_MESSAGE_BYTES = 1_000_000;

export type FakeSmtp = { port: number; url: string; close: () => Promise<void> };

/**
 * A local SMTP server on loopback for development and tests: it accepts every message and stores
 * it in outbox_messages, where admins read it on the outbox screen. Never used when SMTP_URL is set.
 */
export async function startFakeSmtp(db: Db, options: { port?: number; onStored?: (id: number) => void } = {}): Promise<FakeSmtp> {
  const server = new SMTPServer({
    secure: false,
    authOptional: true,
    disabledCommands: ['STARTTLS', 'AUTH'],
    size: MAX_MESSAGE_BYTES,
    banner: 'Ligandry local outbox (development only)',
    logger: false,
    onData(stream, session, callback) {
      const chunks: Buffer[] = [];
      stream.on('data', (chunk: Buffer) => chunks.push(chunk));
      stream.on('end', () => {
        if (stream.sizeExceeded) {
          callback(Object.assign(new Error('Message too large'), { responseCode: 552 }));
          return;
        }
        const raw = Buffer.concat(chunks).toString('utf8');
        simpleParser(raw)
          .then(async (parsed) => {
            const from = session.envelope.mailFrom ? session.envelope.mailFrom.address : '';
            const to = session.envelope.rcptTo.map((r) => r.address);
            const [row] = await db
              .insert(outboxMessages)
              .values({ envelopeFrom: from, envelopeTo: to, subject: parsed.subject ?? '', text: parsed.text ?? '', raw })
              .returning({ id: outboxMessages.id });
            if (row) options.onStored?.(row.id);
            callback();
          })
          .catch((err: Error) => callback(Object.assign(new Error(`Could not store the message: ${err.message}`), { responseCode: 451 })));
      });
    },
  });
  server.on('error', () => {
    // A client that drops the connection is not the server's problem; nothing to do.
  });
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(options.port ?? 0, '127.0.0.1', () => resolve());
  });
  const port = (server.server.address() as AddressInfo).port;
  return {
    port,
    url: `smtp://127.0.0.1:${port}`,
    close: () => new Promise<void>((resolve) => server.close(() => resolve())),
  };
}
