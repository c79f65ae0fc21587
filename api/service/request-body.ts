import type { Context } from 'hono';
import { MAX_JSON_DEPTH, parseJsonText } from '../study/json-text.ts';
import { HttpError } from './http-error.ts';

/** Content types accepted for each kind of body. */
export const JSON_TYPES = ['application/json'] as const;
export const GEOJSON_TYPES = ['application/geo+json', 'application/json'] as const;
export const CSV_TYPES = ['text/csv'] as const;

/** The media type of the request, lower case, without parameters (charset). */
export function mediaType(c: Context): string | undefined {
  const header = c.req.header('content-type');
  if (header === undefined) return undefined;
  return header.split(';')[0]?.trim().toLowerCase() || undefined;
}

/** The body as text, after checking its content type is one of `types` (415 otherwise). */
export async function readText(
  c: Context,
  types: readonly string[],
  what: string,
): Promise<string> {
  const type = mediaType(c);
  if (type === undefined || !types.includes(type)) {
    throw new HttpError(
      415,
      `expected ${what} with Content-Type ${types.join(' or ')}, got ${type ?? 'no Content-Type'}`,
      [],
      { Accept: types.join(', ') },
    );
  }
  return c.req.text();
}

/** A JSON object body and its text; anything but an object (a list, a number) is a 422 naming what was expected. */
export async function readJsonObject(
  c: Context,
  what: string,
  types: readonly string[] = JSON_TYPES,
): Promise<{ value: Record<string, unknown>; text: string }> {
  const text = await readText(c, types, what);
  const parsed = parseJsonText(text, '(body)');
  if (!parsed.ok && parsed.limit === 'depth')
    throw new HttpError(
      422,
      `the JSON is nested deeper than the limit of ${MAX_JSON_DEPTH} levels`,
      [parsed.issue],
    );
  if (!parsed.ok) throw new HttpError(400, 'malformed JSON', [parsed.issue]);
  const value = parsed.value;
  if (typeof value !== 'object' || value === null || Array.isArray(value)) {
    const got = Array.isArray(value) ? 'a list' : value === null ? 'null' : typeof value;
    throw new HttpError(422, `expected ${what} (a JSON object)`, [
      { path: '(body)', message: `expected ${what} as a JSON object, got ${got}` },
    ]);
  }
  return { value: value as Record<string, unknown>, text };
}
