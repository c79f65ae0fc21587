import { expect } from 'vitest';
import { runCli } from '../../../api/cli.ts';
import type { Io } from '../../../api/cli/output.ts';

/** Runs the CLI in-process with its output captured: exit code, standard output and standard error. */
export async function runCapturing(
  ...argv: string[]
): Promise<{ code: number; out: string; err: string }> {
  let out = '';
  let err = '';
  const io: Io = { out: (t) => (out += `${t}\n`), err: (t) => (err += `${t}\n`) };
  const code = await runCli(argv, io);
  return { code, out, err };
}

/** `tremora check` on a study: exit 0 and the summary line it should print. */
export async function expectCheckedValid(studyPath: string, summary: RegExp): Promise<void> {
  const { code, out } = await runCapturing('check', studyPath);
  expect(code).toBe(0);
  expect(out).toMatch(summary);
}

/** Runs the CLI with `--json` added: exit 0, and its standard output read as JSON. */
export async function runJson(...argv: string[]): Promise<any> {
  const { code, out } = await runCapturing(...argv, '--json');
  expect(code).toBe(0);
  return JSON.parse(out);
}
