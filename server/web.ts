import fs from 'node:fs';
import path from 'node:path';

import compression from 'compression';
import express, { Router } from 'express';

/**
 * Serves the exported web app: static files, and index.html for any other GET that asks for a page,
 * so that client routes such as /team work on reload.
 */
export function webApp(distDir: string): Router {
  const router = Router();
  const indexHtml = path.join(distDir, 'index.html');
  // The bundle is 1.5 MB of JavaScript and about 0.4 MB gzipped: compress what the browser downloads.
  router.use(compression());
  router.use(
    express.static(distDir, {
      index: false,
      maxAge: '1h',
      setHeaders: (res, file) => {
        if (file.includes(`${path.sep}_expo${path.sep}`))
          res.setHeader('Cache-Control', 'public, max-age=31536000, immutable');
      },
    }),
  );
  router.get(/.*/, (req, res, next) => {
    if (!req.accepts('html')) return next();
    if (!fs.existsSync(indexHtml)) {
      res
        .status(503)
        .type('text/plain')
        .send('The web app has not been built yet. Run `npm start` (it builds it) or `npm run build:web`.');
      return;
    }
    res.setHeader('Cache-Control', 'no-cache');
    res.sendFile(indexHtml);
  });
  return router;
}
