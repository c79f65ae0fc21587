import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';

// Kept free of vitest, so benchmarks that start processes (test/bench) can use it too.

/** The repository root, where `node --import tsx api/server.ts` runs. */
export const REPO_ROOT = fileURLToPath(new URL('../../', import.meta.url));

/** A fresh temporary directory and its removal. */
export function tempDir(prefix = 'tremora-test-'): { path: string; remove(): void } {
  const path = mkdtempSync(join(tmpdir(), prefix));
  return { path, remove: () => rmSync(path, { recursive: true, force: true }) };
}
