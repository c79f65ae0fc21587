import { describe, expect, test } from 'vitest';
import { frameForStudy } from '../../api/engine/geometry/projection.ts';
import { treeMagnitudeBins } from '../../api/engine/recurrence/tree-magnitude-bins.ts';
import { placeRuptures, prepareSource } from '../../api/engine/ruptures/placement.ts';
import { modelCatalog } from '../../api/engine/motion/registry.ts';
import type { FaultSource } from '../../api/engine/model.ts';
import { faultPlaneCount } from '../../api/study/fault-plane-estimate.ts';
import { loadStudy } from '../../api/study/load-study.ts';
import { MAX_RUPTURE_PLANES } from '../../api/study/rupture-estimate.ts';
import { validStudy } from './fixtures.ts';

/**
 * The plane count of fault ruptures, before any is built, against the planes the engine then
 * builds (ruptures/placement.ts); and the refusal of a trace of many short segments, which
 * multiplies them (a rupture carries a plane per segment it covers).
 */

/** A trace zig-zagging east from (lon0, lat0) in `vertices` vertices `stepDeg` apart. */
function zigZag(vertices: number, stepDeg: number, lon0 = -140.5, lat0 = -47.5): number[][] {
  return Array.from({ length: vertices }, (_, i) => [lon0 + i * stepDeg, lat0 + (i % 2) * stepDeg]);
}

function studyWithTrace(trace: number[][]): Record<string, any> {
  const study = validStudy();
  study.sources.features = [study.sources.features[0]];
  study.sources.features[0].geometry.coordinates = trace;
  study.groundMotion = { crustal: [{ model: 'BSSA14', weight: 1 }] };
  return study;
}

/**
 * The fault's planes as faultPlaneCount estimates them, and as the engine builds them: every
 * rupture of every magnitude bin the engine places (the union of a logic tree's alternatives).
 */
function planeCounts(raw: Record<string, any>): { estimated: number; built: number } {
  const loaded = loadStudy(raw, { models: modelCatalog });
  if (!loaded.ok) throw new Error(JSON.stringify(loaded.issues));
  const { study } = loaded;
  const fault = study.sources[0] as FaultSource;
  const prepared = prepareSource(fault, 0, frameForStudy(study), study.settings);
  let built = 0;
  for (const magnitude of treeMagnitudeBins(fault.recurrence, study.settings).magnitudes) {
    for (const rupture of placeRuptures(prepared, magnitude))
      built += rupture.surface.kind === 'planes' ? rupture.surface.planes.length : 1;
  }
  return { estimated: faultPlaneCount(fault, study.settings), built };
}

describe('faultPlaneCount', () => {
  for (const [name, trace] of [
    [
      'a straight two-vertex trace',
      [
        [-140.5, -47.6],
        [-140.5, -47.2],
      ],
    ],
    [
      'a bent trace of 3 segments',
      [
        [-140.0, -47.8],
        [-139.8, -47.5],
        [-139.7, -47.1],
        [-139.75, -46.9],
      ],
    ],
    ['a zig-zag of 40 vertices', zigZag(40, 0.02)],
  ] as const) {
    test(`counts the planes the engine builds: ${name}`, () => {
      const { estimated, built } = planeCounts(studyWithTrace(trace as unknown as number[][]));
      console.log(`${name}: ${estimated} planes estimated, ${built} built`);
      // Lengths differ between turf's sphere and the local frame by far less than a segment,
      // so a rupture end may rarely fall on the other side of a joint: within 1%.
      expect(Math.abs(estimated - built)).toBeLessThanOrEqual(Math.ceil(built * 0.01));
    });
  }

  test('over a logic tree, counts the planes of every mMax alternative (the union of their bins the engine builds)', () => {
    const raw = studyWithTrace([
      [-140.5, -47.6],
      [-140.5, -47.2],
    ]);
    raw.sources.features[0].properties.recurrence.alternatives = {
      mMax: [
        { value: 7.2, weight: 0.5 },
        { value: 7.65, weight: 0.5 },
      ],
    };
    const { estimated, built } = planeCounts(raw);
    expect(Math.abs(estimated - built)).toBeLessThanOrEqual(Math.ceil(built * 0.01));
  });

  test(`a trace of 1,000 zig-zag vertices is refused before any rupture is built, naming the limit of ${MAX_RUPTURE_PLANES}`, () => {
    // Large ruptures (up to M 8, a few hundred km) each cover hundreds of the 1.4 km segments;
    // the ruptures themselves stay far under MAX_RUPTURES.
    const study = studyWithTrace(zigZag(1000, 0.01));
    study.sources.features[0].properties.recurrence = {
      type: 'gutenberg-richter',
      bValue: 1,
      mMin: 5,
      mMax: 8,
      aValue: 3.1,
    };
    study.settings = { ...study.settings, ruptureSpacingKm: 1 };
    const loaded = loadStudy(study, { models: modelCatalog });
    if (loaded.ok)
      console.log(
        `accepted with ${faultPlaneCount(loaded.study.sources[0] as FaultSource, loaded.study.settings)} planes`,
      );
    expect(loaded.ok).toBe(false);
    const issue = loaded.ok ? undefined : loaded.issues.find((i) => i.path === 'sources');
    expect(issue?.message).toContain(`over the limit of ${MAX_RUPTURE_PLANES}`);
    expect(issue?.message).toContain('"fault-a"');
    expect(issue?.message).toContain('1000 vertices');
  });
});
