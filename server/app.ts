import express, { type Express } from 'express';
import helmet from 'helmet';
import type pino from 'pino';
import { pinoHttp } from 'pino-http';

import type { DbHandle } from '@/db/client';
import { assertEveryRouteDeclared } from '@/server/auth/access';
import { type AuthContext, DEFAULT_SIGN_IN_LIMITS, limiters, type SignInLimits } from '@/server/auth/context';
import { createLucia } from '@/server/auth/lucia';
import { authRouter } from '@/server/auth/routes';
import { sessionMiddleware } from '@/server/auth/session';
import { teamRouter } from '@/server/auth/team-routes';
import type { Mailer } from '@/server/mail/mailer';
import { outboxRouter } from '@/server/mail/outbox-routes';
import { bodyGuard } from '@/server/middleware/body-guard';
import { apiNotFound, errorHandler } from '@/server/middleware/error-handler';
import { originCheck } from '@/server/middleware/origin-check';
import { libraryRouter } from '@/server/library/routes';
import { runsRouter } from '@/server/library/runs-routes';
import { bathsRouter } from '@/server/baths/routes';
import { safetyRouter } from '@/server/safety/routes';
import { healthRouter } from '@/server/routes/health';
import { webRouter } from '@/server/static';

/** What the app needs from outside; tests pass their own database and a silent logger. */
export type AppOptions = {
  db: DbHandle;
  logger: pino.Logger;
  version: string;
  /** Folder of the exported web app (index.html and _expo/). */
  webDir: string;
  /** Folder for uploaded bath attachments (created when missing). */
  uploadsDir: string;
  /** Largest accepted JSON body, as body-parser writes it ("100kb"). */
  jsonLimit?: string;
  /** Send HSTS and upgrade-insecure-requests, and mark the session cookie Secure (only when served over HTTPS). */
  https?: boolean;
  /** How mail leaves (null or absent: it cannot; invitations and reset links are then not mailed). */
  mailer?: Mailer | null;
  /** True when mail goes to the local fake SMTP server, whose messages admins read on the outbox screen. */
  outbox?: boolean;
  /** Base URL for links in mail (PUBLIC_URL); default: the scheme and Host of the request. */
  publicUrl?: string | (() => string);
  signInLimits?: SignInLimits;
};

/** Mailed links carry one-time tokens: keep them out of the request log. */
function redactTokens(url: string): string {
  return url.replace(/(\/(?:invitations|password-resets|welcome|new-password)\/)[A-Za-z0-9_-]{20,}/g, '$1[token]');
}

declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace
  namespace Express {
    // Per-request state shared by middleware and handlers; the session joins it with sign-in.
    interface Locals {
      startedAt?: number;
    }
  }
}

/** Builds the Express app (no listen): security headers, logging, body limit, origin check, body guard, /api, web app, errors. */
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
        req: (req: { method: string; url: string }) => ({ method: req.method, url: redactTokens(req.url) }),
        res: (res: { statusCode: number }) => ({ status: res.statusCode }),
      },
      customLogLevel: (_req, res, err) => (err || res.statusCode >= 500 ? 'error' : 'info'),
    }),
  );
  app.use(express.json({ limit: options.jsonLimit ?? '100kb' }));
  app.use(originCheck);
  app.use(bodyGuard);

  const lucia = createLucia(options.db.db, { secure: options.https === true });
  const { publicUrl } = options;
  const auth: AuthContext = {
    db: options.db.db,
    lucia,
    mailer: options.mailer ?? null,
    outbox: options.outbox === true,
    logger: options.logger,
    publicUrl: (req) => {
      const base = typeof publicUrl === 'function' ? publicUrl() : publicUrl;
      return (base ?? `${req.protocol}://${req.get('host')}`).replace(/\/+$/, '');
    },
    ...limiters(options.signInLimits ?? DEFAULT_SIGN_IN_LIMITS),
  };

  const api = express.Router();
  api.use(healthRouter(options.db, options.version));
  api.use(sessionMiddleware(lucia));
  api.use(authRouter(auth));
  api.use(teamRouter(auth));
  api.use(outboxRouter(auth));
  api.use(libraryRouter(auth));
  api.use(runsRouter(auth));
  api.use(bathsRouter(auth, options.uploadsDir));
  api.use(safetyRouter(auth));
  api.use(apiNotFound);
  app.use('/api', api);

  app.use(webRouter(options.webDir));
  app.use(apiNotFound);
  app.use(errorHandler);
  // Deny by default: an /api route that does not say who may call it stops the app from being built.
  assertEveryRouteDeclared(app);
  return app;
}
