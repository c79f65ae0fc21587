import { describe, expect, test } from 'vitest';
import { modelCatalog } from '../../api/engine/motion/registry.ts';
import { loadStudy } from '../../api/study/load-study.ts';
import { MAX_FRAME_RADIUS_KM } from '../../api/study/study-extent.ts';
import { smallStudy } from '../service/helpers/small-study.ts';

/**
 * Studies wider than their one local frame holds: refused naming the extent and the limit,
 * never accepted with sources that vanish or coordinates that are not finite. Coordinates are
 * of the invented open-ocean region and of points chosen for their geometry (poles, antipodes).
 */
type Doc = ReturnType<typeof smallStudy> & {
  communities: Record<string, unknown>[];
  sources: { features: Record<string, any>[] };
};

function studyAt(communities: [number, number][], sourceAt?: [number, number]): Doc {
  const study = smallStudy('Extent') as Doc;
  study.communities = communities.map(([lon, lat], i) => ({
    id: `c${i}`,
    name: `Place ${i}`,
    lon,
    lat,
    vs30: 500,
  }));
  if (sourceAt) (study.sources.features[0] as Record<string, any>).geometry.coordinates = sourceAt;
  return study;
}

const load = (study: unknown) => loadStudy(study, { models: modelCatalog });

function expectRefused(study: unknown, path: string): string {
  const result = load(study);
  expect(result.ok).toBe(false);
  const issue = result.ok
    ? undefined
    : result.issues.find((i) => i.message.includes(`over the limit of ${MAX_FRAME_RADIUS_KM} km`));
  expect(issue?.path).toBe(path);
  return issue?.message ?? '';
}

describe('study extent', () => {
  test('a source near the antipode of the communities is refused, naming the extent', () => {
    // [-140.2, -47.4] and [39.8, 47.4] are antipodal: half the Earth's circumference apart (about 20,000 km).
    const message = expectRefused(
      studyAt([[-140.2, -47.4]], [39.8, 47.4]),
      // The frame is centred on the sources (engine/geometry/projection.ts), so the community is the far point.
      'communities[0]',
    );
    expect(message).toMatch(/the study spans about \d{5} km/);
  });

  test('communities on both poles are refused', () => {
    expectRefused(
      studyAt(
        [
          [0, 90],
          [0, -90],
        ],
        [0, 89],
      ),
      // The frame is centred on the source beside the north pole: the south pole is the far point.
      'communities[1]',
    );
  });

  test('a study astride the 180° meridian is one region, accepted', () => {
    const result = load(
      studyAt(
        [
          [179.9, -47.4],
          [-179.9, -47.3],
        ],
        [180, -47.35],
      ),
    );
    expect(result.ok, JSON.stringify(result.ok ? [] : result.issues)).toBe(true);
  });

  test(`a study 3,000 km across is accepted; one ${2 * MAX_FRAME_RADIUS_KM + 400} km across is not`, () => {
    // One degree of latitude is about 111.2 km on turf's sphere (radius 6,371 km; 2 pi R / 360).
    const wide = (km: number) =>
      studyAt(
        [
          [-140.2, -47.4 - km / 2 / 111.2],
          [-140.2, -47.4 + km / 2 / 111.2],
        ],
        [-140.2, -47.4],
      );
    expect(load(wide(3000)).ok).toBe(true);
    expectRefused(wide(2 * MAX_FRAME_RADIUS_KM + 400), 'communities[0]');
  });
});
