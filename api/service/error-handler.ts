import { QuickTaskTooLong } from '../operations/quick-task.ts';
import { randomUUID } from 'node:crypto';
import type { Context, ErrorHandler, NotFoundHandler } from 'hono';
import { HTTPException } from 'hono/http-exception';
import { Cancelled, InvalidInput, StudyTooLarge, TremoraError } from '../engine/errors.ts';
import { isDamaged, isDiskFull } from '../store/index.ts';
import { PoolClosed } from '../workers/task-errors.ts';
import { errorBody, HttpError } from './http-error.ts';

/** Where unexpected failures are written, with the id the 500 answer carries. */
export type LogError = (id: string, context: string, error: unknown) => void;

/** The default LogError: the id, what was being done, and the error with its stack, to stderr. */
export const logToStderr: LogError = (id, context, error) => {
  console.error(`[error ${id}] ${context}:`, error);
};

const plural = (n: number, word: string): string => `${n} ${word}${n === 1 ? '' : 's'}`;

/**
 * The one place errors become answers. The user's mistakes get a 4xx naming what was wrong;
 * the engine's named errors are the user's mistakes too (422). Anything else is ours: logged
 * with an id, answered 500 with that id and nothing of the internals.
 */
export function errorHandler(
  logError: LogError,
  onStoreError: (error: unknown) => void = () => {},
): ErrorHandler {
  return (error: Error, c: Context) => {
    // The database said no: the disk is full (RFC 4918 section 11.5, 507 Insufficient
    // Storage), or the file is damaged. Nothing was written either way (the write's
    // transaction was rolled back); health says so too (routes/health.ts).
    if (isDiskFull(error)) {
      onStoreError(error);
      return c.json(
        errorBody(
          'the disk holding the database is full: nothing was saved; free some space and try again',
        ),
        507,
      );
    }
    if (isDamaged(error)) {
      const id = randomUUID();
      logError(id, `${c.req.method} ${c.req.path}`, error);
      return c.json(
        {
          ...errorBody(
            'the database file is damaged: nothing was saved; stop the service and restore the file from a backup',
          ),
          id,
        },
        503,
      );
    }
    if (error instanceof HttpError)
      return c.json(errorBody(error.message, error.issues), error.status, { ...error.headers });
    if (error instanceof HTTPException) {
      // hono's own middleware (bearer auth) builds complete answers; others carry a status only.
      return error.res ?? c.json(errorBody(error.message || 'request refused'), error.status);
    }
    if (error instanceof InvalidInput) {
      return c.json(
        errorBody(`the input has ${plural(error.issues.length, 'problem')}`, error.issues),
        422,
      );
    }
    if (error instanceof StudyTooLarge) {
      return c.json(
        errorBody(
          error.message,
          [
            {
              path: '(study)',
              message: `${error.detail} = ${error.size}; expected at most ${error.budget}. Use fewer communities, sources, measures or levels, or a larger magnitude step or rupture spacing`,
            },
          ],
          {
            size: error.size,
            budget: error.budget,
          },
        ),
        422,
      );
    }
    if (error instanceof QuickTaskTooLong)
      return c.json(errorBody(error.message), 503, { 'Retry-After': '60' });
    if (error instanceof Cancelled) return c.json(errorBody(error.message), 409);
    if (error instanceof TremoraError) return c.json(errorBody(error.message), 422);
    if (error instanceof PoolClosed)
      return c.json(errorBody('the service is shutting down; try again when it is back'), 503);
    // A form body that does not parse as its Content-Type says (hono's parseBody, undici's formData).
    if (error instanceof TypeError && /^Failed to parse body as FormData/.test(error.message)) {
      return c.json(
        errorBody(
          `the body could not be read as the form its Content-Type (${c.req.header('content-type') ?? 'none'}) says`,
        ),
        400,
      );
    }
    // Node's "aborted": the client closed the connection before its body was complete.
    if ((error as NodeJS.ErrnoException).code === 'ECONNRESET')
      return c.json(
        errorBody('the request body was cut short: the connection closed before all of it arrived'),
        400,
      );
    const id = randomUUID();
    logError(id, `${c.req.method} ${c.req.path}`, error);
    return c.json({ error: 'internal error', id, issues: [] }, 500);
  };
}

/** Unknown routes, pages included: 404 in the error shape. */
export const notFoundHandler: NotFoundHandler = (c) =>
  c.json(
    errorBody(
      `no route ${c.req.method} ${c.req.path}; the API is under /api/ (GET /api/health to check the service)`,
    ),
    404,
  );
