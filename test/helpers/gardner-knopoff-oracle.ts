import type { CatalogEvent } from '../../api/engine/catalog/event.ts';
import { MS_PER_DAY } from '../../api/engine/catalog/event.ts';
import {
  epicentralDistanceKm,
  MIN_KM_PER_DEGREE_LATITUDE,
} from '../../api/engine/catalog/epicentral.ts';
import {
  GARDNER_KNOPOFF_WINDOWS,
  gardnerKnopoffWindow,
  type DeclusterOptions,
  type DeclusteredCatalog,
  type RemovedEvent,
} from '../../api/engine/catalog/gardner-knopoff.ts';
import { selectByMagnitudeType } from '../../api/engine/catalog/magnitude-type.ts';

/**
 * The plain Gardner & Knopoff (1974) procedure, with no index: each mainshock scans every event
 * inside its time window. Quadratic on large catalogs, so the engine indexes epicentres in
 * space; this stays with the tests as the oracle the indexed version must match exactly.
 */
export function declusterGardnerKnopoffByScan(
  events: readonly CatalogEvent[],
  options: DeclusterOptions = {},
): DeclusteredCatalog {
  const foreshocks = options.removeForeshocks ?? true;
  const selected = selectByMagnitudeType(events, options.magnitudes);
  const byTime = [...selected.events].sort((a, b) => a.timeMs - b.timeMs);
  const n = byTime.length;
  const times = byTime.map((e) => e.timeMs);
  const order = byTime
    .map((_, i) => i)
    .sort(
      (a, b) =>
        (byTime[b] as CatalogEvent).magnitude - (byTime[a] as CatalogEvent).magnitude || a - b,
    );
  const mainshockOf = new Int32Array(n).fill(-1);
  const removed: RemovedEvent[] = [];
  const clustered = new Set<number>();
  for (const i of order) {
    if (mainshockOf[i] !== -1) continue;
    mainshockOf[i] = i;
    const main = byTime[i] as CatalogEvent;
    const window = gardnerKnopoffWindow(main.magnitude);
    const windowMs = window.days * MS_PER_DAY;
    const from = foreshocks ? firstAtOrAfter(times, main.timeMs - windowMs) : i + 1;
    for (let j = from; j < n && (times[j] as number) <= main.timeMs + windowMs; j++) {
      if (j === i || mainshockOf[j] !== -1) continue;
      const other = byTime[j] as CatalogEvent;
      if (Math.abs(other.lat - main.lat) * MIN_KM_PER_DEGREE_LATITUDE > window.distanceKm) continue;
      const distanceKm = epicentralDistanceKm(main.lon, main.lat, other.lon, other.lat);
      if (distanceKm > window.distanceKm) continue;
      mainshockOf[j] = i;
      clustered.add(i);
      removed.push({
        event: other,
        mainshockId: main.id,
        distanceKm,
        daysFromMainshock: (other.timeMs - main.timeMs) / MS_PER_DAY,
      });
    }
  }
  removed.sort((a, b) => a.event.timeMs - b.event.timeMs);
  return {
    mainshocks: byTime.filter((_, i) => mainshockOf[i] === i),
    removed,
    clusterCount: clustered.size,
    excludedNonMoment: selected.excludedNonMoment,
    windows: GARDNER_KNOPOFF_WINDOWS,
  };
}

function firstAtOrAfter(times: readonly number[], t: number): number {
  let lo = 0;
  let hi = times.length;
  while (lo < hi) {
    const mid = (lo + hi) >>> 1;
    if ((times[mid] as number) < t) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}
