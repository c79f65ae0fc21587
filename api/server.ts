import type { Server } from 'node:http';
import { serve } from '@hono/node-server';
import { modelCatalog } from './engine/motion/registry.ts';
import { createPages } from '../web/pages.tsx';
import { createApp } from './service/app.ts';
import { answerClientError } from './service/client-error.ts';
import { ConfigError, readConfig, type ServiceConfig } from './service/config.ts';
import { seedDemoStudy } from './operations/demo-seed.ts';
import { TOOL_VERSION } from './results/tool-version.ts';
import { openStore, type Store } from './store/store.ts';
import { RunScheduler } from './workers/run-scheduler.ts';
import { WorkerPool } from './workers/worker-pool.ts';

/**
 * `npm start`: the service on 127.0.0.1 (PORT, HOST, TREMORA_DB, TREMORA_TOKEN,
 * TREMORA_WORKERS, TREMORA_WORK_BUDGET; see README, Service), with the demo study
 * saved on the first start. SIGTERM or SIGINT stops it cleanly: runs still computing are
 * marked interrupted and the database is closed.
 */

function readConfigOrExit(): ServiceConfig {
  try {
    return readConfig(process.env);
  } catch (error) {
    if (!(error instanceof ConfigError)) throw error;
    console.error(`tremora: cannot start: ${error.message}`);
    process.exit(2);
  }
}

function seedOnFirstStart(store: Store): void {
  if (store.migration.fromVersion !== 0) return;
  const seed = seedDemoStudy(store, modelCatalog);
  if (seed.seeded) console.log(`new database: the demo study is saved as /api/studies/${seed.id}`);
  else console.error(`new database: the demo study was not saved, it does not validate:\n${seed.issues.map((i) => `  ${i.path}: ${i.message}`).join('\n')}`);
}

const urlHost = (host: string): string => (host.includes(':') && !host.startsWith('[') ? `[${host}]` : host);

const config = readConfigOrExit();
const store = openStore(config.databasePath);
if (store.interruptedAtOpen > 0) console.log(`${store.interruptedAtOpen} run(s) left unfinished by the previous process are marked interrupted`);
if (store.mapRunsInterruptedAtOpen > 0) console.log(`${store.mapRunsInterruptedAtOpen} map(s) left unfinished by the previous process are marked interrupted`);
seedOnFirstStart(store);

const runPool = new WorkerPool({ size: config.workers, name: 'tremora-run' });
const quickPool = new WorkerPool({ size: 1, name: 'tremora-quick' });
const scheduler = new RunScheduler({ store, pool: runPool, toolVersion: TOOL_VERSION });
const context = { store, scheduler, runPool, quickPool, models: modelCatalog, toolVersion: TOOL_VERSION, workBudget: config.workBudget };
const app = createApp(context, { pages: createPages(context, { token: config.token }), ...(config.token === undefined ? {} : { token: config.token }) });

const server = serve({ fetch: app.fetch, hostname: config.host, port: config.port }, (info) => {
  console.log(`Tremora ${TOOL_VERSION} is listening on http://${urlHost(config.host)}:${info.port}`);
  console.log(`database: ${config.databasePath}; ${runPool.size} worker thread(s) for runs`);
}) as Server;

// Requests Node's parser refuses get the one error shape too (client-error.ts).
server.on('clientError', answerClientError);
server.on('error', (error: NodeJS.ErrnoException) => {
  const why = error.code === 'EADDRINUSE' ? `port ${config.port} on ${config.host} is in use; set PORT to another port` : error.message;
  console.error(`tremora: cannot listen: ${why}`);
  process.exit(1);
});

let stopping = false;
async function stop(signal: string): Promise<void> {
  if (stopping) process.exit(1);
  stopping = true;
  console.log(`${signal}: stopping`);
  server.close();
  server.closeIdleConnections();
  await Promise.all([runPool.close(), quickPool.close()]);
  // The scheduler records interrupted runs as the pool's rejections arrive; catch any left.
  await new Promise((resolve) => setImmediate(resolve));
  store.runs.interruptUnfinished();
  store.maps.interruptUnfinished();
  store.close();
  process.exit(0);
}
process.on('SIGTERM', () => void stop('SIGTERM'));
process.on('SIGINT', () => void stop('SIGINT'));
