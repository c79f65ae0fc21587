import { InvalidInput } from '../errors.ts';
import { frameForStudy, type LocalFrame, type PointXY } from '../geometry/projection.ts';
import type { Study } from '../model.ts';
import type { ElevationGrid } from '../terrain/elevation-grid.ts';
import { coastArrival, type TravelTimes } from './coast-arrival.ts';
import { fastMarching } from './fast-marching.ts';
import { DEFAULT_HIGH_GROUND_M, highGround, type HighGround } from './high-ground.ts';
import { longWaveGrid } from './long-wave.ts';
import { metricGrid, nativeCellKm, type MetricGrid } from './metric-grid.ts';
import { interfaceSourceArea, startCells, type SourceArea } from './source-area.ts';

export interface TsunamiOptions {
  /** The interface sources to start from; every interface source of the study when absent. */
  readonly sourceIds?: readonly string[];
  /** Height counted as high ground, m above sea level (DEFAULT_HIGH_GROUND_M). */
  readonly highGroundM?: number;
}

/** One source's arrival at one community's coast, minutes rounded down (coast-arrival.ts). */
export interface SourceArrival {
  readonly sourceId: string;
  readonly firstArrivalMinutes: number;
  readonly latestMinutes: number;
  readonly gridMinutes: number;
  readonly coastDistanceKm: number;
}

export interface TsunamiCommunity {
  readonly id: string;
  readonly name: string;
  /** The earliest first arrival over the sources, minutes rounded down; null with a problem. */
  readonly firstArrivalMinutes: number | null;
  /** The high end of that source's range, minutes rounded down. */
  readonly latestMinutes: number | null;
  /** The source the earliest arrival comes from. */
  readonly sourceId: string | null;
  readonly arrivals: readonly SourceArrival[];
  readonly highGround: HighGround | null;
  /** Why a number is missing: never a silent gap. */
  readonly problems: readonly string[];
}

export interface TsunamiResult {
  readonly terrain: {
    readonly label: string;
    readonly spacingKm: number;
    readonly coarseSpacingKm: number;
    readonly columns: number;
    readonly rows: number;
  };
  readonly sources: readonly { readonly sourceId: string; readonly name: string }[];
  readonly highGroundM: number;
  /** Coastal communities only, in study order. */
  readonly communities: readonly TsunamiCommunity[];
}

/** Finest solve spacing, km: below it a terrain grid is sampled coarser than it is (the work grows as 1/spacing²). */
export const MIN_SOLVE_SPACING_KM = 0.25;

/**
 * Tsunami time-to-act for a study's coastal communities: the first arrival from each interface
 * source's area (the part of it under the sea, offshore of the study's outline) at the coast nearest each (fast marching of √(g h), fast-marching.ts) and the
 * nearest high ground (high-ground.ts).
 */
export function tsunamiScreening(
  study: Study,
  grid: ElevationGrid,
  options: TsunamiOptions = {},
): TsunamiResult {
  const frame = frameForStudy(study);
  const interfaces = study.sources.filter((s) => s.setting === 'interface');
  let chosen = interfaces;
  if (options.sourceIds !== undefined) {
    const unknown = options.sourceIds.filter((id) => !interfaces.some((s) => s.id === id));
    if (unknown.length > 0) {
      throw new InvalidInput([
        {
          path: 'source',
          message: `not an interface source of the study: ${unknown.join(', ')}; expected one of ${interfaces.map((s) => s.id).join(', ') || '(none)'}`,
        },
      ]);
    }
    chosen = interfaces.filter((s) => options.sourceIds?.includes(s.id));
  }
  if (chosen.length === 0)
    throw new InvalidInput([
      {
        path: 'sources',
        message:
          'the study has no interface source for a tsunami to start from; expected at least one source with setting "interface"',
      },
    ]);
  return arrivalsFromAreas(
    study,
    grid,
    frame,
    chosen.map((s) => interfaceSourceArea(s, frame)),
    options.highGroundM ?? DEFAULT_HIGH_GROUND_M,
  );
}

/** The two grids a solve runs on: the terrain's own cell size (MIN_SOLVE_SPACING_KM at the finest) and twice it. */
export interface SolveGrids {
  readonly fine: MetricGrid;
  readonly coarse: MetricGrid;
}

export function solveGrids(grid: ElevationGrid, frame: LocalFrame): SolveGrids {
  const fine = metricGrid(grid, frame, Math.max(MIN_SOLVE_SPACING_KM, nativeCellKm(grid, frame)));
  return { fine, coarse: metricGrid(grid, frame, 2 * fine.spacingKm) };
}

/** The same for given source areas (a scenario's rupture, source-area.ts), in the study's frame. */
export function arrivalsFromAreas(
  study: Study,
  grid: ElevationGrid,
  frame: LocalFrame,
  areas: readonly SourceArea[],
  highGroundM: number,
  grids: SolveGrids = solveGrids(grid, frame),
): TsunamiResult {
  if (!(highGroundM > 0 && highGroundM <= 1000))
    throw new InvalidInput([
      {
        path: 'highGroundM',
        message: `expected a height above sea level in (0, 1000] m, got ${highGroundM}`,
      },
    ]);
  const { fine, coarse } = grids;
  const toLonLat = frame.toLonLat.bind(frame);
  // The land the study outlines: the sea over a rupture starts the wave, not the water inside it.
  const land = (study.outline ?? []).map((ring) => ring.map((p) => frame.toLocal(p)));
  const solves = areas.map((area) => ({
    area,
    fine: solve(fine, area, grid.label, toLonLat, land),
    coarse: solve(coarse, area, grid.label, toLonLat, land),
  }));
  const communities = study.communities
    .filter((c) => c.coastal)
    .map((community): TsunamiCommunity => {
      const site = frame.toLocal([community.lon, community.lat]);
      const problems: string[] = [];
      const arrivals: SourceArrival[] = [];
      for (const s of solves) {
        const arrival = coastArrival(s.fine, s.coarse, site);
        if (arrival.ok)
          arrivals.push({
            sourceId: s.area.sourceId,
            firstArrivalMinutes: arrival.firstArrivalMinutes,
            latestMinutes: arrival.latestMinutes,
            gridMinutes: arrival.gridMinutes,
            coastDistanceKm: arrival.coastDistanceKm,
          });
        else
          problems.push(
            `community "${community.id}" (${community.name}), source "${s.area.sourceId}": ${arrival.problem}`,
          );
      }
      const earliest =
        arrivals.length === areas.length
          ? [...arrivals].sort(
              (a, b) =>
                a.firstArrivalMinutes - b.firstArrivalMinutes || a.latestMinutes - b.latestMinutes,
            )[0]
          : undefined;
      return {
        id: community.id,
        name: community.name,
        firstArrivalMinutes: earliest?.firstArrivalMinutes ?? null,
        latestMinutes: earliest?.latestMinutes ?? null,
        sourceId: earliest?.sourceId ?? null,
        arrivals,
        highGround: highGround(grid, community, highGroundM),
        problems,
      };
    });
  return {
    terrain: {
      label: grid.label,
      spacingKm: fine.spacingKm,
      coarseSpacingKm: coarse.spacingKm,
      columns: fine.columns,
      rows: fine.rows,
    },
    sources: areas.map((a) => ({ sourceId: a.sourceId, name: a.name })),
    highGroundM,
    communities,
  };
}

function solve(
  m: MetricGrid,
  area: SourceArea,
  label: string,
  toLonLat: (p: { x: number; y: number }) => readonly [number, number],
  land: readonly (readonly PointXY[])[],
): TravelTimes {
  return {
    grid: m,
    timesS: fastMarching(longWaveGrid(m), startCells(m, area, label, toLonLat, land)),
  };
}
