import { InvalidInput } from '../errors.ts';
import type { CompletenessPeriod } from './completeness-periods.ts';
import type { CatalogEvent } from './event.ts';
import { binCentre, magnitudeHistogram, type MagnitudeBinCount } from './magnitude-bins.ts';
import { selectByMagnitudeType, type MagnitudeSelectionOptions } from './magnitude-type.ts';

/**
 * Magnitude of completeness by maximum curvature (Wiemer & Wyss 2000, BSSA 90(4)): the bin with the most
 * events in the non-cumulative frequency–magnitude distribution, where the cumulative curve
 * bends most. Maximum curvature is known to underestimate Mc on gradually curved
 * distributions; Woessner & Wiemer (2005), "Assessing the quality of earthquake catalogues",
 * BSSA 95(2), recommend adding 0.2 (from memory), the default correction here.
 */
export interface MaxCurvatureResult {
  /** Bin centre of the most populated bin plus the correction. */
  readonly mc: number;
  /** Bin centre of the most populated bin. */
  readonly peakMagnitude: number;
  readonly correction: number;
  readonly eventCount: number;
  readonly histogram: readonly MagnitudeBinCount[];
}

export interface MaxCurvatureOptions {
  /** Default 0.1. */
  readonly magnitudeStep?: number;
  /** Added to the peak bin; default 0.2 (Woessner & Wiemer 2005). */
  readonly correction?: number;
}

/**
 * Mc by maximum curvature of magnitudes. When two bins tie for the most events the lower is
 * taken (our choice: the cautious end, keeping more events).
 */
export function maxCurvatureMc(
  magnitudes: readonly number[],
  options: MaxCurvatureOptions = {},
): MaxCurvatureResult {
  const step = options.magnitudeStep ?? 0.1;
  const correction = options.correction ?? 0.2;
  if (magnitudes.length === 0)
    throw new InvalidInput([
      {
        path: 'magnitudes',
        message: 'expected at least one event to find the magnitude of completeness',
      },
    ]);
  const histogram = magnitudeHistogram(magnitudes, step);
  let peak = histogram[0] as MagnitudeBinCount;
  for (const bin of histogram) if (bin.count > peak.count) peak = bin;
  return {
    mc: binCentre(peak.magnitude + correction, step),
    peakMagnitude: peak.magnitude,
    correction,
    eventCount: magnitudes.length,
    histogram,
  };
}

/** Mc in one window of a catalog ordered in time. */
export interface CompletenessWindow {
  readonly startMs: number;
  readonly endMs: number;
  readonly eventCount: number;
  readonly mc: number;
}

export interface CompletenessOverTime {
  readonly windows: readonly CompletenessWindow[];
  /** Proposed periods, lowest magnitude (shortest period) first. */
  readonly periods: readonly CompletenessPeriod[];
  readonly excludedNonMoment: number;
}

export interface CompletenessOverTimeOptions
  extends MagnitudeSelectionOptions, MaxCurvatureOptions {
  /** Events per window; default 100. The last window takes any remainder smaller than this. */
  readonly eventsPerWindow?: number;
}

/**
 * Mc by maximum curvature in consecutive windows of equal event count (common practice: equal
 * counts keep every window's histogram equally well sampled, where equal years would leave the
 * sparse early catalog with too few events), and completeness periods proposed from them:
 * walking back from the newest window, a period for magnitude m reaches back to the start of
 * the earliest window from which every later window has Mc at most m. The last window reaches
 * the catalog's first event; give the catalog's real start in the periods if it is known.
 */
export function completenessOverTime(
  events: readonly CatalogEvent[],
  options: CompletenessOverTimeOptions = {},
): CompletenessOverTime {
  const perWindow = options.eventsPerWindow ?? 100;
  if (!(Number.isInteger(perWindow) && perWindow >= 10)) {
    throw new InvalidInput([
      {
        path: 'eventsPerWindow',
        message: `expected a whole number of at least 10 events per window; got ${perWindow}`,
      },
    ]);
  }
  const selected = selectByMagnitudeType(events, options.magnitudes);
  const sorted = [...selected.events].sort((a, b) => a.timeMs - b.timeMs);
  if (sorted.length < perWindow) {
    throw new InvalidInput([
      {
        path: 'events',
        message: `expected at least ${perWindow} events (one window); got ${sorted.length}`,
      },
    ]);
  }
  const windowCount = Math.floor(sorted.length / perWindow);
  const windows: CompletenessWindow[] = [];
  for (let w = 0; w < windowCount; w++) {
    const slice = sorted.slice(
      w * perWindow,
      w === windowCount - 1 ? sorted.length : (w + 1) * perWindow,
    );
    const first = slice[0] as CatalogEvent;
    const last = slice[slice.length - 1] as CatalogEvent;
    const mc = maxCurvatureMc(
      slice.map((e) => e.magnitude),
      options,
    ).mc;
    windows.push({ startMs: first.timeMs, endMs: last.timeMs, eventCount: slice.length, mc });
  }
  return {
    windows,
    periods: proposePeriods(windows),
    excludedNonMoment: selected.excludedNonMoment,
  };
}

/** Completeness periods from windows in time order (see completenessOverTime). */
export function proposePeriods(windows: readonly CompletenessWindow[]): CompletenessPeriod[] {
  const periods: CompletenessPeriod[] = [];
  let level = -Infinity;
  let startMs = NaN;
  for (let w = windows.length - 1; w >= 0; w--) {
    const window = windows[w] as CompletenessWindow;
    // 1e-9: Mc values are bin centres that may differ in the last bits.
    if (window.mc > level + 1e-9 && Number.isFinite(level))
      periods.push({ magnitude: level, startMs });
    level = Math.max(level, window.mc);
    startMs = window.startMs;
  }
  if (Number.isFinite(level)) periods.push({ magnitude: level, startMs });
  return periods;
}
