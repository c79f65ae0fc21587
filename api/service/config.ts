import { DEFAULT_QUICK_LIMIT_S } from '../operations/quick-task.ts';
import { isIP } from 'node:net';
import { resolve } from 'node:path';
import { DEFAULT_DATABASE_PATH } from '../store/store.ts';
import { defaultPoolSize } from '../workers/worker-pool.ts';
import { DEFAULT_WORK_BUDGET } from '../operations/work-budget.ts';
import { LOOPBACK_HOST_NAMES, hostNameOf } from './allowed-hosts.ts';

/** Port used when PORT is not set (our choice: unassigned by IANA and rarely taken locally). */
export const DEFAULT_PORT = 8357;
/** Loopback only, unless HOST says otherwise. */
export const DEFAULT_HOST = '127.0.0.1';
/** Shortest access token accepted: 16 random characters of the token alphabet carry about 96 bits. */
export const MIN_TOKEN_LENGTH = 16;
/** The characters of an RFC 6750 bearer token (the form hono's bearer-auth checks). */
const TOKEN_PATTERN = /^[A-Za-z0-9._~+/-]+=*$/;
const MAX_WORKERS = 64;

export interface ServiceConfig {
  readonly host: string;
  readonly port: number;
  /** Absolute path of the SQLite file. */
  readonly databasePath: string;
  readonly token?: string;
  readonly workers: number;
  readonly workBudget: number;
  /** How long one request may keep the quick thread, s (TREMORA_QUICK_LIMIT_S). */
  readonly quickLimitS: number;
  /** Screen the demo study in the background when a new database saves it (TREMORA_SCREEN_DEMO=0: no). */
  readonly screenDemo: boolean;
  /** Host names the service answers to (allowed-hosts.ts); undefined: any, the token guarding it. */
  readonly allowedHosts?: readonly string[];
}

/** The environment asks for something the service will not do; the message says what to set. */
export class ConfigError extends Error {
  override name = 'ConfigError';
}

/** True for names and addresses that reach only this machine. */
export function isLoopbackHost(host: string): boolean {
  const bare = host.replace(/^\[(.*)\]$/, '$1').toLowerCase();
  if (bare === 'localhost') return true;
  if (isIP(bare) === 4) return bare.startsWith('127.');
  if (isIP(bare) === 6) return bare === '::1' || bare === '0:0:0:0:0:0:0:1';
  return false;
}

function integerIn(
  env: NodeJS.ProcessEnv,
  name: string,
  min: number,
  max: number,
  fallback: number,
): number {
  const text = env[name];
  if (text === undefined || text.trim() === '') return fallback;
  const value = Number(text);
  if (!Number.isInteger(value) || value < min || value > max) {
    throw new ConfigError(`${name} must be a whole number from ${min} to ${max}, got "${text}"`);
  }
  return value;
}

/** Addresses that listen on every interface: the names clients use cannot be known from them. */
const WILDCARD_HOSTS = new Set(['0.0.0.0', '::', '[::]']);

/**
 * The names the Host header may carry: TREMORA_HOSTS (comma-separated) when set, with the
 * loopback names; else the loopback names and HOST. A service listening on every interface
 * without TREMORA_HOSTS answers to any name (its token guards it, as any other client's).
 */
function readAllowedHosts(env: NodeJS.ProcessEnv, host: string): readonly string[] | undefined {
  const listed = env.TREMORA_HOSTS?.split(',')
    .map((name) => name.trim())
    .filter((name) => name !== '');
  if (listed !== undefined && listed.length > 0) {
    const names = listed.map((name) => {
      const bare = hostNameOf(isIP(name) === 6 ? `[${name}]` : name);
      if (bare === undefined)
        throw new ConfigError(
          `TREMORA_HOSTS must list host names or addresses separated by commas, got "${name}"`,
        );
      return bare;
    });
    return [...new Set([...LOOPBACK_HOST_NAMES, ...names])];
  }
  if (WILDCARD_HOSTS.has(host)) return undefined;
  const own = hostNameOf(isIP(host) === 6 ? `[${host}]` : host);
  return [...new Set([...LOOPBACK_HOST_NAMES, ...(own === undefined ? [] : [own])])];
}

/**
 * The service's settings from the environment: PORT, HOST, TREMORA_DB, TREMORA_TOKEN,
 * TREMORA_WORKERS, TREMORA_WORK_BUDGET, TREMORA_QUICK_LIMIT_S, TREMORA_HOSTS. Listening beyond loopback requires a
 * token.
 */
export function readConfig(
  env: NodeJS.ProcessEnv,
  cwd: string = process.cwd(),
  cores?: number,
): ServiceConfig {
  // An IPv6 address is listened on bare; "[::1]" is how URLs write it, so both are accepted.
  const host = (env.HOST?.trim() || DEFAULT_HOST).replace(/^\[(.*)\]$/, '$1');
  const token =
    env.TREMORA_TOKEN === undefined || env.TREMORA_TOKEN === '' ? undefined : env.TREMORA_TOKEN;
  if (token !== undefined && (token.length < MIN_TOKEN_LENGTH || !TOKEN_PATTERN.test(token))) {
    throw new ConfigError(
      `TREMORA_TOKEN must be at least ${MIN_TOKEN_LENGTH} characters of letters, digits and . _ ~ + / - (for example the output of "openssl rand -base64 24")`,
    );
  }
  if (!isLoopbackHost(host) && token === undefined) {
    throw new ConfigError(
      `HOST=${host} would accept requests from other machines; set TREMORA_TOKEN (at least ${MIN_TOKEN_LENGTH} characters) so that only holders of the token can write or compute, or leave HOST unset to listen on ${DEFAULT_HOST} only`,
    );
  }
  const databasePath = env.TREMORA_DB?.trim() ? env.TREMORA_DB.trim() : DEFAULT_DATABASE_PATH;
  const allowed = readAllowedHosts(env, host);
  return {
    host,
    port: integerIn(env, 'PORT', 0, 65_535, DEFAULT_PORT),
    databasePath: databasePath === ':memory:' ? databasePath : resolve(cwd, databasePath),
    ...(token === undefined ? {} : { token }),
    workers: integerIn(env, 'TREMORA_WORKERS', 1, MAX_WORKERS, defaultPoolSize(cores)),
    workBudget: integerIn(
      env,
      'TREMORA_WORK_BUDGET',
      1,
      Number.MAX_SAFE_INTEGER,
      DEFAULT_WORK_BUDGET,
    ),
    quickLimitS: integerIn(env, 'TREMORA_QUICK_LIMIT_S', 1, 3_600, DEFAULT_QUICK_LIMIT_S),
    screenDemo: integerIn(env, 'TREMORA_SCREEN_DEMO', 0, 1, 1) === 1,
    ...(allowed === undefined ? {} : { allowedHosts: allowed }),
  };
}
