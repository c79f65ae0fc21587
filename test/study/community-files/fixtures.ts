import { strToU8, zipSync } from 'fflate';

/*
 * Small communities files made by the tests themselves, so each format's reader is tested on
 * bytes whose every part is known. Places are in the invented demo region (open ocean).
 */

const escapeXml = (s: string) =>
  s.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;');

/** Column letters A, B, ... (enough for a test sheet). */
const columnLetter = (i: number) => String.fromCharCode(65 + i);

/**
 * A minimal XLSX workbook (Office Open XML, ECMA-376 part 1): one sheet whose cells are inline
 * strings or numbers, no shared strings or styles. `null` leaves a cell out.
 */
export function xlsxBytes(rows: readonly (readonly (string | number | null)[])[]): Uint8Array {
  const sheetRows = rows
    .map((cells, r) => {
      const xml = cells
        .map((cell, c) => {
          const ref = `${columnLetter(c)}${r + 1}`;
          if (cell === null) return '';
          return typeof cell === 'number'
            ? `<c r="${ref}"><v>${cell}</v></c>`
            : `<c r="${ref}" t="inlineStr"><is><t>${escapeXml(cell)}</t></is></c>`;
        })
        .join('');
      return `<row r="${r + 1}">${xml}</row>`;
    })
    .join('');
  const ns = 'http://schemas.openxmlformats.org';
  return zipSync({
    '[Content_Types].xml': strToU8(
      `<?xml version="1.0" encoding="UTF-8"?><Types xmlns="${ns}/package/2006/content-types"><Default Extension="rels" ContentType="application/vnd.openxmlformats-package.relationships+xml"/><Default Extension="xml" ContentType="application/xml"/><Override PartName="/xl/workbook.xml" ContentType="application/vnd.openxmlformats-officedocument.spreadsheetml.sheet.main+xml"/><Override PartName="/xl/worksheets/sheet1.xml" ContentType="application/vnd.openxmlformats-officedocument.spreadsheetml.worksheet+xml"/></Types>`,
    ),
    '_rels/.rels': strToU8(
      `<?xml version="1.0" encoding="UTF-8"?><Relationships xmlns="${ns}/package/2006/relationships"><Relationship Id="rId1" Type="${ns}/officeDocument/2006/relationships/officeDocument" Target="xl/workbook.xml"/></Relationships>`,
    ),
    'xl/workbook.xml': strToU8(
      `<?xml version="1.0" encoding="UTF-8"?><workbook xmlns="${ns}/spreadsheetml/2006/main" xmlns:r="${ns}/officeDocument/2006/relationships"><sheets><sheet name="Villages" sheetId="1" r:id="rId1"/></sheets></workbook>`,
    ),
    'xl/_rels/workbook.xml.rels': strToU8(
      `<?xml version="1.0" encoding="UTF-8"?><Relationships xmlns="${ns}/package/2006/relationships"><Relationship Id="rId1" Type="${ns}/officeDocument/2006/relationships/worksheet" Target="worksheets/sheet1.xml"/></Relationships>`,
    ),
    'xl/worksheets/sheet1.xml': strToU8(
      `<?xml version="1.0" encoding="UTF-8"?><worksheet xmlns="${ns}/spreadsheetml/2006/main"><sheetData>${sheetRows}</sheetData></worksheet>`,
    ),
  });
}

export interface PlacemarkFixture {
  readonly name?: string;
  readonly data?: Readonly<Record<string, string>>;
  /** Point `[lon, lat]`, or a line's positions. */
  readonly point?: readonly [number, number];
  readonly line?: readonly (readonly [number, number])[];
}

/** KML 2.2 text with one Placemark per entry (name, ExtendedData, Point or LineString). */
export function kmlText(placemarks: readonly PlacemarkFixture[]): string {
  const body = placemarks
    .map((p) => {
      const data = p.data
        ? `<ExtendedData>${Object.entries(p.data)
            .map(([k, v]) => `<Data name="${escapeXml(k)}"><value>${escapeXml(v)}</value></Data>`)
            .join('')}</ExtendedData>`
        : '';
      const geometry = p.point
        ? `<Point><coordinates>${p.point.join(',')},0</coordinates></Point>`
        : p.line
          ? `<LineString><coordinates>${p.line.map((q) => q.join(',')).join(' ')}</coordinates></LineString>`
          : '';
      return `<Placemark>${p.name !== undefined ? `<name>${escapeXml(p.name)}</name>` : ''}<styleUrl>#village</styleUrl>${data}${geometry}</Placemark>`;
    })
    .join('\n');
  return `<?xml version="1.0" encoding="UTF-8"?>\n<kml xmlns="http://www.opengis.net/kml/2.2"><Document><name>Villages</name>\n${body}\n</Document></kml>\n`;
}

/** A zip of the given files (a KMZ, a zipped shapefile). */
export function zipBytes(files: Readonly<Record<string, Uint8Array | string>>): Uint8Array {
  return zipSync(
    Object.fromEntries(
      Object.entries(files).map(([name, content]) => [
        name,
        typeof content === 'string' ? strToU8(content) : content,
      ]),
    ),
  );
}

/** A dBASE field: name (at most 10 characters), type C (text) or N (number), width in characters. */
export interface DbfField {
  readonly name: string;
  readonly type: 'C' | 'N';
  readonly width: number;
}

/**
 * A point shapefile's .shp (ESRI Shapefile Technical Description, 1998: a 100-byte header with
 * the file code 9994 and length big-endian, version 1000 and shape type 1 little-endian, then
 * records of a big-endian number and length and a little-endian Point) and its dBASE III .dbf.
 */
export function pointShapefile(
  points: readonly (readonly [number, number])[],
  fields: readonly DbfField[],
  records: readonly (readonly (string | number)[])[],
): { shp: Uint8Array; dbf: Uint8Array } {
  const shp = new DataView(new ArrayBuffer(100 + points.length * 28));
  shp.setInt32(0, 9994, false);
  shp.setInt32(24, shp.byteLength / 2, false);
  shp.setInt32(28, 1000, true);
  shp.setInt32(32, 1, true);
  const xs = points.map((p) => p[0]);
  const ys = points.map((p) => p[1]);
  [Math.min(...xs), Math.min(...ys), Math.max(...xs), Math.max(...ys)].forEach((v, i) =>
    shp.setFloat64(36 + i * 8, v, true),
  );
  points.forEach(([x, y], i) => {
    const at = 100 + i * 28;
    shp.setInt32(at, i + 1, false);
    shp.setInt32(at + 4, 10, false);
    shp.setInt32(at + 8, 1, true);
    shp.setFloat64(at + 12, x, true);
    shp.setFloat64(at + 20, y, true);
  });

  return { shp: new Uint8Array(shp.buffer), dbf: dbfBytes(fields, records) };
}

/** A dBASE III table (.dbf) of the given fields and records. */
export function dbfBytes(
  fields: readonly DbfField[],
  records: readonly (readonly (string | number)[])[],
): Uint8Array {
  const headerLength = 32 + fields.length * 32 + 1;
  const recordLength = 1 + fields.reduce((n, f) => n + f.width, 0);
  const dbf = new Uint8Array(headerLength + records.length * recordLength + 1);
  const view = new DataView(dbf.buffer);
  dbf[0] = 0x03;
  dbf.set([125, 1, 1], 1);
  view.setUint32(4, records.length, true);
  view.setUint16(8, headerLength, true);
  view.setUint16(10, recordLength, true);
  fields.forEach((f, i) => {
    const at = 32 + i * 32;
    dbf.set(strToU8(f.name.slice(0, 10)), at);
    dbf[at + 11] = f.type.charCodeAt(0);
    dbf[at + 16] = f.width;
    dbf[at + 17] = 0;
  });
  dbf[headerLength - 1] = 0x0d;
  records.forEach((record, r) => {
    let at = headerLength + r * recordLength;
    dbf[at++] = 0x20;
    fields.forEach((f, i) => {
      const text = String(record[i] ?? '');
      const padded = f.type === 'N' ? text.padStart(f.width, ' ') : text.padEnd(f.width, ' ');
      dbf.set(strToU8(padded.slice(0, f.width)), at);
      at += f.width;
    });
  });
  dbf[dbf.length - 1] = 0x1a;
  return dbf;
}

/**
 * WGS 84 / UTM zone 7S as ESRI-style WKT, as a .prj holds it: Transverse Mercator, central
 * meridian 141°W, scale 0.9996, false easting 500 000 m, false northing 10 000 000 m (the UTM
 * definition for a southern zone).
 */
export const UTM_7S_PRJ =
  'PROJCS["WGS_1984_UTM_Zone_7S",GEOGCS["GCS_WGS_1984",DATUM["D_WGS_1984",SPHEROID["WGS_1984",6378137.0,298.257223563]],PRIMEM["Greenwich",0.0],UNIT["Degree",0.0174532925199433]],PROJECTION["Transverse_Mercator"],PARAMETER["False_Easting",500000.0],PARAMETER["False_Northing",10000000.0],PARAMETER["Central_Meridian",-141.0],PARAMETER["Scale_Factor",0.9996],PARAMETER["Latitude_Of_Origin",0.0],UNIT["Meter",1.0]]';
