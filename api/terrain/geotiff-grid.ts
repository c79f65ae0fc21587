import { fromArrayBuffer } from 'geotiff';
import { InvalidInput } from '../engine/errors.ts';
import {
  createElevationGrid,
  type ElevationGrid,
  type GridCrs,
} from '../engine/terrain/elevation-grid.ts';

/** The GeoTIFF geographic CRS code of WGS84 (EPSG:4326) and the "user-defined" code. */
const WGS84 = 4326;
const USER_DEFINED = 32767;

/**
 * Reads the first band of a GeoTIFF's first image as an elevation grid, with the `geotiff`
 * package (GeoTIFF 1.1: tie point and pixel scale, or a north-up transformation, give the
 * georeferencing; GDAL's nodata tag marks missing values). The CRS comes from the geo keys:
 * WGS84 longitude/latitude, a WGS84 UTM zone (EPSG 32601–32660, 32701–32760), or the
 * `projectedCrs` the caller gives (from a `.prj` beside the file). Every problem names the file.
 */
export async function readGeoTiff(
  bytes: ArrayBuffer,
  label: string,
  projectedCrs?: GridCrs,
): Promise<ElevationGrid> {
  const unusable = (message: string) =>
    new InvalidInput([{ path: label, message }], 'unusable terrain grid');
  let image;
  try {
    image = await (await fromArrayBuffer(bytes)).getImage();
  } catch (error) {
    throw unusable(
      `cannot be read as a GeoTIFF (${(error as Error).message}); expected a GeoTIFF or an ESRI ASCII grid`,
    );
  }
  let origin: number[], resolution: number[];
  try {
    origin = image.getOrigin();
    resolution = image.getResolution();
  } catch {
    throw unusable(
      'the GeoTIFF has no georeferencing (no tie point and pixel scale, nor a transformation); expected a georeferenced elevation grid',
    );
  }
  const [west, north] = origin as [number, number];
  const [cellWidth, negHeight] = resolution as [number, number];
  if (!(cellWidth > 0 && negHeight < 0))
    throw unusable(
      `expected a north-up grid (positive x and negative y pixel size), got ${cellWidth} × ${negHeight}`,
    );
  const keys = image.getGeoKeys() ?? {};
  const crs = projectedCrs ?? crsFromKeys(keys as Record<string, unknown>, label);
  const [band] = (await image.readRasters({ samples: [0] })) as unknown as ArrayLike<number>[];
  if (!band) throw unusable('the GeoTIFF has no band of values');
  const nodata = image.getGDALNoData();
  const values = Float32Array.from(band, (v) => (v === nodata ? NaN : v));
  return createElevationGrid({
    label,
    crs,
    columns: image.getWidth(),
    rows: image.getHeight(),
    west,
    north,
    cellWidth,
    cellHeight: -negHeight,
    elevationM: values,
  });
}

function crsFromKeys(keys: Record<string, unknown>, label: string): GridCrs {
  const projected = keys.ProjectedCSTypeGeoKey;
  const geographic = keys.GeographicTypeGeoKey;
  if (typeof projected === 'number' && projected !== USER_DEFINED) {
    const zone = projected % 100;
    if ((projected >= 32601 && projected <= 32660) || (projected >= 32701 && projected <= 32760)) {
      return {
        kind: 'projected',
        name: `EPSG:${projected}`,
        proj4: `+proj=utm +zone=${zone}${projected > 32700 ? ' +south' : ''} +datum=WGS84 +units=m +no_defs`,
      };
    }
    throw new InvalidInput(
      [
        {
          path: label,
          message: `the GeoTIFF's CRS EPSG:${projected} is not one Tremora knows; expected WGS84 lon/lat, a WGS84 UTM zone, or a .prj file beside it`,
        },
      ],
      'unusable terrain grid',
    );
  }
  if (keys.GTModelTypeGeoKey === 2 || geographic === WGS84) {
    if (geographic !== undefined && geographic !== WGS84) {
      throw new InvalidInput(
        [
          {
            path: label,
            message: `the GeoTIFF's geographic CRS EPSG:${String(geographic)} is not WGS84; expected WGS84 (EPSG:4326) or a .prj file beside it`,
          },
        ],
        'unusable terrain grid',
      );
    }
    return { kind: 'lonlat' };
  }
  throw new InvalidInput(
    [
      {
        path: label,
        message:
          'the GeoTIFF names no coordinate reference system; expected WGS84 lon/lat, a WGS84 UTM zone, or a .prj file beside it',
      },
    ],
    'unusable terrain grid',
  );
}
