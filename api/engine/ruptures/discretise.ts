import { frameForStudy, type LocalFrame } from '../geometry/projection.ts';
import { InvalidInput } from '../errors.ts';
import type { Settings, Source, Study } from '../model.ts';
import { magnitudeBins } from '../recurrence/magnitude-bins.ts';
import { placeRuptures, prepareSource, type PlacedRupture, type PreparedSource } from './placement.ts';
import type { Rupture } from './rupture.ts';

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
    throw new InvalidInput(error.issues.map((issue) => ({
      path: issue.path.startsWith('settings.') ? issue.path : issue.path === 'coordinates' ? `${feature}.geometry.coordinates` : `${feature}.properties.${issue.path}`,
      message: issue.message,
    })));
  }
}

const toRupture = ({ share, ...rest }: PlacedRupture, binRate: number): Rupture => ({ ...rest, annualRate: binRate * share });

/**
 * All ruptures of one source with annual rates (per year): for each magnitude bin in
 * increasing order, every position of that magnitude, each with its share of the bin's rate.
 * Fault areas for moment balancing are the whole surface's (length x down-dip width).
 */
export function discretiseSource(source: Source, sourceIndex: number, frame: LocalFrame, settings: Settings): Rupture[] {
  return inSource(sourceIndex, () => {
    const prepared: PreparedSource = prepareSource(source, sourceIndex, frame, settings);
    const areaKm2 = prepared.kind === 'fault' ? prepared.surface.areaKm2 : undefined;
    const bins = magnitudeBins(source.recurrence, settings, areaKm2);
    const ruptures: Rupture[] = [];
    bins.magnitudes.forEach((magnitude, i) => {
      const binRate = bins.annualRates[i] as number;
      for (const placed of placeRuptures(prepared, magnitude)) ruptures.push(toRupture(placed, binRate));
    });
    return ruptures;
  });
}

export interface DiscretisedStudy {
  readonly frame: LocalFrame;
  readonly ruptures: readonly Rupture[];
}

/** Every rupture of a study in its local frame (frameForStudy), sources in study order. */
export function discretiseStudy(study: Study): DiscretisedStudy {
  const frame = frameForStudy(study);
  return { frame, ruptures: study.sources.flatMap((source, i) => discretiseSource(source, i, frame, study.settings)) };
}

/**
 * All positions of one source at one `magnitude`, without rates (each with its share of a
 * bin), for a scenario that picks the position nearest a community.
 */
export function rupturesAtMagnitude(
  source: Source,
  sourceIndex: number,
  frame: LocalFrame,
  settings: Pick<Settings, 'ruptureSpacingKm' | 'zoneCellKm'>,
  magnitude: number,
): PlacedRupture[] {
  return inSource(sourceIndex, () => placeRuptures(prepareSource(source, sourceIndex, frame, settings), magnitude));
}
