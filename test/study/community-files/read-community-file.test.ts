import proj4 from 'proj4';
import { describe, expect, it } from 'vitest';
import { CommunityFileProblem } from '../../../api/study/community-files/file-problem.ts';
import { readCommunityFile } from '../../../api/study/community-files/read-community-file.ts';
import { tableCommunities } from '../../../api/study/community-files/table-communities.ts';
import { IssueList } from '../../../api/study/issues.ts';
import { boxRing } from '../../helpers/box-ring.ts';
import { expectClose } from '../../helpers/close.ts';
import {
  kmlText,
  type PlacemarkFixture,
  pointShapefile,
  UTM_7S_PRJ,
  xlsxBytes,
  zipBytes,
} from './fixtures.ts';

/** The two villages every format's fixture holds, where each file puts them. */
const NORTH_COVE = { id: 'north-cove', name: 'North Cove', lon: -140.5, lat: -47.25 } as const;
/** North Cove as the XLSX and KML files give it: Vs30 380 m/s measured, 300 people. */
const NORTH_COVE_MEASURED_380 = {
  ...NORTH_COVE,
  vs30: 380,
  vs30Basis: 'measured',
  population: 300,
} as const;
const RIDGE_CAMP = { id: 'ridge-camp', name: 'Ridge Camp', lon: -140.75, lat: -47.5 } as const;

/** Reads a file that must come out in `format` with no problem; gives its communities. */
async function readWithoutProblems(bytes: Uint8Array, fileName: string, format: string) {
  const file = await read(bytes, fileName);
  expect(file.format).toBe(format);
  expect(file.problems).toEqual([]);
  return file.communities;
}

const utf8 = (s: string) => new TextEncoder().encode(s);

/** Reads a file as a study's `communities` would be: its rows' problems and the valid communities. */
async function read(bytes: Uint8Array, fileName: string) {
  const issues = new IssueList();
  const table = await readCommunityFile(bytes, fileName, ['communities'], issues);
  const { communities, missingColumns } = tableCommunities(table, ['communities'], issues);
  return {
    communities,
    missingColumns,
    problems: issues.issues.map((i) => `${i.path}: ${i.message}`),
    format: table.format,
  };
}

/** The message a file that cannot be read at all is refused with. */
async function refusal(bytes: Uint8Array, fileName: string): Promise<string> {
  try {
    await read(bytes, fileName);
  } catch (error) {
    if (error instanceof CommunityFileProblem) return error.message;
    throw error;
  }
  throw new Error('expected the file to be refused');
}

describe('communities from CSV', () => {
  it('reads a spreadsheet export: semicolons, decimal commas, a byte-order mark, no ids, other columns kept', async () => {
    const csv =
      "\uFEFFName;Latitude;Longitude;Site class;Pop;School;Notes\r\nNorth Cove;-47,25;-140,5;D;1 250;yes;\r\nRidge Camp;47°30'S;140°45'W;C;80;;dry season only\r\n";
    const { communities, problems } = await read(utf8(csv), 'villages.csv');
    expect(problems).toEqual([]);
    expect(communities).toEqual([
      {
        ...NORTH_COVE,
        vs30: 260,
        vs30Basis: 'site-class',
        siteClass: 'D',
        population: 1250,
        coastal: false,
        details: { School: 'yes' },
      },
      {
        ...RIDGE_CAMP,
        vs30: 530,
        vs30Basis: 'site-class',
        siteClass: 'C',
        population: 80,
        coastal: false,
        details: { Notes: 'dry season only' },
      },
    ]);
  });

  it('reads tab-separated UTF-16 text (a spreadsheet\'s "Unicode text")', async () => {
    const text = 'village\tlat\tlon\tvs30\nSouth Point\t-47.1\t-140.2\t400\n';
    const bytes = new Uint8Array([
      0xff,
      0xfe,
      ...new Uint8Array(Uint16Array.from(text, (ch) => ch.charCodeAt(0)).buffer),
    ]);
    const { communities, problems } = await read(bytes, 'villages.txt');
    expect(problems).toEqual([]);
    expect(communities.map((c) => [c.id, c.lat, c.lon, c.vs30])).toEqual([
      ['south-point', -47.1, -140.2, 400],
    ]);
  });

  it('refuses text in another encoding, naming the file and the line', async () => {
    // "Caña" saved as Latin-1: ñ is the single byte 0xF1, which is not UTF-8 on its own.
    const bytes = new Uint8Array([
      ...utf8('name,lat,lon,vs30\nA,-47,-140,400\nCa'),
      0xf1,
      ...utf8('a,-47,-140,400\n'),
    ]);
    expect(await refusal(bytes, 'villages.csv')).toBe(
      'villages.csv [line 3]: expected UTF-8 text, found a byte that is not UTF-8 (the file is in another encoding; save it as "CSV UTF-8" or UTF-8 text)',
    );
  });

  it('says which column names it accepts when one is missing', async () => {
    const { missingColumns, problems } = await read(
      utf8('Village,Breite,Lon,vs30\nA,-47,-140,400\n'),
      'villages.csv',
    );
    expect(missingColumns).toEqual(['lat']);
    expect(problems).toEqual([
      'communities[line 1]: villages.csv (header): no column recognised for latitude (degrees north), accepted as lat, latitude, y, lat dd, latitude dd, latitude deg (any case); the file\'s columns are "Village", "Breite", "Lon", "vs30"',
    ]);
  });

  it('names the line and field of a bad coordinate and keeps checking the row', async () => {
    const { problems, communities } = await read(
      utf8("name,lat,lon,vs30\nA,47°75'S,-140,40\nB,-47,-140,400\n"),
      'villages.csv',
    );
    expect(problems).toEqual([
      'communities[line 2].lat: expected a latitude in decimal degrees or degrees, minutes and seconds (e.g. 12°34\'56"S), got "47°75\'S"; minutes and seconds must be below 60',
      'communities[line 2].vs30: expected a number in [50, 5000] m/s, got 40',
    ]);
    expect(communities.map((c) => c.id)).toEqual(['b']);
  });

  it('makes unique ids when names repeat and keeps ids the file gives', async () => {
    const { communities } = await read(
      utf8(
        'id,name,lat,lon,vs30\n,Bay,-47,-140,400\nbay,Bay Upper,-47.1,-140,400\n,Bay,-47.2,-140,400\n',
      ),
      'villages.csv',
    );
    expect(communities.map((c) => c.id)).toEqual(['bay-2', 'bay', 'bay-3']);
  });
});

describe('communities from XLSX', () => {
  it('reads the first sheet: header row, numbers and text cells, other columns kept', async () => {
    const bytes = xlsxBytes([
      ['Village', 'Lat', 'Long', 'Vs30', 'Population', 'Coastal', 'Clinic'],
      ['North Cove', -47.25, -140.5, 380, 300, 'yes', 'weekly'],
      [null, null, null, null, null, null, null],
      ['Ridge Camp', `47°30'S`, '-140,75', 760, 40, 'no', null],
    ]);
    const communities = await readWithoutProblems(bytes, 'villages.xlsx', 'XLSX');
    expect(communities).toEqual([
      {
        ...NORTH_COVE_MEASURED_380,
        coastal: true,
        details: { Clinic: 'weekly' },
      },
      {
        ...RIDGE_CAMP,
        vs30: 760,
        vs30Basis: 'measured',
        population: 40,
        coastal: false,
      },
    ]);
  });

  it('names the sheet row of a bad cell', async () => {
    const bytes = xlsxBytes([
      ['name', 'lat', 'lon', 'vs30'],
      ['A', -95, -140, 400],
    ]);
    expect((await read(bytes, 'villages.xlsx')).problems).toEqual([
      'communities[row 2].lat: expected a number in [-90, 90] degrees, got -95',
    ]);
  });

  it('refuses a file that is not a workbook and an old .xls', async () => {
    expect(await refusal(zipBytes({ 'readme.txt': 'x' }), 'villages.xlsx')).toMatch(
      /^villages\.xlsx: expected an XLSX workbook \(Excel 2007 or later; save an older \.xls as \.xlsx or CSV\), but it cannot be read/,
    );
    expect(await refusal(utf8('x'), 'villages.xls')).toBe(
      'villages.xls: expected a newer spreadsheet; the old .xls format is not read (save it as .xlsx or CSV UTF-8)',
    );
  });
});

describe('communities from KML and KMZ', () => {
  const placemarks: PlacemarkFixture[] = [
    {
      name: 'North Cove',
      data: { vs30: '380', population: '300', airstrip: 'grass, 600 m' },
      point: [-140.5, -47.25] as const,
    },
    { name: 'Ridge Camp', data: { 'site class': 'C' }, point: [-140.75, -47.5] as const },
  ];

  it('reads placemarks: name, extended data, point; style left out', async () => {
    const communities = await readWithoutProblems(utf8(kmlText(placemarks)), 'villages.kml', 'KML');
    expect(communities).toEqual([
      {
        ...NORTH_COVE_MEASURED_380,
        coastal: false,
        details: { airstrip: 'grass, 600 m' },
      },
      {
        ...RIDGE_CAMP,
        vs30: 530,
        vs30Basis: 'site-class',
        siteClass: 'C',
        coastal: false,
      },
    ]);
  });

  it('reads the KML inside a KMZ', async () => {
    const { communities } = await read(
      zipBytes({ 'doc.kml': kmlText(placemarks), 'files/icon.png': new Uint8Array([1, 2]) }),
      'villages.kmz',
    );
    expect(communities.map((c) => c.id)).toEqual(['north-cove', 'ridge-camp']);
  });

  it('names a placemark that is not a point', async () => {
    const bad: PlacemarkFixture[] = [
      ...placemarks,
      {
        name: 'Track',
        line: [
          [-140, -47],
          [-140.1, -47.1],
        ],
      },
    ];
    expect((await read(utf8(kmlText(bad)), 'villages.kml')).problems).toEqual([
      'communities[placemark 3]: villages.kml: placemark 3 ("Track"): expected a point (one position per community), got a LineString',
    ]);
  });

  it('refuses a KML without placemarks, malformed XML and a KMZ without a KML', async () => {
    expect(await refusal(utf8(kmlText([])), 'villages.kml')).toBe(
      'villages.kml: expected KML with at least one Placemark (one point per community), found none',
    );
    expect(
      await refusal(utf8('<kml><Document><Placemark></Document></kml>'), 'villages.kml'),
    ).toMatch(/^villages\.kml: expected KML \(XML\), but it does not parse: /);
    expect(await refusal(zipBytes({ 'notes.txt': 'x' }), 'villages.kmz')).toBe(
      'villages.kmz: expected a .kml file inside the KMZ, found notes.txt',
    );
  });
});

describe('communities from a zipped shapefile', () => {
  const fields = [
    { name: 'NAME', type: 'C', width: 20 },
    { name: 'VS30', type: 'N', width: 6 },
    { name: 'SCHOOL', type: 'C', width: 10 },
  ] as const;
  const records = [
    ['North Cove', 380, 'primary'],
    ['Ridge Camp', 760, ''],
  ];
  const lonLats = [
    [-140.5, -47.25],
    [-140.75, -47.5],
  ] as const;

  it('reads points in longitude and latitude with their attributes', async () => {
    const { shp, dbf } = pointShapefile(lonLats, fields, records);
    const communities = await readWithoutProblems(
      zipBytes({ 'villages.shp': shp, 'villages.dbf': dbf }),
      'villages.zip',
      'shapefile',
    );
    expect(communities.map((c) => [c.id, c.lon, c.lat, c.vs30, c.details])).toEqual([
      ['north-cove', -140.5, -47.25, 380, { SCHOOL: 'primary' }],
      ['ridge-camp', -140.75, -47.5, 760, undefined],
    ]);
  });

  it('reprojects points from the coordinate system in its .prj', async () => {
    // Positions projected with proj4's own UTM definition (+proj=utm +zone=7 +south), read back
    // through the .prj's WKT: the two definitions of WGS 84 / UTM 7S must agree.
    const utm = proj4('+proj=utm +zone=7 +south +datum=WGS84 +units=m +no_defs');
    const projected = lonLats.map((p) => utm.forward([p[0], p[1]]) as [number, number]);
    expect(projected[0]?.[0]).toBeGreaterThan(400000);
    const { shp, dbf } = pointShapefile(projected, fields, records);
    const { communities, problems } = await read(
      zipBytes({ 'v/villages.shp': shp, 'v/villages.dbf': dbf, 'v/villages.prj': UTM_7S_PRJ }),
      'villages.zip',
    );
    expect(problems).toEqual([]);
    communities.forEach((c, i) => {
      // 1e-7° is about 1 cm: the round trip through two definitions of one projection.
      expectClose(
        c.lon,
        lonLats[i]?.[0] as number,
        1e-7,
        'UTM 7S round trip (proj4 definition out, .prj WKT back)',
      );
      expectClose(
        c.lat,
        lonLats[i]?.[1] as number,
        1e-7,
        'UTM 7S round trip (proj4 definition out, .prj WKT back)',
      );
    });
  });

  it('refuses a zip without a .shp, a .shp without its .dbf, an unreadable .prj, and projected positions without a .prj', async () => {
    const { shp, dbf } = pointShapefile(lonLats, fields, records);
    expect(
      await refusal(zipBytes({ 'villages.dbf': dbf, 'readme.txt': 'x' }), 'villages.zip'),
    ).toBe(
      'villages.zip: expected a zipped shapefile with a .shp file (and its .dbf and .prj), found villages.dbf, readme.txt',
    );
    expect(await refusal(zipBytes({ 'villages.shp': shp }), 'villages.zip')).toBe(
      'villages.zip: expected villages.dbf beside villages.shp (the attribute table with the names), found villages.shp',
    );
    expect(
      await refusal(
        zipBytes({ 'villages.shp': shp, 'villages.dbf': dbf, 'villages.prj': 'not a projection' }),
        'villages.zip',
      ),
    ).toMatch(
      /^villages\.zip\/villages\.prj: expected a coordinate system in WKT that proj4 can read, but it cannot/,
    );
    const far = pointShapefile([[512000, 4760000]], fields, [records[0] as (string | number)[]]);
    expect(
      await refusal(zipBytes({ 'villages.shp': far.shp, 'villages.dbf': far.dbf }), 'villages.zip'),
    ).toBe(
      'villages.zip: expected villages.prj beside villages.shp: the positions are not longitude and latitude, so the coordinate system must be given',
    );
    expect(await refusal(utf8('PK not really a zip'), 'villages.zip')).toMatch(
      /^villages\.zip: expected a zip file, but it cannot be unpacked/,
    );
  });
});

describe('communities from GeoJSON', () => {
  it('reads point features and names a feature that is not a point', async () => {
    const fc = {
      type: 'FeatureCollection',
      features: [
        {
          type: 'Feature',
          properties: { name: 'North Cove', siteClass: 'd', notes: 'ferry on Tuesdays' },
          geometry: { type: 'Point', coordinates: [-140.5, -47.25] },
        },
        {
          type: 'Feature',
          properties: { name: 'Reef' },
          geometry: { type: 'Polygon', coordinates: [boxRing(-140.1, -47.1, -140, -47)] },
        },
      ],
    };
    const { communities, problems } = await read(utf8(JSON.stringify(fc)), 'villages.geojson');
    expect(communities).toEqual([
      {
        ...NORTH_COVE,
        vs30: 260,
        vs30Basis: 'site-class',
        siteClass: 'D',
        coastal: false,
        details: { notes: 'ferry on Tuesdays' },
      },
    ]);
    expect(problems).toEqual([
      'communities[feature 2]: villages.geojson: feature 2 ("Reef"): expected a point (one position per community), got a Polygon',
    ]);
  });

  it('refuses JSON that is not a FeatureCollection', async () => {
    expect(await refusal(utf8('{"type":"Point","coordinates":[0,0]}'), 'villages.geojson')).toBe(
      'villages.geojson: expected a GeoJSON FeatureCollection of points, got a Point',
    );
  });
});
