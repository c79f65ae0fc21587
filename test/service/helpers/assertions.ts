import { expect } from 'vitest';
import { CONTENT_SECURITY_POLICY } from '../../../api/service/security-headers.ts';

/** The headers every answer carries, page or API (README, the security headers of the service). */
export function expectSecurityHeaders(response: Response): void {
  expect(response.headers.get('content-security-policy')).toBe(CONTENT_SECURITY_POLICY);
  expect(response.headers.get('x-content-type-options')).toBe('nosniff');
  expect(response.headers.get('x-frame-options')).toBe('DENY');
  expect(response.headers.get('referrer-policy')).toBe('same-origin');
}

export interface ErrorAnswer {
  readonly error: string;
  readonly issues: readonly { readonly path: string; readonly message: string }[];
  readonly [extra: string]: unknown;
}

/** Asserts the status and the one error shape (no stack, JSON); returns the body. */
export async function expectError(response: Response, status: number): Promise<ErrorAnswer> {
  const text = await response.text();
  expect(response.status, text).toBe(status);
  expect(response.headers.get('content-type')).toMatch(/^application\/json/);
  expect(text).not.toMatch(/\n\s+at /);
  const body = JSON.parse(text) as ErrorAnswer;
  expect(typeof body.error).toBe('string');
  expect(Array.isArray(body.issues)).toBe(true);
  for (const issue of body.issues) {
    expect(typeof issue.path).toBe('string');
    expect(typeof issue.message).toBe('string');
  }
  expectSecurityHeaders(response);
  return body;
}
