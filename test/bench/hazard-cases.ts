import { spawnSync } from 'node:child_process';
import { arch, availableParallelism, cpus, loadavg, totalmem } from 'node:os';
import type { Community, Study } from '../../api/engine/model.ts';
import type { ScreeningOutput } from '../../api/engine/screen-study.ts';
import { frameForStudy } from '../../api/engine/geometry/projection.ts';
import { testSettings } from '../helpers/test-settings.ts';

/**
 * Shared pieces of the hazard benchmarks (hazard.bench.ts and the map runs it starts): the
 * invented cases, how the machine is described, peak memory, and how the fast path's numbers
 * are compared with the reference path's. Nothing here asserts anything about time.
 */

/** Rates below this (per year; return periods beyond 10¹² years) are compared absolutely, not relatively. */
export const RATE_FLOOR = 1e-12;

/** The largest relative difference between two lists of numbers (absolute below `floor`). */
export function largestDifference(
  fast: readonly (number | null)[],
  reference: readonly (number | null)[],
  floor = RATE_FLOOR,
): number {
  let worst = 0;
  reference.forEach((r, i) => {
    const f = fast[i];
    if (r === null || f === null || f === undefined) {
      if ((r === null) !== (f === null || f === undefined)) worst = Infinity;
      return;
    }
    worst = Math.max(worst, Math.abs(f - r) / Math.max(Math.abs(r), floor));
  });
  return worst;
}

/** Every mean rate, branch rate and return-period level of two screenings, side by side. */
export function screeningDifference(fast: ScreeningOutput, reference: ScreeningOutput): number {
  let worst = 0;
  reference.communities.forEach((r, c) => {
    const f = fast.communities[c]!;
    for (const [key, curve] of Object.entries(r.curves)) {
      worst = Math.max(worst, largestDifference(f.curves[key]!.annualRate, curve.annualRate));
      curve.branches?.forEach(
        (b, i) =>
          (worst = Math.max(
            worst,
            largestDifference(f.curves[key]!.branches![i]!.annualRate, b.annualRate),
          )),
      );
    }
    for (const [years, levels] of Object.entries(r.atReturnPeriod)) {
      const keys = Object.keys(levels);
      worst = Math.max(
        worst,
        largestDifference(
          keys.map((k) => f.atReturnPeriod[years]![k] ?? null),
          keys.map((k) => levels[k] ?? null),
          1e-9,
        ),
      );
    }
  });
  return worst;
}

/** Peak resident memory, sampled while `work` runs (process.memoryUsage: the whole process, worker threads included). */
export async function withPeakRss<T>(
  work: () => Promise<T>,
): Promise<{ value: T; peakRssMb: number }> {
  let peak = process.memoryUsage().rss;
  const timer = setInterval(() => (peak = Math.max(peak, process.memoryUsage().rss)), 25);
  try {
    const value = await work();
    peak = Math.max(peak, process.memoryUsage().rss);
    return { value, peakRssMb: peak / 2 ** 20 };
  } finally {
    clearInterval(timer);
  }
}

export function machineLine(): string {
  const cpu = cpus()[0];
  return `${cpu?.model ?? 'unknown CPU'} (${arch()}), ${availableParallelism()} cores, ${Math.round(totalmem() / 2 ** 30)} GB, Node ${process.version}`;
}

export const loadLine = (): string =>
  `load average ${loadavg()
    .map((l) => l.toFixed(2))
    .join(' / ')} (1 / 5 / 15 min)`;

/** Vs30 values the invented communities cycle through, m/s: rock to soft soil. */
const VS30_CYCLE = [760, 450, 300, 620, 240, 900, 360, 520];

/**
 * `count` invented communities spread evenly over the box of the study's communities (a square
 * lattice in its local frame), with Vs30 cycling through VS30_CYCLE. Names are numbers.
 */
export function latticeCommunities(study: Study, count: number, prefix: string): Community[] {
  const frame = frameForStudy(study);
  const points = study.communities.map((c) => frame.toLocal([c.lon, c.lat]));
  const x0 = Math.min(...points.map((p) => p.x)),
    x1 = Math.max(...points.map((p) => p.x));
  const y0 = Math.min(...points.map((p) => p.y)),
    y1 = Math.max(...points.map((p) => p.y));
  const columns = Math.ceil(Math.sqrt(count));
  const rows = Math.ceil(count / columns);
  return Array.from({ length: count }, (_, i) => {
    const [lon, lat] = frame.toLonLat({
      x: x0 + ((i % columns) + 0.5) * ((x1 - x0) / columns),
      y: y0 + (Math.floor(i / columns) + 0.5) * ((y1 - y0) / rows),
    });
    return {
      id: `${prefix}-${i + 1}`,
      name: `${prefix} ${i + 1}`,
      lon,
      lat,
      vs30: VS30_CYCLE[i % VS30_CYCLE.length]!,
      vs30Basis: 'measured',
      coastal: false,
    };
  });
}

/**
 * The synthetic case: 200 point sources (one magnitude each, M 5 to 7.5, 10⁻⁴ to
 * 10⁻² a year, depths 5–15 km) spread over a square 160 km across, 1,000 sites on a lattice over
 * it, one crustal model (BSSA14), PGA at 25 levels (the default levels). Invented, in open ocean.
 */
export function syntheticStudy(): Study {
  const origin = { lon: -140, lat: -50 };
  const kmPerDegLat = 111.2;
  const kmPerDegLon = kmPerDegLat * Math.cos((origin.lat * Math.PI) / 180);
  const at = (xKm: number, yKm: number) =>
    [origin.lon + xKm / kmPerDegLon, origin.lat + yKm / kmPerDegLat] as const;
  const sources = Array.from({ length: 200 }, (_, i) => {
    const [lon, lat] = at(((i * 37) % 200) * 0.8 - 80, ((i * 53) % 200) * 0.8 - 80);
    return {
      kind: 'point' as const,
      id: `synthetic-${i + 1}`,
      name: `Synthetic source ${i + 1}`,
      setting: 'crustal' as const,
      mechanism: (['strike-slip', 'reverse', 'normal'] as const)[i % 3]!,
      rakeDeg: [0, 90, -90][i % 3]!,
      recurrence: {
        type: 'fixed' as const,
        magnitude: 5 + (i % 26) * 0.1,
        rate: 10 ** (-2 - (i % 21) * 0.1),
      },
      location: [lon, lat] as const,
      depthKm: 5 + (i % 11),
    };
  });
  const communities: Community[] = Array.from({ length: 1000 }, (_, i) => {
    const [lon, lat] = at((i % 40) * 4 - 78, Math.floor(i / 40) * 6.4 - 77);
    return {
      id: `site-${i + 1}`,
      name: `Site ${i + 1}`,
      lon,
      lat,
      vs30: VS30_CYCLE[i % VS30_CYCLE.length]!,
      vs30Basis: 'measured',
      coastal: false,
    };
  });
  return {
    name: 'Synthetic points (invented)',
    communities,
    sources,
    groundMotion: { crustal: [{ model: 'BSSA14', weight: 1 }], interface: [], intraslab: [] },
    settings: testSettings(),
  };
}

/**
 * The synthetic case as a study file (README, "The study format"), for `tremora screen`: the
 * same point sources as GeoJSON points, the same communities, BSSA14 for the crustal setting
 * and the same settings. `tremora check` confirms that it reads back as the same study.
 */
export function syntheticStudyFile(): object {
  const study = syntheticStudy();
  const { levels: _levels, ...settings } = study.settings;
  return {
    name: study.name,
    communities: study.communities.map(({ id, name, lon, lat, vs30 }) => ({
      id,
      name,
      lon,
      lat,
      vs30,
    })),
    sources: {
      type: 'FeatureCollection',
      features: study.sources.map((source) => {
        if (source.kind !== 'point') throw new Error('the synthetic case has point sources only');
        const { id, name, setting, mechanism, rakeDeg, recurrence, depthKm } = source;
        return {
          type: 'Feature',
          geometry: { type: 'Point', coordinates: source.location },
          properties: { id, name, setting, mechanism, rake: rakeDeg, recurrence, depthKm },
        };
      }),
    },
    groundMotion: { crustal: [{ model: 'BSSA14', weight: 1 }] },
    settings,
  };
}

/**
 * Runs one map of the demo in a process of its own (map-run.ts) and reads its figures; `env`
 * adds to its environment (TREMORA_QUEUE: the map goes through that queue).
 */
export function mapRun(
  points: number,
  sampleEvery: number,
  stopAfter = Infinity,
  env: Readonly<Record<string, string>> = {},
): Record<string, any> {
  const args = [
    '--import',
    'tsx',
    new URL('./map-run.ts', import.meta.url).pathname,
    String(points),
    String(sampleEvery),
    ...(Number.isFinite(stopAfter) ? [String(stopAfter)] : []),
  ];
  const run = spawnSync(process.execPath, args, {
    encoding: 'utf8',
    maxBuffer: 64 * 2 ** 20,
    env: { ...process.env, ...env },
  });
  if (run.status !== 0) throw new Error(`map-run failed: ${run.stderr}`);
  return JSON.parse(run.stdout.trim().split('\n').at(-1)!);
}
