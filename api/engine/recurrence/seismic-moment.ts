/**
 * Seismic moment of a moment magnitude, N·m: Hanks & Kanamori (1979), "A moment magnitude
 * scale", JGR 84(B5), 2348–2350, Mw = (2/3) log10 M0 - 10.7 with M0 in dyne·cm, so
 * log10 M0 = 1.5 Mw + 16.05 (dyne·cm) = 1.5 Mw + 9.05 (N·m, 1 N·m = 10^7 dyne·cm).
 * Their 10.7 is kept (DESIGN.md names Hanks & Kanamori 1979); the later IASPEI standard
 * constant 9.1 (from memory) would give 12% more moment per event and so 11% lower
 * moment-balanced rates.
 */
export const momentNm = (magnitude: number): number => 10 ** (1.5 * magnitude + 9.05);

/** 1 km² in m². */
const M2_PER_KM2 = 1e6;
/** 1 mm in m. */
const M_PER_MM = 1e-3;

/**
 * Moment rate of a fault, N·m per year: shear modulus (Pa) x area (km²) x slip rate (mm/yr),
 * the long-term moment-rate balance of Brune (1968) (from memory).
 */
export const momentRateNmYr = (
  shearModulusPa: number,
  areaKm2: number,
  slipRateMmYr: number,
): number => shearModulusPa * areaKm2 * M2_PER_KM2 * slipRateMmYr * M_PER_MM;
