import { spawnSync } from 'node:child_process';
import { readdirSync } from 'node:fs';
import { fileURLToPath } from 'node:url';

/**
 * `npm run bench`: runs every test/bench/*.bench.ts in turn, each in its own process (a
 * benchmark that starts servers or threads cannot disturb the next). Benchmarks print
 * figures; nothing about time is asserted. Exits non-zero if a benchmark itself fails.
 */
const BENCH_DIR = fileURLToPath(new URL('./', import.meta.url));
const ROOT = fileURLToPath(new URL('../../', import.meta.url));

const files = readdirSync(BENCH_DIR)
  .filter((f) => f.endsWith('.bench.ts'))
  .sort();
const only = process.argv.slice(2);
const selected = only.length === 0 ? files : files.filter((f) => only.some((o) => f.includes(o)));

let failed = 0;
for (const file of selected) {
  console.log(`\n== ${file}`);
  const result = spawnSync(process.execPath, ['--import', 'tsx', `${BENCH_DIR}${file}`], {
    cwd: ROOT,
    stdio: 'inherit',
  });
  if (result.status !== 0) {
    failed++;
    console.error(`${file} failed (exit ${result.status ?? result.signal})`);
  }
}
console.log(`\n${selected.length - failed} of ${selected.length} benchmark(s) ran`);
process.exitCode = failed === 0 ? 0 : 1;
