import { Router } from 'express';
import { emailChangeRequestSchema, passwordChangeRequestSchema, profileUpdateSchema } from '../../shared/types/auth';
import type { RouterDeps } from '../app';
import { declareRoutes } from '../middleware/access';
import { toMe } from '../services/accountDto';
import { changePassword, requestEmailChange, updateProfile } from '../services/accounts';
import { unlinkGithub } from '../services/githubAccounts';
import { destroySessionsOf } from '../services/sessions';

export function meRouter(deps: RouterDeps): Router {
  const router = Router();
  const r = declareRoutes(router, deps.routes, '/me');

  r.get('/', 'public', (req, res) => {
    res.set('Cache-Control', 'no-store').json({ user: req.user ? toMe(req.user) : null });
  });

  r.patch('/profile', 'signedIn', async (req, res) => {
    const user = await updateProfile(deps, req.user!, profileUpdateSchema.parse(req.body));
    res.json({ user: toMe(user) });
  });

  r.post('/email', 'signedIn', async (req, res) => {
    const { email, password } = emailChangeRequestSchema.parse(req.body);
    res.status(202).json({ message: await requestEmailChange(deps, req.user!, email, password) });
  });

  r.post('/password', 'signedIn', async (req, res) => {
    const { currentPassword, newPassword } = passwordChangeRequestSchema.parse(req.body);
    await changePassword(deps, req.user!, req.sessionID, currentPassword, newPassword);
    res.json({ message: 'Password changed. Your other sessions were signed out.' });
  });

  r.post('/sign-out-everywhere', 'signedIn', async (req, res) => {
    await destroySessionsOf(deps.db, req.user!.id);
    res.clearCookie('tunefork.sid', { path: '/' }).status(204).end();
  });

  r.delete('/github', 'signedIn', async (req, res) => {
    res.json({ user: toMe(await unlinkGithub(req.user!)) });
  });
  return router;
}
