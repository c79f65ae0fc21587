import { TremoraError } from '../errors.ts';
import { mmiRoman } from '../intensity/mmi-roman.ts';
import { mmiFromPga } from '../intensity/worden2012.ts';
import type { Community, Mechanism, PointSource, Study, TectonicSetting } from '../model.ts';
import type { ModelCatalog } from '../motion/catalog.ts';
import { modelCatalog } from '../motion/registry.ts';
import type { DistanceContext, GroundMotionModel } from '../motion/types.ts';
import { pointRuptureContext } from '../ruptures/point-rupture.ts';
import { siteMotions, type ScenarioMotion } from '../scenario/site-motions.ts';
import { epicentralPath } from './epicentral.ts';
import type { CatalogEvent } from './event.ts';
import { selectByMagnitudeType, type MagnitudeSelectionOptions } from './magnitude-type.ts';

/**
 * Felt history: what past earthquakes were likely like at each community. For each event the
 * median PGA over the study's ground-motion branches for the event's setting (ln medians
 * averaged with the branch weights, as scenario/site-motions.ts does), converted to MMI with
 * Worden et al. (2012) (intensity/worden2012.ts).
 *
 * Setting by depth (common practice, for catalogs that do not say): events shallower than
 * `crustalMaxDepthKm` (default 35 km) use the crustal branches, deeper ones the intraslab
 * branches. Mechanism: unknown for a catalog event, so the setting's usual one (crustal
 * strike-slip, intraslab normal; common practice) with the point-rupture width, dip and top of
 * rupture of ruptures/point-rupture.ts. Distances treat the event as a point at its hypocentre
 * (Rjb = Repi, Rrup = Rhypo, as geometry/distances.ts does for point ruptures), which
 * underestimates the shaking near large events. Depths above sea level are taken as 0 km;
 * events without a depth are left out (neither the setting nor the distance is known) and counted.
 *
 * "Likely felt" is a median MMI of IV or more, "likely strongly felt" VI or more (the Modified
 * Mercalli descriptions: IV felt indoors by many, VI felt by all; common practice).
 * Events farther than the study's maxDistanceKm from a community are skipped there.
 */
export interface FeltEstimate {
  readonly eventId: string;
  readonly timeMs: number;
  /** UTC date, YYYY-MM-DD. */
  readonly date: string;
  readonly magnitude: number;
  readonly magnitudeType: string;
  readonly depthKm: number;
  readonly setting: TectonicSetting;
  /** Epicentral distance from the community, km (geodesic). */
  readonly distanceKm: number;
  /** Direction from the community to the epicentre, degrees clockwise from north. */
  readonly bearingDeg: number;
  /** The same as one of eight compass points. */
  readonly compass: Compass;
  /** Median PGA over the branches, g. */
  readonly pgaG: number;
  readonly mmi: number;
  readonly roman: string;
}

export type Compass = 'N' | 'NE' | 'E' | 'SE' | 'S' | 'SW' | 'W' | 'NW';
const COMPASS: readonly Compass[] = ['N', 'NE', 'E', 'SE', 'S', 'SW', 'W', 'NW'];

/** The nearest of the eight compass points to a bearing in degrees. */
export const compassPoint = (bearingDeg: number): Compass =>
  COMPASS[Math.round((((bearingDeg % 360) + 360) % 360) / 45) % 8] as Compass;

export interface CommunityFeltHistory {
  readonly communityId: string;
  readonly name: string;
  /** Every event within the distance cut, in time order. */
  readonly estimates: readonly FeltEstimate[];
  /** MMI IV or more, in time order. */
  readonly felt: readonly FeltEstimate[];
  /** MMI VI or more, in time order. */
  readonly stronglyFelt: readonly FeltEstimate[];
}

export interface FeltHistory {
  readonly communities: readonly CommunityFeltHistory[];
  readonly eventCount: number;
  readonly excludedNonMoment: number;
  /** Events left out for want of a depth. */
  readonly excludedWithoutDepth: number;
  readonly crustalMaxDepthKm: number;
  readonly notes: readonly string[];
}

export interface FeltHistoryOptions extends MagnitudeSelectionOptions {
  /** Events shallower than this use the crustal branches, deeper the intraslab; default 35 km. */
  readonly crustalMaxDepthKm?: number;
  /** Default: the engine's registry (motion/registry.ts). */
  readonly models?: ModelCatalog;
}

export const FELT_MMI = 4;
export const STRONGLY_FELT_MMI = 6;
const MECHANISM_OF: Readonly<Record<'crustal' | 'intraslab', Mechanism>> = {
  crustal: 'strike-slip',
  intraslab: 'normal',
};
const RAKE_OF: Readonly<Record<Mechanism, number>> = { 'strike-slip': 0, reverse: 90, normal: -90 };

/** A catalog event whose depth is known. */
type DepthEvent = CatalogEvent & { readonly depthKm: number };
const hasDepth = (event: CatalogEvent): event is DepthEvent => event.depthKm !== null;

interface WeightedModel {
  readonly model: GroundMotionModel;
  readonly weight: number;
}

/** Estimated intensity of each event at each community, and the events likely felt there. */
export function feltHistory(
  study: Study,
  events: readonly CatalogEvent[],
  options: FeltHistoryOptions = {},
): FeltHistory {
  const models = options.models ?? modelCatalog;
  const crustalMaxDepthKm = options.crustalMaxDepthKm ?? 35;
  const selected = selectByMagnitudeType(events, options.magnitudes);
  const ordered = selected.events.filter(hasDepth).sort((a, b) => a.timeMs - b.timeMs);
  const withoutDepth = selected.events.length - ordered.length;
  const notes = new Set<string>();
  const branchesOf = (setting: TectonicSetting) =>
    study.groundMotion[setting].map((b) => ({ model: models.get(b.model), weight: b.weight }));
  const branches = { crustal: branchesOf('crustal'), intraslab: branchesOf('intraslab') };
  const communities = study.communities.map((community): CommunityFeltHistory => {
    const estimates: FeltEstimate[] = [];
    for (const event of ordered) {
      const estimate = estimateAt(
        community,
        event,
        crustalMaxDepthKm,
        branches,
        study.settings.maxDistanceKm,
        notes,
      );
      if (estimate) estimates.push(estimate);
    }
    return {
      communityId: community.id,
      name: community.name,
      estimates,
      felt: estimates.filter((e) => e.mmi >= FELT_MMI),
      stronglyFelt: estimates.filter((e) => e.mmi >= STRONGLY_FELT_MMI),
    };
  });
  if (withoutDepth > 0)
    notes.add(
      `${withoutDepth} event${withoutDepth === 1 ? '' : 's'} left out: no depth, so no distance to the hypocentre`,
    );
  const left = selected.excludedNonMoment;
  if (left > 0)
    notes.add(
      `${left} event${left === 1 ? '' : 's'} left out: not moment magnitude${left === 1 ? '' : 's'}`,
    );
  return {
    communities,
    eventCount: ordered.length,
    excludedNonMoment: selected.excludedNonMoment,
    excludedWithoutDepth: withoutDepth,
    crustalMaxDepthKm,
    notes: [...notes],
  };
}

function estimateAt(
  community: Community,
  event: DepthEvent,
  crustalMaxDepthKm: number,
  branches: Readonly<Record<'crustal' | 'intraslab', readonly WeightedModel[]>>,
  maxDistanceKm: number,
  notes: Set<string>,
): FeltEstimate | undefined {
  const path = epicentralPath(community.lon, community.lat, event.lon, event.lat);
  if (path.distanceKm > maxDistanceKm) return undefined;
  const setting = event.depthKm < crustalMaxDepthKm ? 'crustal' : 'intraslab';
  if (branches[setting].length === 0) {
    notes.add(`the study has no ${setting} ground-motion branches; ${setting} events are skipped`);
    return undefined;
  }
  const depthKm = Math.max(event.depthKm, 0);
  const mechanism = MECHANISM_OF[setting];
  const source: PointSource = {
    kind: 'point',
    id: event.id,
    name: event.id,
    setting,
    mechanism,
    rakeDeg: RAKE_OF[mechanism],
    recurrence: { type: 'fixed', magnitude: event.magnitude, rate: 0 },
    location: [event.lon, event.lat],
    depthKm,
  };
  const context = pointRuptureContext(source, event.magnitude);
  const rhypoKm = Math.hypot(path.distanceKm, depthKm);
  const distances: DistanceContext = {
    rjbKm: path.distanceKm,
    rrupKm: rhypoKm,
    rxKm: -path.distanceKm,
    ry0Km: 0,
    rhypoKm,
    repiKm: path.distanceKm,
  };
  let pgaG: number;
  try {
    const motions = siteMotions({
      rupture: {
        sourceIndex: -1,
        sourceId: event.id,
        context,
        surface: { kind: 'point', hypocentre: { x: 0, y: 0, z: depthKm } },
      },
      distances,
      vs30: community.vs30,
      vs30Measured: community.vs30Basis === 'measured',
      branches: branches[setting],
      measures: ['PGA'],
      notes,
    });
    pgaG = (motions.PGA as ScenarioMotion).median;
  } catch (error) {
    if (!(error instanceof TremoraError)) throw error;
    notes.add(`event ${event.id} skipped at ${community.id}: ${error.message}`);
    return undefined;
  }
  const mmi = mmiFromPga(pgaG);
  return {
    eventId: event.id,
    timeMs: event.timeMs,
    date: new Date(event.timeMs).toISOString().slice(0, 10),
    magnitude: event.magnitude,
    magnitudeType: event.magnitudeType,
    depthKm: event.depthKm,
    setting,
    distanceKm: path.distanceKm,
    bearingDeg: path.azimuthDeg,
    compass: compassPoint(path.azimuthDeg),
    pgaG,
    mmi,
    roman: mmiRoman(mmi),
  };
}
