import type { DistanceContext, GroundMotionModel } from '../motion/types.ts';
import { measureUnit, parseMeasure } from '../motion/measure.ts';
import type { ScenarioRupture } from './scenario-rupture.ts';

/** One measure at one place: median and 84th percentile (median x e^sigma), g (PGV cm/s). */
export interface ScenarioMotion {
  readonly median: number;
  readonly p84: number;
  readonly unit: 'g' | 'cm/s';
}

/** Motion at one site from one rupture over the setting's branches. */
export interface SiteMotionOptions {
  readonly rupture: ScenarioRupture;
  readonly distances: DistanceContext;
  readonly vs30: number;
  readonly vs30Measured: boolean;
  readonly branches: readonly { readonly model: GroundMotionModel; readonly weight: number }[];
  readonly measures: readonly string[];
  readonly notes: Set<string>;
}

/**
 * Logic-tree median and 84th percentile of each measure: ln medians and sigmas averaged with
 * the branch weights (the weighted geometric mean of the medians; common practice for a
 * deterministic scenario), 84th percentile = median x exp(sigma).
 */
export function siteMotions(options: SiteMotionOptions): Record<string, ScenarioMotion> {
  const out: Record<string, ScenarioMotion> = {};
  const input = {
    ...options.rupture.context,
    ...options.distances,
    vs30: options.vs30,
    vs30Measured: options.vs30Measured,
  };
  for (const key of options.measures) {
    const measure = parseMeasure(key);
    let lnMedian = 0;
    let sigma = 0;
    for (const { model, weight } of options.branches) {
      const p = model.predict(input, measure);
      lnMedian += weight * p.lnMedian;
      sigma += weight * p.sigma;
      if (!p.applicable) for (const note of p.notes) options.notes.add(note);
    }
    out[key] = {
      median: Math.exp(lnMedian),
      p84: Math.exp(lnMedian + sigma),
      unit: measureUnit(measure),
    };
  }
  return out;
}
