import { frameForStudy, type LocalFrame, type PointXY } from '../geometry/projection.ts';
import { InvalidInput } from '../errors.ts';
import type { Settings, Source, Study } from '../model.ts';
import { treeMagnitudeBins } from '../recurrence/tree-magnitude-bins.ts';
import {
  placeRuptures,
  prepareSource,
  type PlacedRupture,
  type PreparedSource,
} from './placement.ts';
import { pointRuptureContext } from './point-rupture.ts';
import type { Rupture } from './rupture.ts';
import { virtualRupturesAt } from './virtual-ruptures.ts';

/**
 * Paths of the engine's errors are relative to a source ("dip", "recurrence.mMax") or to the
 * settings; this places them in the study document (DESIGN.md section 2), assuming sources
 * keep the order of the features they came from.
 */
function inSource<T>(sourceIndex: number, work: () => T): T {
  try {
    return work();
  } catch (error) {
    if (!(error instanceof InvalidInput)) throw error;
    const feature = `sources.features[${sourceIndex}]`;
    throw new InvalidInput(
      error.issues.map((issue) => ({
        path: issue.path.startsWith('settings.')
          ? issue.path
          : issue.path === 'coordinates'
            ? `${feature}.geometry.coordinates`
            : `${feature}.properties.${issue.path}`,
        message: issue.message,
      })),
    );
  }
}

/** A placed rupture with its rate (per year), field by field: rest and spread here cost more than the placing. */
const toRupture = (placed: PlacedRupture, binRate: number): Rupture =>
  placed.cellUse
    ? {
        sourceIndex: placed.sourceIndex,
        sourceId: placed.sourceId,
        annualRate: binRate * placed.share,
        context: placed.context,
        surface: placed.surface,
        cellUse: placed.cellUse,
      }
    : {
        sourceIndex: placed.sourceIndex,
        sourceId: placed.sourceId,
        annualRate: binRate * placed.share,
        context: placed.context,
        surface: placed.surface,
      };

/**
 * Visits every rupture of one source, in discretisation order: for each magnitude bin in
 * increasing order, every position of that magnitude, with the bin's annual rate (per year;
 * the rupture's own is that times its share); a zone's or point source's earthquakes from
 * FINITE_RUPTURE_MIN_MAGNITUDE up as their virtual ruptures (a zone cell's one strike, a point
 * source's every strike in turn). Fault areas for moment balancing are the whole surface's
 * (length x down-dip width). The one walk over a source that both the Rupture objects
 * (discretiseSource) and the fast path's table (hazard/study-rupture-table.ts) are built from.
 */
export function visitSourceRuptures(
  source: Source,
  sourceIndex: number,
  frame: LocalFrame,
  settings: Settings,
  visit: (placed: PlacedRupture, binRate: number) => void,
  sites: readonly PointXY[] = [],
  sources: readonly Source[] = [],
): void {
  inSource(sourceIndex, () => {
    const prepared: PreparedSource = prepareSource(
      source,
      sourceIndex,
      frame,
      settings,
      sites,
      sources,
    );
    const areaKm2 = prepared.kind === 'fault' ? prepared.surface.areaKm2 : undefined;
    // Over the source's logic tree, the weighted mean rate of each magnitude (exact for the mean hazard).
    const bins = treeMagnitudeBins(source.recurrence, settings, areaKm2);
    const finite: PlacedRupture[] = [];
    for (let i = 0; i < bins.magnitudes.length; i++) {
      const binRate = bins.annualRates[i] as number;
      const magnitude = bins.magnitudes[i] as number;
      // Large earthquakes of zones and point sources as finite ruptures (virtual-ruptures.ts).
      const spread =
        prepared.kind === 'fault'
          ? null
          : virtualRupturesAt(prepared.source, magnitude, i, (depthKm) =>
              pointRuptureContext(prepared.source, magnitude, depthKm),
            );
      for (const placed of placeRuptures(prepared, magnitude)) {
        if (!spread) {
          visit(placed, binRate);
          continue;
        }
        finite.length = 0;
        spread(placed, finite);
        for (const each of finite) visit(each, binRate);
      }
    }
  });
}

/**
 * All ruptures of one source with annual rates (per year), in the order of visitSourceRuptures;
 * zone cells near `sites` (local km) refined (geometry/cell-refinement.ts).
 */
export function discretiseSource(
  source: Source,
  sourceIndex: number,
  frame: LocalFrame,
  settings: Settings,
  sites: readonly PointXY[] = [],
  sources: readonly Source[] = [],
): Rupture[] {
  const ruptures: Rupture[] = [];
  visitSourceRuptures(
    source,
    sourceIndex,
    frame,
    settings,
    (placed, binRate) => ruptures.push(toRupture(placed, binRate)),
    sites,
    sources,
  );
  return ruptures;
}

export interface DiscretisedStudy {
  readonly frame: LocalFrame;
  readonly ruptures: readonly Rupture[];
}

/**
 * Every rupture of a study in its local frame (frameForStudy), sources in study order, zone
 * cells refined near its communities.
 */
export function discretiseStudy(study: Study): DiscretisedStudy {
  const frame = frameForStudy(study);
  const sites = communitySites(study, frame);
  return {
    frame,
    ruptures: study.sources.flatMap((source, i) =>
      discretiseSource(source, i, frame, study.settings, sites, study.sources),
    ),
  };
}

/** The study's communities in its local frame, km. */
export const communitySites = (study: Pick<Study, 'communities'>, frame: LocalFrame): PointXY[] =>
  study.communities.map((c) => frame.toLocal([c.lon, c.lat]));
