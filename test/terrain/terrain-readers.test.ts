import { writeArrayBuffer } from 'geotiff';
import { describe, expect, it } from 'vitest';
import { InvalidInput } from '../../api/engine/errors.ts';
import { elevationAt, elevationSampler } from '../../api/engine/terrain/elevation-grid.ts';
import { readEsriAscii } from '../../api/terrain/esri-ascii.ts';
import { readGeoTiff } from '../../api/terrain/geotiff-grid.ts';
import { terrainInFolder } from '../../api/terrain/terrain-path.ts';
import { expectClose } from '../helpers/close.ts';

/** A 4 × 3 grid of invented elevations, one missing. */
const ASCII = `ncols 4
nrows 3
xllcorner -140.0
yllcorner -47.0
cellsize 0.5
NODATA_value -9999
-50 -45 -40 -35
0 5 10 -9999
50 55 60 65
`;

/** The plane fixture's frame: 4 columns by 3 rows of 0.5° cells, north-west corner at 140° W, 45.5° S. */
const PLANE_GRID = {
  columns: 4,
  rows: 3,
  west: -140,
  north: -45.5,
  cellWidth: 0.5,
  cellHeight: 0.5,
} as const;

describe('ESRI ASCII grid', () => {
  it('reads the header, the rows north first and nodata as missing, and samples bilinearly', () => {
    const grid = readEsriAscii(ASCII, 'plane.asc', { kind: 'lonlat' });
    expect(grid).toMatchObject(PLANE_GRID);
    // Cell centres: first row at lat -45.75, first column at lon -139.75.
    expect(elevationAt(grid, -139.75, -45.75)).toBe(-50);
    expect(elevationAt(grid, -138.25, -46.25)).toBeNull();
    // Between four centres of the plane the bilinear value is the plane's (derived: bilinear interpolation reproduces a linear function).
    expectClose(
      elevationAt(grid, -139.5, -46.0) as number,
      -22.5,
      1e-9,
      'mean of -50, -45, 0, 5 (derived)',
    );
    // 0.3 of a cell east of the first column, halfway between the second and third rows (derived).
    expectClose(
      elevationSampler(grid)([-139.6, -46.5]) as number,
      0.5 * (0 + 0.3 * 5) + 0.5 * (50 + 0.3 * 5),
      1e-6,
      'bilinear weights (derived)',
    );
    expect(elevationAt(grid, -141, -46)).toBeNull();
  });

  it('refuses a grid without georeferencing, naming the file and the missing lines', () => {
    const bare = ASCII.split('\n')
      .filter((l) => !l.startsWith('xllcorner') && !l.startsWith('cellsize'))
      .join('\n');
    expect(() => readEsriAscii(bare, 'bare.asc', { kind: 'lonlat' })).toThrow(
      /bare\.asc: the grid has no georeferencing: expected the header lines xllcorner \(or xllcenter\), cellsize/,
    );
  });

  it('names the line of a value that is not a number and counts the values', () => {
    expect(() =>
      readEsriAscii(ASCII.replace('55', 'high'), 'typo.asc', { kind: 'lonlat' }),
    ).toThrow(/typo\.asc:9: expected a number of metres, got "high"/);
    expect(() =>
      readEsriAscii(ASCII.replace('50 55 60 65', '50 55 60'), 'short.asc', { kind: 'lonlat' }),
    ).toThrow(/expected 12 values \(4 columns × 3 rows\), got 11/);
  });

  it('refuses a longitude/latitude grid off the globe', () => {
    expect(() =>
      readEsriAscii(ASCII.replace('yllcorner -47.0', 'yllcorner 500000'), 'utm.asc', {
        kind: 'lonlat',
      }),
    ).toThrow(InvalidInput);
  });
});

describe('GeoTIFF grid', () => {
  const values = [-50, -45, -40, -35, 0, 5, 10, -9999, 50, 55, 60, 65];
  const metadata = {
    height: 3,
    width: 4,
    ModelPixelScale: [0.5, 0.5, 0],
    ModelTiepoint: [0, 0, 0, -140, -45.5, 0],
    GDAL_NODATA: '-9999',
    BitsPerSample: [32],
    SampleFormat: [3],
  };
  const tiff = (extra: object) =>
    writeArrayBuffer(Float32Array.from(values), { ...metadata, ...extra } as never);

  /** The file with its georeferencing tags renamed to private tag numbers (the writer always adds them). */
  function withoutGeoreferencing(bytes: ArrayBuffer): ArrayBuffer {
    const view = new DataView(bytes);
    const ifd = view.getUint32(4);
    for (let k = 0; k < view.getUint16(ifd); k += 1) {
      const at = ifd + 2 + 12 * k;
      if ([33550, 33922, 34264].includes(view.getUint16(at))) view.setUint16(at, 65000 + k);
    }
    return bytes;
  }

  it('reads a georeferenced WGS84 GeoTIFF like the same ESRI ASCII grid', async () => {
    const bytes = tiff({ GeographicTypeGeoKey: 4326, GTModelTypeGeoKey: 2 });
    const grid = await readGeoTiff(bytes, 'plane.tif');
    expect(grid).toMatchObject({ ...PLANE_GRID, crs: { kind: 'lonlat' } });
    expectClose(
      elevationAt(grid, -139.5, -46.0) as number,
      -22.5,
      1e-9,
      'mean of -50, -45, 0, 5 (derived)',
    );
  });

  it('refuses a GeoTIFF without georeferencing, naming the file', async () => {
    const bytes = withoutGeoreferencing(tiff({ GeographicTypeGeoKey: 4326, GTModelTypeGeoKey: 2 }));
    await expect(readGeoTiff(bytes, 'plain.tif')).rejects.toThrow(
      /plain\.tif: the GeoTIFF has no georeferencing/,
    );
  });
});

describe('terrain file names in the service', () => {
  it('accepts a bare file name and refuses a path', () => {
    expect(terrainInFolder('/srv/terrain', 'coast.asc')).toBe('/srv/terrain/coast.asc');
    expect(() => terrainInFolder('/srv/terrain', '../etc/passwd')).toThrow(/bare file name/);
    expect(() => terrainInFolder('/srv/terrain', '.hidden')).toThrow(/bare file name/);
  });
});
