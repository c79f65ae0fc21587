import { readFile, stat } from 'node:fs/promises';
import { basename, extname } from 'node:path';
import proj4 from 'proj4';
import { InvalidInput } from '../engine/errors.ts';
import type { ElevationGrid, GridCrs } from '../engine/terrain/elevation-grid.ts';
import { readEsriAscii } from './esri-ascii.ts';
import { readGeoTiff } from './geotiff-grid.ts';

/** Largest terrain file read, bytes: a 4000 × 4000 grid of 32-bit values, with room to spare. */
export const MAX_TERRAIN_BYTES = 100 * 1024 * 1024;

/** File endings read as GeoTIFF; every other ending is read as an ESRI ASCII grid. */
const TIFF_ENDINGS = ['.tif', '.tiff'];

/**
 * Reads the terrain grid a study names (`terrain`): a GeoTIFF (`.tif`, `.tiff`) or an ESRI
 * ASCII grid (any other ending, usually `.asc`). A `.prj` file beside it (same name, WKT) gives
 * the CRS; without one, a GeoTIFF's geo keys do, and an ESRI ASCII grid is taken as WGS84
 * longitude/latitude (its header must then fit on the globe). Problems name the file.
 */
export async function readTerrainFile(path: string): Promise<ElevationGrid> {
  const label = basename(path);
  const size = await stat(path).then(
    (s) => s.size,
    (error: NodeJS.ErrnoException) => {
      throw new InvalidInput([
        {
          path: 'terrain',
          message: `cannot read the terrain grid "${label}" (${error.code ?? 'error'}); expected a GeoTIFF or ESRI ASCII grid beside the study`,
        },
      ]);
    },
  );
  if (size > MAX_TERRAIN_BYTES)
    throw new InvalidInput([
      {
        path: 'terrain',
        message: `the terrain grid "${label}" is ${size} bytes, over the limit of ${MAX_TERRAIN_BYTES}; expected a coarser or smaller grid`,
      },
    ]);
  const prj = await readFile(
    path.slice(0, path.length - extname(path).length) + '.prj',
    'utf8',
  ).catch(() => undefined);
  const crs = prj === undefined ? undefined : crsFromWkt(prj, label);
  if (TIFF_ENDINGS.includes(extname(path).toLowerCase())) {
    const bytes = await readFile(path);
    return readGeoTiff(
      bytes.buffer.slice(bytes.byteOffset, bytes.byteOffset + bytes.byteLength) as ArrayBuffer,
      label,
      crs,
    );
  }
  const text = await readFile(path, 'utf8');
  try {
    return readEsriAscii(text, label, crs ?? { kind: 'lonlat' });
  } catch (error) {
    if (
      crs === undefined &&
      error instanceof InvalidInput &&
      error.issues.some((i) => i.message.includes('longitude/latitude'))
    ) {
      throw new InvalidInput(
        error.issues.map((i) => ({
          ...i,
          message: `${i.message} (no .prj file beside the grid, so WGS84 longitude/latitude was assumed; add one for a projected grid)`,
        })),
        'unusable terrain grid',
      );
    }
    throw error;
  }
}

/** The CRS of a `.prj` (WKT): geographic WGS84 as lon/lat, a projected CRS through proj4's WKT reader. */
function crsFromWkt(wkt: string, label: string): GridCrs {
  const text = wkt.trim();
  const root = /^[A-Z_]+/.exec(text)?.[0] ?? '';
  if (root === 'GEOGCS' || root === 'GEOGCRS') {
    if (!/WGS[ _]?(19)?84/i.test(text))
      throw new InvalidInput([
        {
          path: 'terrain',
          message: `the .prj of "${label}" names a geographic CRS other than WGS84; expected WGS84 longitude/latitude or a projected CRS`,
        },
      ]);
    return { kind: 'lonlat' };
  }
  try {
    proj4('EPSG:4326', text).forward([0, 0]);
  } catch (error) {
    throw new InvalidInput([
      {
        path: 'terrain',
        message: `the .prj of "${label}" cannot be read as a CRS (${(error as Error).message}); expected WKT`,
      },
    ]);
  }
  const name = /^[A-Z_]+\["([^"]+)"/.exec(text)?.[1] ?? 'the .prj CRS';
  return { kind: 'projected', name, proj4: text };
}
