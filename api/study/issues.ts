import type { z } from 'zod';
import type { InputIssue } from '../engine/errors.ts';

/**
 * `['sources', 'features', 3, 'properties', 'dip']` -> `sources.features[3].properties.dip`.
 * A string key already in brackets (`'[line 5]'`, for CSV rows) is appended as it is.
 */
export function formatPath(path: readonly PropertyKey[]): string {
  let out = '';
  for (const key of path) {
    if (typeof key === 'number') out += `[${key}]`;
    else if (typeof key === 'string' && key.startsWith('[')) out += key;
    else out += out === '' ? String(key) : `.${String(key)}`;
  }
  return out === '' ? '(study)' : out;
}

/** zod issues re-rooted under `prefix`, in the project's { path, message } shape. */
export function fromZod(error: z.ZodError, prefix: readonly PropertyKey[] = []): InputIssue[] {
  return error.issues.map((issue) => ({
    path: formatPath([...prefix, ...issue.path]),
    message: issue.code === 'invalid_type' && issue.input === undefined ? 'required, got nothing' : issue.message,
  }));
}

/** Collects issues and warnings while a study is read; nothing is thrown until the end. */
export class IssueList {
  readonly issues: InputIssue[] = [];
  readonly warnings: InputIssue[] = [];

  add(path: readonly PropertyKey[], message: string): void {
    this.issues.push({ path: formatPath(path), message });
  }

  warn(path: readonly PropertyKey[], message: string): void {
    this.warnings.push({ path: formatPath(path), message });
  }

  /** Parses with `schema`; on failure records every issue under `path` and returns undefined. */
  parse<T extends z.ZodType>(schema: T, value: unknown, path: readonly PropertyKey[]): z.output<T> | undefined {
    const result = schema.safeParse(value);
    if (result.success) return result.data;
    this.issues.push(...fromZod(result.error, path));
    return undefined;
  }

  /** Warns about keys of `value` that `known` does not list (likely typos), without rejecting them. */
  warnUnknownKeys(value: unknown, known: readonly string[], path: readonly PropertyKey[]): void {
    if (typeof value !== 'object' || value === null || Array.isArray(value)) return;
    for (const key of Object.keys(value)) {
      if (!known.includes(key)) this.warn([...path, key], `unknown key ignored; expected one of ${known.join(', ')}`);
    }
  }
}
