import compression from 'compression';
import cors from 'cors';
import express, { Router, type Express, type Request } from 'express';
import helmet from 'helmet';
import { pinoHttp } from 'pino-http';
import { csrf } from './auth/csrf';
import { FAKE_GITHUB_MOUNT, fakeGithubRouter } from './auth/fakeGithub';
import { createPassport, type TunePassport } from './auth/passport';
import { SESSION_COOKIE, sessionMiddleware } from './auth/session';
import type { Config } from './config';
import type { Database } from './db/database';
import type { Logger } from './logger';
import { RouteTable } from './middleware/access';
import { apiNotFound, errorHandler } from './middleware/errorHandler';
import { jsonRateLimit } from './middleware/rateLimit';
import { adminRouter } from './routes/admin';
import { authRouter } from './routes/auth';
import { catalogRouter } from './routes/catalog';
import { commentsRouter } from './routes/comments';
import { trackDaysRouter } from './routes/trackDays';
import { followsRouter } from './routes/follows';
import { votesRouter } from './routes/votes';
import { mailPrefsRouter } from './routes/mailPrefs';
import { reportsRouter } from './routes/reports';
import { moderationRouter } from './routes/moderation';
import { devRouter } from './routes/dev';
import { garageRouter } from './routes/garage';
import { healthRouter } from './routes/health';
import { markdownRouter } from './routes/markdown';
import { meRouter } from './routes/me';
import { photosRouter } from './routes/photos';
import { racersRouter } from './routes/racers';
import { setupsRouter } from './routes/setups';
import type { Mailer } from './services/mail';
import { createStorage, type BlobStorage } from './storage';
import { webAppRouter } from './webApp';

/** `storage` defaults to the configured driver; tests pass their own. */
export type AppDeps = { config: Config; db: Database; logger: Logger; mailer: Mailer; storage?: BlobStorage };
/** What routers get: the app's dependencies plus its route table and passport instance. */
export type RouterDeps = AppDeps & { routes: RouteTable; passport: TunePassport; storage: BlobStorage };

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

const SAFE_METHODS = new Set(['GET', 'HEAD', 'OPTIONS']);

/**
 * Whether a request under /api needs its session: any write, anything under /auth (sign-in, the
 * CSRF token, OAuth), and any request that carries a session cookie. A read without one is anonymous.
 */
function needsSession(req: Request): boolean {
  // Routes match case-insensitively, so /AUTH/csrf is the CSRF route too.
  return !SAFE_METHODS.has(req.method) || req.path.toLowerCase().startsWith('/auth/') || (req.headers.cookie ?? '').includes(`${SESSION_COOKIE}=`);
}

function apiRouter(deps: RouterDeps): Router {
  const api = Router();
  if (deps.config.devWebOrigin) api.use(cors({ origin: deps.config.devWebOrigin, credentials: true }));
  api.use(jsonRateLimit({ ...deps.config.apiRateLimit, name: 'api' }));
  // Before JSON and sessions: photos need neither, and a cacheable image must never carry Set-Cookie.
  api.use('/photos', photosRouter(deps));
  api.use(express.json({ limit: deps.config.jsonBodyLimit }));
  // An anonymous read has no session to load or create: skipping the session machinery for it
  // (an id drawn and hashed per request, then thrown away) takes a few percent off every public page.
  const sessions = sessionMiddleware(deps.config, deps.db);
  const passportSession = deps.passport.session();
  api.use((req, res, next) => (needsSession(req) ? sessions(req, res, next) : next()));
  api.use(deps.passport.initialize());
  api.use((req, res, next) => (req.session ? passportSession(req, res, next) : next()));
  api.use(csrf.csrfSynchronisedProtection);
  api.use('/health', healthRouter(deps));
  api.use('/auth', authRouter(deps));
  api.use('/me', meRouter(deps));
  api.use('/racers', racersRouter(deps));
  api.use('/admin', adminRouter(deps));
  api.use('/setups', setupsRouter(deps));
  api.use('/markdown', markdownRouter(deps));
  api.use('/', commentsRouter(deps));
  api.use('/', trackDaysRouter(deps));
  api.use('/', followsRouter(deps));
  api.use('/', votesRouter(deps));
  api.use('/', mailPrefsRouter(deps));
  api.use('/', reportsRouter(deps));
  api.use('/', moderationRouter(deps));
  api.use('/', garageRouter(deps));
  if (deps.config.nodeEnv !== 'production') api.use('/dev', devRouter(deps));
  api.use('/', catalogRouter(deps));
  api.use(apiNotFound);
  return api;
}

/** Builds the Express app: middleware, /api, the web app, the error handler. Never listens. */
export function createApp(deps: AppDeps): Express {
  const routes = new RouteTable();
  const storage = deps.storage ?? createStorage(deps.config.storage);
  const routerDeps: RouterDeps = { ...deps, storage, routes, passport: createPassport(deps) };
  const app = express();
  app.disable('x-powered-by');
  // Behind one reverse proxy, trust exactly one hop of X-Forwarded-For (not any client's claim).
  app.set('trust proxy', deps.config.trustProxy ? 1 : false);
  app.locals.routeTable = routes;
  app.use(helmet({ contentSecurityPolicy: { useDefaults: false, directives: CONTENT_SECURITY_POLICY } }));
  app.use(compression());
  app.use(
    pinoHttp({
      logger: deps.logger,
      autoLogging: deps.config.logLevel !== 'silent',
      // One short line per request: no headers, so cookies and tokens never reach the logs.
      serializers: {
        req: (req: { method: string; url: string }) => ({ method: req.method, url: req.url.split('?')[0] }),
        res: (res: { statusCode: number }) => ({ statusCode: res.statusCode }),
      },
    }),
  );
  if (deps.config.github?.useFakeProvider) app.use(FAKE_GITHUB_MOUNT, fakeGithubRouter(deps.config));
  app.use('/api', apiRouter(routerDeps));
  app.use(webAppRouter(deps.config.webDistDir));
  app.use(errorHandler(deps.logger));
  return app;
}
