import { geoPath, geoTransform, type GeoPermissibleObjects } from 'd3-geo';
import {
  frameForStudy,
  type LocalFrame,
  type PointXY,
} from '../../api/engine/geometry/projection.ts';
import type { LonLat, Study } from '../../api/engine/model.ts';
import { studyPoints } from '../../api/engine/geometry/study-points.ts';

/**
 * Maps are drawn in the study's own local frame (api/engine/geometry/projection.ts: a WGS84
 * azimuthal equidistant projection by proj4, centred on the study), the frame the distances
 * were computed in, so a km on the map is a km of the screening. d3-geo's path generator takes
 * it through geoTransform; d3's own projections are spherical and would not match the engine.
 * North is straight up at the centre; over a study a few hundred km across the meridians lean
 * by under a degree or two, which the north arrow ignores.
 */
export interface MapFrame {
  readonly width: number;
  readonly height: number;
  readonly local: LocalFrame;
  /** Pixels per km. */
  readonly scale: number;
  /** WGS84 [lon, lat] to SVG pixels (y down). */
  project(lonLat: LonLat): readonly [x: number, y: number];
  /** Local km to SVG pixels. */
  fromLocal(point: PointXY): readonly [x: number, y: number];
  /** SVG path data of a GeoJSON object, coordinates to 0.1 px. */
  path(object: GeoPermissibleObjects): string;
}

export interface MapFrameOptions {
  readonly width: number;
  /** Most height the map may take; the frame keeps the study's shape within width × maxHeight. */
  readonly maxHeight: number;
  /** Margin around the data, px. */
  readonly padding: number;
  /** Extra points (WGS84) the map must show, e.g. a scenario grid's corners. */
  readonly include?: readonly LonLat[];
  /** What the map must show: everything (default), or the communities and outline only (sources may run off the edge). */
  readonly fit?: 'everything' | 'communities';
  /** A square around one place instead (a village's own map): what lies outside is clipped. */
  readonly around?: { readonly center: LonLat; readonly radiusKm: number };
}

/** The frame fitting the study (and `include`) into the map's box, north up. */
export function mapFrame(
  study: Pick<Study, 'communities' | 'sources' | 'outline'>,
  options: MapFrameOptions,
): MapFrame {
  const local = frameForStudy(study);
  const shown =
    options.fit === 'communities'
      ? studyPoints({
          communities: study.communities,
          sources: [],
          ...(study.outline ? { outline: study.outline } : {}),
        })
      : studyPoints(study);
  const around = options.around;
  const middle = around ? local.toLocal(around.center) : undefined;
  const points =
    around && middle
      ? [-1, 1].map((k) => ({
          x: middle.x + k * around.radiusKm,
          y: middle.y + k * around.radiusKm,
        }))
      : [...shown, ...(options.include ?? [])].map((p) => local.toLocal(p));
  let minX = Infinity,
    maxX = -Infinity,
    minY = Infinity,
    maxY = -Infinity;
  for (const p of points) {
    minX = Math.min(minX, p.x);
    maxX = Math.max(maxX, p.x);
    minY = Math.min(minY, p.y);
    maxY = Math.max(maxY, p.y);
  }
  // A single place (or none) still gets a 20 km wide map around it.
  const spanX = Math.max(maxX - minX, 20);
  const spanY = Math.max(maxY - minY, 20);
  const cx = (minX + maxX) / 2;
  const cy = (minY + maxY) / 2;
  const inner = options.width - 2 * options.padding;
  const scale = Math.min(inner / spanX, (options.maxHeight - 2 * options.padding) / spanY);
  const height = Math.round(spanY * scale + 2 * options.padding);
  const fromLocal = (p: PointXY) =>
    [options.width / 2 + (p.x - cx) * scale, height / 2 - (p.y - cy) * scale] as const;
  const project = (lonLat: LonLat) => fromLocal(local.toLocal(lonLat));
  const transform = geoTransform({
    point(lon: number, lat: number) {
      const [x, y] = project([lon, lat]);
      this.stream.point(x, y);
    },
  });
  const generator = geoPath(transform).digits(1);
  return {
    width: options.width,
    height,
    local,
    scale,
    project,
    fromLocal,
    path: (object) => generator(object) ?? '',
  };
}

/**
 * A scale bar's length: the largest of 1, 2 or 5 × 10^k km that fits in `maxPx` pixels at
 * `pxPerKm` (the usual round lengths of map scale bars; common practice).
 */
export function scaleBarKm(pxPerKm: number, maxPx: number): number {
  if (!(pxPerKm > 0 && maxPx > 0))
    throw new RangeError(
      `expected positive pixels per km and bar length, got ${pxPerKm}, ${maxPx}`,
    );
  const maxKm = maxPx / pxPerKm;
  const power = 10 ** Math.floor(Math.log10(maxKm));
  for (const step of [5, 2, 1]) if (step * power <= maxKm) return step * power;
  return power;
}
