import { describe, expect, it } from 'vitest';
import type { InputIssue } from '../../api/engine/errors.ts';
import type { FaultSource } from '../../api/engine/model.ts';
import { loadStudy } from '../../api/study/load-study.ts';
import { MAX_RUPTURE_PLANES } from '../../api/study/rupture-estimate.ts';
import { testCatalog } from '../helpers/test-catalog.ts';
import { validStudy } from './fixtures.ts';

/**
 * A source given by depth contours (GeoJSON MultiLineString, properties.contourDepthsKm) in the
 * study format: accepted for an interface and a crustal fault, refused with the line and point
 * named when the contours are not a surface. Coordinates invented, in open ocean.
 */
const load = (raw: unknown) => loadStudy(raw, { models: testCatalog });

/** Three contours running north–south at 140.6°, 140.4° and 140.1° W, each through 47.8°, 47.5° and 47.2° S. */
const CONTOURS = [-140.6, -140.4, -140.1].map((lon) =>
  [-47.8, -47.5, -47.2].map((lat) => [lon, lat]),
);

function withContours(
  coordinates: unknown,
  properties: Record<string, unknown> = {},
): Record<string, any> {
  const study = validStudy();
  study.sources.features.push({
    type: 'Feature',
    geometry: { type: 'MultiLineString', coordinates },
    properties: {
      id: 'slab-top',
      name: 'Slab top',
      setting: 'interface',
      mechanism: 'reverse',
      contourDepthsKm: [5, 15, 40],
      recurrence: { type: 'gutenberg-richter', bValue: 1, mMin: 6, mMax: 8, rate: 0.05 },
      ...properties,
    },
  });
  return study;
}

function issuesOf(raw: unknown): string[] {
  const result = load(raw);
  expect(result.ok, 'expected the study to be refused').toBe(false);
  return result.ok ? [] : result.issues.map((i: InputIssue) => `${i.path}: ${i.message}`);
}

const contouredOf = (raw: unknown): FaultSource => {
  const result = load(raw);
  expect(result.ok, result.ok ? '' : JSON.stringify(result.issues)).toBe(true);
  if (!result.ok) throw new Error('refused');
  return result.study.sources.find((s) => s.id === 'slab-top') as FaultSource;
};

describe('a contoured source in the study format', () => {
  it('is read as a fault with its contours, depths and the default 5 km mesh spacing', () => {
    const source = contouredOf(withContours(CONTOURS));
    expect(source.kind).toBe('fault');
    expect(source.contours?.depthsKm).toEqual([5, 15, 40]);
    expect(source.contours?.lines).toHaveLength(3);
    expect(source.contours?.meshSpacingKm).toBe(5);
    expect(source.upperDepthKm).toBe(5);
    expect(source.lowerDepthKm).toBe(40);
    // Dipping east: the contours step east with depth (azimuth near 90°).
    expect(Math.abs(source.dipDirectionDeg - 90)).toBeLessThan(1);
  });

  it('is accepted for a crustal fault too, with a mesh spacing of its own', () => {
    const source = contouredOf(
      withContours(CONTOURS, { setting: 'crustal', meshSpacingKm: 2, contourDepthsKm: [1, 6, 12] }),
    );
    expect(source.setting).toBe('crustal');
    expect(source.contours?.meshSpacingKm).toBe(2);
  });

  it('refuses a line with fewer than two points, naming the line', () => {
    const issues = issuesOf(withContours([CONTOURS[0], [[-140.4, -47.8]], CONTOURS[2]]));
    expect(issues.join('\n')).toMatch(
      /sources\.features\[\d+\]\.geometry\.coordinates\[1\]: line 1 has 1 point; expected at least 2/,
    );
  });

  it('refuses a line that runs backwards, naming it and its first point', () => {
    const backwards = [...(CONTOURS[1] as number[][])].reverse();
    const issues = issuesOf(withContours([CONTOURS[0], backwards, CONTOURS[2]]));
    expect(issues.join('\n')).toMatch(
      /coordinates\[1\]: line 1 runs backwards \(from point 0 at \[-140\.4, -47\.2\]/,
    );
  });

  it('refuses contours that cross, naming both lines and the points between which they meet', () => {
    const crossing = [
      [-140.7, -47.8],
      [-140.5, -47.5],
      [-140.3, -47.2],
    ];
    const issues = issuesOf(withContours([CONTOURS[0], crossing, CONTOURS[2]]));
    expect(issues.join('\n')).toMatch(
      /coordinates\[1\]\[0\]: line 1 crosses line 0 near \[-140\.6, -47\.65\] \(between points 0 and 1 of line 1, 0 and 1 of line 0\)/,
    );
  });

  it('refuses depths that do not increase down dip, naming the line', () => {
    const issues = issuesOf(withContours(CONTOURS, { contourDepthsKm: [5, 15, 15] }));
    expect(issues.join('\n')).toMatch(
      /properties\.contourDepthsKm\[2\]: line 2's depth 15 km is not below line 1's 15 km/,
    );
  });

  it('refuses a depth list that does not give one depth per line', () => {
    const issues = issuesOf(withContours(CONTOURS, { contourDepthsKm: [5, 15] }));
    expect(issues.join('\n')).toMatch(
      /contourDepthsKm: expected one depth in km per contour line \(3\)/,
    );
  });

  it('counts its mesh cells against the rupture-plane limit', () => {
    // A 1 km mesh over a 550 km long slab: its ruptures stay under the rupture limit, but each
    // holds hundreds to thousands of cells, far past the plane limit, though its trace has three points.
    const long = CONTOURS.map((line) => line.map((p) => [...p]));
    long.forEach((line) => {
      line[0]![1] = -50;
      line[2]![1] = -45;
    });
    const study = withContours(long, { meshSpacingKm: 1 });
    study.settings = { ...(study.settings ?? {}), magnitudeStep: 0.05 };
    const issues = issuesOf(study);
    expect(issues.join('\n')).toMatch(
      new RegExp(
        `over the limit of ${MAX_RUPTURE_PLANES} per study .*"slab-top", \\d+ planes from the mesh cells`,
      ),
    );
  });
});

describe('a zone whose depths come from a contoured source, or a weighted list', () => {
  const zoneWith = (properties: Record<string, unknown>): Record<string, any> => {
    const study = withContours(CONTOURS);
    const zone = study.sources.features.find((f: any) => f.properties.id === 'background');
    delete zone.properties.depthKm;
    Object.assign(zone.properties, properties);
    return study;
  };
  const zoneOf = (raw: unknown) => {
    const result = load(raw);
    expect(result.ok, result.ok ? '' : JSON.stringify(result.issues)).toBe(true);
    if (!result.ok) throw new Error('refused');
    return result.study.sources.find((s) => s.id === 'background');
  };

  it('reads depthFromSource with its offset', () => {
    const zone = zoneOf(zoneWith({ depthFromSource: { id: 'slab-top', offsetKm: 10 } }));
    expect(zone).toMatchObject({ kind: 'zone', depthFrom: { sourceId: 'slab-top', offsetKm: 10 } });
  });

  it('reads weighted depths', () => {
    const depths = [
      { depthKm: 40, weight: 0.4 },
      { depthKm: 70, weight: 0.6 },
    ];
    expect(zoneOf(zoneWith({ depths }))).toMatchObject({ kind: 'zone', depths });
  });

  it('refuses a depthFromSource that names no contoured source', () => {
    const issues = issuesOf(zoneWith({ depthFromSource: { id: 'fault-a', offsetKm: 10 } }));
    expect(issues.join('\n')).toMatch(
      /properties\.depthFromSource\.id: expected the id of a source given by depth contours .*got "fault-a"/,
    );
  });

  it('refuses weights that do not sum to 1, and a zone with two ways to its depth', () => {
    expect(issuesOf(zoneWith({ depths: [{ depthKm: 40, weight: 0.5 }] })).join('\n')).toMatch(
      /properties\.depths: expected weights summing to 1/,
    );
    expect(
      issuesOf(zoneWith({ depthKm: 30, depthFromSource: { id: 'slab-top' } })).join('\n'),
    ).toMatch(/properties\.depthKm: expected one of depthKm, depthFromSource .* got 2/);
  });
});
