import cookieParser from 'cookie-parser';
import cors from 'cors';
import express, { type Express, type RequestHandler, Router } from 'express';
import helmet from 'helmet';
import { pinoHttp } from 'pino-http';

import { config } from './config';
import { logger } from './logger';
import { apiNotFound, errorHandler } from './middleware/errors';
import { sameOriginOnly } from './middleware/same-origin';
import { authRouter } from './routes/auth';
import { batchesRouter } from './routes/batches';
import { benchRouter } from './routes/bench';
import { bottleFormatsRouter } from './routes/bottle-formats';
import { calculationsRouter } from './routes/calculations';
import { healthRouter } from './routes/health';
import { attachmentsRouter, ingredientsRouter } from './routes/ingredients';
import { outboxRouter } from './routes/outbox';
import { organisationRouter, profileRouter } from './routes/profile';
import { recipesRouter } from './routes/recipes';
import { teamRouter } from './routes/team';
import { webApp } from './web';

/** Every API route, mounted under /api. Each route's first handler is `allow(...)`, which says who may call it. */
export function apiRouter(): Router {
  const api = Router();
  api.use('/health', healthRouter);
  api.use('/auth', authRouter);
  api.use('/team', teamRouter);
  api.use('/profile', profileRouter);
  api.use('/organisation', organisationRouter);
  api.use('/outbox', outboxRouter);
  api.use('/calculations', calculationsRouter);
  api.use('/bottle-formats', bottleFormatsRouter);
  api.use('/ingredients', ingredientsRouter);
  api.use('/attachments', attachmentsRouter);
  api.use('/recipes', recipesRouter);
  api.use('/batches', batchesRouter);
  if (config.benchRoutes) api.use('/bench', benchRouter);
  return api;
}

/** Answers of the API are about one person at one moment: no browser or proxy keeps them. */
const noStore: RequestHandler = (_req, res, next) => {
  res.setHeader('Cache-Control', 'no-store');
  next();
};

/** A request's URL for the logs, with one-time link tokens (in a query or an invitation path) hidden. */
export function redactUrl(url: string): string {
  return url
    .replace(/([?&]token=)[^&#]*/gi, '$1[hidden]')
    .replace(/(\/invitations\/)(?!\d+(?:\/|$))[^/?#]+/g, '$1[hidden]');
}

/** Builds the Express app (API under /api plus the exported web app) without listening. */
export function createApp(): Express {
  const app = express();
  app.disable('x-powered-by');
  // API answers are computed per request and never revalidated; hashing every body for an ETag is wasted work.
  app.set('etag', false);
  // X-Forwarded-* headers are believed only when TRUST_PROXY says which proxy sends them.
  app.set('trust proxy', config.trustProxy);
  app.use(
    helmet({
      // The exported app loads its fonts and images from this origin; RN Web injects style rules at run time.
      contentSecurityPolicy: {
        directives: { 'img-src': ["'self'", 'data:', 'blob:'], 'upgrade-insecure-requests': null },
      },
      strictTransportSecurity: config.appUrl.startsWith('https://'),
    }),
  );
  if (config.env !== 'test') {
    app.use(
      pinoHttp({
        logger,
        autoLogging: { ignore: (req) => !req.url?.startsWith('/api') },
        serializers: {
          req: (req: { method: string; url: string }) => ({ method: req.method, url: redactUrl(req.url) }),
          res: (res: { statusCode: number }) => ({ status: res.statusCode }),
        },
      }),
    );
  }

  const api = Router();
  // Only `npm run dev` names other origins (the Expo dev server); `npm start` answers its own pages only.
  if (config.corsOrigins.length > 0) api.use(cors({ origin: config.corsOrigins, credentials: true }));
  api.use(noStore);
  api.use(sameOriginOnly);
  api.use(express.json({ limit: '200kb' }));
  api.use(cookieParser());
  api.use(apiRouter());
  api.use(apiNotFound);
  app.use('/api', api);
  app.use(webApp(config.webDistDir));
  app.use(errorHandler);
  return app;
}
