import type { InputIssue } from '../engine/errors.ts';

export type JsonTextResult = { readonly ok: true; readonly value: unknown } | { readonly ok: false; readonly issue: InputIssue };

/**
 * Parses JSON text; a syntax error becomes one issue at `path` naming the line and column
 * (Node reports only a character position).
 */
export function parseJsonText(text: string, path: string): JsonTextResult {
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
    const reason = message.replace(/ in JSON at position \d+.*$/s, '').replace(/, ".*" is not valid JSON$/s, '').slice(0, 120);
    return { ok: false, issue: { path, message: `expected valid JSON; the text is malformed${where} (${reason})` } };
  }
}
