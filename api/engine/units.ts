/** Unit conversions used across the engine. Degrees at the boundary, radians inside. */

export const DEG_TO_RAD = Math.PI / 180;
export const RAD_TO_DEG = 180 / Math.PI;

export const toRadians = (deg: number): number => deg * DEG_TO_RAD;
export const toDegrees = (rad: number): number => rad * RAD_TO_DEG;

/** Standard gravity, m/s² (CGPM 1901 conventional value). */
export const STANDARD_GRAVITY_MS2 = 9.80665;

/** Azimuth normalised to [0, 360). */
/** An angle in degrees, any turn, as the same angle in [−180, 180). */
export const wrapDeg180 = (deg: number): number => ((((deg + 180) % 360) + 360) % 360) - 180;

export const normaliseAzimuthDeg = (deg: number): number => ((deg % 360) + 360) % 360;
