import type { Context, MiddlewareHandler } from 'hono';
import { bearerAuth } from 'hono/bearer-auth';
import { errorBody } from './http-error.ts';
import {
  ACCESS_PATH,
  LEAVE_PATH,
  accessPageFor,
  hasPageAccess,
  pageBehind,
} from './page-access.ts';
import { isWrite } from './same-origin.ts';
import type { PageAccessRepository } from '../store/page-access-repository.ts';

const refused = (c: Context, why: string) =>
  c.json(
    errorBody(
      `${why}; expected the header "Authorization: Bearer <TREMORA_TOKEN>" on every request that writes or computes`,
    ),
    401,
  );

/** The JSON API; every other path is a page. */
const isApiPath = (path: string): boolean => path === '/api' || path.startsWith('/api/');

/** The access page's own posts: entering the token, and forgetting it. */
const isAccessPost = (path: string): boolean => path === ACCESS_PATH || path === LEAVE_PATH;

/**
 * Requires the access token on every request that writes or computes (any method but GET,
 * HEAD, OPTIONS): the bearer header, or the access cookie the access page sets
 * (page-access.ts). hono's bearer-auth compares in constant time. A page form posted without
 * access is sent to the access page (303) rather than answered with JSON; the API keeps 401.
 */
export function requireToken(token: string, records: PageAccessRepository): MiddlewareHandler {
  const check = bearerAuth({
    token,
    noAuthenticationHeader: { message: (c: Context) => refused(c, 'an access token is required') },
    invalidAuthenticationHeader: {
      message: (c: Context) => refused(c, 'the Authorization header is malformed'),
    },
    invalidToken: { message: (c: Context) => refused(c, 'the access token is wrong') },
  });
  return async (c, next) => {
    if (!isWrite(c.req.method) || isAccessPost(c.req.path)) return next();
    if (c.req.header('authorization') === undefined) {
      if (hasPageAccess(c, token, records)) return next();
      if (!isApiPath(c.req.path)) return c.redirect(accessPageFor(pageBehind(c)), 303);
    }
    return check(c, next);
  };
}
