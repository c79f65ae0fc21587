import { copyFile, mkdtemp, readFile, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { normalSurvival } from '../../api/engine/hazard/normal-cdf.ts';
import { expectRelative } from '../helpers/close.ts';
import { expectCheckedValid, runCapturing as run, runJson } from './helpers/run-cli.ts';

const TINY = new URL('fixtures/tiny.study.json', import.meta.url).pathname;
const DEMO = new URL('../../data-demo/demo.study.json', import.meta.url).pathname;

/** Cornell et al. (1979) as Baker (2008) states it: mean ln PGA = −0.152 + 0.859 M − 1.803 ln(R + 25), σ = 0.57. */
const cornellLnPga = (m: number, rKm: number) => -0.152 + 0.859 * m - 1.803 * Math.log(rKm + 25);

describe('tremora check', () => {
  it('says a valid study is valid and exits 0', async () => {
    await expectCheckedValid(DEMO, /valid — "Demo coast", 11 communities, 6 sources/);
  });

  it('prints every problem of a broken copy with its path and exits 2', async () => {
    const dir = await mkdtemp(join(tmpdir(), 'tremora-cli-'));
    const study = JSON.parse(await readFile(DEMO, 'utf8'));
    study.sources.features[2].properties.dip = 120;
    study.communities[0].lat = 'south';
    // The copy sits apart from the demo's terrain grid, which a check would report missing.
    delete study.terrain;
    // The demo uses the default branches; a study naming its own with weights off by 0.1 is refused.
    study.groundMotion = {
      crustal: [
        { model: 'BSSA14', weight: 0.5 },
        { model: 'CB14', weight: 0.4 },
      ],
    };
    const broken = join(dir, 'broken.study.json');
    await writeFile(broken, JSON.stringify(study));
    const { code, err } = await run('check', broken);
    expect(code).toBe(2);
    expect(err).toContain('3 problems');
    expect(err).toContain(
      'sources.features[2].properties.dip: expected a number in (0, 90] degrees, got 120',
    );
    expect(err).toContain(
      'communities[0].lat: expected a number in [-90, 90] degrees, got "south"',
    );
    expect(err).toContain('groundMotion.crustal: expected weights summing to 1');
    const json = await run('check', broken, '--json');
    expect(json.code).toBe(2);
    expect(JSON.parse(json.out).issues).toHaveLength(3);
  });

  it('reads a communities CSV named by the study, relative to it', async () => {
    const dir = await mkdtemp(join(tmpdir(), 'tremora-cli-'));
    const study = JSON.parse(await readFile(DEMO, 'utf8'));
    study.communities = 'villages.csv';
    await writeFile(join(dir, 'demo.study.json'), JSON.stringify(study));
    await copyFile(
      new URL('../../data-demo/villages.csv', import.meta.url),
      join(dir, 'villages.csv'),
    );
    const { code, out } = await run('check', join(dir, 'demo.study.json'));
    expect(code).toBe(0);
    expect(out).toContain('11 communities');
  });

  it('exits 2 with usage on a missing file, an unknown verb or option', async () => {
    expect((await run('check', '/nonexistent/x.study.json')).code).toBe(2);
    const unknown = await run('frobnicate');
    expect(unknown.code).toBe(2);
    expect(unknown.err).toContain('unknown verb "frobnicate"');
    expect((await run('check', DEMO, '--bogus')).code).toBe(2);
    expect((await run('--help')).code).toBe(0);
  });

  it('says a mistyped option, a missing value and a stray argument in its own words, quotes balanced', async () => {
    const mistyped = await run('screen', TINY, '--ot', 'x.json');
    expect(mistyped.code).toBe(2);
    expect(mistyped.err).toContain(
      'tremora screen: unknown option "--ot"; the options are listed below',
    );
    const missing = await run('screen', TINY, '--out');
    expect(missing.err).toContain('tremora screen: option "--out" needs a value');
    const flag = await run('screen', TINY, '--json=yes');
    expect(flag.err).toContain('tremora screen: option "--json" takes no value');
    const stray = await run('motion', 'extra', '--model', 'Cornell79');
    expect(stray.err).toContain('tremora motion: unexpected argument "extra"');
    for (const { err } of [mistyped, missing, flag, stray]) {
      const firstLine = err.split('\n')[0] ?? '';
      expect(firstLine).not.toMatch(/'/);
      expect((firstLine.match(/"/g) ?? []).length % 2).toBe(0);
    }
  });

  it('lists each verb in the overall help with the first line of its own help', async () => {
    const { VERB_SYNOPSES } = await import('../../api/cli.ts');
    const overall = (await run('--help')).out;
    for (const [verb, synopsis] of Object.entries(VERB_SYNOPSES)) {
      expect(overall).toContain(synopsis);
      expect((await run(verb, '--help')).out.split('\n')[0]).toBe(synopsis);
    }
  });

  it('points to no file the project does not have', async () => {
    for (const verb of ['screen', 'check', 'scenario', 'map', 'motion', 'catalog'])
      expect((await run(verb, '--help')).out).not.toContain('DESIGN.md');
  });
});

describe('tremora motion --json', () => {
  /** An M 6.5 earthquake 20 km away (Rjb) by `model`, as JSON. */
  const m65At20Km = (model: string) =>
    runJson('motion', '--model', model, '--magnitude', '6.5', '--rjb', '20');

  it('prints the median in g and the sigmas in natural-log units', async () => {
    const result = await m65At20Km('Cornell79');
    // Default hypocentral depth 10 km: R = sqrt(20² + 10²).
    expectRelative(
      result.measures.PGA.median,
      Math.exp(cornellLnPga(6.5, Math.hypot(20, 10))),
      1e-12,
      'Cornell et al. (1979) via Baker (2008)',
    );
    expect(result.measures.PGA).toMatchObject({ unit: 'g', sigma: 0.57, tau: 0, phi: 0.57 });
  });

  it('exits 2 naming a bad number and an unknown model', async () => {
    const bad = await run('motion', '--model', 'Cornell79', '--magnitude', 'big', '--rjb', '20');
    expect(bad.code).toBe(2);
    expect(bad.err).toContain('--magnitude: expected a number, got "big"');
    const unknown = await run('motion', '--model', 'NOPE', '--magnitude', '6', '--rjb', '20');
    expect(unknown.code).toBe(2);
    expect(unknown.err).toContain('unknown ground-motion model "NOPE"');
  });

  it('for the subduction model: the hypocentral distance it used, only the assumptions it reads, a derived PGV said so', async () => {
    const slab = await run(
      'motion',
      '--model',
      'AGA16',
      '--magnitude',
      '7',
      '--rjb',
      '30',
      '--setting',
      'intraslab',
    );
    expect(slab.code).toBe(0);
    // Default intraslab hypocentral depth 60 km: Rhypo = sqrt(30² + 60²) = 67.08 km (geometry).
    expect(slab.out).toContain("distance in the model's equations: Rhypo (hypocentral) 67.1 km");
    expect(slab.out).toContain('Rhypo 67.1 km');
    // An M 8 interface earthquake 40 km from the site (Rrup), right under it (Rjb 0).
    const interfaceMotion = [
      ...['motion', '--model', 'AGA16', '--magnitude', '8'],
      ...['--rjb', '0', '--rrup', '40', '--setting', 'interface'],
    ];
    const iface = await run(...interfaceMotion);
    expect(iface.out).toContain("distance in the model's equations: Rrup 40 km");
    const assumed = iface.out.split('\n').find((l) => l.startsWith('assumed:')) ?? '';
    // Abrahamson et al. (2016) interface equations read M, Rrup and Vs30 only.
    expect(assumed).not.toMatch(/hypoDepthKm|dipDeg|widthKm|rxKm|mechanism/);
    expect(iface.out).toMatch(/not read by AGA16 for interface earthquakes: .*hypoDepthKm/);
    expect(iface.out).toMatch(
      /PGV .*derived, not predicted by the model: PGV derived from SA\(0\.5 s\) \/ 20 \(Bommer & Alarcón 2006\)/,
    );
    const json = JSON.parse((await run(...interfaceMotion, '--json')).out);
    expect(json.distanceUsed).toBe('rrupKm');
    expect(json.measures.PGV.derived).toMatch(/Bommer & Alarcón 2006/);
    expect(json.measures.PGA.derived).toBeNull();
  });

  it('takes a model name in any case', async () => {
    const lower = await m65At20Km('cornell79');
    expect(lower.model).toBe('Cornell79');
    expectRelative(
      lower.measures.PGA.median,
      Math.exp(cornellLnPga(6.5, Math.hypot(20, 10))),
      1e-12,
      'Cornell et al. (1979) via Baker (2008)',
    );
  });
});

describe('tremora screen', () => {
  it('gives the result keys of the study format, with the hazard of a point source below the village', async () => {
    const result = await runJson('screen', TINY);
    const [c] = result.communities;
    expect(Object.keys(c)).toEqual(
      expect.arrayContaining([
        'curves',
        'atReturnPeriod',
        'chanceOfExceeding',
        'intensity',
        'deaggregation',
        'nearestFaults',
        'band',
      ]),
    );
    expect(result.provenance).toMatchObject({
      tool: 'tremora',
      models: { crustal: [{ model: 'Cornell79', weight: 1 }] },
    });
    expect(result.provenance.inputHash).toMatch(/^[0-9a-f]{64}$/);
    // One M 6.5 event a century, 10 km straight below: rate(PGA > x) = 0.01 P(ε > e) with the
    // lognormal truncated at ±3σ (Baker 2008 eq. for the hazard integral).
    const lnMedian = cornellLnPga(6.5, 10);
    const q3 = normalSurvival(3);
    c.curves.PGA.levels.forEach((level: number, i: number) => {
      const e = (Math.log(level) - lnMedian) / 0.57;
      const expected =
        e >= 3 ? 0 : e <= -3 ? 0.01 : (0.01 * (normalSurvival(e) - q3)) / (1 - 2 * q3);
      expectRelative(c.curves.PGA.annualRate[i], expected, 1e-9, `annual rate at ${level} g`);
    });
  });

  it('writes CSV with --format csv --out', async () => {
    const dir = await mkdtemp(join(tmpdir(), 'tremora-cli-'));
    const file = join(dir, 'out.csv');
    const { code } = await run('screen', TINY, '--format', 'csv', '--out', file);
    expect(code).toBe(0);
    const [header, row] = (await readFile(file, 'utf8')).split('\r\n');
    expect(header?.split(',').slice(0, 3)).toEqual(['communityId', 'name', 'lon']);
    expect(row?.startsWith('east-cove,East Cove,')).toBe(true);
  });

  it('writes the file with --json --out as well as printing the JSON', async () => {
    const dir = await mkdtemp(join(tmpdir(), 'tremora-cli-'));
    const file = join(dir, 'out.json');
    const { code, out } = await run('screen', TINY, '--json', '--out', file);
    expect(code).toBe(0);
    const written = JSON.parse(await readFile(file, 'utf8'));
    expect(written.communities[0].name).toBe('East Cove');
    expect(JSON.parse(out).communities[0].curves).toEqual(written.communities[0].curves);
  });

  it("takes the study's model names in any case and keeps the catalog's spelling", async () => {
    const dir = await mkdtemp(join(tmpdir(), 'tremora-cli-'));
    const study = JSON.parse(await readFile(TINY, 'utf8'));
    study.groundMotion.crustal[0].model = 'CORNELL79';
    const file = join(dir, 'upper.study.json');
    await writeFile(file, JSON.stringify(study));
    const result = await runJson('screen', file);
    expect(result.provenance.models.crustal).toEqual([{ model: 'Cornell79', weight: 1 }]);
  });
});

describe('tremora scenario', () => {
  it('prints medians at every community and exits 2 on an unknown source', async () => {
    const result = await runJson('scenario', TINY, '--source', 'below', '--magnitude', '6.5');
    expectRelative(
      result.communities[0].motions.PGA.median,
      Math.exp(cornellLnPga(6.5, 10)),
      1e-6,
      'Cornell et al. (1979) at R = 10 km',
    );
    const bad = await run('scenario', TINY, '--source', 'nope', '--magnitude', '6.5');
    expect(bad.code).toBe(2);
    expect(bad.err).toContain('sourceId: unknown source "nope"');
  });
});
