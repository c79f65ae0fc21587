import type { ContentfulStatusCode } from 'hono/utils/http-status';
import type { InputIssue } from '../engine/errors.ts';

/**
 * A 4xx (or 503) answer decided by the service itself: unknown id, wrong content type, a run
 * not yet done. Rendered by the one error handler in the one error shape.
 */
export class HttpError extends Error {
  override name = 'HttpError';
  constructor(
    readonly status: ContentfulStatusCode,
    message: string,
    readonly issues: readonly InputIssue[] = [],
    readonly headers: Readonly<Record<string, string>> = {},
  ) {
    super(message);
  }
}

/** The body of every error answer: `{ error, issues: [{ path, message }] }`, plus optional extras. */
export interface ErrorBody {
  readonly error: string;
  readonly issues: readonly InputIssue[];
  readonly [extra: string]: unknown;
}

/** An error answer's body; `extra` adds fields beside error and issues (size, budget). */
export const errorBody = (
  error: string,
  issues: readonly InputIssue[] = [],
  extra: Record<string, unknown> = {},
): ErrorBody => ({ error, issues, ...extra });

/** 404 for an id that names nothing: `no study with id "…"`. */
export const notFound = (what: string, id: string): HttpError =>
  new HttpError(404, `no ${what} with id "${id}"`);

/** `record`, the store's answer for `id`; notFound when there is none. */
export function found<T>(record: T | undefined, what: string, id: string): T {
  if (record === undefined) throw notFound(what, id);
  return record;
}
