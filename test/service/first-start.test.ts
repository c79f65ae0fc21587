import { spawnSync } from 'node:child_process';
import { rmSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
  REPO_ROOT,
  type ServiceProcess,
  startService,
  tempDir,
  waitFor,
} from './helpers/service-process.ts';

/**
 * A new user's first start, on the compiled build (api/bin/build.js, as `npm ci` and
 * `npm start` run it): the service prints the demo's page address, the demo is screened in the
 * background on worker threads loading the compiled worker module, and its community pages say
 * the screening is under way until they show results. The compiled CLI answers too.
 */
const BUILD = join(REPO_ROOT, 'test-artifacts', `build-${process.pid}`);

describe('first start of the compiled service', () => {
  const dir = tempDir();
  let service: ServiceProcess;

  beforeAll(async () => {
    const built = spawnSync(process.execPath, ['api/bin/build.js', '--out', BUILD], {
      cwd: REPO_ROOT,
      encoding: 'utf8',
    });
    expect(built.status, built.stderr).toBe(0);
    service = await startService({
      databasePath: join(dir.path, 'first.db'),
      nodeArgs: [join(BUILD, 'api/server.js')],
      env: { TREMORA_SCREEN_DEMO: '1', TREMORA_WORKERS: '1' },
    });
  });

  afterAll(async () => {
    await service?.stop();
    dir.remove();
    rmSync(BUILD, { recursive: true, force: true });
  });

  it('prints the address of the demo page, and the demo is screened without anyone asking', async () => {
    const opened = await waitFor(
      async () => service.output(),
      (o) => /open (http:\/\/\S+\/studies\/(\S+))/.test(o),
      100,
    );
    const match = /open http:\/\/\S+(\/studies\/(\S+))/.exec(opened);
    expect(match, opened).not.toBeNull();
    const [, path, studyId] = match as RegExpExecArray;
    expect(opened).toContain('the demo study is saved and being screened');
    expect(opened).not.toContain('/api/studies/');
    expect((await service.fetch(path as string)).status).toBe(200);

    const communityPath = `${path}/communities/harbour-point`;
    const runs = async () =>
      (
        (await (await service.fetch(`/api/studies/${studyId}/runs`)).json()) as {
          runs: { status: string }[];
        }
      ).runs;
    // The run is recorded once the study is measured on the quick thread.
    const first = await waitFor(runs, (r) => r.length > 0);
    expect(first).toHaveLength(1);
    const early = await (await service.fetch(communityPath)).text();
    const stillRunning = ((await runs())[0]?.status ?? '') !== 'done';
    if (stillRunning) expect(early).toContain('The screening of this study is under way');

    const finished = await waitFor(
      runs,
      (r) => r[0]?.status === 'done' || r[0]?.status === 'failed',
      1200,
      250,
    );
    expect(finished[0]?.status).toBe('done');
    const page = await (await service.fetch(communityPath)).text();
    expect(page).not.toContain('no results yet');
    expect(page).not.toContain('under way');
    expect(page).toContain('class="headline"');
  });

  it('runs the compiled CLI with no TypeScript loader', () => {
    const help = spawnSync(process.execPath, [join(BUILD, 'api/cli.js'), '--help'], {
      cwd: REPO_ROOT,
      encoding: 'utf8',
    });
    expect(help.status).toBe(0);
    expect(help.stdout).toContain('tremora screen STUDY');
    const check = spawnSync(
      process.execPath,
      [join(BUILD, 'api/cli.js'), 'check', 'data-demo/demo.study.json'],
      { cwd: REPO_ROOT, encoding: 'utf8' },
    );
    expect(check.stdout).toContain('valid — "Demo coast", 11 communities');
  });
});
