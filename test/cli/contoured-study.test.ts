import { mkdtemp, readFile, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import type { StudyResult } from '../../api/engine/results.ts';
import { expectClose } from '../helpers/close.ts';
import { expectCheckedValid, runCapturing as run } from './helpers/run-cli.ts';

/**
 * `tremora check` and `tremora screen` on a study whose interface is given by depth contours
 * (fixtures/slab.study.json, invented, in open ocean): contours north-south at 140.6° W (5 km),
 * 140.4° W (20 km) and 140.1° W (35 km); Over Cove at 140.3° W over the mesh, Far Hill at
 * 139.7° W beyond its deep edge.
 */
const SLAB = new URL('fixtures/slab.study.json', import.meta.url).pathname;

describe('a study with a contoured source on the command line', () => {
  it('is checked valid', async () => {
    await expectCheckedValid(
      SLAB,
      /valid — "Slab test shore \(invented\)", 2 communities, 2 sources/,
    );
  });

  it('is screened: the slab is said below the village over it, away from the one beyond it', async () => {
    const { code, out } = await run('screen', SLAB, '--json');
    expect(code).toBe(0);
    const result = JSON.parse(out) as StudyResult;
    const slabOf = (id: string) =>
      result.communities
        .find((c) => c.communityId === id)
        ?.nearestFaults.find((f) => f.sourceId === 'slab-top');
    // One third of the way from the 20 km contour to the 35 km one: 25 km (hand calculation;
    // the mesh is planar between two straight contours). 0.05 km allows for the local projection
    // bending the meridians by metres.
    const over = slabOf('over-cove');
    expect(over?.distanceKm).toBe(0);
    expectClose(over?.depthBelowKm as number, 25, 0.05, 'slab depth under Over Cove, by hand');
    // 0.4° of longitude at 47.5° S: 0.4 × 111.32 km × cos 47.5° = 30.08 km (spherical, by
    // hand); 0.2 km allows for the local projection against the sphere.
    const beyond = slabOf('far-hill');
    expect(beyond?.depthBelowKm).toBeUndefined();
    expectClose(beyond?.distanceKm as number, 30.08, 0.2, 'Far Hill to the deep edge, by hand');
    expect(result.diagnostics?.zoneDepths.map((z) => z.sourceId)).toEqual(['slab-deep']);

    const text = await run('screen', SLAB);
    expect(text.out).toMatch(/Over Cove .* Slab top 25 km below/);
    expect(text.out).toMatch(/Far Hill .* Slab top 30 km away/);
    expect(text.out).toMatch(
      /zone depths: Deep slab: \d+ cells at [\d.]+–[\d.]+ km \(10 km below slab-top;/,
    );
  });

  it('refuses contours that cross, naming the lines and the points, and exits 2', async () => {
    const study = JSON.parse(await readFile(SLAB, 'utf8'));
    // Line 1 runs from west of line 0 at the south end to east of it at the north end.
    study.sources.features[0].geometry.coordinates[1] = [
      [-140.7, -47.8],
      [-140.3, -47.2],
    ];
    const broken = join(await mkdtemp(join(tmpdir(), 'tremora-cli-')), 'crossing.study.json');
    await writeFile(broken, JSON.stringify(study));
    const { code, err } = await run('check', broken);
    expect(code).toBe(2);
    // The zone that follows the refused surface is not refused a second time for it.
    expect(err).toContain('1 problem:');
    expect(err).toMatch(
      /sources\.features\[0\]\.geometry\.coordinates\[1\]\[0\]: line 1 crosses line 0 near \[-140\.6, -47\.65\] \(between points 0 and 1 of line 1, 0 and 1 of line 0\)/,
    );
  });
});
