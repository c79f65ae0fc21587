import { CONTENT_SECURITY_POLICY } from '../../../api/service/security-headers.ts';
import type { Answer } from './http-client.ts';

/**
 * What a hostile request may get back: never a status of 500 or above, never a stack trace or
 * a path of the code, and every 4xx in the one error shape of the README's Service section
 * (`{ error, issues: [{ path, message }] }`, JSON, with the security headers).
 */

/** Signs of internals in an answer: a stack frame, a source path, an engine error class name. */
const INTERNALS = [
  /\n\s+at /,
  /\bat [\w$.<>]+ \([^)]*:\d+:\d+\)/,
  /node_modules/,
  /\/work\/|file:\/\//,
  /\.ts:\d+/,
  /RangeError|TypeError|ReferenceError|SqliteError/,
];

/**
 * Why `answer` breaks the rules above, or undefined when it keeps them. Outside /api/ the
 * pages answer people: there a 4xx may be an HTML page, which must still carry the security
 * headers and no internals.
 */
export function answerProblem(answer: Answer, method: string, path = '/api/'): string | undefined {
  if (answer.status >= 500) return `status ${answer.status}`;
  for (const pattern of INTERNALS)
    if (pattern.test(answer.text))
      return `internals in the answer (${pattern}): ${answer.text.slice(0, 200)}`;
  if (answer.status < 400 || method === 'HEAD') return undefined;
  const type = String(answer.headers['content-type'] ?? '');
  // As the service sees the path: dot segments (also %2e%2e) resolved by URL parsing.
  const seen = URL.canParse(`http://127.0.0.1${path}`)
    ? new URL(`http://127.0.0.1${path}`).pathname
    : path;
  const isApi = seen === '/api' || seen.startsWith('/api/');
  if (!isApi && type.startsWith('text/html')) {
    return answer.headers['content-security-policy'] === CONTENT_SECURITY_POLICY
      ? undefined
      : `a ${answer.status} page without the security headers`;
  }
  if (!type.startsWith('application/json')) return `a ${answer.status} with Content-Type "${type}"`;
  if (answer.headers['content-security-policy'] !== CONTENT_SECURITY_POLICY)
    return `a ${answer.status} without the security headers`;
  let body: unknown;
  try {
    body = JSON.parse(answer.text);
  } catch {
    return `a ${answer.status} whose body is not JSON: ${answer.text.slice(0, 120)}`;
  }
  const shaped = body as { error?: unknown; issues?: unknown };
  if (typeof shaped.error !== 'string' || shaped.error.length === 0)
    return `a ${answer.status} without an "error" text`;
  if (!Array.isArray(shaped.issues)) return `a ${answer.status} without an "issues" list`;
  for (const issue of shaped.issues as { path?: unknown; message?: unknown }[]) {
    if (typeof issue?.path !== 'string' || typeof issue?.message !== 'string')
      return `a ${answer.status} with an issue that is not { path, message }: ${JSON.stringify(issue)}`;
  }
  return undefined;
}

/** Counts by a key, printed in key order. */
export class Tally {
  readonly #counts = new Map<string, number>();
  add(key: string | number): void {
    this.#counts.set(String(key), (this.#counts.get(String(key)) ?? 0) + 1);
  }
  get total(): number {
    return [...this.#counts.values()].reduce((a, b) => a + b, 0);
  }
  count(key: string | number): number {
    return this.#counts.get(String(key)) ?? 0;
  }
  toString(): string {
    return [...this.#counts.entries()]
      .sort(([a], [b]) => (a < b ? -1 : 1))
      .map(([k, n]) => `${k}: ${n}`)
      .join(', ');
  }
}
