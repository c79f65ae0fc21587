import { describe, expect, it } from 'vitest';
import { ConfigError, DEFAULT_PORT, isLoopbackHost, readConfig } from '../../api/service/config.ts';
import { DEFAULT_WORK_BUDGET } from '../../api/operations/work-budget.ts';

const TOKEN = 'test-token-0123456789abcdef';

describe('readConfig', () => {
  it('defaults to loopback, the default port, .tremora/tremora.db under the working directory, cores - 1 workers, 60 s on the quick thread', () => {
    expect(readConfig({}, '/srv/tremora', 4)).toEqual({
      host: '127.0.0.1',
      port: DEFAULT_PORT,
      databasePath: '/srv/tremora/.tremora/tremora.db',
      workers: 3,
      workBudget: DEFAULT_WORK_BUDGET,
      quickLimitS: 60,
      screenDemo: true,
      allowedHosts: ['localhost', '127.0.0.1', '[::1]'],
    });
  });

  it('leaves the demo unscreened at first start with TREMORA_SCREEN_DEMO=0, and refuses other values', () => {
    expect(readConfig({ TREMORA_SCREEN_DEMO: '0' }).screenDemo).toBe(false);
    expect(readConfig({ TREMORA_SCREEN_DEMO: '1' }).screenDemo).toBe(true);
    expect(() => readConfig({ TREMORA_SCREEN_DEMO: 'no' })).toThrow(
      'TREMORA_SCREEN_DEMO must be a whole number from 0 to 1, got "no"',
    );
  });

  it('listens on an IPv6 address written with or without brackets', () => {
    expect(readConfig({ HOST: '[::1]' }).host).toBe('::1');
    expect(readConfig({ HOST: '::1' }).host).toBe('::1');
  });

  it('reads PORT, TREMORA_DB, TREMORA_WORKERS and TREMORA_WORK_BUDGET', () => {
    const config = readConfig(
      { PORT: '0', TREMORA_DB: 'data/x.db', TREMORA_WORKERS: '2', TREMORA_WORK_BUDGET: '1000' },
      '/w',
      8,
    );
    expect(config).toMatchObject({
      port: 0,
      databasePath: '/w/data/x.db',
      workers: 2,
      workBudget: 1000,
    });
  });

  it('refuses to listen beyond loopback without a token', () => {
    expect(() => readConfig({ HOST: '0.0.0.0' })).toThrow(ConfigError);
    expect(() => readConfig({ HOST: '0.0.0.0' })).toThrow(/set TREMORA_TOKEN/);
    expect(readConfig({ HOST: '0.0.0.0', TREMORA_TOKEN: TOKEN })).toMatchObject({
      host: '0.0.0.0',
      token: TOKEN,
    });
  });

  it('refuses short or malformed tokens and bad numbers, naming the variable', () => {
    expect(() => readConfig({ TREMORA_TOKEN: 'short' })).toThrow(
      /TREMORA_TOKEN must be at least 16 characters/,
    );
    expect(() => readConfig({ TREMORA_TOKEN: 'has spaces in it, not allowed' })).toThrow(
      /TREMORA_TOKEN/,
    );
    expect(() => readConfig({ PORT: '70000' })).toThrow(
      'PORT must be a whole number from 0 to 65535, got "70000"',
    );
    expect(() => readConfig({ TREMORA_WORKERS: '0' })).toThrow(
      /TREMORA_WORKERS must be a whole number from 1/,
    );
  });
});

describe('isLoopbackHost', () => {
  it('knows loopback names and addresses', () => {
    for (const host of ['127.0.0.1', '127.1.2.3', 'localhost', '::1', '[::1]'])
      expect(isLoopbackHost(host), host).toBe(true);
    for (const host of ['0.0.0.0', '::', '192.168.1.4', 'example.invalid', '10.0.0.1'])
      expect(isLoopbackHost(host), host).toBe(false);
  });
});
