import type { ReturnPeriodStatus } from '../../api/engine/results.ts';
import type { ServiceContext } from '../../api/operations/service-context.ts';
import type { MapRunRecord } from '../../api/store/index.ts';
import { DoneRunCache } from './done-run-cache.ts';

/**
 * Most grid points the overview draws as cells: beyond this the page (one SVG rect a point,
 * about 80 bytes each) grows past a megabyte and the map is offered as a download only.
 */
export const MAX_DRAWN_POINTS = 12_000;

/** One grid point of a done map, as the layer draws it. */
export interface LayerPoint {
  readonly lon: number;
  readonly lat: number;
  /** g, cm/s for PGV, or a probability; null where the level is off the computed curve. */
  readonly value: number | null;
  readonly status: ReturnPeriodStatus;
}

/** A done map's points, read from its GeoJSON. */
export interface MapLayer {
  readonly points: readonly LayerPoint[];
}

export interface ShownMap {
  /** The newest done map run of the study. */
  readonly run: MapRunRecord & { readonly description: NonNullable<MapRunRecord['description']> };
  /** Its points; undefined when there are more than MAX_DRAWN_POINTS. */
  readonly layer?: MapLayer;
  /** False when the study has changed since the map was computed. */
  readonly current: boolean;
}

export interface MapState {
  /** The study's newest map run of any status. */
  readonly latest?: MapRunRecord;
  readonly shown?: ShownMap;
}

interface PointFeature {
  readonly geometry: { readonly coordinates: readonly [number, number] };
  readonly properties: { readonly value: number | null; readonly status: ReturnPeriodStatus };
}

/**
 * Layers of done maps, by map run id: a done map never changes (the store refuses it), so its
 * parsed points are kept; the cache lives with the pages (study-pages.tsx), holding the few
 * most recent, as ResultsCache does for screenings.
 */
export class MapLayerCache extends DoneRunCache<MapLayer> {
  constructor(capacity = 4) {
    super(capacity, (ctx, runId) => {
      const text = ctx.store.maps.geojson(runId);
      if (text === undefined) return undefined;
      const features = (JSON.parse(text) as { features: readonly PointFeature[] }).features;
      const layer: MapLayer = {
        points: features.map((f) => ({
          lon: f.geometry.coordinates[0],
          lat: f.geometry.coordinates[1],
          value: f.properties.value,
          status: f.properties.status,
        })),
      };
      return layer;
    });
  }
}

/** The study's newest map run and newest done map (with its points when few enough to draw). */
export function readMaps(
  ctx: ServiceContext,
  cache: MapLayerCache,
  studyId: string,
  currentHash: string | undefined,
): MapState {
  const runs = ctx.store.maps.listForStudy(studyId);
  const latest = runs.at(-1);
  const done = [...runs].reverse().find((r) => r.status === 'done' && r.description !== null);
  if (!done) return latest ? { latest } : {};
  const run = done as ShownMap['run'];
  const layer = run.description.count <= MAX_DRAWN_POINTS ? cache.get(ctx, run.id) : undefined;
  return {
    ...(latest ? { latest } : {}),
    shown: { run, ...(layer ? { layer } : {}), current: run.inputHash === currentHash },
  };
}
