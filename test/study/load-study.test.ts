import { describe, expect, it } from 'vitest';
import { loadStudy } from '../../api/study/load-study.ts';
import type { InputIssue } from '../../api/engine/errors.ts';
import type { FaultSource } from '../../api/engine/model.ts';
import { testCatalog } from '../helpers/test-catalog.ts';
import { validStudy } from './fixtures.ts';

const load = (raw: unknown, communitiesCsv?: string) =>
  loadStudy(raw, {
    models: testCatalog,
    ...(communitiesCsv !== undefined ? { communitiesCsv } : {}),
  });

function issuesOf(raw: unknown): InputIssue[] {
  const result = load(raw);
  expect(result.ok, 'expected the study to be rejected').toBe(false);
  return result.ok ? [] : [...result.issues];
}

const lines = (issues: InputIssue[]) => issues.map((i) => `${i.path}: ${i.message}`);

describe('loadStudy: a valid study', () => {
  it('loads, fills defaults and derives what the engine needs', () => {
    const result = load(validStudy());
    expect(result.ok).toBe(true);
    if (!result.ok) return;
    const { study } = result;
    expect(study.communities.map((c) => c.id)).toEqual(['north-cove', 'ridge-camp']);
    expect(study.communities[0]).toMatchObject({
      vs30: 450,
      vs30Basis: 'measured',
      coastal: true,
      population: 300,
    });
    // ASCE 7-16 class C: geometric mean of 366 and 762 m/s, about 530 (api/study/site-class.ts).
    expect(study.communities[1]).toMatchObject({
      vs30: 530,
      vs30Basis: 'site-class',
      siteClass: 'C',
      coastal: false,
    });
    expect(study.settings).toMatchObject({
      measures: ['PGA', 'SA(1.0)'],
      horizonsYears: [1, 50],
      returnPeriodsYears: [475, 2475],
      truncationSigma: 3,
      maxDistanceKm: 300,
      magnitudeStep: 0.1,
    });
    expect(study.groundMotion.intraslab).toEqual([{ model: 'SUBDUCTION-A', weight: 1 }]);
    // The fixture's background zone repeats its faults' M 5–6.5: warned of, not refused (source-sanity.ts).
    expect(result.warnings.map((w) => w.path)).toEqual([
      'groundMotion.intraslab',
      'sources.features[2].properties.recurrence.mMax',
      'sources.features[2].properties.recurrence.mMax',
    ]);
  });

  it('derives kinds, mechanisms and the right-hand-rule dip direction', () => {
    const result = load(validStudy());
    if (!result.ok) throw new Error('expected ok');
    const [a, b, zone, point] = result.study.sources;
    // A trace drawn due north dips east by the right-hand rule: dip direction 90°.
    expect(a).toMatchObject({
      kind: 'fault',
      mechanism: 'strike-slip',
      rakeDeg: 0,
      dipDeg: 90,
      upperDepthKm: 0,
      lowerDepthKm: 15,
      name: 'Fault A',
    });
    expect((a as FaultSource).dipDirectionDeg).toBeCloseTo(90, 6);
    // Rake 95° lies in the reverse range 30–150° (Boore et al. 2014 classes, from memory).
    expect(b).toMatchObject({ kind: 'fault', mechanism: 'reverse', rakeDeg: 95, name: 'fault-b' });
    expect(b?.recurrence).toMatchObject({
      type: 'moment-balanced',
      shape: 'characteristic',
      shearModulusPa: 3e10,
    });
    // The trace runs roughly north-north-east, so the dip direction is roughly east-south-east.
    expect((b as FaultSource).dipDirectionDeg).toBeGreaterThan(100);
    expect((b as FaultSource).dipDirectionDeg).toBeLessThan(120);
    expect(zone).toMatchObject({ kind: 'zone', mechanism: 'normal', rakeDeg: -90, depthKm: 10 });
    expect(point).toMatchObject({
      kind: 'point',
      setting: 'intraslab',
      location: [-140.2, -47.9],
      depthKm: 60,
    });
  });

  it('warns about unknown keys instead of dropping them silently', () => {
    const study = validStudy();
    study.sources.features[0].properties.dipp = 45;
    const result = load(study);
    expect(result.ok).toBe(true);
    expect(result.warnings.map((w) => w.path)).toContain('sources.features[0].properties.dipp');
  });

  it('keeps notes on the study without a warning, and refuses notes that are not text', () => {
    const noted = load({
      ...validStudy(),
      notes: 'Convergence 40 mm/yr, coupling 0.5 (invented).',
    });
    expect(noted.ok).toBe(true);
    expect(noted.warnings.map((w) => w.path)).not.toContain('notes');
    expect(lines(issuesOf({ ...validStudy(), notes: 42 }))).toEqual([
      'notes: expected notes on the study of 1 to 4000 characters, got 42',
    ]);
  });
});

describe('loadStudy: every problem at once, each with its path', () => {
  it('names the feature, the field, the range and the value of a dip out of range', () => {
    const study = validStudy();
    study.sources.features[3] = {
      ...study.sources.features[1],
      properties: { ...study.sources.features[1].properties, id: 'fault-c', dip: 120 },
    };
    expect(lines(issuesOf(study))).toEqual([
      'sources.features[3].properties.dip: expected a number in (0, 90] degrees, got 120',
    ]);
  });

  it('lists wrong types, ranges, recurrence, models and weights together', () => {
    const study = validStudy();
    study.name = 42;
    study.communities[0].lon = 200;
    study.communities[1].lat = 'south';
    delete study.communities[1].siteClass;
    const a = study.sources.features[0].properties;
    a.upperDepthKm = 20;
    a.recurrence.mMin = 7.5;
    const b = study.sources.features[1].properties;
    b.recurrence.bValue = 2.5;
    study.sources.features[2].properties.setting = 'crust';
    study.groundMotion.crustal = [
      { model: 'NOPE', weight: 0.5 },
      { model: 'CRUSTAL-B', weight: 0.4 },
    ];
    expect(lines(issuesOf(study))).toEqual(
      [
        'name: expected a study name of 1 to 200 characters, got 42',
        'communities[0].lon: expected a number in [-180, 180] degrees, got 200',
        'communities[1].lat: expected a number in [-90, 90] degrees, got "south"',
        'communities[1].vs30: expected vs30 (m/s) or siteClass (A, B, BC, C, CD, D, DE, E), got neither (or name a terrain grid in the study for the slope–Vs30 proxy)',
        'sources.features[0].properties.recurrence.mMax: expected mMax greater than mMin (7.5), got 7.2',
        'sources.features[1].properties.recurrence.bValue: expected a number in (0.3, 2.5), got 2.5',
        'sources.features[2].properties.setting: expected one of "crustal", "interface", "intraslab", got "crust"',
        'groundMotion.crustal[0].model: unknown model "NOPE"; expected one of CRUSTAL-A, CRUSTAL-B, SUBDUCTION-A, PGA-ONLY',
        'groundMotion.crustal: expected weights summing to 1 (within 0.000001), got 0.9',
      ].map((l) => l.replace('0.000001', String(1e-6))),
    );
  });

  it('reports upper depth below lower depth', () => {
    const study = validStudy();
    study.sources.features[0].properties.upperDepthKm = 20;
    expect(lines(issuesOf(study))).toEqual([
      'sources.features[0].properties.lowerDepthKm: expected lowerDepthKm greater than upperDepthKm (20 km), got 15 km',
    ]);
  });

  it('reports duplicate ids of communities and sources', () => {
    const study = validStudy();
    study.communities[1].id = 'north-cove';
    study.sources.features[2].properties.id = 'fault-a';
    expect(lines(issuesOf(study))).toEqual([
      'communities[1].id: duplicate id "north-cove"; expected unique ids (first used at communities[0])',
      'sources.features[2].properties.id: duplicate id "fault-a"; expected unique ids (first used at sources.features[0])',
    ]);
  });

  it('reports self-intersecting and degenerate geometry', () => {
    const study = validStudy();
    study.sources.features[0].geometry.coordinates = [
      [-140.5, -47.6],
      [-140.3, -47.2],
      [-140.3, -47.6],
      [-140.5, -47.2],
    ];
    study.sources.features[2].geometry.coordinates = [
      [
        [-141, -48],
        [-139, -48],
        [-141, -48],
        [-141, -48],
      ],
    ];
    study.sources.features[1].geometry.coordinates = [
      [-140.0, -47.8],
      [-140.0, -47.8],
    ];
    expect(lines(issuesOf(study))).toEqual([
      'sources.features[0].geometry.coordinates: the trace crosses itself; expected a simple line',
      'sources.features[1].geometry.coordinates[1]: repeats the previous vertex; expected consecutive vertices at least 1 m apart',
      'sources.features[2].geometry.coordinates[0][3]: repeats the previous vertex; expected consecutive vertices at least 1 m apart',
    ]);
  });

  it('reports an unclosed ring and a bow-tie polygon', () => {
    const study = validStudy();
    study.sources.features[2].geometry.coordinates = [
      [
        [-141, -48],
        [-139, -46.5],
        [-139, -48],
        [-141, -46.5],
        [-141, -48],
      ],
    ];
    expect(lines(issuesOf(study))).toEqual([
      'sources.features[2].geometry.coordinates: the polygon crosses itself; expected simple rings',
    ]);
    study.sources.features[2].geometry.coordinates = [
      [
        [-141, -48],
        [-139, -48],
        [-139, -46.5],
        [-141, -46.5],
      ],
    ];
    expect(lines(issuesOf(study))).toEqual([
      'sources.features[2].geometry.coordinates[0]: the ring is not closed; expected its last position to repeat its first',
    ]);
  });

  it('rejects models that do not suit the setting or the measures', () => {
    const study = validStudy();
    study.groundMotion.crustal = [{ model: 'SUBDUCTION-A', weight: 1 }];
    study.groundMotion.intraslab = [{ model: 'PGA-ONLY', weight: 1 }];
    expect(lines(issuesOf(study))).toEqual([
      'groundMotion.crustal[0].model: SUBDUCTION-A is for interface and intraslab earthquakes; expected a model for crustal earthquakes',
      'groundMotion.intraslab[0].model: PGA-ONLY is for crustal earthquakes; expected a model for intraslab earthquakes',
      'groundMotion.intraslab[0].model: PGA-ONLY has no spectral accelerations, which settings.measures[1] asks for',
    ]);
  });

  it('rejects moment balancing on a zone and a characteristic range too narrow for its box', () => {
    const study = validStudy();
    study.sources.features[2].properties.recurrence = {
      type: 'moment-balanced',
      slipRateMmYr: 1,
      bValue: 1,
      mMin: 5,
      mMax: 6,
    };
    study.sources.features[1].properties.recurrence.mMin = 7.0;
    expect(lines(issuesOf(study))).toEqual([
      'sources.features[1].properties.recurrence.mMin: the characteristic shape (Youngs & Coppersmith 1985) needs mMax - mMin > 0.5, got 0.40',
      'sources.features[2].properties.recurrence.type: moment-balanced recurrence needs a fault surface; expected a LineString source, or use "gutenberg-richter"',
    ]);
  });

  it('rejects both or neither of aValue and rate, and an unknown recurrence type', () => {
    const study = validStudy();
    study.sources.features[0].properties.recurrence.rate = 0.1;
    study.sources.features[2].properties.recurrence = { type: 'poisson' };
    expect(lines(issuesOf(study))).toEqual([
      'sources.features[0].properties.recurrence.aValue: expected exactly one of aValue (log10 annual rate of M >= 0) or rate (annual rate of M >= mMin)',
      'sources.features[2].properties.recurrence.type: expected one of "gutenberg-richter", "moment-balanced", "fixed", got "poisson"',
    ]);
  });

  it('checks settings: measures, levels order, ranges', () => {
    const study = validStudy();
    study.settings = {
      measures: ['PGA', 'SA(x)', 'PGA'],
      levels: { PGA: [0.1, 0.05], PGV: [1, 2] },
      truncationSigma: -1,
    };
    expect(lines(issuesOf(study))).toEqual([
      'settings.truncationSigma: expected a number in [0, 6] sigma, got -1',
    ]);
    study.settings.truncationSigma = 2;
    expect(lines(issuesOf(study))).toEqual([
      'settings.measures[1]: unsupported measure "SA(x)": expected "PGA", "PGV" or "SA(T)" with T in seconds, e.g. "SA(0.2)"',
      'settings.measures[2]: "PGA" is listed twice; expected each measure once',
      'settings.levels.PGA[1]: expected levels in increasing order, got 0.05 after 0.1',
      'settings.levels.PGV: levels for a measure not in settings.measures; expected one of PGA, SA(x), PGA',
    ]);
  });

  it('says what was received when a value has the wrong type', () => {
    const study = validStudy();
    study.groundMotion.crustal = [{ model: 5, weight: 1 }];
    study.settings = { measures: [5], levels: { PGA: 'x' } };
    expect(lines(issuesOf(study))).toEqual([
      'settings.measures[0]: expected a measure name such as "PGA" or "SA(0.2)", got 5',
      'settings.levels.PGA: expected a list of levels, got "x"',
      'groundMotion.crustal[0].model: expected a model name, got 5',
    ]);
    delete study.settings;
    expect(lines(issuesOf(study))).toEqual([
      'groundMotion.crustal[0].model: expected a model name, got 5',
    ]);
  });

  it('refuses a non-object study and a missing FeatureCollection', () => {
    expect(lines(issuesOf([1, 2]))).toEqual([
      '(study): expected a study object with name, communities, sources, groundMotion, settings, outline, terrain, notes, got a list of 2',
    ]);
    const study = validStudy();
    study.sources = { type: 'Feature' };
    expect(lines(issuesOf(study))).toEqual([
      'sources: expected a GeoJSON FeatureCollection with a list of features, got an object',
    ]);
  });
});

describe('loadStudy: communities from CSV', () => {
  const header = 'id,name,lon,lat,vs30,population,coastal,elevationM';

  it('reads rows, site classes and flags', () => {
    const study = { ...validStudy(), communities: 'villages.csv' };
    const csv = [
      'id,name,lon,lat,siteClass,population,coastal,elevationM',
      'north-cove,North Cove,-140.1,-47.2,D,300,yes,5',
      '"ridge-camp","Ridge Camp, upper",-140.3,-47.4,B,,no,',
    ].join('\n');
    const result = load(study, csv);
    expect(result.ok).toBe(true);
    if (!result.ok) return;
    expect(result.study.communities).toEqual([
      {
        id: 'north-cove',
        name: 'North Cove',
        lon: -140.1,
        lat: -47.2,
        vs30: 260,
        vs30Basis: 'site-class',
        siteClass: 'D',
        population: 300,
        coastal: true,
        elevationM: 5,
      },
      {
        id: 'ridge-camp',
        name: 'Ridge Camp, upper',
        lon: -140.3,
        lat: -47.4,
        vs30: 1080,
        vs30Basis: 'site-class',
        siteClass: 'B',
        coastal: false,
      },
    ]);
  });

  it('reports rows with missing columns and bad cells by line number, blank lines counted', () => {
    const study = { ...validStudy(), communities: 'villages.csv' };
    const csv = [
      header,
      'a,A,-140,-47,400,10,no,3',
      '',
      'b,B,-140,-47,400',
      'c,C,-140,-95,400,10,no,3',
      'd,"D\nwith a break",-140,-47,400,10,maybe,3',
      'e,E,-140,-47,400,10,no,3',
    ].join('\r\n');
    const result = load(study, csv);
    expect(result.ok ? [] : lines([...result.issues])).toEqual([
      'communities[line 4]: expected 8 columns (id,name,lon,lat,vs30,population,coastal,elevationM), got 5',
      'communities[line 5].lat: expected a number in [-90, 90] degrees, got -95',
      'communities[line 6].coastal: expected true or false, got "maybe"',
    ]);
  });

  it('reports a header without the required columns, with the names it accepts and the columns it found', () => {
    const study = { ...validStudy(), communities: 'villages.csv' };
    const result = load(study, 'id,title,lon,lat\nx,X,1,2');
    expect(result.ok ? [] : lines([...result.issues])).toEqual([
      'communities[line 1]: villages.csv (header): no column recognised for the community name, accepted as name, village, village name, community, community name, settlement, place, place name, site name (any case); the file\'s columns are "id", "title", "lon", "lat"',
      'communities[line 1]: villages.csv (header): no column recognised for vs30 (m/s), accepted as vs30, vs 30; or site class, accepted as siteClass, site class, soil class, ground class, class (any case); the file\'s columns are "id", "title", "lon", "lat"',
    ]);
  });
});
