import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import geodesic from 'geographiclib-geodesic';
import { afterAll, describe, expect, it } from 'vitest';
import { runCli } from '../../api/cli.ts';
import type { Io } from '../../api/cli/output.ts';
import {
  ALL_MAGNITUDES_FIT,
  DEFAULT_FIT,
  EAST_ZONE,
  EAST_ZONE_FIT,
  FELT_CATALOG_CSV,
  FELT_EXPECTED,
  feltStudy,
  FIT_CATALOG_CSV,
  NOT_DECLUSTERED_FIT,
  SPAN_YEARS,
  type HandFit,
} from '../helpers/catalog-fixtures.ts';
import { expectClose, expectRelative } from '../helpers/close.ts';
import { expectOnePeriodWeichert } from '../service/helpers/one-period-weichert.ts';

const dir = mkdtempSync(join(tmpdir(), 'tremora-cli-catalog-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));
const file = (name: string, text: string): string => {
  const path = join(dir, name);
  writeFileSync(path, text);
  return path;
};
const fitCsv = file('fit.csv', FIT_CATALOG_CSV);
const zone = file('zone.geojson', JSON.stringify(EAST_ZONE));
const study = file('felt.study.json', JSON.stringify(feltStudy()));
const feltCsv = file('felt.csv', FELT_CATALOG_CSV);

async function run(...argv: string[]): Promise<{ code: number; out: string[]; err: string[] }> {
  const out: string[] = [];
  const err: string[] = [];
  const io: Io = { out: (t) => out.push(t), err: (t) => err.push(t) };
  const code = await runCli(['catalog', ...argv], io);
  return { code, out, err };
}

async function runJson<T>(...argv: string[]): Promise<T> {
  const { code, out, err } = await run(...argv, '--json');
  expect(code, err.join('\n')).toBe(0);
  expect(out).toHaveLength(1);
  return JSON.parse(out[0] as string) as T;
}

interface FitJson {
  akiUtsu: {
    bValue: number;
    sigmaB: number;
    aValue: number;
    rateAtReference: number;
    sigmaRate: number;
    eventCount: number;
    mc: number;
    referenceMagnitude: number;
  };
  completeness: { method: string; mc: number; peakMagnitude: number };
  declustering: {
    applied: boolean;
    mainshocks?: number;
    removed?: number;
    clusters?: number;
    removedEvents?: {
      id: string;
      mainshockId: string;
      distanceKm: number;
      daysFromMainshock: number;
    }[];
  };
  excludedNonMoment: number;
  zone: { given: boolean; eventsInZone: number; eventsOutside: number };
  observation: { start: string; end: string; years: number };
  recurrence: {
    recurrence: { type: string; bValue: number; mMin: number; mMax: number; rate: number };
    method: string;
  } | null;
  frequencyMagnitude: {
    bins: {
      magnitude: number;
      lowerEdge: number;
      count: number;
      cumulativeCount: number;
      cumulativeAnnualRate: number;
    }[];
  };
  notes: string[];
}

function expectHandFit(fit: FitJson, hand: HandFit, what: string): void {
  const source = `hand computation, ${what} (Aki 1965 / Utsu 1965; Shi & Bolt 1982; test/helpers/catalog-fixtures.ts)`;
  expect(fit.completeness.mc).toBe(hand.mc);
  expect(fit.akiUtsu.eventCount).toBe(hand.n);
  // 1e-6: the hand values are given to 7 or 8 significant digits.
  expectClose(fit.akiUtsu.bValue, hand.bValue, 1e-6, `b, ${source}`);
  expectClose(fit.akiUtsu.sigmaB, hand.sigmaB, 1e-6, `σb, ${source}`);
  expectClose(fit.akiUtsu.rateAtReference, hand.rate, 1e-6, `rate of M >= 4.15, ${source}`);
  expectClose(fit.akiUtsu.aValue, hand.aValue, 1e-6, `a, ${source}`);
  expectClose(fit.akiUtsu.sigmaRate, Math.sqrt(hand.n) / SPAN_YEARS, 1e-9, 'Poisson: sqrt(n) / T');
}

describe('tremora catalog fit', () => {
  it('declusters, finds Mc, fits b and gives the recurrence (--json)', async () => {
    const fit = await runJson<FitJson>('fit', fitCsv, '--m-max', '7');
    expectHandFit(fit, DEFAULT_FIT, 'declustered moment magnitudes');
    expect(fit.completeness).toMatchObject({ method: 'max-curvature', peakMagnitude: 4.0 });
    expect(fit.excludedNonMoment).toBe(1);
    expect(fit.declustering).toMatchObject({
      applied: true,
      mainshocks: 12,
      removed: 1,
      clusters: 1,
    });
    const removed = fit.declustering.removedEvents?.[0];
    expect(removed).toMatchObject({ id: 'ev-02', mainshockId: 'ev-01', daysFromMainshock: 1 });
    const km = (geodesic.Geodesic.WGS84.Inverse(-50, -139, -50.01, -139.02).s12 as number) / 1000;
    expectClose(
      removed?.distanceKm ?? NaN,
      km,
      1e-9,
      'geodesic distance ev-01 to ev-02 (Karney 2013)',
    );
    expect(fit.zone).toEqual({ given: false, eventsInZone: 12, eventsOutside: 0 });
    expect(fit.observation).toMatchObject({
      start: '2001-01-15T00:00:00.000Z',
      end: '2012-01-15T00:00:00.000Z',
    });
    expectClose(fit.observation.years, SPAN_YEARS, 1e-12, '4017 days in Julian years');
    // At mMin = Mc − ΔM/2 the truncated line keeps the observed rate (Cornell & Vanmarcke 1969, from memory).
    expect(fit.recurrence?.method).toBe('aki-utsu');
    expect(fit.recurrence?.recurrence).toMatchObject({
      type: 'gutenberg-richter',
      mMin: 4.15,
      mMax: 7,
    });
    expectClose(
      fit.recurrence?.recurrence.bValue ?? NaN,
      DEFAULT_FIT.bValue,
      1e-6,
      'recurrence b: the Aki–Utsu hand computation',
    );
    expectClose(
      fit.recurrence?.recurrence.rate ?? NaN,
      DEFAULT_FIT.rate,
      1e-6,
      'recurrence rate: 7 events in 10.997947 years',
    );
  });

  it('gives the frequency–magnitude counts and rates for a plot', async () => {
    const fit = await runJson<FitJson>('fit', fitCsv);
    const bins = fit.frequencyMagnitude.bins;
    // Counted by hand from the fixture's twelve mainshocks, 4.0 to 5.0 in bins of 0.1.
    expect(bins.map((b) => b.magnitude)).toEqual([
      4.0, 4.1, 4.2, 4.3, 4.4, 4.5, 4.6, 4.7, 4.8, 4.9, 5.0,
    ]);
    expect(bins.map((b) => b.count)).toEqual([4, 1, 2, 1, 1, 0, 1, 0, 1, 0, 1]);
    expect(bins.map((b) => b.cumulativeCount)).toEqual([12, 8, 7, 5, 4, 3, 3, 2, 2, 1, 1]);
    bins.forEach((b) =>
      expectRelative(
        b.cumulativeAnnualRate,
        b.cumulativeCount / SPAN_YEARS,
        1e-12,
        `cumulative count / T at ${b.lowerEdge}`,
      ),
    );
    expect(fit.recurrence).toBeNull();
    // The command line names its own options, not the service's keys.
    expect(fit.notes).toContain(
      'no recurrence: give the largest magnitude the zone can host (--m-max), which a catalog cannot tell',
    );
  });

  it('reads every magnitude type with --all-magnitudes, keeps aftershocks with --no-decluster', async () => {
    const all = await runJson<FitJson>('fit', fitCsv, '--all-magnitudes');
    expectHandFit(all, ALL_MAGNITUDES_FIT, 'with the ML event');
    expect(all.excludedNonMoment).toBe(0);
    const kept = await runJson<FitJson>('fit', fitCsv, '--no-decluster');
    expectHandFit(kept, NOT_DECLUSTERED_FIT, 'with the aftershock');
    expect(kept.declustering).toEqual({ applied: false });
  });

  it('fits only the events inside --polygon', async () => {
    const fit = await runJson<FitJson>('fit', fitCsv, '--polygon', zone, '--m-max', '7');
    expectHandFit(fit, EAST_ZONE_FIT, 'inside the east box');
    expect(fit.zone).toEqual({ given: true, eventsInZone: 8, eventsOutside: 4 });
  });

  it('prints a plain account by default', async () => {
    const { code, out, err } = await run('fit', fitCsv, '--m-max', '7');
    expect(code, err.join('\n')).toBe(0);
    // The numbers are the hand computation's (DEFAULT_FIT), rounded for reading; the geodesic ev-01 to ev-02 is 1.8 km.
    expect(out).toEqual(
      expect.arrayContaining([
        'Magnitudes: moment magnitudes only (1 event of other types left out)',
        'Declustering (Gardner & Knopoff 1974): 12 mainshocks kept; 1 foreshock or aftershock removed in 1 cluster',
        '  2001-01-16  M 4.2 Mw  ev-02: 1.8 km from ev-01, 1 day after it',
        'Zone: the whole catalog (12 events; give --polygon for one zone)',
        'Observation: 2001-01-15 to 2012-01-15 (11 years)',
        'Completeness: Mc 4.2 (maximum curvature: most events at 4.0, plus 0.2)',
        'b-value (Aki–Utsu): 1.24 ± 0.42 (Shi & Bolt 1982) from 7 events at or above Mc',
        'a-value: 4.95 (log10 of the yearly number of events of M 0 or more)',
        'Yearly rate of M 4.15 or more: 0.636 ± 0.24',
        '  "recurrence": {"type":"gutenberg-richter","bValue":1.241,"mMin":4.15,"mMax":7,"rate":0.6365}',
        '  3.95          4          12       1.09',
        '  4.15          2           7      0.636      0.636',
      ]),
    );
    expect(out[0]).toBe(
      'Catalog fit.csv (csv): Loaded 14 events; rejected 0. 1 event has a magnitude type other than moment magnitude (ML 1); analyses use moment magnitudes only unless asked to use all.',
    );
  });

  it('with completeness periods and --m-max, says that --m-max changes the Weichert b, and names no service key', async () => {
    const fit = await runJson<FitJson & { notes: string[]; warnings: string[] }>(
      'fit',
      fitCsv,
      '--m-max',
      '7',
      '--periods',
      '4.0@2001-01-01',
    );
    expect(fit.recurrence?.method).toBe('weichert');
    expect(fit.notes).toContain(
      'the Weichert (1980) fit counts every magnitude bin up to --m-max 7, the empty ones too, so --m-max changes its b-value',
    );
    expect([...fit.notes, ...fit.warnings].join(' ')).not.toMatch(/startTime|endTime|mMax\b/);
  });

  it('takes the observation span from --start and --end', async () => {
    const fit = await runJson<FitJson>(
      'fit',
      fitCsv,
      '--start',
      '2001-01-01',
      '--end',
      '2013-01-01',
    );
    // 2001-01-01 to 2013-01-01 is 4383 days: exactly 12 Julian years; 7 events over it.
    expectClose(fit.observation.years, 12, 1e-12, '4383 days / 365.25');
    expectClose(fit.akiUtsu.rateAtReference, 7 / 12, 1e-12, '7 events in 12 years');
    expect(fit.notes.join(' ')).not.toMatch(/observation span runs from the first/);
  });

  it('adds a Weichert fit from --periods; with one period it is the binned Aki–Utsu estimate', async () => {
    const fit = await runJson<
      FitJson & {
        weichert: {
          bValue: number;
          sigmaB: number;
          rateAtReference: number;
          method: string;
        } | null;
        periods: { magnitude: number; start: string }[] | null;
      }
    >('fit', fitCsv, '--m-max', '9.5', '--periods', '4.2@2001-01-15T00:00:00Z');
    expectOnePeriodWeichert(fit.weichert);
    expect(fit.periods).toEqual([{ magnitude: 4.2, start: '2001-01-15T00:00:00.000Z' }]);
    const { out } = await run(
      'fit',
      fitCsv,
      '--m-max',
      '9.5',
      '--periods',
      '4.2@2001-01-15T00:00:00Z',
    );
    expect(out).toContain(
      `b-value (Weichert 1980, completeness periods): ${(fit.weichert?.bValue ?? NaN).toFixed(2)} ± ${(fit.weichert?.sigmaB ?? NaN).toFixed(2)}`,
    );
  });

  it('loads the good rows of a catalog with a bad one, and says which line', async () => {
    const bad = file(
      'bad-row.csv',
      `${FIT_CATALOG_CSV}2013-02-30T00:00:00Z,-139.00,-50.00,10,4.5,Mw,ev-15\n`,
    );
    const { code, out } = await run('fit', bad);
    expect(code).toBe(0);
    expect(out[0]).toBe(
      'Catalog bad-row.csv (csv): Loaded 14 events; rejected 1. Rejected: line 16: time: expected a real calendar date; got "2013-02-30T00:00:00Z". 1 event has a magnitude type other than moment magnitude (ML 1); analyses use moment magnitudes only unless asked to use all.',
    );
  });

  it('exits 2 with a clear message on bad input', async () => {
    const cases: [string[], RegExp][] = [
      [['fit', join(dir, 'absent.csv')], /absent\.csv: cannot read the catalog file \(ENOENT\)/],
      [['fit', fitCsv, '--m-max', 'seven'], /--m-max: expected a number, got "seven"/],
      [['fit', fitCsv, '--m-max', '4'], /mMax: expected mMax greater than mMin 4\.15; got 4/],
      [['fit', fitCsv, '--start', '2001-01-01'], /--start and --end go together/],
      [
        ['fit', file('header.csv', 'when,where\n2001,x\n')],
        /header\.csv\[line 1\]: expected the columns time,lon,lat,depthKm,magnitude,magnitudeType,id \(id optional\); missing time, lon, lat/,
      ],
      [
        [
          'fit',
          file(
            'all-bad.csv',
            'time,lon,lat,depthKm,magnitude,magnitudeType\n2001-01-01,-139,-95,10,4,Mw\n',
          ),
        ],
        /all-bad\.csv\[line 2\]: lat: expected a number from -90 to 90 degrees; got "-95"/,
      ],
      [
        [
          'fit',
          fitCsv,
          '--polygon',
          file('line.geojson', '{"type":"LineString","coordinates":[[0,0],[1,1]]}'),
        ],
        /line\.geojson\.type: expected a GeoJSON Polygon/,
      ],
      [
        ['fit', fitCsv, '--polygon', file('broken.geojson', '{"type": ')],
        /broken\.geojson: expected valid JSON/,
      ],
      [
        [
          'fit',
          fitCsv,
          '--polygon',
          file(
            'far.geojson',
            JSON.stringify({
              type: 'Polygon',
              coordinates: [
                [
                  [10, 10],
                  [11, 10],
                  [11, 11],
                  [10, 10],
                ],
              ],
            }),
          ),
        ],
        /polygon: expected events inside the zone polygon; all 12 events fall outside it/,
      ],
      [
        ['fit', fitCsv, '--periods', '4.2'],
        /--periods: expected "proposed" or M@TIME pairs such as 4\.0@1970-01-01, got "4\.2" \(pair 1\)/,
      ],
      [
        ['fit', fitCsv, '--periods', '4.2@2001-01-15,big@2005-01-01'],
        /--periods: expected .* got "big@2005-01-01" \(pair 2\)/,
      ],
      [
        ['fit', fitCsv, '--periods', '4.2@last spring'],
        /--periods: pair 1: expected an ISO 8601 time/,
      ],
      [['fit'], /expected exactly one CATALOG file/],
      [['fit', fitCsv, '--bogus'], /unknown option "--bogus"/],
      [['sum', fitCsv], /expected "fit" or "felt" after "catalog", got "sum"/],
    ];
    for (const [argv, message] of cases) {
      const { code, out, err } = await run(...argv);
      expect(code, argv.join(' ')).toBe(2);
      expect(out).toEqual([]);
      expect(err.join('\n')).toMatch(message);
    }
  });
});

interface FeltJson {
  study: string;
  excludedNonMoment: number;
  communities: {
    communityId: string;
    consideredEvents: number;
    felt: {
      eventId: string;
      date: string;
      pgaG: number;
      mmi: number;
      roman: string;
      distanceKm: number;
      bearingDeg: number;
      compass: string;
    }[];
    stronglyFelt: { eventId: string }[];
  }[];
}

describe('tremora catalog felt', () => {
  const expectEstimate = (
    e: FeltJson['communities'][number]['felt'][number] | undefined,
    id: keyof typeof FELT_EXPECTED,
  ) => {
    const hand = FELT_EXPECTED[id];
    expect(e?.eventId).toBe(id);
    expectRelative(
      e?.pgaG ?? NaN,
      hand.pgaG,
      1e-4,
      `Cornell et al. (1979) median PGA, hand computation (${id})`,
    );
    expectClose(
      e?.mmi ?? NaN,
      hand.mmi,
      1e-3,
      `Worden et al. (2012) MMI, hand computation (${id})`,
    );
    if ('roman' in hand) {
      expect(e?.roman).toBe(hand.roman);
      expect(e?.compass).toBe(hand.compass);
      // Epicentres placed by GeographicLib's direct problem and written to 1e-7 degrees (about 1 cm).
      expectClose(
        e?.distanceKm ?? NaN,
        hand.distanceKm,
        1e-4,
        `geodesic distance of the placed event (${id})`,
      );
      expectClose(
        e?.bearingDeg ?? NaN,
        hand.bearingDeg,
        1e-4,
        `azimuth of the placed event (${id})`,
      );
    }
  };

  it('lists the events likely felt and strongly felt at each community (--json)', async () => {
    const felt = await runJson<FeltJson>('felt', study, feltCsv);
    expect(felt.study).toBe('Felt test study');
    expect(felt.excludedNonMoment).toBe(1);
    const [cove, distant] = felt.communities;
    expect(cove?.consideredEvents).toBe(3);
    expect(cove?.felt.map((e) => e.eventId)).toEqual(['moderate', 'near-strong']);
    expect(cove?.stronglyFelt.map((e) => e.eventId)).toEqual(['near-strong']);
    expectEstimate(cove?.felt[0], 'moderate');
    expectEstimate(cove?.felt[1], 'near-strong');
    expect(cove?.felt[0]?.date).toBe('2001-02-03');
    expect(distant).toMatchObject({
      communityId: 'distant-shoal',
      consideredEvents: 0,
      felt: [],
      stronglyFelt: [],
    });
  });

  it('reads other magnitude types with --all-magnitudes, and one community with --community', async () => {
    const felt = await runJson<FeltJson>(
      'felt',
      study,
      feltCsv,
      '--all-magnitudes',
      '--community',
      'test-cove',
    );
    expect(felt.communities.map((c) => c.communityId)).toEqual(['test-cove']);
    const cove = felt.communities[0];
    expect(cove?.stronglyFelt.map((e) => e.eventId)).toEqual(['near-strong', 'local-scale']);
    expectEstimate(cove?.felt[2], 'local-scale');
  });

  it('prints dates, magnitudes, distances and directions in words', async () => {
    const { code, out, err } = await run('felt', study, feltCsv);
    expect(code, err.join('\n')).toBe(0);
    expect(out).toEqual(
      expect.arrayContaining([
        'Test Cove: 2 of 3 events within 300 km likely felt, 1 strongly',
        '  2001-02-03  M 6.0 Mw   30 km to the north       MMI VI',
        '  2003-04-05  M 6.5 Mw   5 km to the south-east   MMI VIII  strongly felt',
        'Distant Shoal: no catalog event within 300 km',
        '  - 1 event left out: not moment magnitude',
      ]),
    );
    expect(out.at(-1)).toMatch(
      /not design values: building codes and licensed engineers decide\.$/,
    );
  });

  it('exits 2 with a clear message on bad input', async () => {
    const cases: [string[], RegExp][] = [
      [
        ['felt', study, feltCsv, '--community', 'nowhere'],
        /community: no community "nowhere" in .*felt\.study\.json; expected one of test-cove, distant-shoal/,
      ],
      [
        ['felt', file('bad.study.json', '{"name": "x"}'), feltCsv],
        /bad\.study\.json: \d+ problems?/,
      ],
      [
        ['felt', study, join(dir, 'absent.csv')],
        /absent\.csv: cannot read the catalog file \(ENOENT\)/,
      ],
      [['felt', study], /expected a STUDY file and a CATALOG file/],
    ];
    for (const [argv, message] of cases) {
      const { code, out, err } = await run(...argv);
      expect(code, argv.join(' ')).toBe(2);
      expect(out).toEqual([]);
      expect(err.join('\n')).toMatch(message);
    }
  });
});
