import { afterAll, beforeAll } from 'vitest';
import { type ChildProcess, spawn } from 'node:child_process';
import { join } from 'node:path';
import { REPO_ROOT, tempDir } from '../../helpers/repo-files.ts';

export { REPO_ROOT, tempDir };

const ADDRESS = /listening on (http:\/\/\S+)/;

/** A started service: a real process on a random loopback port with its own database. */
export interface ServiceProcess {
  /** Base URL, e.g. http://127.0.0.1:40213 (a 0.0.0.0 listener is reached over loopback). */
  readonly url: string;
  readonly child: ChildProcess;
  /** Everything written to stdout and stderr so far. */
  output(): string;
  fetch(path: string, init?: RequestInit): Promise<Response>;
  /** SIGTERM and wait for the exit code. */
  stop(): Promise<number | null>;
  /** SIGKILL (no chance to clean up) and wait for the exit. */
  kill(): Promise<void>;
}

export interface StartOptions {
  readonly databasePath: string;
  /** Node's arguments: the service from source by default, or a compiled entry such as dist/api/server.js. */
  readonly nodeArgs?: readonly string[];
  readonly env?: Readonly<Record<string, string>>;
}

/**
 * Spawns the service with PORT=0 and resolves once it prints its address. The demo is not
 * screened at first start (TREMORA_SCREEN_DEMO=0) unless `env` asks for it, so a test's runs
 * are only its own.
 */
export function startService(options: StartOptions): Promise<ServiceProcess> {
  const child = spawn(
    process.execPath,
    [...(options.nodeArgs ?? ['--import', 'tsx', 'api/server.ts'])],
    {
      cwd: REPO_ROOT,
      env: {
        ...process.env,
        PORT: '0',
        HOST: '127.0.0.1',
        TREMORA_DB: options.databasePath,
        TREMORA_TOKEN: '',
        TREMORA_SCREEN_DEMO: '0',
        ...options.env,
      },
      stdio: ['ignore', 'pipe', 'pipe'],
    },
  );
  let output = '';
  const exited = new Promise<number | null>((resolve) =>
    child.once('exit', (code) => resolve(code)),
  );
  return new Promise((resolve, reject) => {
    const onData = (chunk: Buffer) => {
      output += chunk.toString('utf8');
      const match = ADDRESS.exec(output);
      if (match) {
        child.stdout?.off('data', onData);
        child.stdout?.on('data', (more: Buffer) => (output += more.toString('utf8')));
        const url = (match[1] as string).replace('//0.0.0.0:', '//127.0.0.1:');
        resolve({
          url,
          child,
          output: () => output,
          fetch: (path, init) => fetch(`${url}${path}`, init),
          stop: async () => {
            child.kill('SIGTERM');
            return exited;
          },
          kill: async () => {
            child.kill('SIGKILL');
            await exited;
          },
        });
      }
    };
    child.stdout?.on('data', onData);
    child.stderr?.on('data', (chunk: Buffer) => (output += chunk.toString('utf8')));
    void exited.then((code) =>
      reject(new Error(`the service exited with code ${code} before listening:\n${output}`)),
    );
  });
}

/** Runs the service expecting it to refuse to start; resolves with its exit code and output. */
export function startExpectingRefusal(
  options: StartOptions,
): Promise<{ code: number | null; output: string }> {
  const child = spawn(process.execPath, ['--import', 'tsx', 'api/server.ts'], {
    cwd: REPO_ROOT,
    env: {
      ...process.env,
      PORT: '0',
      TREMORA_DB: options.databasePath,
      TREMORA_TOKEN: '',
      ...options.env,
    },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  let output = '';
  child.stdout?.on('data', (c: Buffer) => (output += c.toString('utf8')));
  child.stderr?.on('data', (c: Buffer) => (output += c.toString('utf8')));
  return new Promise((resolve) => child.once('exit', (code) => resolve({ code, output })));
}

/** Polls `read` until `done` holds (or gives up after `attempts`); no timing is asserted. */
export async function waitFor<T>(
  read: () => Promise<T>,
  done: (value: T) => boolean,
  attempts = 600,
  pauseMs = 100,
): Promise<T> {
  let value = await read();
  for (let i = 0; i < attempts && !done(value); i++) {
    await new Promise((r) => setTimeout(r, pauseMs));
    value = await read();
  }
  return value;
}

export const jsonInit = (
  method: string,
  body: unknown,
  headers: Record<string, string> = {},
): RequestInit => ({
  method,
  headers: { 'Content-Type': 'application/json', ...headers },
  body: typeof body === 'string' ? body : JSON.stringify(body),
});

/**
 * A service of its own for one test file (or describe block): started in a temporary folder
 * before its tests (database `<name>.db`, with `env` added to the environment) and stopped,
 * folder removed, after them. The object answers for
 * the started process once the tests run.
 */
export function serviceForFile(name: string, env?: Record<string, string>): ServiceProcess {
  const dir = tempDir();
  let started: ServiceProcess | undefined;
  const current = (): ServiceProcess => {
    if (!started) throw new Error(`the ${name} service is used before it has started`);
    return started;
  };
  beforeAll(async () => {
    started = await startService({ databasePath: join(dir.path, `${name}.db`), env });
  });
  afterAll(async () => {
    await started?.stop();
    dir.remove();
  });
  return {
    get url() {
      return current().url;
    },
    get child() {
      return current().child;
    },
    output: () => current().output(),
    fetch: (path, init) => current().fetch(path, init),
    stop: () => current().stop(),
    kill: () => current().kill(),
  };
}

/**
 * Services started one after another on one database kept for a test file (`<name>.db` in a
 * temporary folder), as a restart after a crash would find it: `start` starts one with a
 * single worker thread; after the file's tests, any still alive is stopped and the folder
 * removed.
 */
export function restartableService(name: string): {
  readonly databasePath: string;
  readonly start: () => Promise<ServiceProcess>;
} {
  const dir = tempDir();
  const databasePath = join(dir.path, `${name}.db`);
  const running: ServiceProcess[] = [];
  afterAll(async () => {
    for (const service of running)
      if (service.child.exitCode === null && service.child.signalCode === null)
        await service.stop();
    dir.remove();
  });
  const start = async (): Promise<ServiceProcess> => {
    const service = await startService({ databasePath, env: { TREMORA_WORKERS: '1' } });
    running.push(service);
    return service;
  };
  return { databasePath, start };
}
