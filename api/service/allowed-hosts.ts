import type { MiddlewareHandler } from 'hono';
import { HttpError } from './http-error.ts';

/** The names that reach only this machine, accepted in Host by default. */
export const LOOPBACK_HOST_NAMES = ['localhost', '127.0.0.1', '[::1]'] as const;

/**
 * The host name of a Host header, lower case, without the port; IPv6 addresses keep their
 * brackets (RFC 9110 section 7.2 and RFC 3986 section 3.2.2). Undefined when it is not one.
 */
export function hostNameOf(header: string | undefined): string | undefined {
  if (header === undefined) return undefined;
  const match = /^(\[[0-9a-f:.]+\]|[^:[\]\s/@]+)(?::\d{1,5})?$/i.exec(header.trim());
  return match ? (match[1] as string).toLowerCase().replace(/\.$/, '') : undefined;
}

/**
 * Answers 421 (Misdirected Request, RFC 9110 section 15.5.20) to any request whose Host names
 * another server than this one. A web page the user visits can point its own name at
 * 127.0.0.1 (DNS rebinding) and then talk to a loopback service as if same-origin; its
 * requests still say its own name in Host, which this check refuses before anything is read
 * or written.
 */
export function allowedHosts(names: readonly string[]): MiddlewareHandler {
  const allowed = new Set(names.map((name) => name.toLowerCase()));
  return async (c, next) => {
    // Without Host the request is no browser's (browsers always send it); HTTP/1.1 without
    // one is refused before the app (node-listener.ts).
    const header = c.req.header('host');
    const name = hostNameOf(header);
    if (header !== undefined && (name === undefined || !allowed.has(name))) {
      throw new HttpError(
        421,
        `this service answers to ${[...allowed].join(', ')} only; the request was for ${c.req.header('host') ?? 'no host'} (set TREMORA_HOSTS to add a name)`,
        [{ path: '(header) Host', message: `expected one of ${[...allowed].join(', ')}` }],
      );
    }
    await next();
  };
}
