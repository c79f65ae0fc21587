import { createHash, createHmac, timingSafeEqual } from 'node:crypto';
import type { Context } from 'hono';
import { deleteCookie, getCookie, setCookie } from 'hono/cookie';
import type { PageAccessRepository } from '../store/page-access-repository.ts';

/**
 * The way in for people using the pages of a service that has TREMORA_TOKEN: a browser form
 * cannot send "Authorization: Bearer", so the access page checks the token once and leaves a
 * cookie that require-token.ts accepts in its place. The cookie names an access recorded in
 * the database (store/page-access-repository.ts) and carries an HMAC-SHA256 of that name keyed
 * by the token (RFC 2104), never the token: whoever reads the cookie cannot recover the token,
 * leaving ends that access on the service (a copy of the cookie no longer works, also after a
 * restart), and starting the service with a new token ends every browser's access.
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

/**
 * The cookie's value for the access `accessId` under `token`: the id, a dot, and base64url of
 * HMAC-SHA256(key = token, message = a fixed label and the id).
 */
export function accessCookieValue(token: string, accessId: string): string {
  const mac = createHmac('sha256', token).update(`${COOKIE_LABEL} ${accessId}`).digest('base64url');
  return `${accessId}.${mac}`;
}

/**
 * Whether two texts are equal, in time that does not depend on where they differ: both are
 * hashed to 32 bytes first, so even their lengths are not compared directly.
 */
export function sameSecret(given: string, expected: string): boolean {
  const digest = (text: string) => createHash('sha256').update(text, 'utf8').digest();
  return timingSafeEqual(digest(given), digest(expected));
}

/** The access the request's cookie names, when the cookie was made with `token`. */
function accessOf(c: Context, token: string): string | undefined {
  const value = getCookie(c, ACCESS_COOKIE);
  const dot = value?.indexOf('.') ?? -1;
  if (value === undefined || dot <= 0) return undefined;
  const accessId = value.slice(0, dot);
  return sameSecret(value, accessCookieValue(token, accessId)) ? accessId : undefined;
}

/** Whether the request carries a cookie made from `token` for an access that is still open. */
export function hasPageAccess(c: Context, token: string, records: PageAccessRepository): boolean {
  const accessId = accessOf(c, token);
  return accessId !== undefined && records.isOpen(accessId, new Date());
}

/**
 * Whether the browser reached us over https, directly or through a proxy that says so. A
 * forged X-Forwarded-Proto can only make the cookie Secure, which harms nobody but the forger.
 */
function overHttps(c: Context): boolean {
  const forwarded = c.req.header('x-forwarded-proto')?.split(',')[0]?.trim().toLowerCase();
  return new URL(c.req.url).protocol === 'https:' || forwarded === 'https';
}

/**
 * Records a new access and sets its cookie on the answer: HttpOnly, SameSite=Strict, Path=/,
 * Secure over https.
 */
export function grantPageAccess(c: Context, token: string, records: PageAccessRepository): void {
  const now = new Date();
  const accessId = records.open(now, new Date(now.getTime() + ACCESS_MAX_AGE_S * 1000));
  setCookie(c, ACCESS_COOKIE, accessCookieValue(token, accessId), {
    httpOnly: true,
    sameSite: 'Strict',
    path: '/',
    secure: overHttps(c),
    maxAge: ACCESS_MAX_AGE_S,
  });
}

/** Ends the access the cookie names, on the service, and clears the cookie (same name, path and flags, expired). */
export function endPageAccess(c: Context, token: string, records: PageAccessRepository): void {
  const accessId = accessOf(c, token);
  if (accessId !== undefined) records.end(accessId);
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
