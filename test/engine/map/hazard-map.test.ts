import { describe, expect, it } from 'vitest';
import { Cancelled, InvalidInput } from '../../../api/engine/errors.ts';
import { frameForStudy } from '../../../api/engine/geometry/projection.ts';
import {
  hazardMap,
  MAP_VS30,
  planHazardMap,
  type MapPoint,
} from '../../../api/engine/map/hazard-map.ts';
import { gridPoint } from '../../../api/engine/map/map-grid.ts';
import type { Community, Study } from '../../../api/engine/model.ts';
import { screenStudy } from '../../../api/engine/screen-study.ts';
import { expectClose } from '../../helpers/close.ts';
import { allKindsStudy } from '../fixtures/all-kinds-study.ts';

// A coarse map of the invented all-kinds study (test scaffolding); its values are checked against
// single-site screening of the same study (itself checked against the reference path).
// No outline: the map then covers the box the study's frame is centred on, and a community put at
// an inner grid point leaves that frame (and so every distance) as it is.
const { outline: _, ...base } = allKindsStudy({ measures: ['PGA'] });
const study: Study = { ...base, sources: base.sources.filter((s) => s.id !== 'background') };
const SPACING_KM = 45;

function wholeMap(
  options: Parameters<typeof hazardMap>[1],
  chunkSize?: number,
): { points: MapPoint[]; shares: number[] } {
  const points: MapPoint[] = [];
  const shares: number[] = [];
  hazardMap(
    study,
    options,
    (chunk, share) => {
      points.push(...chunk);
      shares.push(share);
    },
    chunkSize === undefined ? {} : { chunkSize },
  );
  return { points, shares };
}

describe('hazardMap', () => {
  const rp = {
    measure: 'PGA',
    quantity: { kind: 'return-period' as const, returnPeriodYears: 475 },
    spacingKm: SPACING_KM,
  };
  const { points, shares } = wholeMap(rp, 4);

  it('gives every grid point once, in order, with shares of the work rising to 1', () => {
    const plan = planHazardMap(study, rp);
    expect(points.map((p) => p.index)).toEqual(
      Array.from({ length: plan.grid.count }, (_, i) => i),
    );
    expect(shares.at(-1)).toBe(1);
    expect([...shares].sort((a, b) => a - b)).toEqual(shares);
  });

  it('chunks of any size reassemble to the same map', () => {
    expect(wholeMap(rp, 1000).points).toEqual(points);
    expect(wholeMap(rp, 3).points).toEqual(points);
  });

  it('at each grid point equals the screening of a community placed there with Vs30 760 (475-year PGA)', () => {
    const plan = planHazardMap(study, rp);
    const frame = frameForStudy(study);
    const { columns, rows } = plan.grid;
    const inner = (column: number, row: number): number => row * columns + column;
    const picked = [
      inner(1, 1),
      inner(columns - 2, 1),
      inner(2, Math.floor(rows / 2)),
      inner(Math.floor(columns / 2), rows - 2),
    ];
    const communities: Community[] = picked.map((i) => {
      const [lon, lat] = frame.toLonLat(gridPoint(plan.grid, i));
      return {
        id: `g${i}`,
        name: `g${i}`,
        lon,
        lat,
        vs30: MAP_VS30,
        vs30Basis: 'measured',
        coastal: false,
      };
    });
    const screened = screenStudy({ ...study, communities: [...study.communities, ...communities] });
    picked.forEach((i, k) => {
      const c = screened.communities[study.communities.length + k]!;
      const expected = c.atReturnPeriod['475']!.PGA ?? null;
      const value = points[i]!.value;
      if (expected === null) expect(value).toBeNull();
      // A community refines the zone cells near it (geometry/cell-refinement.ts) and a map point
      // uses the cells as the study's communities left them: within the 1% the refinement is
      // held to (test/engine/hazard/zone-refinement.test.ts).
      else
        expectClose(
          value!,
          expected,
          0.01 * expected,
          `grid point ${i}: map against single-site screening (same engine path)`,
        );
      expect(points[i]!.status).toBe(c.returnPeriodStatus['475']!.PGA);
    });
  });

  it("a chance map at a level gives the Poisson chance of the screening's rate there", () => {
    const level = 0.2;
    const chance = wholeMap({
      measure: 'PGA',
      quantity: { kind: 'chance', level, horizonYears: 50 },
      spacingKm: SPACING_KM,
    }).points;
    const plan = planHazardMap(study, rp);
    const [lon, lat] = frameForStudy(study).toLonLat(gridPoint(plan.grid, 11));
    const screened = screenStudy({
      ...study,
      settings: { ...study.settings, levels: { PGA: [0.1, level, 0.4] } },
      communities: [
        { id: 'g', name: 'g', lon, lat, vs30: MAP_VS30, vs30Basis: 'measured', coastal: false },
      ],
    });
    const expected = screened.communities[0]!.chanceOfExceeding['50']!.PGA![1]!;
    expectClose(
      chance[11]!.value!,
      expected,
      1e-9 * expected + 1e-15,
      'Poisson chance at the level (poisson.ts) from the same rate',
    );
    for (const p of chance) expect(p.value! >= 0 && p.value! <= 1).toBe(true);
  });

  it('refuses a bad return period, horizon or Vs30 naming the field, and stops when asked (Cancelled)', () => {
    expect(() =>
      planHazardMap(study, { ...rp, quantity: { kind: 'return-period', returnPeriodYears: 0 } }),
    ).toThrow(InvalidInput);
    expect(() =>
      planHazardMap(study, { ...rp, quantity: { kind: 'chance', level: 0.1, horizonYears: -5 } }),
    ).toThrow(/horizonYears: expected a horizon in years above 0/);
    expect(() => planHazardMap(study, { ...rp, vs30: 0 })).toThrow(/vs30/);
    let calls = 0;
    expect(() =>
      hazardMap(study, rp, () => {}, { chunkSize: 2, shouldStop: () => ++calls > 1 }),
    ).toThrow(Cancelled);
  });
});
