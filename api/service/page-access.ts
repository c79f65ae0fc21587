import { createHash, createHmac, timingSafeEqual } from 'node:crypto';
import type { Context } from 'hono';
import { deleteCookie, getCookie, setCookie } from 'hono/cookie';

/**
 * The way in for people using the pages of a service that has TREMORA_TOKEN: a browser form
 * cannot send "Authorization: Bearer", so the access page checks the token once and leaves a
 * cookie that require-token.ts accepts in its place. The cookie holds an HMAC-SHA256 of a
 * fixed label keyed by the token (RFC 2104), never the token: whoever reads the cookie cannot
 * recover the token, and starting the service with a new token ends every browser's access.
 * Page writes stay behind the same-origin check (same-origin.ts) as well as SameSite=Strict.
 */
export const ACCESS_COOKIE = 'tremora_access';
/** The access page (GET), and where its form posts the token (POST). */
export const ACCESS_PATH = '/access';
/** Where the access page's second form posts to forget the access. */
export const LEAVE_PATH = '/access/leave';
/** How long a browser keeps its access, seconds (30 days; our choice for an office's shared service). */
export const ACCESS_MAX_AGE_S = 30 * 24 * 3600;

const COOKIE_LABEL = 'tremora page access';

/** The cookie's value for `token`: base64url of HMAC-SHA256(key = token, message = a fixed label). */
export function accessCookieValue(token: string): string {
  return createHmac('sha256', token).update(COOKIE_LABEL).digest('base64url');
}

/**
 * Whether two texts are equal, in time that does not depend on where they differ: both are
 * hashed to 32 bytes first, so even their lengths are not compared directly.
 */
export function sameSecret(given: string, expected: string): boolean {
  const digest = (text: string) => createHash('sha256').update(text, 'utf8').digest();
  return timingSafeEqual(digest(given), digest(expected));
}

/** Whether the request carries the access cookie made from `token`. */
export function hasPageAccess(c: Context, token: string): boolean {
  const value = getCookie(c, ACCESS_COOKIE);
  return value !== undefined && sameSecret(value, accessCookieValue(token));
}

/**
 * Whether the browser reached us over https, directly or through a proxy that says so. A
 * forged X-Forwarded-Proto can only make the cookie Secure, which harms nobody but the forger.
 */
function overHttps(c: Context): boolean {
  const forwarded = c.req.header('x-forwarded-proto')?.split(',')[0]?.trim().toLowerCase();
  return new URL(c.req.url).protocol === 'https:' || forwarded === 'https';
}

/** Sets the access cookie on the answer: HttpOnly, SameSite=Strict, Path=/, Secure over https. */
export function grantPageAccess(c: Context, token: string): void {
  setCookie(c, ACCESS_COOKIE, accessCookieValue(token), {
    httpOnly: true,
    sameSite: 'Strict',
    path: '/',
    secure: overHttps(c),
    maxAge: ACCESS_MAX_AGE_S,
  });
}

/** Clears the access cookie (same name, path and flags, expired). */
export function endPageAccess(c: Context): void {
  deleteCookie(c, ACCESS_COOKIE, {
    httpOnly: true,
    sameSite: 'Strict',
    path: '/',
    secure: overHttps(c),
  });
}

/** The access page for a page write refused for want of access; it returns to `back` afterwards. */
export function accessPageFor(back: string): string {
  return `${ACCESS_PATH}?${new URLSearchParams({ back, why: 'needed' }).toString()}`;
}

/**
 * The page a form was posted from, as a path of this origin (from Referer, which the
 * same-origin referrer policy keeps for this origin); "/" when there is none.
 */
export function pageBehind(c: Context): string {
  const referer = c.req.header('referer');
  const host = c.req.header('host');
  if (referer === undefined || host === undefined) return '/';
  try {
    const url = new URL(referer);
    return url.host === host ? `${url.pathname}${url.search}` : '/';
  } catch {
    return '/';
  }
}
