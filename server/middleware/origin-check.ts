import type { RequestHandler } from 'express';

import { HttpError } from '@/server/http-error';

const SAFE_METHODS = new Set(['GET', 'HEAD', 'OPTIONS']);

/**
 * Refuses state-changing requests sent by another site's page: the Origin header, when a browser
 * sends one, must name this host and port. Requests without Origin (scripts, the CLI) pass.
 */
export const originCheck: RequestHandler = (req, _res, next) => {
  if (SAFE_METHODS.has(req.method)) return next();
  const origin = req.get('origin');
  if (req.get('sec-fetch-site') === 'cross-site') {
    throw new HttpError(403, 'bad_origin', 'Cross-site requests may not change data.');
  }
  if (!origin) return next();
  let host: string;
  try {
    host = new URL(origin).host;
  } catch {
    throw new HttpError(403, 'bad_origin', 'The Origin header is not a valid URL.');
  }
  if (host !== req.get('host')) {
    throw new HttpError(403, 'bad_origin', `Requests from ${origin} may not change data here.`);
  }
  next();
};
