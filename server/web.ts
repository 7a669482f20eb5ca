import fs from 'node:fs';
import path from 'node:path';

import compression from 'compression';
import { Router } from 'express';
import expressStaticGzip from 'express-static-gzip';

/**
 * Serves the exported web app: static files, and index.html for any other GET that asks for a page,
 * so that client routes such as /team work on reload. The build writes Brotli and gzip copies of every text file
 * (server/cli/build-web.ts): a browser gets the smallest it accepts, as it is, with no work per request. Hashed
 * files under /_expo/ never change and are cached for a year; the rest for an hour.
 */
export function webApp(distDir: string): Router {
  const router = Router();
  const indexHtml = path.join(distDir, 'index.html');
  // Whatever has no precompressed copy (index.html, a file added by hand) is compressed as it goes; a response that
  // already carries its encoding is left alone.
  router.use(compression());
  router.use(
    expressStaticGzip(distDir, {
      enableBrotli: true,
      orderPreference: ['br', 'gz'],
      index: false,
      serveStatic: {
        index: false,
        maxAge: '1h',
        setHeaders: (res, file) => {
          if (file.includes(`${path.sep}_expo${path.sep}`))
            res.setHeader('Cache-Control', 'public, max-age=31536000, immutable');
        },
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
