import fc from 'fast-check';
import { afterAll, describe, expect, it } from 'vitest';
import { ruptureDistances } from '../../../api/engine/geometry/distances.ts';
import type { PointXY } from '../../../api/engine/geometry/projection.ts';
import { modelCatalog } from '../../../api/engine/motion/registry.ts';
import { discretiseStudy } from '../../../api/engine/ruptures/discretise.ts';
import type { Rupture } from '../../../api/engine/ruptures/rupture.ts';
import { loadStudy } from '../../../api/study/load-study.ts';
import { studyDocArb } from '../../study/arbitrary-study.ts';

/**
 * Invariants of source-to-site distances on generated ruptures (fast-check). They follow from
 * the definitions (NGA-West2 flatfile, Ancheta et al. 2014, from memory) for a site at the
 * ground surface:
 * - every distance is finite and Rjb, Rrup, Ry0, Rhypo, Repi are >= 0;
 * - Rrup >= Rjb: the 3-D distance to a point is at least its horizontal part;
 * - Rrup >= Ztor: every point of the rupture is at least Ztor deep;
 * - Rrup <= Rhypo and Rjb <= Repi: the hypocentre lies on the rupture (and its epicentre on
 *   the rupture's surface projection), so the nearest point is no farther than it.
 * Point ruptures (zone cells, points) are the degenerate case: Rjb = Repi, Rrup = Rhypo.
 */

const RUNS = 60;
const SEED = 19_680_901;
/** Distances are differences of km-sized coordinates: 1e-9 km (1 µm) covers their rounding. */
const SLACK_KM = 1e-9;

const figures: string[] = [];

/** Tens of thousands of pairs: a plain check, with the message built only on failure. */
function check(ok: boolean, message: () => string): void {
  if (!ok) throw new Error(message());
}
afterAll(() => console.log(`distance properties (seed ${SEED}): ${figures.join('; ')}`));

/** A study's ruptures with 1 to 3 sources of every kind, one community to centre the frame. */
const rupturesArb = studyDocArb({ maxCommunities: 1 }).map((doc) => {
  const loaded = loadStudy(doc, { models: modelCatalog });
  if (!loaded.ok)
    throw new Error(`a generated study should be valid: ${JSON.stringify(loaded.issues)}`);
  return discretiseStudy(loaded.study).ruptures;
});

/**
 * Sites in the local frame (km): anywhere within 200 km, or exactly above a corner or the
 * hypocentre of a rupture (distance-zero edges).
 */
const sitesArb = (ruptures: readonly Rupture[]): fc.Arbitrary<PointXY[]> => {
  const special: PointXY[] = [];
  for (const r of ruptures.slice(0, 50)) {
    special.push({ x: r.surface.hypocentre.x, y: r.surface.hypocentre.y });
    if (r.surface.kind === 'planes')
      for (const p of r.surface.planes) special.push(...p.corners.map((c) => ({ x: c.x, y: c.y })));
  }
  const anywhere = fc.record({
    x: fc.double({ min: -200, max: 200, noNaN: true }),
    y: fc.double({ min: -200, max: 200, noNaN: true }),
  });
  return fc.array(special.length > 0 ? fc.oneof(anywhere, fc.constantFrom(...special)) : anywhere, {
    minLength: 1,
    maxLength: 8,
  });
};

describe('rupture distances', () => {
  it('are non-negative, with Rrup >= Rjb, Rrup >= Ztor, Rrup <= Rhypo and Rjb <= Repi', () => {
    let pairs = 0;
    let planar = 0;
    fc.assert(
      fc.property(
        rupturesArb.chain((ruptures) => fc.tuple(fc.constant(ruptures), sitesArb(ruptures))),
        ([ruptures, sites]) => {
          for (const rupture of ruptures) {
            if (rupture.surface.kind === 'planes') planar++;
            for (const site of sites) {
              pairs++;
              const d = ruptureDistances(rupture.surface, site);
              const label = () =>
                `${rupture.sourceId} M${rupture.context.magnitude} at (${site.x}, ${site.y}): ${JSON.stringify(d)}`;
              for (const v of Object.values(d)) check(Number.isFinite(v), label);
              for (const v of [d.rjbKm, d.rrupKm, d.ry0Km, d.rhypoKm, d.repiKm])
                check(v >= 0, label);
              check(d.rrupKm >= d.rjbKm - SLACK_KM, () => `Rrup < Rjb: ${label()}`);
              check(
                d.rrupKm >= rupture.context.ztorKm - SLACK_KM,
                () => `Rrup < Ztor ${rupture.context.ztorKm}: ${label()}`,
              );
              check(d.rrupKm <= d.rhypoKm + SLACK_KM, () => `Rrup > Rhypo: ${label()}`);
              check(d.rjbKm <= d.repiKm + SLACK_KM, () => `Rjb > Repi: ${label()}`);
              if (rupture.surface.kind === 'point')
                check(
                  d.rjbKm === d.repiKm && d.rrupKm === d.rhypoKm,
                  () => `point rupture: ${label()}`,
                );
            }
          }
        },
      ),
      { numRuns: RUNS, seed: SEED },
    );
    figures.push(`${pairs} rupture-site pairs (${planar} planar ruptures) checked`);
    expect(planar).toBeGreaterThan(0);
  });
});
