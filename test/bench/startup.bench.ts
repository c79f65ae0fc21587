import { spawnSync } from 'node:child_process';
import { existsSync } from 'node:fs';
import { join } from 'node:path';
import { REPO_ROOT } from '../service/helpers/service-process.ts';

/**
 * Start-up time of the command line: `tremora --help` as installed (api/bin/tremora.js, the
 * compiled dist/ build), beside Node itself doing nothing and the CLI run from source through
 * tsx. The wall time of each run is measured from this process and the median printed, with
 * the time over Node alone (what the program itself costs; on a busy machine Node's own start
 * varies most). Figures only; nothing about time is asserted. The target for the installed
 * command is under 0.5 s.
 */
const RUNS = Number(process.env.BENCH_STARTUP_RUNS ?? 7);

interface Case {
  readonly label: string;
  readonly args: readonly string[];
}

const CASES: readonly Case[] = [
  { label: 'node -e "" (Node alone)', args: ['-e', ''] },
  { label: 'tremora --help (compiled)', args: [join(REPO_ROOT, 'api/bin/tremora.js'), '--help'] },
  {
    label: 'tremora screen --help (compiled)',
    args: [join(REPO_ROOT, 'api/bin/tremora.js'), 'screen', '--help'],
  },
  {
    label: 'tsx api/cli.ts --help (source)',
    args: ['--import', 'tsx', join(REPO_ROOT, 'api/cli.ts'), '--help'],
  },
];

const median = (xs: readonly number[]): number => {
  const sorted = [...xs].sort((a, b) => a - b);
  const mid = sorted.length >> 1;
  return sorted.length % 2 === 1
    ? (sorted[mid] as number)
    : ((sorted[mid - 1] as number) + (sorted[mid] as number)) / 2;
};

if (!existsSync(join(REPO_ROOT, 'dist/api/cli.js'))) {
  const built = spawnSync(process.execPath, ['api/bin/build.js'], {
    cwd: REPO_ROOT,
    stdio: 'inherit',
  });
  if (built.status !== 0) throw new Error('the build failed');
}

console.log(`CLI start-up, median wall time of ${RUNS} runs after one warm-up run:`);
let nodeAloneS = 0;
for (const c of CASES) {
  const wall: number[] = [];
  for (let i = 0; i <= RUNS; i++) {
    const before = process.hrtime.bigint();
    const run = spawnSync(process.execPath, [...c.args], { cwd: REPO_ROOT, encoding: 'utf8' });
    const elapsedS = Number(process.hrtime.bigint() - before) / 1e9;
    if (run.status !== 0) throw new Error(`${c.label} exited with ${run.status}: ${run.stderr}`);
    if (i === 0) continue;
    wall.push(elapsedS);
  }
  const s = median(wall);
  if (c === CASES[0]) nodeAloneS = s;
  console.log(
    `  ${c.label.padEnd(36)} ${s.toFixed(3)} s${c === CASES[0] ? '' : `  (${(s - nodeAloneS).toFixed(3)} s over Node alone)`}`,
  );
}
