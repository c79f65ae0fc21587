import type { GmmInput } from '../../../api/engine/motion/types.ts';

/**
 * The crustal models' test rupture: M 7, vertical strike-slip, reaching the surface, 15 km wide,
 * the site on the footwall side at one distance (Rrup = Rjb = Repi = −Rx, 10 km unless `over`
 * gives Rrup or Rjb), Vs30 760 m/s measured. Tests change what they need through `over`.
 */
export function verticalStrikeSlip(over: Partial<GmmInput> = {}, hypoDepthKm = 8): GmmInput {
  const distanceKm = over.rrupKm ?? over.rjbKm ?? 10;
  return {
    magnitude: 7,
    rakeDeg: 0,
    mechanism: 'strike-slip',
    setting: 'crustal',
    dipDeg: 90,
    ztorKm: 0,
    widthKm: 15,
    hypoDepthKm,
    rjbKm: distanceKm,
    rrupKm: distanceKm,
    rxKm: -distanceKm,
    ry0Km: 0,
    rhypoKm: Math.hypot(distanceKm, hypoDepthKm),
    repiKm: distanceKm,
    vs30: 760,
    vs30Measured: true,
    ...over,
  };
}
