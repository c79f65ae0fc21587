import { InvalidInput } from '../errors.ts';
import { ruptureDistances } from '../geometry/distances.ts';
import { frameForStudy, type LocalFrame } from '../geometry/projection.ts';
import { mmiRoman } from '../intensity/mmi-roman.ts';
import { mmiFromPga } from '../intensity/worden2012.ts';
import type { Study } from '../model.ts';
import type { ModelCatalog } from '../motion/catalog.ts';
import { withPgvFromSa } from '../motion/pgv-from-sa.ts';
import { prepareSource } from '../ruptures/placement.ts';
import { scenarioGrid } from './scenario-grid.ts';
import { siteMotions, type ScenarioMotion } from './site-motions.ts';
import {
  candidateRuptures,
  closestRupture,
  faultRuptureAt,
  pointRuptureAt,
  type ScenarioPosition,
  type ScenarioRupture,
} from './scenario-rupture.ts';

export interface ScenarioRequest {
  readonly sourceId: string;
  /** Moment magnitude. */
  readonly magnitude: number;
  readonly position?: ScenarioPosition;
  /** Grid spacing for the map, km; no grid when absent. */
  readonly gridSpacingKm?: number;
  /** Vs30 of the map's grid points, m/s (communities use their own). */
  readonly gridVs30?: number;
}

export interface ScenarioCommunity {
  readonly communityId: string;
  readonly name: string;
  readonly rjbKm: number;
  readonly rrupKm: number;
  readonly motions: Readonly<Record<string, ScenarioMotion>>;
  /** MMI from PGA (Worden et al. 2012) at the median and the 84th-percentile PGA. */
  readonly mmi: {
    readonly median: number;
    readonly p84: number;
    readonly romanMedian: string;
    readonly romanP84: string;
  };
}

export interface ScenarioResult {
  readonly sourceId: string;
  readonly sourceName: string;
  readonly magnitude: number;
  readonly position: string;
  readonly models: readonly { readonly model: string; readonly weight: number }[];
  readonly communities: readonly ScenarioCommunity[];
  readonly grid?: ReturnType<typeof scenarioGrid>;
  readonly warnings: readonly string[];
}

/** The measures a scenario reports: PGA first (intensity comes from it), then the study's. */
function scenarioMeasures(study: Study): string[] {
  return ['PGA', ...study.settings.measures.filter((m) => m !== 'PGA')];
}

/** Most grid points one scenario map may have. */
export const MAX_SCENARIO_GRID_POINTS = 40_000;

/**
 * Deterministic shaking of one rupture of a study's source at a chosen magnitude: median and
 * 84th-percentile motions and MMI at every community, and on a grid for a map. The rupture's
 * size follows the source's magnitude–area scaling (as in the hazard); where it goes follows
 * `request.position` (default 'closest', see ScenarioPosition).
 */
export function runScenario(
  study: Study,
  models: ModelCatalog,
  request: ScenarioRequest,
): ScenarioResult {
  const sourceIndex = study.sources.findIndex((s) => s.id === request.sourceId);
  const source = study.sources[sourceIndex];
  if (!source) {
    throw new InvalidInput([
      {
        path: 'sourceId',
        message: `unknown source "${request.sourceId}"; expected one of ${study.sources.map((s) => s.id).join(', ')}`,
      },
    ]);
  }
  if (!(request.magnitude >= 3 && request.magnitude <= 9.6)) {
    throw new InvalidInput([
      {
        path: 'magnitude',
        message: `expected a moment magnitude in [3, 9.6], got ${request.magnitude}`,
      },
    ]);
  }
  const warnings = new Set<string>();
  const range =
    source.recurrence.type === 'fixed'
      ? [source.recurrence.magnitude, source.recurrence.magnitude]
      : [source.recurrence.mMin, source.recurrence.mMax];
  if (
    request.magnitude < (range[0] as number) - 1e-9 ||
    request.magnitude > (range[1] as number) + 1e-9
  ) {
    warnings.add(
      `M ${request.magnitude} is outside the magnitudes the study gives ${source.name} (${range[0]}–${range[1]})`,
    );
  }
  const frame = frameForStudy(study);
  const prepared = prepareSource(source, sourceIndex, frame, study.settings, [], study.sources);
  const candidates = candidateRuptures(prepared, request.magnitude);
  const measures = scenarioMeasures(study);
  const branches = study.groundMotion[source.setting].map((b) => {
    const model = models.get(b.model);
    return { model: measures.includes('PGV') ? withPgvFromSa(model) : model, weight: b.weight };
  });
  // A map shows one earthquake, so with a grid every community gets that same rupture.
  const withGrid = request.gridSpacingKm !== undefined;
  const position = request.position ?? (withGrid ? 'middle' : 'closest');
  if (position === 'closest' && withGrid) {
    throw new InvalidInput([
      {
        path: 'position',
        message:
          '"closest" puts a different rupture beside each community, which one map cannot show; leave the position out (the middle of the source) or give one',
      },
    ]);
  }
  const fixed = fixedRupture(study, frame, prepared, candidates, request.magnitude, position);

  const communities = study.communities.map((community): ScenarioCommunity => {
    const site = frame.toLocal([community.lon, community.lat]);
    const rupture = fixed ?? closestRupture(candidates, site);
    const distances = ruptureDistances(rupture.surface, site);
    const motions = siteMotions({
      rupture,
      distances,
      vs30: community.vs30,
      vs30Measured: community.vs30Basis === 'measured',
      branches,
      measures,
      notes: warnings,
    });
    const pga = motions.PGA as ScenarioMotion;
    const median = mmiFromPga(pga.median);
    const p84 = mmiFromPga(pga.p84);
    return {
      communityId: community.id,
      name: community.name,
      rjbKm: distances.rjbKm,
      rrupKm: distances.rrupKm,
      motions,
      mmi: { median, p84, romanMedian: mmiRoman(median), romanP84: mmiRoman(p84) },
    };
  });

  let grid: ReturnType<typeof scenarioGrid> | undefined;
  if (request.gridSpacingKm !== undefined && fixed !== undefined) {
    grid = scenarioGrid({
      study,
      frame,
      rupture: fixed,
      branches,
      spacingKm: request.gridSpacingKm,
      vs30: request.gridVs30 ?? 760,
      maxPoints: MAX_SCENARIO_GRID_POINTS,
      notes: warnings,
    });
  }
  return {
    sourceId: source.id,
    sourceName: source.name,
    magnitude: request.magnitude,
    position: describePosition(position),
    models: study.groundMotion[source.setting].map((b) => ({ model: b.model, weight: b.weight })),
    communities,
    ...(grid ? { grid } : {}),
    warnings: [...warnings],
  };
}

function fixedRupture(
  study: Study,
  frame: LocalFrame,
  prepared: ReturnType<typeof prepareSource>,
  candidates: readonly ScenarioRupture[],
  magnitude: number,
  position: ScenarioPosition,
): ScenarioRupture | undefined {
  if (position === 'closest') return undefined;
  if (position === 'middle') return middleRupture(candidates);
  if ('communityId' in position) {
    const community = study.communities.find((c) => c.id === position.communityId);
    if (!community)
      throw new InvalidInput([
        { path: 'position.communityId', message: `unknown community "${position.communityId}"` },
      ]);
    return closestRupture(candidates, frame.toLocal([community.lon, community.lat]));
  }
  if ('alongStrikeKm' in position) {
    if (prepared.kind !== 'fault')
      throw new InvalidInput([
        {
          path: 'position',
          message:
            'alongStrikeKm and downDipKm need a fault source; for a zone or point give lon and lat',
        },
      ]);
    return faultRuptureAt(prepared, magnitude, position.alongStrikeKm, position.downDipKm);
  }
  return pointRuptureAt(candidates, frame.toLocal([position.lon, position.lat]));
}

/** The middle of the candidates' hypocentres, where the map's rupture goes by default. */
/**
 * The candidate whose hypocentre is nearest the mean of all the candidates' hypocentres: the
 * middle of the source. (Rrup to the mean would tie among every rupture that spans it.)
 */
function middleRupture(candidates: readonly ScenarioRupture[]): ScenarioRupture | undefined {
  let x = 0;
  let y = 0;
  let z = 0;
  for (const c of candidates) {
    x += c.surface.hypocentre.x;
    y += c.surface.hypocentre.y;
    z += c.surface.hypocentre.z;
  }
  const n = candidates.length;
  let best: ScenarioRupture | undefined;
  let bestKm = Infinity;
  for (const c of candidates) {
    const h = c.surface.hypocentre;
    const km = Math.hypot(h.x - x / n, h.y - y / n, h.z - z / n);
    if (km < bestKm) [best, bestKm] = [c, km];
  }
  return best;
}

function describePosition(position: ScenarioPosition): string {
  if (position === 'closest')
    return 'each community: the rupture position closest to it (worst case for each, not one earthquake)';
  if (position === 'middle')
    return 'the rupture position nearest the middle of the source, for every community and the map';
  if ('communityId' in position) return `the rupture position closest to ${position.communityId}`;
  if ('alongStrikeKm' in position)
    return `starting ${position.alongStrikeKm} km along the trace and ${position.downDipKm} km down dip`;
  return `epicentre at ${position.lon}, ${position.lat}`;
}
