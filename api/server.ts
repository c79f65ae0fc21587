import type { AddressInfo } from 'node:net';
import { dirname, join } from 'node:path';
import { modelCatalog } from './engine/motion/registry.ts';
import { startScreening } from './operations/start-screening.ts';
import { createPages } from '../web/pages.tsx';
import { BundleFileError } from '../web/text/text-bundles.ts';
import { createApp } from './service/app.ts';
import { answerClientError } from './service/client-error.ts';
import { ConfigError, readConfig, type ServiceConfig } from './service/config.ts';
import { createNodeServer } from './service/node-listener.ts';
import { seedDemoStudy } from './operations/demo-seed.ts';
import { TOOL_VERSION } from './results/tool-version.ts';
import { DatabaseRefused } from './store/database-file.ts';
import { openStore, type Store } from './store/store.ts';
import { RunScheduler } from './jobs/run-scheduler.ts';
import { ChunkQueue } from './queue/chunk-queue.ts';
import { QueueSettingError, queueUrlFrom } from './queue/queue-setting.ts';
import { WorkerPool } from './workers/worker-pool.ts';

/**
 * `npm start`: the service on 127.0.0.1 (PORT, HOST, TREMORA_DB, TREMORA_TOKEN,
 * TREMORA_WORKERS, TREMORA_WORK_BUDGET, TREMORA_QUEUE; see README, Service and Running a cluster), with the demo study
 * saved on the first start. SIGTERM or SIGINT stops it cleanly: runs still computing are
 * marked interrupted and the database is closed.
 */

/** `read()`; when it throws a setting error of `kind`, says why the service cannot start and exits 2. */
function settingOrExit<T>(read: () => T, kind: new (message: string) => Error): T {
  try {
    return read();
  } catch (error) {
    if (!(error instanceof kind)) throw error;
    console.error(`tremora: cannot start: ${error.message}`);
    process.exit(2);
  }
}

const readConfigOrExit = (): ServiceConfig =>
  settingOrExit(() => readConfig(process.env), ConfigError);

/** The demo study's id when this start saved it (a new database), else undefined. */
function seedOnFirstStart(store: Store): string | undefined {
  if (store.migration.fromVersion !== 0) return undefined;
  const seed = seedDemoStudy(store, modelCatalog);
  if (seed.seeded) return seed.id;
  console.error(
    `new database: the demo study was not saved, it does not validate:\n${seed.issues.map((i) => `  ${i.path}: ${i.message}`).join('\n')}`,
  );
  return undefined;
}

/** The Redis URL of TREMORA_QUEUE (README, Running a cluster), when set; checked before anything opens. */
const queueUrlOrExit = (): string | undefined =>
  settingOrExit(() => queueUrlFrom(process.env), QueueSettingError);

async function openQueue(url: string | undefined): Promise<ChunkQueue | undefined> {
  if (url === undefined) return undefined;
  const queue = await ChunkQueue.open({ url });
  console.log(`map chunks and large screenings go to the queue at ${new URL(url).host}`);
  return queue;
}

const urlHost = (host: string): string =>
  host.includes(':') && !host.startsWith('[') ? `[${host}]` : host;

function openStoreOrExit(path: string): Store {
  try {
    return openStore(path);
  } catch (error) {
    if (!(error instanceof DatabaseRefused)) throw error;
    console.error(`tremora: cannot start: ${error.message}`);
    process.exit(2);
  }
}

const config = readConfigOrExit();
const queueUrl = queueUrlOrExit();
const store = openStoreOrExit(config.databasePath);
if (store.interruptedAtOpen > 0)
  console.log(
    `${store.interruptedAtOpen} run(s) left unfinished by the previous process are marked interrupted`,
  );
if (store.mapRunsInterruptedAtOpen > 0)
  console.log(
    `${store.mapRunsInterruptedAtOpen} map(s) left unfinished by the previous process are marked interrupted`,
  );
const demoId = seedOnFirstStart(store);

const runPool = new WorkerPool({ size: config.workers, name: 'tremora-run' });
const quickPool = new WorkerPool({ size: 1, name: 'tremora-quick' });
const queue = await openQueue(queueUrl);
const scheduler = new RunScheduler({
  store,
  pool: runPool,
  toolVersion: TOOL_VERSION,
  ...(queue ? { chunks: queue } : {}),
});
const context = {
  store,
  scheduler,
  runPool,
  quickPool,
  models: modelCatalog,
  toolVersion: TOOL_VERSION,
  workBudget: config.workBudget,
  quickLimitS: config.quickLimitS,
  ...(queue ? { queue } : {}),
};
/** The pages; a text bundle that cannot be read stops the start with its file and problem. */
function createPagesOrExit(): ReturnType<typeof createPages> {
  try {
    return createPages(context, {
      token: config.token,
      // Imported translations live beside the SQLite file (README, Translating Tremora).
      importedTextDir:
        config.databasePath === ':memory:' ? undefined : join(dirname(config.databasePath), 'text'),
    });
  } catch (error) {
    if (!(error instanceof BundleFileError)) throw error;
    console.error(`tremora: cannot start: ${error.message}`);
    store.close();
    process.exit(2);
  }
}

const app = createApp(context, {
  pages: createPagesOrExit(),
  ...(config.token === undefined ? {} : { token: config.token }),
  ...(config.allowedHosts === undefined ? {} : { allowedHosts: config.allowedHosts }),
});

// A new database's demo is screened at once, in the background, so its pages have results
// by the time a person opens them (they say the screening is under way until then).
if (demoId !== undefined && config.screenDemo) {
  const demo = store.studies.get(demoId);
  if (demo)
    startScreening(context, demo).catch((error: unknown) =>
      console.error(
        `the demo study could not be screened: ${error instanceof Error ? error.message : String(error)}`,
      ),
    );
}

const server = createNodeServer({ fetch: app.fetch, hostname: config.host });
server.listen(config.port, config.host, () => {
  const origin = `http://${urlHost(config.host)}:${(server.address() as AddressInfo).port}`;
  console.log(`Tremora ${TOOL_VERSION} is listening on ${origin}`);
  console.log(`database: ${config.databasePath}; ${runPool.size} worker thread(s) for runs`);
  if (demoId !== undefined)
    console.log(
      `new database: the demo study is saved${config.screenDemo ? ' and being screened' : ''}; open ${origin}/studies/${demoId}`,
    );
  else console.log(`open ${origin}/ in a browser`);
});

// Requests Node's parser refuses get the one error shape too (client-error.ts).
server.on('clientError', answerClientError);
server.on('error', (error: NodeJS.ErrnoException) => {
  const why =
    error.code === 'EADDRINUSE'
      ? `port ${config.port} on ${config.host} is in use; set PORT to another port`
      : `${error.message}; set HOST to an address of this machine`;
  console.error(
    `tremora: cannot start: cannot listen on ${urlHost(config.host)}:${config.port}: ${why}`,
  );
  store.close();
  process.exit(2);
});

let stopping = false;
async function stop(signal: string): Promise<void> {
  if (stopping) process.exit(1);
  stopping = true;
  console.log(`${signal}: stopping`);
  server.close();
  server.closeIdleConnections();
  await Promise.all([runPool.close(), quickPool.close(), queue?.close()]);
  // The scheduler records interrupted runs as the pool's rejections arrive; catch any left.
  await new Promise((resolve) => setImmediate(resolve));
  store.runs.interruptUnfinished();
  store.maps.interruptUnfinished();
  store.close();
  process.exit(0);
}
process.on('SIGTERM', () => void stop('SIGTERM'));
process.on('SIGINT', () => void stop('SIGINT'));
