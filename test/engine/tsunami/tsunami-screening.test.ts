import { describe, expect, it } from 'vitest';
import { InvalidInput } from '../../../api/engine/errors.ts';
import { frameForStudy } from '../../../api/engine/geometry/projection.ts';
import type { Study } from '../../../api/engine/model.ts';
import { modelCatalog } from '../../../api/engine/motion/registry.ts';
import { createElevationGrid } from '../../../api/engine/terrain/elevation-grid.ts';
import { SLOW_WALK_MS, highGround, tsunamiScreening } from '../../../api/engine/tsunami/index.ts';
import { STANDARD_GRAVITY_MS2 } from '../../../api/engine/units.ts';
import { loadStudy } from '../../../api/study/load-study.ts';
import { expectClose, expectRelative } from '../../helpers/close.ts';
import { lonLatGrid } from '../fixtures/lonlat-grid.ts';

/** The coast of the test shore: sea west of this longitude, land east (invented). */
const COAST_LON = -140.0;
const SEA_DEPTH_M = 2000;
/** Land rises 10 m per km east of the coast from 2 m (invented). */
const landM = (kmInland: number) => 2 + 10 * kmInland;

/**
 * A test study of the shore (all invented): `communities`, one reverse interface source of M 8
 * at 0.001 a year (its GeoJSON `geometry` and the rest of its `properties`) with AGA16, PGA at
 * 475 years; `outline` if given.
 */
function shoreStudy(
  name: string,
  communities: object[],
  source: { geometry: object; properties: object },
  outline?: object,
): Study {
  const properties = {
    setting: 'interface',
    mechanism: 'reverse',
    recurrence: { type: 'fixed', magnitude: 8, rate: 0.001 },
    ...source.properties,
  };
  const feature = { type: 'Feature', geometry: source.geometry, properties };
  const loaded = loadStudy(
    {
      name,
      communities,
      ...(outline ? { outline } : {}),
      sources: { type: 'FeatureCollection', features: [feature] },
      groundMotion: { interface: [{ model: 'AGA16', weight: 1 }] },
      settings: { measures: ['PGA'], horizonsYears: [50], returnPeriodsYears: [475] },
    },
    { models: modelCatalog },
  );
  if (!loaded.ok) throw new Error(JSON.stringify(loaded.issues));
  return loaded.study;
}

/** A test study: one interface fault dipping east offshore and coastal communities (all invented). */
function study(communities: object[]): Study {
  return shoreStudy('Tsunami test shore', communities, {
    geometry: {
      type: 'LineString',
      coordinates: [
        [-141.2, -47.5],
        [-141.2, -46.9],
      ],
    },
    properties: {
      id: 'trench',
      name: 'Test trench',
      dip: 45,
      upperDepthKm: 5,
      lowerDepthKm: 15,
    },
  });
}

/** A lon/lat grid of 0.01° from `west` to −139.0 and −48.0 to −46.4: sea of constant depth west of the coast, a ramp of land east. */
function shoreGrid(west = -142.0) {
  const cell = 0.01,
    north = -46.4;
  const columns = Math.round((-139.0 - west) / cell),
    rows = Math.round((north + 48.0) / cell);
  const values = new Float32Array(columns * rows);
  for (let r = 0; r < rows; r += 1) {
    const lat = north - (r + 0.5) * cell;
    const kmPerDeg = (Math.PI / 180) * 6371 * Math.cos((lat * Math.PI) / 180);
    for (let c = 0; c < columns; c += 1) {
      const lon = west + (c + 0.5) * cell;
      values[r * columns + c] =
        lon < COAST_LON ? -SEA_DEPTH_M : landM((lon - COAST_LON) * kmPerDeg);
    }
  }
  return lonLatGrid('shore.asc', { west, north, cellDeg: cell, columns, rows }, values);
}

/** The one community's first arrival, after checking it has no problems. */
function firstArrival(
  s: Parameters<typeof tsunamiScreening>[0],
  grid: Parameters<typeof tsunamiScreening>[1],
) {
  const result = tsunamiScreening(s, grid);
  const community = result.communities[0];
  const arrival = community?.arrivals[0];
  expect(community?.problems).toEqual([]);
  if (!community || !arrival) throw new Error('no arrival');
  return { result, community, arrival };
}

const cove = { id: 'cove', name: 'Cove', lon: -139.995, lat: -47.2, vs30: 400, coastal: true };

describe('tsunami first arrival for coastal communities', () => {
  it('over a sea of constant depth, the grid time is the distance from the rupture area / √(g h), and the range holds it', () => {
    const s = study([cove]);
    const { community, arrival } = firstArrival(s, shoreGrid());
    // Distance (derived): from the east edge of the rupture's surface projection (the trace plus
    // the horizontal width (15 − 5) / tan 45° = 10 km, east) to the sea cell the time is read at.
    const frame = frameForStudy(s);
    const traceX = frame.toLocal([-141.2, -47.2]).x;
    const siteX = frame.toLocal([cove.lon, cove.lat]).x;
    const distanceKm = siteX - community.arrivals[0]!.coastDistanceKm - (traceX + 10);
    const expectedMinutes =
      (distanceKm * 1000) / Math.sqrt(STANDARD_GRAVITY_MS2 * SEA_DEPTH_M) / 60;
    expectRelative(
      arrival.gridMinutes,
      expectedMinutes,
      0.02,
      'distance / √(g h) (Lamb 1932 §170 for the speed; distance derived)',
    );
    expect(community.firstArrivalMinutes).toBeLessThanOrEqual(Math.floor(expectedMinutes));
    expect(community.latestMinutes).toBeGreaterThanOrEqual(Math.floor(expectedMinutes));
    expect(community.sourceId).toBe('trench');
  });

  it('says so, with no number, for a community flagged coastal but far from the sea on the grid', () => {
    const inland = { ...cove, id: 'hill-farm', name: 'Hill Farm', lon: -139.6 };
    const result = tsunamiScreening(study([cove, inland]), shoreGrid());
    const farm = result.communities.find((c) => c.id === 'hill-farm');
    expect(farm?.firstArrivalMinutes).toBeNull();
    expect(farm?.problems.join(' ')).toMatch(
      /community "hill-farm" \(Hill Farm\).*no sea within 5 km/,
    );
  });

  it('refuses a grid that does not cover the source, naming the file and the source', () => {
    expect(() => tsunamiScreening(study([cove]), shoreGrid(-141.0))).toThrow(InvalidInput);
    expect(() => tsunamiScreening(study([cove]), shoreGrid(-141.0))).toThrow(
      /"shore\.asc" does not cover the rupture area of source "trench"/,
    );
  });

  it('refuses a source that is not an interface source of the study', () => {
    expect(() => tsunamiScreening(study([cove]), shoreGrid(), { sourceIds: ['nowhere'] })).toThrow(
      /not an interface source of the study: nowhere/,
    );
  });
});

/** The test shore's inlet: sea reaching this far east at latitudes −47.215 to −47.185 (invented). */
const INLET_EAST_LON = -139.8;
const inletLat = (lat: number) => lat > -47.215 && lat < -47.185;

/** The test shore with an inlet of the sea's depth cut into the land from the coast to INLET_EAST_LON. */
function inletGrid() {
  const plain = shoreGrid();
  const values = Float32Array.from(plain.elevationM);
  for (let r = 0; r < plain.rows; r += 1) {
    const lat = plain.north - (r + 0.5) * plain.cellHeight;
    if (!inletLat(lat)) continue;
    for (let c = 0; c < plain.columns; c += 1) {
      const lon = plain.west + (c + 0.5) * plain.cellWidth;
      if (lon >= COAST_LON && lon < INLET_EAST_LON) values[r * plain.columns + c] = -SEA_DEPTH_M;
    }
  }
  return createElevationGrid({ ...plain, label: 'inlet.asc', elevationM: values });
}

/**
 * A study whose interface is given by depth contours running north–south, from 5 km at −140.4
 * (under the sea) to 30 km at −139.7 (under the land east of the coast at −140.0), with an
 * outline of the land: the coarse coastline a study draws, which does not follow the inlet.
 */
function contouredStudy(communities: object[]): Study {
  return shoreStudy(
    'Tsunami test shore, contoured',
    communities,
    {
      geometry: {
        type: 'MultiLineString',
        coordinates: [
          [
            [-140.4, -47.5],
            [-140.4, -46.9],
          ],
          [
            [-139.7, -47.5],
            [-139.7, -46.9],
          ],
        ],
      },
      properties: {
        id: 'curved-trench',
        name: 'Test contoured trench',
        contourDepthsKm: [5, 30],
        meshSpacingKm: 10,
      },
    },
    {
      type: 'Polygon',
      coordinates: [
        [
          [COAST_LON, -48.0],
          [-139.0, -48.0],
          [-139.0, -46.4],
          [COAST_LON, -46.4],
          [COAST_LON, -48.0],
        ],
      ],
    },
  );
}

describe('tsunami source of an interface that runs on under the land', () => {
  const head = { ...cove, id: 'inlet-head', name: 'Inlet Head', lon: -139.81 };

  it("starts from the part under the sea: the inlet's head hears of it after the inlet's length / √(g h)", () => {
    const s = contouredStudy([head]);
    const { result, arrival } = firstArrival(s, inletGrid());
    // Distance (derived): from the coast, where the source's offshore part ends, along the
    // inlet to the sea cell the time is read at.
    const frame = frameForStudy(s);
    const coastX = frame.toLocal([COAST_LON, head.lat]).x;
    const siteX = frame.toLocal([head.lon, head.lat]).x;
    const distanceKm = siteX - arrival.coastDistanceKm - coastX;
    expect(distanceKm).toBeGreaterThan(10);
    // The wave's path (km) from its time at √(g h) (Lamb 1932 §170); it starts at the centres of
    // the solve grid's cells west of the coast and ends at a cell centre in the inlet, so it may
    // be longer than the inlet by up to a cell and a half of the solve grid (derived).
    const pathKm =
      (arrival.gridMinutes * 60 * Math.sqrt(STANDARD_GRAVITY_MS2 * SEA_DEPTH_M)) / 1000;
    const cellKm = result.terrain.spacingKm;
    expectClose(
      pathKm,
      distanceKm + 0.75 * cellKm,
      0.75 * cellKm,
      'inlet length (derived) plus up to 1.5 solve cells between the coast, the start cells and the read cell',
    );
  });

  it('without the outline, the water over the rupture inside the land would start the wave at the village', () => {
    const s = contouredStudy([head]);
    const result = tsunamiScreening({ ...s, outline: undefined }, inletGrid());
    expect(result.communities[0]?.arrivals[0]?.gridMinutes).toBeLessThan(0.5);
  });

  it('refuses an interface wholly under the outlined land, saying it has no sea offshore', () => {
    const s = contouredStudy([head]);
    const allLand = [
      [
        [-141.0, -48.0],
        [-139.0, -48.0],
        [-139.0, -46.4],
        [-141.0, -46.4],
      ] as const,
    ];
    expect(() => tsunamiScreening({ ...s, outline: allLand }, inletGrid())).toThrow(
      /source "curved-trench" has no sea on the terrain grid "inlet\.asc" offshore of the study's outline/,
    );
  });
});

describe('nearest high ground', () => {
  it('on land rising 10 m per km, finds 30 m due inland at (30 − 2) / 10 km from the shore (derived)', () => {
    const found = highGround(shoreGrid(), { ...cove, vs30Basis: 'measured', lon: -139.99 });
    if (found.kind !== 'found') throw new Error(found.kind);
    const kmPerDeg = (Math.PI / 180) * 6371 * Math.cos((47.2 * Math.PI) / 180);
    const expectedKm = (30 - 2) / 10 - 0.01 * kmPerDeg;
    expectClose(
      found.distanceKm,
      expectedKm,
      0.1,
      'ramp of the test grid (derived); 0.05 km rings and the sphere-versus-ellipsoid scale allow 0.1 km',
    );
    expectClose(found.bearingDeg, 90, 2, 'due east, up the ramp (derived)');
    expect(found.walkingMinutes).toBe(Math.ceil((found.distanceKm * 1000) / SLOW_WALK_MS / 60));
  });

  it('says a community already stands high enough, from its own elevationM', () => {
    const above = highGround(shoreGrid(), { ...cove, vs30Basis: 'measured', elevationM: 45 });
    expect(above).toMatchObject({ kind: 'already-above', elevationM: 45, basis: 'community' });
  });
});
