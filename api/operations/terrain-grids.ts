import { stat } from 'node:fs/promises';
import { fileURLToPath } from 'node:url';
import { InvalidInput } from '../engine/errors.ts';
import type { ElevationGrid } from '../engine/terrain/elevation-grid.ts';
import { siteProxy, type SiteProxy } from '../engine/terrain/site-proxy.ts';
import { readTerrainFile, terrainInFolder } from '../terrain/index.ts';

/** Where the service reads terrain grids: TREMORA_TERRAIN_DIR, else the demo folder (data-demo/). */
export const DEFAULT_TERRAIN_DIR = fileURLToPath(new URL('../../data-demo/', import.meta.url));

/** Grids kept: a few studies' worth (a demo grid is about 0.2 MB). */
const KEEP = 8;

/**
 * The terrain grids of saved studies, read from the terrain folder (bare file names only,
 * terrain-path.ts) and kept while their file is unchanged; shared by the tsunami times and
 * the slope–Vs30 proxy. Reading is asynchronous and validation is not, so a grid is read first
 * (`prepare`, before a study is validated) and its proxy then looked up (`siteProxyFor`).
 */
export class TerrainGrids {
  readonly #grids = new Map<string, { mtimeMs: number; grid: ElevationGrid }>();
  readonly #proxies = new WeakMap<ElevationGrid, SiteProxy>();
  readonly #problems = new Map<string, string>();

  constructor(
    readonly folder: string = process.env.TREMORA_TERRAIN_DIR?.trim() || DEFAULT_TERRAIN_DIR,
  ) {}

  /** The grid `terrain` names; InvalidInput naming the file when it cannot be read. */
  async grid(terrain: string): Promise<ElevationGrid> {
    const path = terrainInFolder(this.folder, terrain);
    const mtimeMs = await stat(path).then(
      (s) => s.mtimeMs,
      () => -1,
    );
    const kept = this.#grids.get(path);
    if (kept && kept.mtimeMs === mtimeMs) return kept.grid;
    const grid = await readTerrainFile(path);
    this.#grids.delete(path);
    this.#grids.set(path, { mtimeMs, grid });
    while (this.#grids.size > KEEP) this.#grids.delete(this.#grids.keys().next().value as string);
    return grid;
  }

  /**
   * Reads the grid a study document's `terrain` names, if any, so that `siteProxyFor` can
   * answer; why it cannot be read is kept for `problemWith` (validation reports it).
   */
  async prepare(document: unknown): Promise<void> {
    const terrain = terrainOf(document);
    if (terrain === undefined) return;
    try {
      await this.grid(terrain);
      this.#problems.delete(terrain);
    } catch (error) {
      if (!(error instanceof InvalidInput)) throw error;
      this.#problems.set(terrain, error.issues.map((i) => i.message).join('; '));
    }
  }

  /** `prepare` for a stored document's text, parsed only when it names a terrain grid. */
  async prepareText(text: string): Promise<void> {
    if (text.includes('"terrain"')) await this.prepare(JSON.parse(text));
  }

  /** The slope–Vs30 proxy over the grid a document names, once read (prepare); else undefined. */
  siteProxyFor(document: unknown): SiteProxy | undefined {
    const terrain = terrainOf(document);
    if (terrain === undefined) return undefined;
    let path: string;
    try {
      path = terrainInFolder(this.folder, terrain);
    } catch {
      return undefined;
    }
    const grid = this.#grids.get(path)?.grid;
    if (!grid) return undefined;
    let proxy = this.#proxies.get(grid);
    if (!proxy) {
      proxy = siteProxy(grid);
      this.#proxies.set(grid, proxy);
    }
    return proxy;
  }

  /** Why the grid a document names could not be read, when it could not. */
  problemWith(document: unknown): string | undefined {
    const terrain = terrainOf(document);
    return terrain === undefined ? undefined : this.#problems.get(terrain);
  }
}

function terrainOf(document: unknown): string | undefined {
  const terrain = (document as { terrain?: unknown } | null)?.terrain;
  return typeof document === 'object' && typeof terrain === 'string' ? terrain : undefined;
}

const perContext = new WeakMap<object, TerrainGrids>();

/** The one TerrainGrids of a service context (routes and pages share its cache). */
export function terrainGridsOf(ctx: object): TerrainGrids {
  let grids = perContext.get(ctx);
  if (!grids) {
    grids = new TerrainGrids();
    perContext.set(ctx, grids);
  }
  return grids;
}
