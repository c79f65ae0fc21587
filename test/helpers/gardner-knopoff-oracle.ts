import type { CatalogEvent } from '../../api/engine/catalog/event.ts';
import { MS_PER_DAY } from '../../api/engine/catalog/event.ts';
import {
  declusterCatalog,
  declusteredCatalog,
  declusterGardnerKnopoff,
  mainshocksInTurn,
  windowMember,
  type RemovedEvent,
} from '../../api/engine/catalog/gardner-knopoff.ts';

/**
 * The plain Gardner & Knopoff (1974) procedure, with the engine's signature and no index: each
 * mainshock scans every event inside its time window. Quadratic on large catalogs, so the engine
 * indexes epicentres in space; this stays with the tests as the oracle the indexed version must
 * match exactly. What it checks is that search; the selection of events, the mainshocks' turns,
 * the distance test of one event and the packing of the result are the engine's
 * (gardner-knopoff.ts, checked by test/engine/catalog/gardner-knopoff.test.ts).
 */
export const declusterGardnerKnopoffByScan: typeof declusterGardnerKnopoff = (
  events,
  options = {},
) => {
  const catalog = declusterCatalog(events, options);
  const { byTime, times } = catalog;
  const foreshocks = options.removeForeshocks ?? true;
  const n = byTime.length;
  const mainshockOf = new Int32Array(n).fill(-1);
  const removed: RemovedEvent[] = [];
  const clustered = new Set<number>();
  for (const { i, main, window } of mainshocksInTurn(catalog, mainshockOf)) {
    const windowMs = window.days * MS_PER_DAY;
    const from = foreshocks ? firstAtOrAfter(times, main.timeMs - windowMs) : i + 1;
    for (let j = from; j < n && (times[j] as number) <= main.timeMs + windowMs; j++) {
      if (j === i || mainshockOf[j] !== -1) continue;
      const member = windowMember(main, window, byTime[j] as CatalogEvent);
      if (member === null) continue;
      mainshockOf[j] = i;
      clustered.add(i);
      removed.push(member);
    }
  }
  removed.sort((a, b) => a.event.timeMs - b.event.timeMs);
  return declusteredCatalog(catalog, mainshockOf, removed, clustered.size);
};

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
