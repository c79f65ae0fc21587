import type { TectonicSetting } from '../../../api/engine/model.ts';
import type { DistanceContext, SiteContext } from '../../../api/engine/motion/types.ts';
import type { Rupture } from '../../../api/engine/ruptures/rupture.ts';

/**
 * Hand-made point ruptures for the hazard tests: a rupture at the site's epicentral distance
 * `repiKm` and hypocentral depth `depthKm`, so Rjb = Repi and Rrup = Rhypo = √(Repi² + depth²).
 * These are test scaffolding, not check values.
 */
export interface PointRuptureSpec {
  readonly magnitude: number;
  readonly annualRate: number;
  readonly repiKm: number;
  readonly depthKm?: number;
  readonly sourceIndex?: number;
  readonly sourceId?: string;
  readonly setting?: TectonicSetting;
}

export function pointRupture(spec: PointRuptureSpec): {
  rupture: Rupture;
  distances: DistanceContext;
} {
  const depthKm = spec.depthKm ?? 0;
  const sourceIndex = spec.sourceIndex ?? 0;
  const rhypoKm = Math.hypot(spec.repiKm, depthKm);
  return {
    rupture: {
      sourceIndex,
      sourceId: spec.sourceId ?? `source-${sourceIndex}`,
      annualRate: spec.annualRate,
      context: {
        magnitude: spec.magnitude,
        rakeDeg: 0,
        mechanism: 'strike-slip',
        setting: spec.setting ?? 'crustal',
        dipDeg: 90,
        ztorKm: depthKm,
        widthKm: 0,
        hypoDepthKm: depthKm,
      },
      surface: { kind: 'point', hypocentre: { x: spec.repiKm, y: 0, z: depthKm } },
    },
    distances: {
      rjbKm: spec.repiKm,
      rrupKm: rhypoKm,
      rxKm: 0,
      ry0Km: 0,
      rhypoKm,
      repiKm: spec.repiKm,
    },
  };
}

export function pointRuptures(specs: readonly PointRuptureSpec[]): {
  ruptures: Rupture[];
  distances: DistanceContext[];
} {
  const built = specs.map(pointRupture);
  return { ruptures: built.map((b) => b.rupture), distances: built.map((b) => b.distances) };
}

export const ROCK_SITE: SiteContext = { vs30: 760, vs30Measured: true };
