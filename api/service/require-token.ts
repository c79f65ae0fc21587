import type { Context, MiddlewareHandler } from 'hono';
import { bearerAuth } from 'hono/bearer-auth';
import { errorBody } from './http-error.ts';
import { isWrite } from './same-origin.ts';

const refused = (c: Context, why: string) =>
  c.json(errorBody(`${why}; expected the header "Authorization: Bearer <TREMORA_TOKEN>" on every request that writes or computes`), 401);

/**
 * Requires the access token on every request that writes or computes (any method but GET,
 * HEAD, OPTIONS). hono's bearer-auth compares in constant time.
 */
export function requireToken(token: string): MiddlewareHandler {
  const check = bearerAuth({
    token,
    noAuthenticationHeader: { message: (c: Context) => refused(c, 'an access token is required') },
    invalidAuthenticationHeader: { message: (c: Context) => refused(c, 'the Authorization header is malformed') },
    invalidToken: { message: (c: Context) => refused(c, 'the access token is wrong') },
  });
  return async (c, next) => (isWrite(c.req.method) ? check(c, next) : next());
}
