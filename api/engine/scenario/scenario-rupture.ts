import { InvalidInput } from '../errors.ts';
import { ruptureDistances } from '../geometry/distances.ts';
import { floatingRuptureAt, floatingRuptures } from '../geometry/floating-ruptures.ts';
import {
  fitDimensions,
  scaledDimensions,
  scalingRelationFor,
} from '../geometry/rupture-scaling.ts';
import type { PointXY } from '../geometry/projection.ts';
import type { PreparedSource } from '../ruptures/placement.ts';
import { faultRupture, placeRuptures } from '../ruptures/placement.ts';
import type { Rupture } from '../ruptures/rupture.ts';

/**
 * Where a scenario puts its rupture:
 * - `closest`: for each site, the floating position (or zone cell) with the smallest Rrup to it
 *   — the worst placement for every community at once, so the communities' numbers do not come
 *   from one single earthquake (and no map can show them: a scenario with a map uses one rupture);
 * - `middle`: the position nearest the middle of the source (the mean of the candidates'
 *   hypocentres), used for every site and the map: the default when a map is asked for;
 * - `{ communityId }`: the one position closest to that community, used for every site;
 * - `{ alongStrikeKm, downDipKm }`: a fault rupture starting that far along the trace (from its
 *   first vertex, after the right-hand-rule orientation) and down dip from its top edge;
 * - `{ lon, lat }`: the epicentre of a zone or point source's rupture, at the source's depth.
 */
export type ScenarioPosition =
  | 'closest'
  | 'middle'
  | { readonly communityId: string }
  | { readonly alongStrikeKm: number; readonly downDipKm: number }
  | { readonly lon: number; readonly lat: number };

/** A scenario rupture carries no rate; it is one earthquake. */
export type ScenarioRupture = Omit<Rupture, 'annualRate'>;

/**
 * Every candidate position of `prepared` at `magnitude`: a fault's floating positions from end
 * to end (the worst placement may be at an end, which the hazard's midpoint positions never
 * reach), or zone cells.
 */
export function candidateRuptures(prepared: PreparedSource, magnitude: number): ScenarioRupture[] {
  if (prepared.kind === 'fault') {
    const { surface, source } = prepared;
    const size = fitDimensions(
      scaledDimensions(scalingRelationFor(source.setting, source.mechanism), magnitude),
      surface.lengthKm,
      surface.widthKm,
    );
    return floatingRuptures(surface, size, { spacingKm: prepared.spacingKm, endToEnd: true }).map(
      (p) => faultRupture(prepared, magnitude, p),
    );
  }
  return placeRuptures(prepared, magnitude).map(
    ({ share: _share, lattice: _lattice, ...rupture }) => rupture,
  );
}

/** The candidate with the smallest Rrup to `site` (first one on ties). */
export function closestRupture(
  candidates: readonly ScenarioRupture[],
  site: PointXY,
): ScenarioRupture {
  let best = candidates[0];
  let bestKm = Infinity;
  for (const rupture of candidates) {
    const { rrupKm } = ruptureDistances(rupture.surface, site);
    if (rrupKm < bestKm) {
      bestKm = rrupKm;
      best = rupture;
    }
  }
  if (!best)
    throw new InvalidInput([
      { path: 'sourceId', message: 'the source has no rupture positions at this magnitude' },
    ]);
  return best;
}

/** A fault rupture of `magnitude`'s scaled size starting at an explicit position on the surface. */
export function faultRuptureAt(
  prepared: PreparedSource & { kind: 'fault' },
  magnitude: number,
  alongStrikeKm: number,
  downDipKm: number,
): ScenarioRupture {
  const { surface, source } = prepared;
  const size = fitDimensions(
    scaledDimensions(scalingRelationFor(source.setting, source.mechanism), magnitude),
    surface.lengthKm,
    surface.widthKm,
  );
  const maxAlong = surface.lengthKm - size.lengthKm;
  const maxDown = surface.widthKm - size.widthKm;
  const issues = [];
  if (!(alongStrikeKm >= 0 && alongStrikeKm <= maxAlong + 1e-9)) {
    issues.push({
      path: 'position.alongStrikeKm',
      message: `expected a number in [0, ${maxAlong.toFixed(1)}] km for a rupture ${size.lengthKm.toFixed(1)} km long, got ${alongStrikeKm}`,
    });
  }
  if (!(downDipKm >= 0 && downDipKm <= maxDown + 1e-9)) {
    issues.push({
      path: 'position.downDipKm',
      message: `expected a number in [0, ${maxDown.toFixed(1)}] km for a rupture ${size.widthKm.toFixed(1)} km wide, got ${downDipKm}`,
    });
  }
  if (issues.length > 0) throw new InvalidInput(issues);
  return faultRupture(
    prepared,
    magnitude,
    floatingRuptureAt(surface, size, alongStrikeKm, downDipKm),
  );
}

/** A point rupture of a zone or point source with its epicentre at `epicentre`. */
export function pointRuptureAt(
  candidates: readonly ScenarioRupture[],
  epicentre: PointXY,
): ScenarioRupture {
  const template = candidates[0];
  if (!template || template.surface.kind !== 'point') {
    throw new InvalidInput([
      {
        path: 'position',
        message:
          'a lon/lat position needs a zone or point source; for a fault give alongStrikeKm and downDipKm',
      },
    ]);
  }
  return {
    ...template,
    surface: {
      kind: 'point',
      hypocentre: { x: epicentre.x, y: epicentre.y, z: template.surface.hypocentre.z },
    },
  };
}
