import { Router, type Request } from 'express';
import type { RouterDeps } from '../app';
import { declareRoutes } from '../middleware/access';
import { getFeed, suggestRacers } from '../services/feed';
import { followRacer, getFollowStatus, listFollows, unfollowRacer } from '../services/follows';
import { countUnread, listNotifications, markAllRead, markRead, registerNotificationHooks } from '../services/notifications';

const handleOf = (req: Request) => String(req.params.handle);

/** Follows, the activity feed and in-app notifications: all personal, so never cached by anyone else. */
export function followsRouter(deps: RouterDeps): Router {
  const router = Router();
  const r = declareRoutes(router, deps.routes, '/');
  const { db } = deps;
  registerNotificationHooks(db, deps.logger);
  router.use(['/feed', '/notifications', '/racers/:handle/follow'], (_req, res, next) => {
    res.set('Cache-Control', 'private, no-cache');
    next();
  });

  r.get('/racers/:handle/follow', 'public', async (req, res) => {
    res.json({ follow: await getFollowStatus(db, handleOf(req), req.user) });
  });
  r.post('/racers/:handle/follow', 'signedIn', async (req, res) => {
    res.json({ follow: await followRacer(db, req.user!, handleOf(req)) });
  });
  r.delete('/racers/:handle/follow', 'signedIn', async (req, res) => {
    res.json({ follow: await unfollowRacer(db, req.user!, handleOf(req)) });
  });
  r.get('/racers/:handle/followers', 'public', async (req, res) => {
    res.json(await listFollows(db, handleOf(req), 'followers', req.query.cursor));
  });
  r.get('/racers/:handle/following', 'public', async (req, res) => {
    res.json(await listFollows(db, handleOf(req), 'following', req.query.cursor));
  });

  r.get('/feed', 'signedIn', async (req, res) => {
    res.json(await getFeed(db, req.user!, req.query.cursor));
  });
  r.get('/feed/suggestions', 'signedIn', async (req, res) => {
    res.json(await suggestRacers(db, req.user!));
  });

  r.get('/notifications', 'signedIn', async (req, res) => {
    res.json(await listNotifications(db, req.user!, req.query.cursor));
  });
  r.get('/notifications/unread-count', 'signedIn', async (req, res) => {
    res.json({ unreadCount: await countUnread(db, req.user!) });
  });
  r.post('/notifications/read-all', 'signedIn', async (req, res) => {
    res.json({ unreadCount: await markAllRead(db, req.user!) });
  });
  r.post('/notifications/:id/read', 'signedIn', async (req, res) => {
    res.json({ unreadCount: await markRead(db, req.user!, Number(req.params.id)) });
  });

  return router;
}
