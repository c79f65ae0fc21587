import { STANDARD_GRAVITY_MS2 } from '../units.ts';
import type { FastMarchingGrid } from './fast-marching.ts';
import type { MetricGrid } from './metric-grid.ts';

/**
 * Shallowest depth the speed is worked out at, m. The last cells before the shore are partly
 * land on any grid of a kilometre or so, and √(g h) goes to zero there; a floor keeps one such
 * cell from holding the front back (at 5 m, 7 m/s, a 1 km cell takes under 2.5 minutes). The
 * value is our choice (common practice to floor the depth; the number is not from a source).
 */
export const MIN_DEPTH_M = 5;

/**
 * Speed of a long wave over water `depthM` deep, m/s: c = √(g h), the shallow-water (long-wave)
 * limit where the wavelength is much longer than the depth (Lamb 1932, Hydrodynamics, §170).
 */
export const longWaveSpeedMS = (depthM: number): number => Math.sqrt(STANDARD_GRAVITY_MS2 * depthM);

/** Slowness of each metric cell for the solver: water cells 1/√(g h) in s/km; land and no data blocked. */
export function longWaveGrid(m: MetricGrid): FastMarchingGrid {
  const slownessSPerKm = new Float64Array(m.elevationM.length);
  for (let i = 0; i < slownessSPerKm.length; i += 1) {
    const z = m.elevationM[i] as number;
    slownessSPerKm[i] = z < 0 ? 1000 / longWaveSpeedMS(Math.max(-z, MIN_DEPTH_M)) : Infinity;
  }
  return { columns: m.columns, rows: m.rows, spacingKm: m.spacingKm, slownessSPerKm };
}
