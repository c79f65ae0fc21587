import type { InputIssue } from '../engine/errors.ts';

/** Exit codes: 0 success, 2 the input was wrong (the user can fix it), 1 anything else. */
export const EXIT_OK = 0;
export const EXIT_FAILURE = 1;
export const EXIT_BAD_INPUT = 2;

/** What a verb gives back: its exit code; all printing goes through `Io`. */
export interface Io {
  out(text: string): void;
  err(text: string): void;
}

export const processIo: Io = {
  out: (text) => process.stdout.write(text.endsWith('\n') ? text : `${text}\n`),
  err: (text) => process.stderr.write(text.endsWith('\n') ? text : `${text}\n`),
};

export function formatIssues(issues: readonly InputIssue[]): string {
  return issues.map((i) => `  ${i.path}: ${i.message}`).join('\n');
}

/** A usage error: printed with the verb's usage, exit 2. */
export class UsageError extends Error {
  override name = 'UsageError';
}
