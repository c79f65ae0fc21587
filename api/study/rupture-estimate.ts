import * as turf from '@turf/turf';
import type { Recurrence, Settings, Source } from '../engine/model.ts';
import {
  FINITE_RUPTURE_MIN_MAGNITUDE,
  VIRTUAL_STRIKE_COUNT,
} from '../engine/ruptures/virtual-ruptures.ts';
import { contouredExtent, contouredPlaneCount } from './contour-cell-estimate.ts';
import { faultPlaneCount } from './fault-plane-estimate.ts';
import type { IssueList } from './issues.ts';

/**
 * Most ruptures a study may be discretised into, estimated from above before any is built. A
 * rupture holds about 1 kB while a study is measured or screened, so this keeps one study under
 * about 1 GB; the demo coast has about 7 x 10^4. Without it a small document (a wide zone with
 * 1 km cells and 0.01-unit magnitude bins) asks for 10^8 ruptures and holds a worker for hours.
 */
export const MAX_RUPTURES = 1_000_000;

/**
 * Most rupture planes a study's fault ruptures may hold, counted as they will be built
 * (fault-plane-estimate.ts). A floating rupture carries one plane per trace segment it
 * covers, so a trace of thousands of short segments multiplies the memory and the distance
 * work of every rupture: 1,000 zig-zag vertices took 3 GB and close to a minute to validate.
 * The demo coast holds about 5.5 x 10^4 planes; the limit leaves it forty times that.
 */
export const MAX_RUPTURE_PLANES = 2_000_000;

/**
 * Magnitude bins of a recurrence at `stepM` (recurrence/magnitude-bins.ts makes at most this
 * many); over a logic tree, the sum over its mMax alternatives, at least the union's count;
 * `finite` counts a point source's bins from FINITE_RUPTURE_MIN_MAGNITUDE up once per virtual
 * rupture (a zone cell's large earthquake is one virtual rupture, so a zone counts as before).
 */
function binCount(recurrence: Recurrence, stepM: number, finite = false): number {
  const weight = (m: number): number =>
    finite && m >= FINITE_RUPTURE_MIN_MAGNITUDE - 1e-6 ? VIRTUAL_STRIKE_COUNT : 1;
  if (recurrence.type === 'fixed') return weight(recurrence.magnitude);
  const maxima = new Set(recurrence.alternatives?.mMax?.map((a) => a.value) ?? [recurrence.mMax]);
  let count = 0;
  for (const mMax of maxima) {
    const bins = Math.max(1, Math.ceil((mMax - recurrence.mMin) / stepM - 1e-6));
    // A point source's large earthquakes are VIRTUAL_STRIKE_COUNT ruptures each (ruptures/virtual-ruptures.ts).
    for (let k = 0; k < bins; k++) count += weight(recurrence.mMin + (k + 0.5) * stepM);
  }
  return count;
}

/**
 * Rupture positions per magnitude bin, at most: a fault's floating positions for the smallest
 * rupture (geometry/floating-ruptures.ts spaces them at most ruptureSpacingKm apart along strike
 * and down dip); a zone's cells, its area in cells plus a fringe of part-cells along its
 * outline (turf's area and length are spherical, close enough for a bound); one for a point.
 */
function positionCount(source: Source, settings: Settings): number {
  if (source.kind === 'point') return 1;
  if (source.kind === 'fault') {
    const { lengthKm, widthKm } = source.contours
      ? contouredExtent(source.contours)
      : {
          lengthKm: turf.length(turf.lineString(source.trace.map(([lon, lat]) => [lon, lat])), {
            units: 'kilometers',
          }),
          widthKm:
            (source.lowerDepthKm - source.upperDepthKm) / Math.sin((source.dipDeg * Math.PI) / 180),
        };
    const spacing = settings.ruptureSpacingKm;
    return (Math.ceil(lengthKm / spacing) + 1) * (Math.ceil(widthKm / spacing) + 1);
  }
  const polygon = turf.polygon(source.rings.map((ring) => ring.map(([lon, lat]) => [lon, lat])));
  const cell = settings.zoneCellKm;
  const areaCells = turf.area(polygon) / 1e6 / (cell * cell);
  const outlineCells = turf.length(turf.polygonToLine(polygon), { units: 'kilometers' }) / cell;
  // One rupture per cell and depth (a zone's weighted depths).
  return (Math.ceil(areaCells + 2 * outlineCells) + 1) * (source.depths?.length ?? 1);
}

/** The ruptures one source would make, estimated from above before any is built. */
export const sourceRuptureEstimate = (source: Source, settings: Settings): number =>
  binCount(source.recurrence, settings.magnitudeStep, source.kind === 'point') *
  positionCount(source, settings);

/** The sum of `countOf` over the sources, and the first source with the largest count. */
function totalAndLargest(
  sources: readonly Source[],
  countOf: (source: Source) => number,
): { total: number; largest: { index: number; count: number } } {
  let total = 0;
  let largest = { index: 0, count: 0 };
  sources.forEach((source, index) => {
    const count = countOf(source);
    total += count;
    if (count > largest.count) largest = { index, count };
  });
  return { total, largest };
}

/**
 * Refuses a study whose sources would make more than MAX_RUPTURES ruptures, estimated from
 * above, naming the largest source and the settings that reduce the count. `sources` must be
 * the study's valid sources in feature order.
 */
export function checkRuptureEstimate(
  sources: readonly Source[],
  settings: Settings,
  issues: IssueList,
): void {
  const { total, largest } = totalAndLargest(sources, (source) =>
    sourceRuptureEstimate(source, settings),
  );
  if (total <= MAX_RUPTURES) {
    checkPlaneEstimate(sources, settings, issues);
    return;
  }
  const id = sources[largest.index]?.id ?? '';
  issues.add(
    ['sources'],
    `the sources would make up to about ${Math.round(total)} ruptures, over the limit of ${MAX_RUPTURES} ruptures per study ` +
      `(the most from sources.features[${largest.index}] "${id}", up to about ${Math.round(largest.count)}); ` +
      'expected fewer: use a larger settings.magnitudeStep, settings.ruptureSpacingKm or settings.zoneCellKm, or smaller zones',
  );
}

/** Refuses a study whose fault ruptures would hold more than MAX_RUPTURE_PLANES planes, naming the largest fault. */
function checkPlaneEstimate(
  sources: readonly Source[],
  settings: Settings,
  issues: IssueList,
): void {
  // Only faults are cut into planes: the other sources count 0.
  const { total, largest } = totalAndLargest(sources, (source) => {
    if (source.kind !== 'fault') return 0;
    return source.contours
      ? contouredPlaneCount({ ...source, contours: source.contours }, settings)
      : faultPlaneCount(source, settings);
  });
  if (total <= MAX_RUPTURE_PLANES) return;
  const source = sources[largest.index];
  const vertices = source?.kind === 'fault' ? source.trace.length : 0;
  const from =
    source?.kind === 'fault' && source.contours
      ? `${largest.count} planes from the mesh cells between its contours`
      : `${largest.count} planes from a trace of ${vertices} vertices`;
  issues.add(
    ['sources'],
    `the fault ruptures would hold about ${total} rupture planes (one per trace segment a rupture covers, or per mesh cell of a contoured fault), over the limit of ${MAX_RUPTURE_PLANES} per study ` +
      `(the most from sources.features[${largest.index}] "${source?.id ?? ''}", ${from}); ` +
      'expected fewer: simplify the fault traces to fewer, longer segments, give contoured faults a larger meshSpacingKm, or use a larger settings.ruptureSpacingKm or settings.magnitudeStep',
  );
}
