import type { z } from 'zod';
import type { InputIssue } from '../engine/errors.ts';
import { describeValue } from './fields.ts';

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

/**
 * zod issues re-rooted under `prefix`, in the project's { path, message } shape. zod's own type
 * messages ("Invalid input: expected string, received number") are put in the project's words
 * with the value received; our validators' messages (fields.ts) are kept as they are. Needs the
 * issues parsed with `reportInput` so the received value is there.
 */
export function fromZod(error: z.ZodError, prefix: readonly PropertyKey[] = []): InputIssue[] {
  // zod 4 still runs a list's length checks on a value of the wrong type; the type says it all.
  const wrongType = new Set(
    error.issues.filter((i) => i.code === 'invalid_type').map((i) => i.path.join('\u0000')),
  );
  const issues = error.issues.filter(
    (i) => i.code === 'invalid_type' || !wrongType.has(i.path.join('\u0000')),
  );
  return issues.map((issue) => {
    let message = issue.message;
    if (issue.code === 'invalid_type') {
      message =
        issue.input === undefined
          ? 'required, got nothing'
          : message.startsWith('Invalid input')
            ? `expected ${issue.expected}, got ${describeValue(issue.input)}`
            : message;
    }
    return { path: formatPath([...prefix, ...issue.path]), message };
  });
}

/**
 * Most issues, and most warnings, listed for one input. A 5 MiB document can hold a million
 * bad positions or unknown keys; listing each would answer with tens of megabytes. The list
 * ends with one entry saying that more were found.
 */
export const MAX_LISTED_ISSUES = 500;

/** Appends to `list` up to MAX_LISTED_ISSUES entries, then one that says the rest are not listed. */
function pushCapped(list: InputIssue[], issue: InputIssue, what: string): void {
  if (list.length < MAX_LISTED_ISSUES) list.push(issue);
  else if (list.length === MAX_LISTED_ISSUES)
    list.push({
      path: '(study)',
      message: `more than ${MAX_LISTED_ISSUES} ${what}; only the first ${MAX_LISTED_ISSUES} are listed (the limit)`,
    });
}

/** Collects issues and warnings while a study is read; nothing is thrown until the end. */
export class IssueList {
  readonly issues: InputIssue[] = [];
  readonly warnings: InputIssue[] = [];

  add(path: readonly PropertyKey[], message: string): void {
    pushCapped(this.issues, { path: formatPath(path), message }, 'problems');
  }

  warn(path: readonly PropertyKey[], message: string): void {
    pushCapped(this.warnings, { path: formatPath(path), message }, 'warnings');
  }

  /** Parses with `schema`; on failure records every issue under `path` and returns undefined. */
  parse<T extends z.ZodType>(
    schema: T,
    value: unknown,
    path: readonly PropertyKey[],
  ): z.output<T> | undefined {
    const result = schema.safeParse(value, { reportInput: true });
    if (result.success) return result.data;
    for (const issue of fromZod(result.error, path)) pushCapped(this.issues, issue, 'problems');
    return undefined;
  }

  /** Warns about keys of `value` that `known` does not list (likely typos), without rejecting them. */
  warnUnknownKeys(value: unknown, known: readonly string[], path: readonly PropertyKey[]): void {
    if (typeof value !== 'object' || value === null || Array.isArray(value)) return;
    for (const key of Object.keys(value)) {
      if (!known.includes(key))
        this.warn([...path, key], `unknown key ignored; expected one of ${known.join(', ')}`);
    }
  }
}
