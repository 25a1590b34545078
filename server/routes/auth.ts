import { Router, type NextFunction, type Request, type Response } from 'express';
import {
  emailOnlyRequestSchema,
  resetPasswordRequestSchema,
  signInRequestSchema,
  signUpRequestSchema,
  tokenRequestSchema,
} from '../../shared/types/auth';
import { csrf } from '../auth/csrf';
import type { RouterDeps } from '../app';
import { ApiError } from '../errors';
import { declareRoutes } from '../middleware/access';
import { jsonRateLimit } from '../middleware/rateLimit';
import { toMe } from '../services/accountDto';
import { requestPasswordReset, resendVerification, resetPassword, signUp, verifyEmail } from '../services/accounts';

type GithubIntent = { mode: 'signin' | 'link'; next: string };
type IntentSession = { githubIntent?: GithubIntent };

/** Only same-site paths: never redirect a racer to another site after sign-in. */
export function safeNextPath(next: unknown, fallback = '/'): string {
  return typeof next === 'string' && /^\/(?!\/)[^\\\s]*$/.test(next) ? next : fallback;
}

function logIn(req: Request, user: Express.User): Promise<void> {
  return new Promise((resolve, reject) => req.login(user, (err) => (err ? reject(err) : resolve())));
}

async function signedInResponse(req: Request, res: Response, user: Express.User, status: number) {
  await logIn(req, user); // passport regenerates the session id here: no fixation
  res.status(status).json({ user: toMe(user), csrfToken: csrf.generateToken(req, true) });
}

export function authRouter(deps: RouterDeps): Router {
  const router = Router();
  const r = declareRoutes(router, deps.routes, '/auth');
  const limit = jsonRateLimit({ ...deps.config.authRateLimit, name: 'auth' });

  r.get('/csrf', 'public', (req, res) => {
    res.set('Cache-Control', 'no-store').json({ csrfToken: csrf.generateToken(req) });
  });

  r.post('/sign-up', 'public', limit, async (req, res) => {
    const user = await signUp(deps, signUpRequestSchema.parse(req.body));
    await signedInResponse(req, res, user, 201);
  });

  r.post('/sign-in', 'public', limit, (req, res, next) => {
    signInRequestSchema.parse(req.body);
    deps.passport.authenticate('local', { session: false }, (err: unknown, user: Express.User | false) => {
      if (err) return next(err);
      if (!user) return next(new ApiError(401, 'invalid_credentials', 'That e-mail, handle or password is not right.'));
      signedInResponse(req, res, user, 200).catch(next);
    })(req, res, next);
  });

  r.post('/sign-out', 'public', (req, res, next) => {
    req.logout((err) => {
      if (err) return next(err);
      req.session.destroy((destroyErr) => {
        if (destroyErr) return next(destroyErr);
        res.clearCookie('tunefork.sid', { path: '/' }).status(204).end();
      });
    });
  });

  r.post('/verify-email', 'public', async (req, res) => {
    await verifyEmail(deps, tokenRequestSchema.parse(req.body).token);
    res.json({ message: 'Your e-mail address is confirmed. Thanks!' });
  });

  r.post('/resend-verification', 'public', limit, async (req, res) => {
    res.status(202).json({ message: await resendVerification(deps, emailOnlyRequestSchema.parse(req.body).email) });
  });

  r.post('/forgot-password', 'public', limit, async (req, res) => {
    res.status(202).json({ message: await requestPasswordReset(deps, emailOnlyRequestSchema.parse(req.body).email) });
  });

  r.post('/reset-password', 'public', limit, async (req, res) => {
    const { token, password } = resetPasswordRequestSchema.parse(req.body);
    await resetPassword(deps, token, password);
    res.json({ message: 'Your password is changed. Sign in with the new one; other sessions were signed out.' });
  });

  githubRoutes(deps, r);
  return router;
}

function githubRoutes(deps: RouterDeps, r: ReturnType<typeof declareRoutes>): void {
  const requireGithub = (_req: Request, _res: Response, next: NextFunction) =>
    next(deps.config.github ? undefined : new ApiError(404, 'github_disabled', 'GitHub sign-in is not set up on this server.'));
  const start = (mode: GithubIntent['mode']) => (req: Request, res: Response, next: NextFunction) => {
    (req.session as typeof req.session & IntentSession).githubIntent = {
      mode,
      next: safeNextPath(req.query.next, mode === 'link' ? '/settings' : '/'),
    };
    deps.passport.authenticate('github')(req, res, next);
  };

  r.get('/github', 'public', requireGithub, start('signin'));
  r.get('/github/link', 'signedIn', requireGithub, start('link'));
  r.get('/github/callback', 'public', requireGithub, (req, res, next) => {
    const intent = (req.session as typeof req.session & IntentSession).githubIntent ?? { mode: 'signin', next: '/' };
    const fail = (message: string) =>
      res.redirect(303, `${intent.mode === 'link' ? '/settings' : '/sign-in'}?error=${encodeURIComponent(message)}`);
    if (typeof req.query.error === 'string') return fail('GitHub sign-in was cancelled.');
    deps.passport.authenticate('github', (err: unknown, user: Express.User | false) => {
      if (err instanceof ApiError) return fail(err.message);
      if (err || !user) {
        deps.logger.warn({ err }, 'GitHub sign-in failed');
        return fail('GitHub sign-in did not complete. Try again.');
      }
      logIn(req, user).then(
        () => res.redirect(303, intent.mode === 'link' ? `${intent.next}?linked=github` : intent.next),
        next,
      );
    })(req, res, next);
  });
}
