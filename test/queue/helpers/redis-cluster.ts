import { type ChildProcess, spawn } from 'node:child_process';
import { createServer } from 'node:net';
import { REPO_ROOT, tempDir } from '../../helpers/repo-files.ts';

/** A free loopback port (the OS picks one; it is released for the caller to take). */
export function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const server = createServer();
    server.once('error', reject);
    server.listen(0, '127.0.0.1', () => {
      const address = server.address();
      server.close(() =>
        typeof address === 'object' && address
          ? resolve(address.port)
          : reject(new Error('no port')),
      );
    });
  });
}

/** A process that prints `ready` once it can be used; everything it writes is kept. */
function started(child: ChildProcess, ready: RegExp, what: string): Promise<() => string> {
  let output = '';
  return new Promise((resolve, reject) => {
    const timer = setTimeout(() => reject(new Error(`${what} did not start:\n${output}`)), 60_000);
    const read = (chunk: Buffer): void => {
      output += chunk.toString();
      if (ready.test(output)) {
        clearTimeout(timer);
        resolve(() => output);
      }
    };
    child.stdout?.on('data', read);
    child.stderr?.on('data', read);
    child.once('exit', (code) => reject(new Error(`${what} exited with ${code}:\n${output}`)));
  });
}

export interface RedisServer {
  readonly url: string;
  stop(): Promise<void>;
}

/** Debian's redis-server on a free loopback port, in a temporary directory, saving nothing. */
export async function startRedis(): Promise<RedisServer> {
  const dir = tempDir();
  const port = await freePort();
  const child = spawn(
    'redis-server',
    [
      '--port',
      String(port),
      '--bind',
      '127.0.0.1',
      '--dir',
      dir.path,
      '--save',
      '',
      '--appendonly',
      'no',
    ],
    { stdio: ['ignore', 'pipe', 'pipe'] },
  );
  await started(child, /Ready to accept connections/, 'redis-server');
  return {
    url: `redis://127.0.0.1:${port}`,
    async stop() {
      const exited = new Promise((resolve) => child.once('exit', resolve));
      child.kill('SIGTERM');
      await exited;
      dir.remove();
    },
  };
}

export interface WorkerProcess {
  readonly child: ChildProcess;
  output(): string;
  /** SIGTERM and wait for the exit. */
  stop(): Promise<void>;
  /** SIGKILL (no chance to give its chunks back) and wait for the exit. */
  kill(): Promise<void>;
}

/** `tremora worker` as its own process, on the queue at `url`. */
export async function startWorker(
  url: string,
  args: readonly string[] = [],
): Promise<WorkerProcess> {
  const child = spawn(process.execPath, ['--import', 'tsx', 'api/cli.ts', 'worker', ...args], {
    cwd: REPO_ROOT,
    env: { ...process.env, TREMORA_QUEUE: url },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  const output = await started(child, /taking chunks from/, 'tremora worker');
  const exited = new Promise<void>((resolve) => child.once('exit', () => resolve()));
  return {
    child,
    output,
    async stop() {
      child.kill('SIGTERM');
      await exited;
    },
    async kill() {
      child.kill('SIGKILL');
      await exited;
    },
  };
}
