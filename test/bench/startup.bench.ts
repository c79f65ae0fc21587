import { spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { REPO_ROOT } from '../service/helpers/service-process.ts';
import { syntheticStudyFile } from './hazard-cases.ts';

/**
 * Start-up time of the command line: `tremora --help` as installed (api/bin/tremora.js, the
 * compiled dist/ build), beside Node itself doing nothing and the CLI run from source through
 * tsx. The wall time of each run is measured from this process and the median printed, with
 * the time over Node alone (what the program itself costs; on a busy machine Node's own start
 * varies most). Figures only; nothing about time is asserted. The target for the installed
 * command is under 0.5 s.
 *
 * Then the whole process of `tremora screen` on the synthetic case (hazard-cases.ts), split
 * into start-up (`tremora screen --help`: Node, and the command's code loaded), reading and
 * checking the study (`tremora check`, less `tremora check --help`) and the rest, the screening
 * with its output.
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

const SCREEN_RUNS = Number(process.env.BENCH_SCREEN_RUNS ?? 3);

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

/** Median wall time, s, of `runs` runs of Node with `args` after one warm-up run. */
function medianWallS(label: string, args: readonly string[], runs: number): number {
  const wall: number[] = [];
  for (let i = 0; i <= runs; i++) {
    const before = process.hrtime.bigint();
    const run = spawnSync(process.execPath, [...args], { cwd: REPO_ROOT, encoding: 'utf8' });
    const elapsedS = Number(process.hrtime.bigint() - before) / 1e9;
    if (run.status !== 0) throw new Error(`${label} exited with ${run.status}: ${run.stderr}`);
    if (i > 0) wall.push(elapsedS);
  }
  return median(wall);
}

console.log(`CLI start-up, median wall time of ${RUNS} runs after one warm-up run:`);
let nodeAloneS = 0;
for (const c of CASES) {
  const s = medianWallS(c.label, c.args, RUNS);
  if (c === CASES[0]) nodeAloneS = s;
  console.log(
    `  ${c.label.padEnd(36)} ${s.toFixed(3)} s${c === CASES[0] ? '' : `  (${(s - nodeAloneS).toFixed(3)} s over Node alone)`}`,
  );
}

const dir = mkdtempSync(join(tmpdir(), 'tremora-startup-'));
try {
  const studyPath = join(dir, 'synthetic.study.json');
  writeFileSync(studyPath, JSON.stringify(syntheticStudyFile()));
  const cli = join(REPO_ROOT, 'api/bin/tremora.js');
  const startS = medianWallS('tremora screen --help', [cli, 'screen', '--help'], SCREEN_RUNS);
  const checkStartS = medianWallS('tremora check --help', [cli, 'check', '--help'], SCREEN_RUNS);
  const checkS = medianWallS('tremora check', [cli, 'check', studyPath], SCREEN_RUNS);
  const screenS = medianWallS(
    'tremora screen',
    [cli, 'screen', studyPath, '--out', join(dir, 'screening.json')],
    SCREEN_RUNS,
  );
  const readS = checkS - checkStartS;
  const part = (label: string, s: number): string =>
    `  ${label.padEnd(36)} ${s.toFixed(3)} s  (${((100 * s) / screenS).toFixed(0)}%)`;
  console.log(
    `\ntremora screen of the synthetic case (200 point sources, 1,000 communities, BSSA14), whole process, median of ${SCREEN_RUNS} runs after one warm-up run:`,
  );
  console.log(`  ${'whole run'.padEnd(36)} ${screenS.toFixed(3)} s`);
  console.log(part('start-up (tremora screen --help)', startS));
  console.log(part('reading and checking the study', readS));
  console.log(part('screening and writing the results', screenS - startS - readS));
} finally {
  rmSync(dir, { recursive: true, force: true });
}
