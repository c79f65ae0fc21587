import { describe, expect, it } from 'vitest';
import { InvalidInput } from '../../../api/engine/errors.ts';
import { createLocalFrame } from '../../../api/engine/geometry/projection.ts';
import { mmiFromPga } from '../../../api/engine/intensity/worden2012.ts';
import type { Community, Source, Study } from '../../../api/engine/model.ts';
import { createModelCatalog } from '../../../api/engine/motion/catalog.ts';
import { cornell79 } from '../../../api/engine/motion/cornell79.ts';
import { runScenario } from '../../../api/engine/scenario/scenario.ts';
import { expectClose, expectRelative } from '../../helpers/close.ts';
import { testSettings } from '../../helpers/test-settings.ts';

const models = createModelCatalog([cornell79], {
  crustal: [{ model: 'Cornell79', weight: 1 }],
  interface: [{ model: 'Cornell79', weight: 1 }],
  intraslab: [{ model: 'Cornell79', weight: 1 }],
});

/** Cornell et al. (1979) as Baker (2008) states it: mean ln PGA = −0.152 + 0.859 M − 1.803 ln(R + 25), σ = 0.57. */
const cornellMedianG = (m: number, rKm: number) =>
  Math.exp(-0.152 + 0.859 * m - 1.803 * Math.log(rKm + 25));

const origin = [-140, -47] as const;
const frame = createLocalFrame(origin);
const at = (xKm: number, yKm: number) => frame.toLonLat({ x: xKm, y: yKm });

function community(id: string, xKm: number, yKm: number): Community {
  const [lon, lat] = at(xKm, yKm);
  return { id, name: id, lon, lat, vs30: 760, vs30Basis: 'measured', coastal: false };
}

function study(sources: Source[], communities: Community[]): Study {
  return {
    name: 'scenario test (invented)',
    communities,
    sources,
    groundMotion: { crustal: [{ model: 'Cornell79', weight: 1 }], interface: [], intraslab: [] },
    settings: testSettings({ ruptureSpacingKm: 2 }),
  };
}

const common = { setting: 'crustal', mechanism: 'strike-slip', rakeDeg: 0 } as const;

/** A point source 'p' at the frame's origin, 10 km deep, M 6.5 (invented). */
const point: Source = {
  ...common,
  id: 'p',
  name: 'P',
  kind: 'point',
  location: at(0, 0),
  depthKm: 10,
  recurrence: { type: 'fixed', magnitude: 6.5, rate: 0.01 },
};

/** A vertical strike-slip fault 'f' along x = 0 from y = −40 to 40 km, 0–12 km deep, M 6 (invented). */
const fault: Source = {
  ...common,
  id: 'f',
  name: 'F',
  kind: 'fault',
  trace: [at(0, -40), at(0, 40)],
  dipDeg: 90,
  dipDirectionDeg: 90,
  upperDepthKm: 0,
  lowerDepthKm: 12,
  recurrence: { type: 'fixed', magnitude: 6, rate: 0.01 },
};

describe('runScenario', () => {
  it('gives Cornell et al. (1979) medians, 84th percentiles and Worden et al. (2012) MMI for a point source', () => {
    // Communities 30 and 0 km from the epicentre: the test's study frame is centred elsewhere, so
    // distances carry the projection's small error (< 1e-3 relative within 50 km, projection.ts).
    const s = study([point], [community('a', 30, 0), community('b', 0, 0)]);
    const result = runScenario(s, models, { sourceId: 'p', magnitude: 6.5 });
    const [a, b] = result.communities;
    const rA = Math.hypot(30, 10);
    expectRelative(a!.rrupKm, rA, 1e-3, 'hypocentral distance sqrt(30² + 10²)');
    expectRelative(
      a!.motions.PGA!.median,
      cornellMedianG(6.5, rA),
      2e-3,
      'Cornell et al. (1979) median PGA via Baker (2008)',
    );
    expectRelative(
      a!.motions.PGA!.p84,
      cornellMedianG(6.5, rA) * Math.exp(0.57),
      2e-3,
      'median x e^σ, σ = 0.57',
    );
    expectRelative(
      b!.motions.PGA!.median,
      cornellMedianG(6.5, 10),
      2e-3,
      'Cornell et al. (1979) at the epicentre, R = depth',
    );
    expectClose(
      a!.mmi.median,
      mmiFromPga(a!.motions.PGA!.median),
      1e-12,
      'MMI from the median PGA',
    );
    expect(result.position).toMatch(/closest/);
  });

  it("places the 'closest' rupture nearest each community and a named community's rupture for all", () => {
    const s = study([fault], [community('north', 5, 35), community('south', 5, -35)]);
    const each = runScenario(s, models, { sourceId: 'f', magnitude: 6 });
    // A vertical fault reaching the surface: the closest floating rupture lies beside each site, Rrup = 5 km.
    for (const c of each.communities)
      expectClose(c.rrupKm, 5, 0.05, 'perpendicular distance to a vertical surface rupture');
    const one = runScenario(s, models, {
      sourceId: 'f',
      magnitude: 6,
      position: { communityId: 'north' },
    });
    expectClose(one.communities[0]!.rrupKm, 5, 0.05, 'north sits beside the chosen rupture');
    expect(one.communities[1]!.rrupKm).toBeGreaterThan(40);
  });

  it('places an explicit fault position from the start of the trace and refuses one off the fault', () => {
    const s = study([fault], [community('south', 5, -35), community('north', 5, 35)]);
    // M 6 strike-slip: Wells & Coppersmith (1994) area and width give a rupture about 13 km long
    // (from memory), so one starting at the south end runs from y = -40 to about y = -27 km.
    const result = runScenario(s, models, {
      sourceId: 'f',
      magnitude: 6,
      position: { alongStrikeKm: 0, downDipKm: 0 },
    });
    expectClose(result.communities[0]!.rrupKm, 5, 0.05, 'south sits beside the rupture');
    expect(result.communities[1]!.rrupKm).toBeGreaterThan(50);
    expect(() =>
      runScenario(s, models, {
        sourceId: 'f',
        magnitude: 6,
        position: { alongStrikeKm: 79, downDipKm: 0 },
      }),
    ).toThrow(/position.alongStrikeKm/);
  });

  it('refuses an unknown source, a magnitude out of range and a bad explicit position, naming the field', () => {
    const s = study([point], [community('a', 30, 0)]);
    const issuePaths = (request: Parameters<typeof runScenario>[2]) => {
      try {
        runScenario(s, models, request);
      } catch (error) {
        if (error instanceof InvalidInput) return error.issues.map((i) => i.path);
        throw error;
      }
      return [];
    };
    expect(issuePaths({ sourceId: 'nope', magnitude: 6 })).toEqual(['sourceId']);
    expect(issuePaths({ sourceId: 'p', magnitude: 11 })).toEqual(['magnitude']);
    expect(
      issuePaths({ sourceId: 'p', magnitude: 6, position: { alongStrikeKm: 1, downDipKm: 0 } }),
    ).toEqual(['position']);
    expect(runScenario(s, models, { sourceId: 'p', magnitude: 7 }).warnings[0]).toMatch(
      /outside the magnitudes/,
    );
  });

  it('maps median PGA on a grid, strongest at the grid point nearest the epicentre', () => {
    const s = study([point], [community('a', 30, 0)]);
    const { grid } = runScenario(s, models, { sourceId: 'p', magnitude: 6.5, gridSpacingKm: 5 });
    expect(grid).toBeDefined();
    expect(grid!.lon.length).toBe(grid!.columns * grid!.rows);
    const strongest = grid!.pgaMedianG.indexOf(Math.max(...grid!.pgaMedianG));
    const p = frame.toLocal([grid!.lon[strongest]!, grid!.lat[strongest]!]);
    expect(Math.hypot(p.x, p.y)).toBeLessThanOrEqual(5 * Math.SQRT1_2 + 0.01);
  });

  it('with a map, the table and the map show one earthquake: each community reads as the map beside it', () => {
    const s = study(
      [fault],
      [community('north', 5, 35), community('south', 5, -35), community('middle', 5, 0)],
    );
    const mapped = runScenario(s, models, { sourceId: 'f', magnitude: 6, gridSpacingKm: 1 });
    const grid = mapped.grid!;
    expect(mapped.position).toMatch(/middle of the source, for every community and the map/);
    for (const c of mapped.communities) {
      const site = frame.toLocal([
        s.communities.find((x) => x.id === c.communityId)!.lon,
        s.communities.find((x) => x.id === c.communityId)!.lat,
      ]);
      let nearest = 0;
      let best = Infinity;
      grid.lon.forEach((lon, i) => {
        const p = frame.toLocal([lon, grid.lat[i]!]);
        const d = Math.hypot(p.x - site.x, p.y - site.y);
        if (d < best) [best, nearest] = [d, i];
      });
      // Communities and grid both on Vs30 760 with Cornell et al. (1979): within 1 km of the
      // community the map differs from the table only by that step (ours: a bound on the slope).
      expectClose(
        grid.mmiMedian[nearest]!,
        c.mmi.median,
        0.25,
        `${c.communityId}: the map beside it`,
      );
    }
    // The one rupture sits in the middle: the ends see it from afar, alike.
    const [north, south, middle] = mapped.communities;
    expect(north!.rrupKm).toBeGreaterThan(20);
    expectClose(
      north!.rrupKm,
      south!.rrupKm,
      3,
      'north and south see the middle rupture from about as far',
    );
    // 5 km off the trace; the middle position down dip may start up to 2 km below the surface
    // (rows of the 12 km deep fault), so Rrup is at most √(5² + 2²) = 5.39 km (derived).
    expectClose(middle!.rrupKm, 5, 0.4, 'the middle community sits beside the rupture');
    // Asking for a different rupture beside each community together with a map is refused, naming the field.
    try {
      runScenario(s, models, {
        sourceId: 'f',
        magnitude: 6,
        gridSpacingKm: 5,
        position: 'closest',
      });
      expect.unreachable('closest with a map must be refused');
    } catch (error) {
      expect(error).toBeInstanceOf(InvalidInput);
      expect((error as InvalidInput).issues.map((i) => i.path)).toEqual(['position']);
    }
  });
});
