import type { RequestHandler, Router } from 'express';
import { ERROR_CODES } from '../../shared/types/errors';
import { ApiError } from '../errors';

/**
 * Who may call a route:
 * - public: anyone, signed in or not
 * - signedIn: any signed-in racer who is not suspended
 * - moderator: moderators and admins
 * - admin: admins only
 */
export type Access = 'public' | 'signedIn' | 'moderator' | 'admin';

export type RouteSpec = { method: 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE'; path: string; access: Access };

const RANK: Record<'racer' | 'moderator' | 'admin', number> = { racer: 0, moderator: 1, admin: 2 };

/** The one role check. Anonymous callers get 401, signed-in callers without the role 403. */
export function requireAccess(access: Access): RequestHandler {
  return (req, _res, next) => {
    if (access === 'public') return next();
    if (!req.user) {
      return next(new ApiError(401, ERROR_CODES.unauthenticated, 'Sign in to do that.'));
    }
    const needed = access === 'signedIn' ? 0 : RANK[access];
    if (RANK[req.user.role as keyof typeof RANK] < needed) {
      return next(new ApiError(403, ERROR_CODES.forbidden, access === 'admin' ? 'Only admins can do that.' : 'Only moderators can do that.'));
    }
    next();
  };
}

/** Every /api route of one app, with the access it declared; the route×role test reads it. */
export class RouteTable {
  readonly routes: RouteSpec[] = [];
}

type Method = 'get' | 'post' | 'put' | 'patch' | 'delete';

/**
 * Declares routes on `router` (mounted at `mountPath` under /api) so that each one states who may
 * call it: the access check is always the first handler, and the route is recorded in `table`.
 */
export function declareRoutes(router: Router, table: RouteTable, mountPath: string) {
  const add =
    (method: Method) =>
    (path: string, access: Access, ...handlers: RequestHandler[]) => {
      const full = `/api${mountPath === '/' ? '' : mountPath}${path === '/' ? '' : path}` || '/api';
      table.routes.push({ method: method.toUpperCase() as RouteSpec['method'], path: full, access });
      router[method](path, requireAccess(access), ...handlers);
    };
  return { get: add('get'), post: add('post'), put: add('put'), patch: add('patch'), delete: add('delete') };
}
