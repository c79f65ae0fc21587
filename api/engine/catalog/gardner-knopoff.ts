import { InvalidInput } from '../errors.ts';
import { firstAbove, firstAtLeast } from '../sorted-search.ts';
import { MS_PER_DAY, type CatalogEvent } from './event.ts';
import { epicentralDistanceKm, MIN_KM_PER_DEGREE_LATITUDE } from './epicentral.ts';
import { epicentreGrid, MIN_CELL_KM, visitNear } from './epicentre-grid.ts';
import { selectByMagnitudeType, type MagnitudeSelectionOptions } from './magnitude-type.ts';

/**
 * Declustering by the space–time windows of Gardner & Knopoff (1974), BSSA 64(5).
 *
 * Windows: the fitted form of their table in common use (e.g. van Stiphout, Zhuang & Marsan
 * 2012, CORSSA "Seismicity declustering"; coefficients from memory):
 *   distance L = 10^(0.1238 M + 0.983) km,
 *   time T = 10^(0.032 M + 2.7389) days for M >= 6.5, 10^(0.5409 M − 0.547) days below.
 * Distances are geodesic between epicentres (epicentral.ts).
 *
 * Procedure: events in decreasing magnitude (earlier first on ties); an event not yet in a
 * cluster becomes a mainshock, and every event not yet in a cluster within L of its epicentre
 * and within T after it (and, by default, within T before it, as foreshocks) joins its cluster.
 * So each cluster's mainshock is its largest event.
 *
 * Search: epicentres are filed in space (epicentre-grid.ts) and numbered in time order, so a
 * mainshock visits only events near it inside its time window, and the cost grows about
 * linearly with the catalog rather than with its square. Candidates are taken in time order,
 * so the result is the one the plain scan of every event in the window gives.
 */
export const GARDNER_KNOPOFF_WINDOWS =
  'Gardner & Knopoff (1974) windows, fitted form: L = 10^(0.1238 M + 0.983) km; T = 10^(0.032 M + 2.7389) days (M >= 6.5), 10^(0.5409 M − 0.547) days (M < 6.5)';

/** Window half-lengths for a mainshock of magnitude M: distance in km, time in days. */
export function gardnerKnopoffWindow(magnitude: number): {
  readonly distanceKm: number;
  readonly days: number;
} {
  return {
    distanceKm: 10 ** (0.1238 * magnitude + 0.983),
    days:
      magnitude >= 6.5 ? 10 ** (0.032 * magnitude + 2.7389) : 10 ** (0.5409 * magnitude - 0.547),
  };
}

export interface RemovedEvent {
  readonly event: CatalogEvent;
  readonly mainshockId: string;
  /** Epicentral distance from the mainshock, km. */
  readonly distanceKm: number;
  /** Time after the mainshock, days (negative for a foreshock). */
  readonly daysFromMainshock: number;
}

export interface DeclusteredCatalog {
  /** Mainshocks and independent events, in time order. */
  readonly mainshocks: readonly CatalogEvent[];
  /** Foreshocks and aftershocks, in time order, each with its mainshock. */
  readonly removed: readonly RemovedEvent[];
  /** Mainshocks with at least one removed event. */
  readonly clusterCount: number;
  readonly excludedNonMoment: number;
  readonly windows: string;
}

export interface DeclusterOptions extends MagnitudeSelectionOptions {
  /** Remove events within the window before a larger event too; default true. */
  readonly removeForeshocks?: boolean;
}

/** What a declustering works on: the events selected by magnitude type, in time order. */
export interface DeclusterCatalog {
  readonly byTime: readonly CatalogEvent[];
  /** byTime's times, ms. */
  readonly times: readonly number[];
  /** Indices into byTime by decreasing magnitude, earlier first on ties: the mainshocks' turns. */
  readonly order: Int32Array;
  readonly excludedNonMoment: number;
}

/**
 * The events of the magnitude types asked for (magnitude-type.ts) in time order, events at one
 * instant kept in catalog order; ids must be unique (InvalidInput names the first repeat).
 */
export function declusterCatalog(
  events: readonly CatalogEvent[],
  options: MagnitudeSelectionOptions,
): DeclusterCatalog {
  const selected = selectByMagnitudeType(events, options.magnitudes);
  const byTime = [...selected.events].sort((a, b) => a.timeMs - b.timeMs);
  const ids = new Set<string>();
  byTime.forEach((e, i) => {
    if (ids.has(e.id))
      throw new InvalidInput([
        { path: `events[${i}].id`, message: `expected unique event ids; "${e.id}" appears twice` },
      ]);
    ids.add(e.id);
  });
  const magnitudes = Float64Array.from(byTime, (e) => e.magnitude);
  return {
    byTime,
    times: byTime.map((e) => e.timeMs),
    order: Int32Array.from(byTime, (_, i) => i).sort(
      (a, b) => (magnitudes[b] as number) - (magnitudes[a] as number) || a - b,
    ),
    excludedNonMoment: selected.excludedNonMoment,
  };
}

/** A mainshock: its index in time order, the event and its window. */
export interface Mainshock {
  readonly i: number;
  readonly main: CatalogEvent;
  readonly window: ReturnType<typeof gardnerKnopoffWindow>;
}

/**
 * The mainshocks as their turns come (catalog.order): each event not yet in a cluster
 * (mainshockOf −1) when its turn comes is made its own mainshock (mainshockOf[i] = i); the
 * caller puts the events of its window into its cluster before the next is taken.
 */
export function* mainshocksInTurn(
  catalog: DeclusterCatalog,
  mainshockOf: Int32Array,
): Generator<Mainshock> {
  for (const i of catalog.order) {
    if (mainshockOf[i] !== -1) continue;
    mainshockOf[i] = i;
    const main = catalog.byTime[i] as CatalogEvent;
    yield { i, main, window: gardnerKnopoffWindow(main.magnitude) };
  }
}

/**
 * `other` as removed into the cluster of `main`, or null when its epicentre is farther than the
 * window's distance (the time window is the caller's). The latitude difference alone rules out
 * most events before the geodesic is computed.
 */
export function windowMember(
  main: CatalogEvent,
  window: { readonly distanceKm: number },
  other: CatalogEvent,
): RemovedEvent | null {
  if (Math.abs(other.lat - main.lat) * MIN_KM_PER_DEGREE_LATITUDE > window.distanceKm) return null;
  const distanceKm = epicentralDistanceKm(main.lon, main.lat, other.lon, other.lat);
  if (distanceKm > window.distanceKm) return null;
  return {
    event: other,
    mainshockId: main.id,
    distanceKm,
    daysFromMainshock: (other.timeMs - main.timeMs) / MS_PER_DAY,
  };
}

/**
 * The result, from each event's mainshock by time-order index (its own index for a mainshock),
 * the removed events in time order and how many mainshocks have a cluster.
 */
export function declusteredCatalog(
  catalog: DeclusterCatalog,
  mainshockOf: Int32Array,
  removed: readonly RemovedEvent[],
  clusterCount: number,
): DeclusteredCatalog {
  return {
    mainshocks: catalog.byTime.filter((_, i) => mainshockOf[i] === i),
    removed,
    clusterCount,
    excludedNonMoment: catalog.excludedNonMoment,
    windows: GARDNER_KNOPOFF_WINDOWS,
  };
}

/** Gardner & Knopoff (1974) declustering (see the file comment). */
export function declusterGardnerKnopoff(
  events: readonly CatalogEvent[],
  options: DeclusterOptions = {},
): DeclusteredCatalog {
  const catalog = declusterCatalog(events, options);
  const { byTime, times, order } = catalog;
  const foreshocks = options.removeForeshocks ?? true;
  const n = byTime.length;
  const smallest = n === 0 ? 0 : (byTime[order[n - 1] as number] as CatalogEvent).magnitude;
  // Cells as wide as the smallest window: most mainshocks are small, and theirs then spans a few cells.
  const grid = epicentreGrid(
    byTime.map((e) => e.lon),
    byTime.map((e) => e.lat),
    Math.max(MIN_CELL_KM, gardnerKnopoffWindow(smallest).distanceKm),
  );
  const mainshockOf = new Int32Array(n).fill(-1);
  // Each removed event by its time-order index, and the order in which it was removed.
  const removedAt: (RemovedEvent | undefined)[] = new Array(n);
  const removedSeq = new Int32Array(n);
  let removedCount = 0;
  const clustered = new Set<number>();
  const near: number[] = [];
  for (const { i, main, window } of mainshocksInTurn(catalog, mainshockOf)) {
    const windowMs = window.days * MS_PER_DAY;
    const from = foreshocks ? firstAtLeast(times, main.timeMs - windowMs) : i + 1;
    const to = firstAbove(times, main.timeMs + windowMs);
    near.length = 0;
    visitNear(grid, i, window.distanceKm, from, to, (j) => {
      if (j !== i && mainshockOf[j] === -1) near.push(j);
    });
    near.sort((a, b) => a - b);
    for (const j of near) {
      const member = windowMember(main, window, byTime[j] as CatalogEvent);
      if (member === null) continue;
      mainshockOf[j] = i;
      clustered.add(i);
      removedAt[j] = member;
      removedSeq[j] = removedCount++;
    }
  }
  return declusteredCatalog(
    catalog,
    mainshockOf,
    inTimeOrder(removedAt, removedSeq, times),
    clustered.size,
  );
}

/**
 * Removed events in time order, events at the same instant in the order they were removed
 * (as a stable sort by time of the removal list gives).
 */
function inTimeOrder(
  removedAt: readonly (RemovedEvent | undefined)[],
  removedSeq: Int32Array,
  times: readonly number[],
): RemovedEvent[] {
  const removed: RemovedEvent[] = [];
  for (let start = 0; start < times.length;) {
    let end = start + 1;
    while (end < times.length && times[end] === times[start]) end++;
    if (end === start + 1) {
      const only = removedAt[start];
      if (only !== undefined) removed.push(only);
      start = end;
      continue;
    }
    const instant: number[] = [];
    for (let j = start; j < end; j++) if (removedAt[j] !== undefined) instant.push(j);
    instant.sort((a, b) => (removedSeq[a] as number) - (removedSeq[b] as number));
    for (const j of instant) removed.push(removedAt[j] as RemovedEvent);
    start = end;
  }
  return removed;
}
