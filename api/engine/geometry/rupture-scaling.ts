import type { Mechanism, TectonicSetting } from '../model.ts';

/**
 * Magnitude–size scaling relations, each log10(size) = a + b·M (M moment magnitude, sizes in
 * km and km²), typed from memory and checked as described in
 * test/engine/geometry/rupture-scaling.test.ts (length x width against area at M 6–8, and the
 * stress drop the area implies).
 *
 * Crustal faults: Wells & Coppersmith (1994), "New empirical relationships among magnitude,
 * rupture length, rupture width, rupture area, and surface displacement", BSSA 84(4), 974–1002,
 * Table 2A: subsurface rupture length (RLD), down-dip rupture width (RW) and rupture area (RA)
 * by slip type. Read against the text of Table 2A: log(RLD) = -2.57 + 0.62 M (strike-slip) and
 * -2.42 + 0.58 M (reverse), log(RW) = -0.76 + 0.27 M (strike-slip); the other rows from memory. Their normal-faulting sample is small (the paper advises the all-slip-type
 * relations where the slip type is unknown).
 *
 * Subduction: Strasser, Arango & Bommer (2010), "Scaling of the source dimensions of interface
 * and intraslab subduction-zone earthquakes with moment magnitude", SRL 81(6), 941–950,
 * their regressions of log10 length, width and area on moment magnitude for interface and for
 * intraslab events (table number not re-checked here).
 */
export interface ScalingRelation {
  readonly name: string;
  /** [a, b] of log10(area km²) = a + b·M. */
  readonly area: readonly [a: number, b: number];
  /** [a, b] of log10(width km) = a + b·M. */
  readonly width: readonly [a: number, b: number];
  /**
   * [a, b] of log10(length km) = a + b·M. Rupture lengths are area / width, so the area
   * relation is honoured; this row is kept to check the table's consistency.
   */
  readonly length: readonly [a: number, b: number];
}

export const WELLS_COPPERSMITH_1994: Readonly<Record<Mechanism, ScalingRelation>> = {
  'strike-slip': {
    name: 'Wells & Coppersmith 1994 (strike-slip)',
    area: [-3.42, 0.9],
    width: [-0.76, 0.27],
    length: [-2.57, 0.62],
  },
  reverse: {
    name: 'Wells & Coppersmith 1994 (reverse)',
    area: [-3.99, 0.98],
    width: [-1.61, 0.41],
    length: [-2.42, 0.58],
  },
  normal: {
    name: 'Wells & Coppersmith 1994 (normal)',
    area: [-2.87, 0.82],
    width: [-1.14, 0.35],
    length: [-1.88, 0.5],
  },
};

export const STRASSER_2010_INTERFACE: ScalingRelation = {
  name: 'Strasser et al. 2010 (interface)',
  area: [-3.476, 0.952],
  width: [-0.882, 0.351],
  length: [-2.477, 0.585],
};

export const STRASSER_2010_INTRASLAB: ScalingRelation = {
  name: 'Strasser et al. 2010 (intraslab)',
  area: [-3.225, 0.89],
  width: [-1.058, 0.356],
  length: [-2.35, 0.562],
};

/** The relation used for a fault: Strasser et al. for subduction settings, else Wells & Coppersmith by mechanism. */
export function scalingRelationFor(
  setting: TectonicSetting,
  mechanism: Mechanism,
): ScalingRelation {
  if (setting === 'interface') return STRASSER_2010_INTERFACE;
  if (setting === 'intraslab') return STRASSER_2010_INTRASLAB;
  return WELLS_COPPERSMITH_1994[mechanism];
}

export interface RuptureDimensions {
  readonly areaKm2: number;
  readonly lengthKm: number;
  readonly widthKm: number;
}

const sizeFromLog = ([a, b]: readonly [number, number], magnitude: number): number =>
  10 ** (a + b * magnitude);

/**
 * Median rupture area and width of `relation` at `magnitude` (km², km), and the length that
 * goes with them, area / width (km).
 */
export function scaledDimensions(relation: ScalingRelation, magnitude: number): RuptureDimensions {
  const areaKm2 = sizeFromLog(relation.area, magnitude);
  const widthKm = sizeFromLog(relation.width, magnitude);
  return { areaKm2, widthKm, lengthKm: areaKm2 / widthKm };
}

/**
 * Dimensions fitted to a fault of `faultLengthKm` by `faultWidthKm` (km): the width is capped
 * at the fault's down-dip width, the length then grows to keep the area (area / width) and is
 * capped at the fault's length; a rupture that fills the fault has less area than the
 * relation's median, as a fault cannot hold more.
 */
export function fitDimensions(
  scaled: RuptureDimensions,
  faultLengthKm: number,
  faultWidthKm: number,
): RuptureDimensions {
  const widthKm = Math.min(scaled.widthKm, faultWidthKm);
  const lengthKm = Math.min(scaled.areaKm2 / widthKm, faultLengthKm);
  return { areaKm2: lengthKm * widthKm, lengthKm, widthKm };
}
