import path from 'node:path';

import express, { Router } from 'express';

const NOT_BUILT = `<!doctype html><html lang="en"><meta charset="utf-8"><title>Ligandry</title>
<body style="font-family:sans-serif;max-width:36rem;margin:3rem auto;padding:0 1rem">
<h1>The web app is not built yet</h1><p>Run <code>npm start</code>, which builds it, or
<code>npm run build:web</code>. The API under /api works meanwhile.</p></body></html>`;

/** Serves the exported web app; any other GET that wants HTML gets index.html so client routes load. */
export function webRouter(webDir: string): Router {
  const router = Router();
  const indexFile = path.join(webDir, 'index.html');
  // Expo's exported bundles carry a content hash in their names, so they can be cached for good.
  router.use(
    '/_expo',
    express.static(path.join(webDir, '_expo'), { immutable: true, maxAge: '365d', fallthrough: true }),
  );
  router.use(express.static(webDir, { index: false, maxAge: '1h' }));
  router.get('/{*splat}', (req, res, next) => {
    if (!req.accepts('html')) return next();
    res.set('Cache-Control', 'no-cache').sendFile(indexFile, (err?: NodeJS.ErrnoException) => {
      if (!err) return;
      if (err.code === 'ENOENT' && !res.headersSent) res.status(503).type('html').send(NOT_BUILT);
      else next(err);
    });
  });
  return router;
}
