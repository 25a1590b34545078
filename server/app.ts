import compression from 'compression';
import cors from 'cors';
import express, { Router, type Express } from 'express';
import helmet from 'helmet';
import { pinoHttp } from 'pino-http';
import type { Config } from './config';
import type { Database } from './db/database';
import type { Logger } from './logger';
import { apiNotFound, errorHandler } from './middleware/errorHandler';
import { jsonRateLimit } from './middleware/rateLimit';
import { catalogRouter } from './routes/catalog';
import { healthRouter } from './routes/health';
import { webAppRouter } from './webApp';

export type AppDeps = { config: Config; db: Database; logger: Logger };

/**
 * The Content-Security-Policy the exported web app runs under. React Native Web writes its
 * styles into <style> tags at run time, hence 'unsafe-inline' for styles only; scripts are
 * same-origin files.
 */
export const CONTENT_SECURITY_POLICY = {
  defaultSrc: ["'self'"],
  scriptSrc: ["'self'"],
  styleSrc: ["'self'", "'unsafe-inline'"],
  imgSrc: ["'self'", 'data:', 'blob:'],
  fontSrc: ["'self'", 'data:'],
  connectSrc: ["'self'"],
  objectSrc: ["'none'"],
  baseUri: ["'self'"],
  formAction: ["'self'"],
  frameAncestors: ["'none'"],
  upgradeInsecureRequests: null,
};

function apiRouter(deps: AppDeps): Router {
  const api = Router();
  if (deps.config.devWebOrigin) api.use(cors({ origin: deps.config.devWebOrigin, credentials: true }));
  api.use(jsonRateLimit(deps.config.apiRateLimit));
  api.use(express.json({ limit: deps.config.jsonBodyLimit }));
  api.use('/health', healthRouter(deps));
  api.use('/', catalogRouter(deps));
  api.use(apiNotFound);
  return api;
}

/** Builds the Express app: middleware, /api, the web app, the error handler. Never listens. */
export function createApp(deps: AppDeps): Express {
  const app = express();
  app.disable('x-powered-by');
  app.set('trust proxy', deps.config.trustProxy);
  app.use(helmet({ contentSecurityPolicy: { useDefaults: false, directives: CONTENT_SECURITY_POLICY } }));
  app.use(compression());
  app.use(
    pinoHttp({
      logger: deps.logger,
      autoLogging: deps.config.logLevel !== 'silent',
      // One short line per request: no headers, so cookies and tokens never reach the logs.
      serializers: {
        req: (req: { method: string; url: string }) => ({ method: req.method, url: req.url }),
        res: (res: { statusCode: number }) => ({ statusCode: res.statusCode }),
      },
    }),
  );
  app.use('/api', apiRouter(deps));
  app.use(webAppRouter(deps.config.webDistDir));
  app.use(errorHandler(deps.logger));
  return app;
}
