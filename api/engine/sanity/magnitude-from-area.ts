import type { Mechanism, TectonicSetting } from '../model.ts';

/** M = a + b·log10(area km²), with its standard deviation in magnitude units. */
export interface MagnitudeAreaRelation {
  readonly name: string;
  readonly a: number;
  readonly b: number;
  readonly sigma: number;
}

/**
 * Magnitude from rupture area, the regressions of M on area (the direction that answers "how
 * large an earthquake can this area hold"; rupture-scaling.ts has the inverse ones).
 * Crustal: Wells & Coppersmith (1994), BSSA 84(4), Table 2A, M on log10(RA), by slip type;
 * interface and intraslab: Strasser, Arango & Bommer (2010), SRL 81(6), M on log10(A).
 * Coefficients from memory: check against the papers' tables before relying on a warning.
 */
const WELLS_COPPERSMITH_1994_M_ON_AREA: Readonly<Record<Mechanism, MagnitudeAreaRelation>> = {
  'strike-slip': {
    name: 'Wells & Coppersmith 1994, Table 2A (strike-slip)',
    a: 3.98,
    b: 1.02,
    sigma: 0.23,
  },
  reverse: { name: 'Wells & Coppersmith 1994, Table 2A (reverse)', a: 4.33, b: 0.9, sigma: 0.25 },
  normal: { name: 'Wells & Coppersmith 1994, Table 2A (normal)', a: 3.93, b: 1.02, sigma: 0.25 },
};
const STRASSER_2010_INTERFACE_M_ON_AREA: MagnitudeAreaRelation = {
  name: 'Strasser et al. 2010 (interface)',
  a: 4.441,
  b: 0.846,
  sigma: 0.286,
};
const STRASSER_2010_INTRASLAB_M_ON_AREA: MagnitudeAreaRelation = {
  name: 'Strasser et al. 2010 (intraslab)',
  a: 4.054,
  b: 0.981,
  sigma: 0.193,
};

export function magnitudeAreaRelation(
  setting: TectonicSetting,
  mechanism: Mechanism,
): MagnitudeAreaRelation {
  if (setting === 'interface') return STRASSER_2010_INTERFACE_M_ON_AREA;
  if (setting === 'intraslab') return STRASSER_2010_INTRASLAB_M_ON_AREA;
  return WELLS_COPPERSMITH_1994_M_ON_AREA[mechanism];
}

/** The median magnitude of a rupture of `areaKm2` (km²) by `relation`. */
export const magnitudeForArea = (relation: MagnitudeAreaRelation, areaKm2: number): number =>
  relation.a + relation.b * Math.log10(areaKm2);
