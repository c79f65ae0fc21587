/**
 * Vs30 from topographic slope for active tectonic regions: Wald, D. J. & Allen, T. I. (2007),
 * "Topographic slope as a proxy for seismic site conditions and amplification", BSSA 97(5),
 * 1379–1395, Table 1 (active tectonic regions, slope from 30 arc-second topography), as
 * re-published for the same regions by Allen, T. I. & Wald, D. J. (2009), "On the use of
 * high-resolution topographic data as a proxy for seismic site conditions (VS30)", BSSA 99(2A),
 * 935–943, Table 1. The slope bounds below are from memory of that table: check them against
 * the paper before relying on a result.
 *
 * Slope is the gradient magnitude in m/m (rise over run, not degrees or per cent), computed
 * from 30 arc-second (about 1 km) topography: the relation was calibrated at that resolution
 * and gives higher slopes, so higher Vs30, on finer grids (Allen & Wald 2009). See
 * topographic-slope.ts for how the slope is taken from a grid.
 */

import type { SiteClass } from '../model.ts';

/** One row of the table: slopes from `slopeMin` (inclusive) give Vs30 from `vs30Min`. */
interface SlopeRow {
  readonly siteClass: SiteClass;
  readonly vs30Min: number;
  readonly vs30Max: number;
  readonly slopeMin: number;
  readonly slopeMax: number;
}

/**
 * Wald & Allen (2007) Table 1, active tectonic regions (from memory): NEHRP class, Vs30 range
 * (m/s) and slope range (m/m). The open ends (E below 180 m/s, B above 760 m/s) are closed here
 * at the representative values below, since the table gives no bound.
 */
const ACTIVE_TABLE: readonly SlopeRow[] = [
  { siteClass: 'E', vs30Min: 150, vs30Max: 180, slopeMin: 0, slopeMax: 1.0e-4 },
  { siteClass: 'D', vs30Min: 180, vs30Max: 240, slopeMin: 1.0e-4, slopeMax: 2.2e-3 },
  { siteClass: 'D', vs30Min: 240, vs30Max: 300, slopeMin: 2.2e-3, slopeMax: 6.3e-3 },
  { siteClass: 'D', vs30Min: 300, vs30Max: 360, slopeMin: 6.3e-3, slopeMax: 0.018 },
  { siteClass: 'C', vs30Min: 360, vs30Max: 490, slopeMin: 0.018, slopeMax: 0.05 },
  { siteClass: 'C', vs30Min: 490, vs30Max: 620, slopeMin: 0.05, slopeMax: 0.1 },
  { siteClass: 'C', vs30Min: 620, vs30Max: 760, slopeMin: 0.1, slopeMax: 0.138 },
];

/** The NEHRP Vs30 range of each class the table reaches, m/s (BSSC 2003; the table's own bins). */
const CLASS_RANGE: Readonly<Record<'B' | 'C' | 'D' | 'E', readonly [number, number]>> = {
  E: [0, 180],
  D: [180, 360],
  C: [360, 760],
  B: [760, 1500],
};

/**
 * The slope above which every site is class B, m/m; such slopes are given 760 m/s, the class's
 * lower bound: the table says nothing above it, and the lower value leans towards more shaking.
 */
const B_SLOPE = 0.138;

/** A Vs30 estimated from slope, with the spread it carries. */
export interface SlopeVs30 {
  /** The slope the estimate comes from, m/m. */
  readonly slope: number;
  /** Vs30, m/s, within the table row the slope falls in. */
  readonly vs30: number;
  /** NEHRP class of the row. */
  readonly siteClass: 'B' | 'C' | 'D' | 'E';
  /** The class's Vs30 range, m/s: the uncertainty the proxy is stated with. */
  readonly vs30Range: readonly [min: number, max: number];
}

/**
 * Vs30 (m/s) for a slope (m/m) by Wald & Allen (2007) Table 1, active regions. Within a row,
 * log Vs30 is interpolated linearly in log slope between the row's ends (common practice: the
 * table only gives bins); below 1e-4 (class E, whose row has no lower slope) 150 m/s, the
 * ASCE 7-16 representative of class E used for site classes (api/study/site-class.ts); from
 * 0.138 up, 760 m/s.
 */
export function vs30FromSlope(slope: number): SlopeVs30 {
  if (!(slope >= 0) || !Number.isFinite(slope))
    throw new RangeError(`expected a slope (m/m) of 0 or more, got ${slope}`);
  if (slope >= B_SLOPE) return estimate(slope, 760, 'B');
  const row = ACTIVE_TABLE.find((r) => slope < r.slopeMax) as SlopeRow;
  if (row.slopeMin === 0) return estimate(slope, row.vs30Min, row.siteClass);
  const f = Math.log(slope / row.slopeMin) / Math.log(row.slopeMax / row.slopeMin);
  const vs30 = row.vs30Min * Math.exp(f * Math.log(row.vs30Max / row.vs30Min));
  return estimate(slope, vs30, row.siteClass);
}

function estimate(slope: number, vs30: number, siteClass: SlopeRow['siteClass']): SlopeVs30 {
  const letter = siteClass as keyof typeof CLASS_RANGE;
  return { slope, vs30, siteClass: letter, vs30Range: CLASS_RANGE[letter] };
}
