import { availableParallelism } from 'node:os';
import { QUEUE_SETTING, queueUrlFrom } from '../queue/queue-setting.ts';
import { DEFAULT_LOCK_MS, startQueueWorker } from '../queue/queue-worker.ts';
import { numberOption, verbArgs } from './args.ts';
import { EXIT_OK, type Io, UsageError } from './output.ts';

export const WORKER_USAGE = `tremora worker [--threads N]

Takes chunks of hazard maps and screenings from the Redis queue named by ${QUEUE_SETTING}
(e.g. redis://10.0.0.5:6379) and computes them on this machine, until stopped (Ctrl-C or
SIGTERM: the chunks in hand are finished first). Start one on each machine that should help;
the numbers are the same whichever machine computes a chunk.
  --threads N         worker threads (default: one per core)
  --lock-ms MS        how long a claim on a chunk lasts unrenewed (default ${DEFAULT_LOCK_MS}); a
                      worker that vanishes has its chunks taken by another this long after`;

/** The stop signals a worker waits for (overridable by tests through `until`). */
const waitForStop = (): Promise<string> =>
  new Promise((resolve) => {
    process.once('SIGTERM', () => resolve('SIGTERM'));
    process.once('SIGINT', () => resolve('SIGINT'));
  });

export async function workerVerb(
  args: readonly string[],
  io: Io,
  until: () => Promise<string> = waitForStop,
): Promise<number> {
  const { values } = verbArgs(args, { strings: ['threads', 'lock-ms'], positionals: false });
  const url = queueUrlFrom(process.env);
  if (url === undefined)
    throw new UsageError(
      `set ${QUEUE_SETTING} to the queue's Redis URL, e.g. ${QUEUE_SETTING}=redis://127.0.0.1:6379`,
    );
  const threads = numberOption(values, 'threads') ?? availableParallelism();
  if (!Number.isInteger(threads) || threads < 1)
    throw new UsageError(`--threads: expected a whole number of at least 1, got ${threads}`);
  const lockMs = numberOption(values, 'lock-ms') ?? DEFAULT_LOCK_MS;
  if (!Number.isInteger(lockMs) || lockMs < 1000)
    throw new UsageError(
      `--lock-ms: expected a whole number of milliseconds of at least 1000, got ${lockMs}`,
    );
  const worker = await startQueueWorker({ url, threads, lockMs, log: (line) => io.err(line) });
  io.out(`tremora worker: ${threads} thread(s) taking chunks from ${new URL(url).host}`);
  const signal = await until();
  io.out(`${signal}: finishing the chunks in hand`);
  // A chunk may take longer than anyone waits at a shutdown: past one claim's length, stop anyway
  // (its claim then lapses and another worker takes it again).
  const closed = await Promise.race([
    worker.close().then(() => true),
    new Promise<false>((resolve) => setTimeout(() => resolve(false), lockMs + 5000).unref()),
  ]);
  if (!closed) io.err('tremora worker: stopping with chunks in hand; other workers will take them');
  // Connections still closing must not hold a stopped worker open.
  if (until === waitForStop) setTimeout(() => process.exit(EXIT_OK), 1000).unref();
  return EXIT_OK;
}
