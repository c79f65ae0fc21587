import { readFileSync } from 'node:fs';
import { startRedis, startWorker } from '../queue/helpers/redis-cluster.ts';
import { loadLine, machineLine, mapRun } from './hazard-cases.ts';

/**
 * The demo's 475-year PGA map of 100,000 points, in process (every core's thread) and through
 * the Redis queue over two local `tremora worker` processes (their own redis-server on a free
 * loopback port, started and stopped here). Prints the figures of each and whether the two maps
 * are the same (the SHA-256 of their points' GeoJSON); asserts nothing.
 *
 *   npm run bench -- queue-map
 *   TREMORA_BENCH_QUEUE_POINTS=200 npm run bench -- queue-map     a small grid, to try it out
 *   TREMORA_BENCH_WORKER_THREADS=N                                 threads per worker (default 1)
 *
 * On a 2-core machine, two workers of one thread each use the same cores as the in-process map,
 * so the difference is the queue's cost (Redis round trips, each worker's rupture table and plans).
 */
const POINTS = Number(process.env.TREMORA_BENCH_QUEUE_POINTS ?? 100_000);
const WORKER_THREADS = Number(process.env.TREMORA_BENCH_WORKER_THREADS ?? 1);
/** Linux's clock ticks per second in /proc/PID/stat (USER_HZ, 100 on every common build). */
const TICKS_PER_S = 100;

const seconds = (ms: number): string => `${(ms / 1000).toFixed(1)} s`;

/** CPU time of a process and its threads so far, ms (utime + stime, fields 14 and 15 of /proc/PID/stat). */
function cpuMsOf(pid: number | undefined): number {
  if (pid === undefined) return NaN;
  const stat = readFileSync(`/proc/${pid}/stat`, 'utf8');
  const fields = stat.slice(stat.lastIndexOf(')') + 2).split(' ');
  return ((Number(fields[11]) + Number(fields[12])) / TICKS_PER_S) * 1000;
}

function report(label: string, run: Record<string, any>, extra = ''): void {
  console.log(`\n${label}`);
  console.log(
    `  points             ${run.points} every ${run.spacingKm.toFixed(3)} km${run.finished ? '' : ' (not finished)'}`,
  );
  console.log(`  wall time          ${seconds(run.wallMs)}`);
  console.log(`  points / s         ${(run.points / (run.wallMs / 1000)).toFixed(0)}`);
  console.log(
    `  coordinator        CPU ${seconds(run.cpuMs)}, ${run.threads} thread(s), peak RSS ${run.peakRssMb.toFixed(0)} MB${extra}`,
  );
}

console.log(machineLine());
console.log(loadLine());
const inProcess = mapRun(POINTS, 0);
report(`in process, ${inProcess.threads} threads`, inProcess);

const redis = await startRedis();
const workerArgs = ['--threads', String(WORKER_THREADS)];
const workers = await Promise.all([
  startWorker(redis.url, workerArgs),
  startWorker(redis.url, workerArgs),
]);
try {
  const before = workers.map((w) => cpuMsOf(w.child.pid));
  const queued = mapRun(POINTS, 0, Infinity, { TREMORA_QUEUE: redis.url });
  const workerCpu = workers.map((w, i) => cpuMsOf(w.child.pid) - (before[i] as number));
  report(
    `through the queue, 2 workers × ${WORKER_THREADS} thread(s), redis-server on loopback`,
    queued,
    `\n  workers            CPU ${workerCpu.map(seconds).join(' and ')}`,
  );
  console.log(
    `\nsame map both ways  ${queued.digest === inProcess.digest ? 'yes' : 'NO'} (SHA-256 of the points' GeoJSON ${inProcess.digest.slice(0, 16)}…)`,
  );
  console.log(
    `queue / in process  ${(queued.wallMs / inProcess.wallMs).toFixed(2)} × the wall time`,
  );
  console.log(loadLine());
} finally {
  await Promise.all(workers.map((w) => w.stop()));
  await redis.stop();
}
