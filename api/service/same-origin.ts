import type { MiddlewareHandler } from 'hono';
import { HttpError } from './http-error.ts';

const SAFE_METHODS = new Set(['GET', 'HEAD', 'OPTIONS']);

/** Whether a request with this method writes or computes (anything but GET, HEAD, OPTIONS). */
export const isWrite = (method: string): boolean => !SAFE_METHODS.has(method);

/**
 * Refuses writes sent by another site's page. JSON and CSV bodies already need a CORS
 * preflight this service never grants, but a body-less POST (start or cancel a run) does not;
 * browsers say where such a request came from in Origin and Sec-Fetch-Site.
 */
export const sameOriginWrites = (): MiddlewareHandler => async (c, next) => {
  if (isWrite(c.req.method)) {
    const origin = c.req.header('origin');
    const host = c.req.header('host');
    const crossSite = c.req.header('sec-fetch-site') === 'cross-site';
    let foreign = crossSite;
    if (origin !== undefined && origin !== 'null' && host !== undefined) {
      try {
        foreign ||= new URL(origin).host !== host;
      } catch {
        foreign = true;
      }
    } else if (origin === 'null') {
      foreign = true;
    }
    if (foreign)
      throw new HttpError(
        403,
        `writes are accepted only from this service's own pages; got a request from ${origin ?? 'another site'}`,
      );
  }
  await next();
};
