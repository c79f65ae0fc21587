import type { Settings } from '../../api/engine/model.ts';

/**
 * Engine settings the engine tests and benchmarks share: PGA only, no fixed levels, 50-year
 * horizon, 475-year return period, 3-sigma truncation, 300 km cut-off, 0.1 magnitude step,
 * 5 km rupture spacing and 10 km zone cells. Invented test scaffolding; a test that needs a
 * different value overrides that field.
 */
export function testSettings(overrides: Partial<Settings> = {}): Settings {
  return {
    measures: ['PGA'],
    levels: {},
    horizonsYears: [50],
    returnPeriodsYears: [475],
    truncationSigma: 3,
    maxDistanceKm: 300,
    magnitudeStep: 0.1,
    ruptureSpacingKm: 5,
    zoneCellKm: 10,
    ...overrides,
  };
}
