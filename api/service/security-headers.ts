import { secureHeaders } from 'hono/secure-headers';

/**
 * Headers on every answer, pages and API alike. The policy allows only this service's own
 * origin: no inline script or style (a page that needs one adds its hash to its own answer),
 * images also as data: URLs (maps drawn in the page), no framing by any site, no <base>
 * rewriting, forms posting only here.
 */
export const CONTENT_SECURITY_POLICY =
  "default-src 'self'; script-src 'self'; style-src 'self'; img-src 'self' data:; frame-ancestors 'none'; base-uri 'none'; form-action 'self'";

/**
 * No URL of ours goes to another site, while this origin's own form posts keep their Origin:
 * under no-referrer a browser sends "Origin: null" with them, which same-origin.ts must refuse.
 */
export const REFERRER_POLICY = 'same-origin';

/**
 * The same headers as a plain record, for the few answers written before the app sees a
 * request (client-error.ts, node-listener.ts).
 */
export const SECURITY_HEADERS: Readonly<Record<string, string>> = {
  'Content-Security-Policy': CONTENT_SECURITY_POLICY,
  'X-Content-Type-Options': 'nosniff',
  'X-Frame-Options': 'DENY',
  'Referrer-Policy': REFERRER_POLICY,
};

/** hono's secure-headers middleware set to the policy above, with nosniff, DENY and REFERRER_POLICY. */
export const securityHeaders = () =>
  secureHeaders({
    contentSecurityPolicy: {
      defaultSrc: ["'self'"],
      scriptSrc: ["'self'"],
      styleSrc: ["'self'"],
      imgSrc: ["'self'", 'data:'],
      frameAncestors: ["'none'"],
      baseUri: ["'none'"],
      formAction: ["'self'"],
    },
    xContentTypeOptions: 'nosniff',
    referrerPolicy: REFERRER_POLICY,
    xFrameOptions: 'DENY',
    // Served over plain HTTP on a local network: an HSTS header would be ignored or, behind a
    // TLS proxy, is that proxy's decision.
    strictTransportSecurity: false,
  });
