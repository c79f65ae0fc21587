import { describe, expect, it } from 'vitest';
import { CommunityFileProblem } from '../../../api/study/community-files/file-problem.ts';
import {
  readFaultDefaults,
  STARTING_DEFAULTS,
} from '../../../api/study/fault-files/fault-defaults.ts';
import { guessFaultMapping } from '../../../api/study/fault-files/fault-fields.ts';
import { faultSources } from '../../../api/study/fault-files/fault-sources.ts';
import { readFaultFile } from '../../../api/study/fault-files/read-fault-file.ts';
import { zipBytes } from '../community-files/fixtures.ts';
import { faultGeoJson, faultKml, faultShapefileZip, TRACE_A, TRACE_B } from './fixtures.ts';

const utf8 = (s: string) => new TextEncoder().encode(s);

/** Defaults as the import page starts them, with the largest magnitude given. */
const defaults = () => {
  const read = readFaultDefaults({ ...STARTING_DEFAULTS, mMax: '7' });
  if (!read.ok) throw new Error('starting defaults refused');
  return read.defaults;
};

const GUESSED = {
  name: 'FAULT_NAME',
  slipRateMmYr: 'SLIP_RATE',
  dip: 'DIP',
  dipDirection: 'DIP_DIR',
  rake: 'RAKE',
  lowerDepthKm: 'LSD',
};

describe('fault files in each format', () => {
  const cases: [string, () => Uint8Array, string, string][] = [
    ['GeoJSON', () => utf8(faultGeoJson()), 'faults.geojson', 'geojson'],
    ['KML', () => utf8(faultKml()), 'faults.kml', 'kml'],
    ['KMZ', () => zipBytes({ 'doc.kml': faultKml() }), 'faults.kmz', 'kmz'],
    ['a zipped shapefile', faultShapefileZip, 'faults.zip', 'shapefile'],
  ];
  it.each(cases)(
    'reads the two faults of %s with their traces and attributes',
    async (_, bytes, name, format) => {
      const file = await readFaultFile(bytes(), name);
      expect(file.format).toBe(format);
      expect(file.records.map((r) => r.trace)).toEqual([TRACE_A, TRACE_B]);
      const sources = faultSources(file, guessFaultMapping(file.attributes), defaults(), new Set());
      expect(sources.problems).toEqual([]);
      // Attributes typed as numbers (GeoJSON, dBASE N) or as text (KML ExtendedData) read the same.
      expect(sources.features.map((f) => f.properties)).toEqual([
        {
          id: 'kessin-ridge-fault',
          name: 'Kessin Ridge fault',
          setting: 'crustal',
          ...{ dip: 60, dipDirection: 120, rake: 90, upperDepthKm: 0, lowerDepthKm: 15 },
          recurrence: { type: 'moment-balanced', bValue: 1, mMin: 5, mMax: 7, slipRateMmYr: 1.5 },
        },
        {
          id: 'marrow-flats-fault',
          name: 'Marrow Flats fault',
          setting: 'crustal',
          ...{ dip: 45, dipDirection: 300, rake: -90, upperDepthKm: 0, lowerDepthKm: 12 },
          recurrence: { type: 'moment-balanced', bValue: 1, mMin: 5, mMax: 7, slipRateMmYr: 0.4 },
        },
      ]);
    },
  );

  it('names the file and what was expected when it holds no fault', async () => {
    const refusal = (bytes: Uint8Array, name: string) =>
      readFaultFile(bytes, name).then(
        () => 'read',
        (e: unknown) => (e instanceof CommunityFileProblem ? e.message : 'other'),
      );
    expect(await refusal(zipBytes({ 'notes.txt': 'x' }), 'faults.zip')).toBe(
      'faults.zip: expected a zipped shapefile with a .shp file (and its .dbf and .prj), found notes.txt',
    );
    expect(await refusal(utf8('{"type":"FeatureCollection","features":[]}'), 'f.geojson')).toBe(
      'f.geojson: expected at least one fault trace feature, found none',
    );
    expect(await refusal(utf8('a,b\n1,2\n'), 'faults.csv')).toBe(
      'faults.csv: expected a fault file in GeoJSON, KML, KMZ or a zipped shapefile, got something else',
    );
  });
});

describe('the mapping guess', () => {
  it('recognises usual spellings whatever the case, separators and units in brackets', () => {
    expect(
      guessFaultMapping(['FAULT_NAME', 'SLIP_RATE', 'DIP', 'DIP_DIR', 'RAKE', 'LSD', 'NOTES']),
    ).toEqual(GUESSED);
    expect(
      guessFaultMapping([
        'Name',
        'Slip rate (mm/yr)',
        'dip-angle',
        'Dip Direction',
        'upper_depth',
        'Lower depth (km)',
        'fault_id',
      ]),
    ).toEqual({
      name: 'Name',
      slipRateMmYr: 'Slip rate (mm/yr)',
      dip: 'dip-angle',
      dipDirection: 'Dip Direction',
      upperDepthKm: 'upper_depth',
      lowerDepthKm: 'Lower depth (km)',
      id: 'fault_id',
    });
  });

  it('leaves out what it does not recognise', () => {
    expect(guessFaultMapping(['SLIPMMYR_X', 'ANGLE', 'COMMENTS'])).toEqual({});
  });
});

describe('missing and out-of-range values', () => {
  it('lists every one by feature (number and name), field and where the value came from', async () => {
    const file = await readFaultFile(
      utf8(
        faultGeoJson([
          { DIP: 120, SLIP_RATE: null },
          { RAKE: 'thrust', LSD: '-3' },
        ]),
      ),
      'faults.geojson',
    );
    const { problems } = faultSources(file, GUESSED, defaults(), new Set());
    expect(problems).toEqual([
      {
        feature: 1,
        name: 'Kessin Ridge fault',
        field: 'slipRateMmYr',
        message: 'missing: "SLIP_RATE" is empty and there is no default',
      },
      {
        feature: 1,
        name: 'Kessin Ridge fault',
        field: 'dip',
        from: 'DIP',
        message: 'expected a number in (0, 90] degrees, got 120',
      },
      {
        feature: 2,
        name: 'Marrow Flats fault',
        field: 'rake',
        from: 'RAKE',
        message: 'expected a number in [-180, 180] degrees, got "thrust"',
      },
      {
        feature: 2,
        name: 'Marrow Flats fault',
        field: 'lowerDepthKm',
        from: 'LSD',
        message: 'expected a number in (0, 700] km, got -3',
      },
    ]);
  });

  it('fills what the file lacks from the defaults, and names a fault without a trace', async () => {
    const text = JSON.stringify({
      type: 'FeatureCollection',
      features: [
        {
          type: 'Feature',
          geometry: { type: 'LineString', coordinates: TRACE_A },
          properties: { NAME: 'Kessin Ridge fault' },
        },
        { type: 'Feature', geometry: { type: 'Point', coordinates: [-150, -47] }, properties: {} },
      ],
    });
    const file = await readFaultFile(utf8(text), 'faults.geojson');
    const read = readFaultDefaults({
      ...STARTING_DEFAULTS,
      mMax: '7',
      dip: '50',
      rake: '0',
      lowerDepthKm: '14',
      slipRateMmYr: '0,8',
    });
    if (!read.ok) throw new Error('defaults refused');
    const { features, problems } = faultSources(
      file,
      guessFaultMapping(file.attributes),
      read.defaults,
      new Set(['kessin-ridge-fault']),
    );
    expect(features[0]?.properties).toEqual({
      id: 'kessin-ridge-fault-2',
      name: 'Kessin Ridge fault',
      setting: 'crustal',
      dip: 50,
      rake: 0,
      upperDepthKm: 0,
      lowerDepthKm: 14,
      recurrence: { type: 'moment-balanced', bValue: 1, mMin: 5, mMax: 7, slipRateMmYr: 0.8 },
    });
    expect(problems).toEqual([
      {
        feature: 2,
        name: 'Fault 2',
        field: 'trace',
        message: 'expected a fault trace (a LineString), got a Point',
      },
    ]);
  });

  it('refuses defaults out of range, by field', () => {
    expect(readFaultDefaults({ ...STARTING_DEFAULTS, dip: '95', setting: 'oceanic' })).toEqual({
      ok: false,
      issues: [
        { path: 'defaults.dip', message: 'expected a number in (0, 90] degrees, got 95' },
        {
          path: 'defaults.mMax',
          message: 'expected a number in [0, 10] for every imported fault, got nothing',
        },
        {
          path: 'defaults.setting',
          message: 'expected one of crustal, interface, intraslab, got "oceanic"',
        },
      ],
    });
  });
});
