import type { InputIssue } from '../engine/errors.ts';

export type JsonTextResult =
  | { readonly ok: true; readonly value: unknown }
  | {
      readonly ok: false;
      readonly issue: InputIssue;
      /** Set when the text is well formed but over a limit. */ readonly limit?: 'depth';
    };

/**
 * Deepest nesting of objects and lists accepted. A study needs about 10 (an outline's
 * MultiPolygon inside a scenario request); deeper documents are refused before parsing, as
 * JSON.stringify and other recursive code would exhaust the stack on them.
 */
export const MAX_JSON_DEPTH = 64;

/** Whether `text` nests objects and lists more than `maxDepth` deep; one pass, no recursion. */
export function jsonDepthExceeds(text: string, maxDepth: number = MAX_JSON_DEPTH): boolean {
  let depth = 0;
  let inString = false;
  for (let i = 0; i < text.length; i++) {
    const code = text.charCodeAt(i);
    if (inString) {
      if (code === 92)
        i++; // backslash: skip the escaped character
      else if (code === 34) inString = false;
    } else if (code === 34) inString = true;
    else if (code === 91 || code === 123) {
      if (++depth > maxDepth) return true;
    } else if (code === 93 || code === 125) depth--;
  }
  return false;
}

/**
 * Parses JSON text; a syntax error becomes one issue at `path` naming the line and column
 * (Node reports only a character position), and so does nesting beyond MAX_JSON_DEPTH.
 */
export function parseJsonText(text: string, path: string): JsonTextResult {
  if (jsonDepthExceeds(text)) {
    return {
      ok: false,
      limit: 'depth',
      issue: {
        path,
        message: `expected JSON nested at most ${MAX_JSON_DEPTH} levels deep (objects and lists), got deeper`,
      },
    };
  }
  try {
    return { ok: true, value: JSON.parse(text.startsWith('\uFEFF') ? text.slice(1) : text) };
  } catch (error) {
    const message = error instanceof Error ? error.message : String(error);
    const position = /position (\d+)/.exec(message);
    let where = '';
    if (position) {
      const offset = Number(position[1]);
      const before = text.slice(0, offset);
      const line = before.split('\n').length;
      const column = offset - before.lastIndexOf('\n');
      where = ` at line ${line}, column ${column}`;
    }
    // Node quotes the whole text in some messages; keep only the reason.
    const reason = message
      .replace(/ in JSON at position \d+.*$/s, '')
      .replace(/, ".*" is not valid JSON$/s, '')
      .slice(0, 120);
    return {
      ok: false,
      issue: { path, message: `expected valid JSON; the text is malformed${where} (${reason})` },
    };
  }
}
