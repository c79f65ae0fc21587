import { InvalidInput } from '../engine/errors.ts';
import type { Study } from '../engine/model.ts';
import type { ScenarioRequest } from '../engine/scenario/index.ts';
import type { ElevationGrid } from '../engine/terrain/elevation-grid.ts';
import {
  DEFAULT_HIGH_GROUND_M,
  scenarioTsunami,
  tsunamiScreening,
  type TsunamiResult,
} from '../engine/tsunami/index.ts';
import { TerrainGrids, terrainGridsOf } from './terrain-grids.ts';

/** Results kept: a few studies' worth (a result is a few kB). */
const KEEP = 8;

/**
 * Tsunami times for saved studies, shared by the API route and the pages: the terrain grid
 * comes from the context's TerrainGrids (terrain-grids.ts); results are kept by the study's input hash and the options, as they never
 * change for the same inputs and grid. A solve takes about a second on the demo grid.
 */
export class TsunamiTimes {
  /** A number per grid read, so results from a replaced file are never served again. */
  readonly #gridIds = new WeakMap<ElevationGrid, number>();
  readonly #results = new Map<string, TsunamiResult>();
  #nextGridId = 1;

  constructor(readonly grids: TerrainGrids = new TerrainGrids()) {}

  /** The study's terrain grid; InvalidInput naming the file when it has none or cannot be read. */
  async grid(study: Study): Promise<ElevationGrid> {
    if (study.terrain === undefined) {
      throw new InvalidInput([
        {
          path: 'terrain',
          message:
            'the study names no terrain grid; expected "terrain": the file name of a GeoTIFF or ESRI ASCII elevation grid in the service\'s terrain folder',
        },
      ]);
    }
    const grid = await this.grids.grid(study.terrain);
    if (!this.#gridIds.has(grid)) this.#gridIds.set(grid, this.#nextGridId++);
    return grid;
  }

  /** First arrivals from the study's interface sources (all, or `sourceIds`) and high ground. */
  async forStudy(
    study: Study,
    hash: string,
    options: { sourceIds?: readonly string[]; highGroundM?: number } = {},
  ): Promise<TsunamiResult> {
    const grid = await this.grid(study);
    const key = `${hash}|${this.#gridIds.get(grid)}|${options.sourceIds?.join(',') ?? '*'}|${options.highGroundM ?? DEFAULT_HIGH_GROUND_M}`;
    const kept = this.#results.get(key);
    if (kept) return kept;
    const result = tsunamiScreening(study, grid, options);
    remember(this.#results, key, result);
    return result;
  }

  /** First arrivals for a scenario earthquake on an interface source. */
  async forScenario(
    study: Study,
    hash: string,
    request: Pick<ScenarioRequest, 'sourceId' | 'magnitude' | 'position'>,
  ): Promise<TsunamiResult> {
    const grid = await this.grid(study);
    const key = `${hash}|${this.#gridIds.get(grid)}|scenario|${request.sourceId}|${request.magnitude}|${JSON.stringify(request.position ?? 'closest')}`;
    const kept = this.#results.get(key);
    if (kept) return kept;
    const result = scenarioTsunami(study, grid, request);
    remember(this.#results, key, result);
    return result;
  }
}

function remember<V>(map: Map<string, V>, key: string, value: V): void {
  map.delete(key);
  map.set(key, value);
  while (map.size > KEEP) map.delete(map.keys().next().value as string);
}

const perContext = new WeakMap<object, TsunamiTimes>();

/** The one TsunamiTimes of a service context (routes and pages share its cache). */
export function tsunamiTimesOf(ctx: object): TsunamiTimes {
  let times = perContext.get(ctx);
  if (!times) {
    times = new TsunamiTimes(terrainGridsOf(ctx));
    perContext.set(ctx, times);
  }
  return times;
}
