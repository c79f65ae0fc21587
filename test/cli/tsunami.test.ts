import { copyFile, mkdtemp, readFile, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { runCapturing as run } from './helpers/run-cli.ts';

const TINY = new URL('fixtures/tiny.study.json', import.meta.url).pathname;
const DEMO = new URL('../../data-demo/demo.study.json', import.meta.url).pathname;
const DEMO_TERRAIN = new URL('../../data-demo/demo-terrain.asc', import.meta.url).pathname;

describe('tremora tsunami', () => {
  it('lists every coastal community of the demo with its id and first arrival in whole minutes (--json)', async () => {
    const { code, out } = await run('tsunami', DEMO, '--source', 'orle-interface', '--json');
    expect(code).toBe(0);
    const result = JSON.parse(out) as {
      communities: {
        id: string;
        firstArrivalMinutes: number;
        latestMinutes: number;
        highGround: { kind: string };
      }[];
      caution: string;
    };
    const demo = JSON.parse(await readFile(DEMO, 'utf8')) as {
      communities: { id: string; coastal: boolean }[];
    };
    expect(result.communities.map((c) => c.id)).toEqual(
      demo.communities.filter((c) => c.coastal).map((c) => c.id),
    );
    for (const c of result.communities) {
      expect(Number.isInteger(c.firstArrivalMinutes) && c.firstArrivalMinutes >= 0).toBe(true);
      expect(c.latestMinutes).toBeGreaterThan(c.firstArrivalMinutes);
      expect(['found', 'already-above']).toContain(c.highGround.kind);
    }
    expect(result.caution).toMatch(/not a warning/);
  });

  it('prints a table with the caution', async () => {
    const { code, out } = await run('tsunami', DEMO);
    expect(code).toBe(0);
    expect(out).toMatch(/Harbour Point\s+\d+–\d+ min/);
    expect(out).toMatch(/not a warning/);
  });

  it('refuses a study without a terrain grid, and an unknown source, with exit 2', async () => {
    const none = await run('tsunami', TINY);
    expect(none.code).toBe(2);
    expect(none.err).toMatch(/terrain: .*names no terrain grid/);
    const unknown = await run('tsunami', DEMO, '--source', 'vennick-fault');
    expect(unknown.code).toBe(2);
    expect(unknown.err).toMatch(/not an interface source of the study: vennick-fault/);
  });

  it('names a community flagged coastal far from the sea, and exits 2', async () => {
    const dir = await mkdtemp(join(tmpdir(), 'tremora-tsunami-'));
    const study = JSON.parse(await readFile(DEMO, 'utf8')) as {
      communities: { id: string; coastal: boolean }[];
    };
    for (const c of study.communities) if (c.id === 'drumarrow') c.coastal = true;
    await writeFile(join(dir, 'inland.study.json'), JSON.stringify(study));
    await copyFile(DEMO_TERRAIN, join(dir, 'demo-terrain.asc'));
    const { code, err } = await run('tsunami', join(dir, 'inland.study.json'));
    expect(code).toBe(2);
    expect(err).toMatch(/community "drumarrow" \(Drumarrow\).*no sea within 5 km/);
  });
});
