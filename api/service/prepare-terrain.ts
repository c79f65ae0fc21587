import type { MiddlewareHandler } from 'hono';
import type { ServiceContext } from '../operations/service-context.ts';
import { terrainGridsOf } from '../operations/terrain-grids.ts';

/** A saved study's or run's path, in the API or the pages: its kind and id. */
const RECORD_PATH = /^\/(?:api\/)?(studies|runs)\/([^/]+)/;

/**
 * Reads, before a request about a saved study or run is handled, the terrain grid its document
 * names (terrain-grids.ts): the handlers validate the study without waiting, and its
 * communities without vs30 or a site class then take the slope–Vs30 proxy.
 */
export function prepareTerrain(ctx: ServiceContext): MiddlewareHandler {
  return async (c, next) => {
    const match = RECORD_PATH.exec(c.req.path);
    if (match) {
      const [, kind, id] = match as unknown as [string, string, string];
      const document =
        kind === 'studies'
          ? ctx.store.studies.get(id)?.document
          : ctx.store.runs.inputs(id)?.document;
      if (document !== undefined) await terrainGridsOf(ctx).prepareText(document);
    }
    await next();
  };
}
