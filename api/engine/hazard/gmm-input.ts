import type { DistanceContext, GmmInput, RuptureContext, SiteContext } from '../motion/types.ts';

/**
 * A model's input from its three parts, every field written out: one object shape for every
 * rupture keeps model calls fast (spreading ruptures' objects of varied shapes costs several
 * times the call itself).
 */
export function gmmInput(rupture: RuptureContext, d: DistanceContext, site: SiteContext): GmmInput {
  return {
    magnitude: rupture.magnitude,
    rakeDeg: rupture.rakeDeg,
    mechanism: rupture.mechanism,
    setting: rupture.setting,
    dipDeg: rupture.dipDeg,
    ztorKm: rupture.ztorKm,
    widthKm: rupture.widthKm,
    hypoDepthKm: rupture.hypoDepthKm,
    rjbKm: d.rjbKm,
    rrupKm: d.rrupKm,
    rxKm: d.rxKm,
    ry0Km: d.ry0Km,
    rhypoKm: d.rhypoKm,
    repiKm: d.repiKm,
    vs30: site.vs30,
    vs30Measured: site.vs30Measured,
    z1Km: site.z1Km,
    z2p5Km: site.z2p5Km,
  };
}
