import geodesic from 'geographiclib-geodesic';
import { COMMUNITY, smallStudy } from '../service/helpers/small-study.ts';
import { boxRing } from './box-ring.ts';

/**
 * Small hand-written catalogs for the catalog verbs and routes, in an invented open-ocean test
 * area, with every expected value worked by hand from the published formulas (calculator; the
 * working is beside each value). None of these numbers comes from Tremora's own output.
 */

/**
 * Fourteen events, one a year from 2001 to 2012 at two spots 2° of longitude apart, plus:
 * ev-02, one day after ev-01 and about 1.8 km from it (an aftershock), and ev-08, an ML.
 * The yearly spacing keeps every other pair outside the Gardner & Knopoff (1974) windows: the
 * largest, for M 5.0, is L = 10^(0.1238·5 + 0.983) = 40.0 km and T = 10^(0.5409·5 − 0.547) =
 * 143.7 days (fitted form, van Stiphout, Zhuang & Marsan 2012, from memory); ev-08 (M 4.7,
 * T = 98.9 days) is 167 days after ev-07 and 198 days before ev-09.
 * East spot (-139.00, -50.00): ev-01, 02, 04, 06, 09, 10, 12, 13, 14; west (-141.00, -50.00): the rest.
 */
export const FIT_CATALOG_CSV = `time,lon,lat,depthKm,magnitude,magnitudeType,id
2001-01-15T00:00:00Z,-139.00,-50.00,10,5.0,Mw,ev-01
2001-01-16T00:00:00Z,-139.02,-50.01,10,4.2,Mw,ev-02
2002-01-15T00:00:00Z,-141.00,-50.00,10,4.0,Mw,ev-03
2003-01-15T00:00:00Z,-139.00,-50.00,10,4.0,Mw,ev-04
2004-01-15T00:00:00Z,-141.00,-50.00,10,4.1,Mw,ev-05
2005-01-15T00:00:00Z,-139.00,-50.00,10,4.0,Mw,ev-06
2006-01-15T00:00:00Z,-141.00,-50.00,10,4.4,Mw,ev-07
2006-07-01T00:00:00Z,-141.00,-50.00,10,4.7,ML,ev-08
2007-01-15T00:00:00Z,-139.00,-50.00,10,4.2,Mw,ev-09
2008-01-15T00:00:00Z,-139.00,-50.00,10,4.6,Mw,ev-10
2009-01-15T00:00:00Z,-141.00,-50.00,10,4.3,Mw,ev-11
2010-01-15T00:00:00Z,-139.00,-50.00,10,4.0,Mw,ev-12
2011-01-15T00:00:00Z,-139.00,-50.00,10,4.8,Mw,ev-13
2012-01-15T00:00:00Z,-139.00,-50.00,10,4.2,Mw,ev-14
`;

/** A box around the east spot only, as a GeoJSON Feature. */
export const EAST_ZONE = {
  type: 'Feature',
  properties: { id: 'east-box' },
  geometry: {
    type: 'Polygon',
    coordinates: [boxRing(-139.5, -50.5, -138.5, -49.5)],
  },
} as const;

/** 2001-01-15 to 2012-01-15: 11 × 365 + 2 leap days = 4017 days, in Julian years (365.25 days). */
export const SPAN_YEARS = 4017 / 365.25;

/**
 * One fit worked by hand: Mc by maximum curvature (Wiemer & Wyss 2000) + 0.2 (Woessner & Wiemer
 * 2005); b = log10(e) / (mean M − (Mc − ΔM/2)) (Aki 1965 with Utsu's 1965 correction, ΔM 0.1);
 * σb = ln(10) b² sqrt(Σ(M − mean)² / (n (n − 1))) (Shi & Bolt 1982); rate of M >= Mc − ΔM/2
 * = n / T and a = log10(rate) + b (Mc − ΔM/2).
 */
export interface HandFit {
  readonly mc: number;
  readonly n: number;
  readonly bValue: number;
  readonly sigmaB: number;
  readonly rate: number;
  readonly aValue: number;
}

/**
 * Moment magnitudes, declustered (ev-02 removed, ev-08 left out), whole catalog: 12 events;
 * the most populated bin is 4.0 (4 events), so Mc = 4.2. At or above it: 5.0, 4.4, 4.2, 4.6,
 * 4.3, 4.8, 4.2 (n = 7, sum 31.5, mean 4.5, Σ(M − mean)² = 0.58):
 * b = 0.4342945 / 0.35 = 1.2408414; σb = 2.302585 · 1.2408414² · sqrt(0.58 / 42) = 0.4166176;
 * rate = 7 / 10.997947 = 0.6364824; a = log10(0.6364824) + 1.2408414 · 4.15 = 4.9532781.
 */
export const DEFAULT_FIT: HandFit = {
  mc: 4.2,
  n: 7,
  bValue: 1.2408414,
  sigmaB: 0.4166176,
  rate: 0.6364824,
  aValue: 4.9532781,
};

/** All magnitude types: ev-08 (4.7) joins: n = 8, mean 36.2 / 8 = 4.525, b = 0.4342945 / 0.375 = 1.1581186; rate 8 / T = 0.7274085. */
export const ALL_MAGNITUDES_FIT: HandFit = {
  mc: 4.2,
  n: 8,
  bValue: 1.1581186,
  sigmaB: 0.3236423,
  rate: 0.7274085,
  aValue: 4.6679706,
};

/** Not declustered: ev-02 (4.2) stays: n = 8, mean 35.7 / 8 = 4.4625, b = 0.4342945 / 0.3125 = 1.3897423. */
export const NOT_DECLUSTERED_FIT: HandFit = {
  mc: 4.2,
  n: 8,
  bValue: 1.3897423,
  sigmaB: 0.482337,
  rate: 0.7274085,
  aValue: 5.6292091,
};

/**
 * Inside EAST_ZONE after declustering: 8 events (4 outside); bins 4.0 ×3, 4.2 ×2, 4.6, 4.8, 5.0;
 * Mc 4.2; n = 5, mean 22.8 / 5 = 4.56, b = 0.4342945 / 0.41 = 1.0592548; Σ(M − mean)² = 0.512,
 * σb = 2.302585 · 1.0592548² · sqrt(0.512 / 20) = 0.4133677; rate 5 / T = 0.4546303.
 */
export const EAST_ZONE_FIT: HandFit = {
  mc: 4.2,
  n: 5,
  bValue: 1.0592548,
  sigmaB: 0.4133677,
  rate: 0.4546303,
  aValue: 4.053566,
};

const WGS84 = geodesic.Geodesic.WGS84;

/** An epicentre at a geodesic distance (km) and azimuth (deg) from the small study's community (Karney 2013 direct problem). */
function from(distanceKm: number, azimuthDeg: number): { lon: number; lat: number } {
  const p = WGS84.Direct(COMMUNITY.lat, COMMUNITY.lon, azimuthDeg, distanceKm * 1000);
  return { lon: p.lon2 as number, lat: p.lat2 as number };
}

const row = (
  time: string,
  distanceKm: number,
  azimuthDeg: number,
  magnitude: number,
  type: string,
  id: string,
): string => {
  const { lon, lat } = from(distanceKm, azimuthDeg);
  return `${time},${lon.toFixed(7)},${lat.toFixed(7)},10,${magnitude.toFixed(1)},${type},${id}`;
};

/**
 * Four events around Test Cove (the small study: Cornell et al. 1979 for crustal events),
 * all at 10 km depth. Median PGA from ln PGA = −0.152 + 0.859 M − 1.803 ln(R + 25), R
 * hypocentral (Cornell et al. 1979 as given by Baker 2008), and MMI = 1.78 + 1.55 log10(PGA
 * cm/s²) up to log10 = 1.57, −1.60 + 3.70 log10 above (Worden et al. 2012, from memory);
 * hand computation: see FELT_EXPECTED.
 */
export const FELT_CATALOG_CSV = [
  'time,lon,lat,depthKm,magnitude,magnitudeType,id',
  row('2001-02-03T10:00:00Z', 30, 0, 6.0, 'Mw', 'moderate'),
  row('2002-01-01T00:00:00Z', 100, 270, 4.0, 'Mw', 'small-far'),
  row('2003-04-05T00:00:00Z', 5, 135, 6.5, 'Mw', 'near-strong'),
  row('2004-06-07T00:00:00Z', 10, 0, 6.0, 'ML', 'local-scale'),
].join('\n');

/**
 * Hand computation (calculator) for FELT_CATALOG_CSV at Test Cove:
 *   moderate: Repi 30 km, R = sqrt(30² + 10²) = 31.623 km, PGA 0.102730 g, MMI 5.8119 (V): felt;
 *   small-far: Repi 100 km, R = 100.499 km, PGA 0.00438911 g, MMI 2.7625: not felt;
 *   near-strong: Repi 5 km, R = 11.180 km, PGA 0.353952 g, MMI 7.7997 (VII): strongly felt;
 *   local-scale (ML): left out unless all magnitudes are asked for; then Repi 10 km,
 *   R = 14.142 km, PGA 0.199895 g, MMI 6.8816 (VI): strongly felt.
 * Roman numerals name the nearest level (MMI rounded; mmi-roman.ts).
 */
export const FELT_EXPECTED = {
  moderate: {
    pgaG: 0.10273,
    mmi: 5.8119,
    roman: 'VI',
    distanceKm: 30,
    bearingDeg: 0,
    compass: 'N',
  },
  'small-far': { pgaG: 0.00438911, mmi: 2.7625 },
  'near-strong': {
    pgaG: 0.353952,
    mmi: 7.7997,
    roman: 'VIII',
    distanceKm: 5,
    bearingDeg: 135,
    compass: 'SE',
  },
  'local-scale': {
    pgaG: 0.199895,
    mmi: 6.8816,
    roman: 'VII',
    distanceKm: 10,
    bearingDeg: 0,
    compass: 'N',
  },
} as const;

/**
 * The small study with a second, invented community 400 km south of Test Cove: every event
 * above is more than the study's 300 km from it, so it has no felt history.
 */
export function feltStudy(): Record<string, unknown> {
  const study = smallStudy('Felt test study');
  const { lon, lat } = from(400, 180);
  const distant = {
    id: 'distant-shoal',
    name: 'Distant Shoal',
    lon: Number(lon.toFixed(5)),
    lat: Number(lat.toFixed(5)),
    vs30: 760,
    population: 30,
    coastal: true,
    elevationM: 2,
  };
  return { ...study, communities: [...(study.communities as unknown[]), distant] };
}
