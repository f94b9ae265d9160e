import express, { type Express } from 'express';
import helmet from 'helmet';
import type pino from 'pino';
import { pinoHttp } from 'pino-http';

import type { DbHandle } from '@/db/client';
import { apiNotFound, errorHandler } from '@/server/middleware/error-handler';
import { originCheck } from '@/server/middleware/origin-check';
import { healthRouter } from '@/server/routes/health';
import { webRouter } from '@/server/static';

/** What the app needs from outside; tests pass their own database and a silent logger. */
export type AppOptions = {
  db: DbHandle;
  logger: pino.Logger;
  version: string;
  /** Folder of the exported web app (index.html and _expo/). */
  webDir: string;
  /** Largest accepted JSON body, as body-parser writes it ("100kb"). */
  jsonLimit?: string;
  /** Send HSTS and upgrade-insecure-requests (only when served over HTTPS). */
  https?: boolean;
};

declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace
  namespace Express {
    // Per-request state shared by middleware and handlers; the session joins it with sign-in.
    interface Locals {
      startedAt?: number;
    }
  }
}

/** Builds the Express app (no listen): security headers, logging, body limit, origin check, /api, web app, errors. */
export function createApp(options: AppOptions): Express {
  const app = express();
  app.disable('x-powered-by');
  app.set('trust proxy', 'loopback');

  app.use(
    helmet({
      contentSecurityPolicy: {
        useDefaults: true,
        directives: {
          'script-src': ["'self'"],
          // react-native-web writes its styles into <style> tags at run time.
          'style-src': ["'self'", "'unsafe-inline'"],
          'img-src': ["'self'", 'data:', 'blob:'],
          'font-src': ["'self'", 'data:'],
          'connect-src': ["'self'"],
          'frame-ancestors': ["'none'"],
          'upgrade-insecure-requests': options.https ? [] : null,
        },
      },
      strictTransportSecurity: options.https ? undefined : false,
    }),
  );
  app.use(
    pinoHttp({
      logger: options.logger,
      autoLogging: { ignore: (req) => req.url === '/api/health' },
      // One short line per request: method, path and status; headers (and cookies) stay out of logs.
      serializers: {
        req: (req: { method: string; url: string }) => ({ method: req.method, url: req.url }),
        res: (res: { statusCode: number }) => ({ status: res.statusCode }),
      },
      customLogLevel: (_req, res, err) => (err || res.statusCode >= 500 ? 'error' : 'info'),
    }),
  );
  app.use(express.json({ limit: options.jsonLimit ?? '100kb' }));
  app.use(originCheck);

  const api = express.Router();
  api.use(healthRouter(options.db, options.version));
  api.use(apiNotFound);
  app.use('/api', api);

  app.use(webRouter(options.webDir));
  app.use(apiNotFound);
  app.use(errorHandler);
  return app;
}
