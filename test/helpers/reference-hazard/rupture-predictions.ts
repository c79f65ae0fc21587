import { TremoraError } from '../../../api/engine/errors.ts';
import { gmmInput } from '../../../api/engine/hazard/gmm-input.ts';
import type { TectonicSetting } from '../../../api/engine/model.ts';
import type { Measure } from '../../../api/engine/motion/measure.ts';
import { measureLabel } from '../../../api/engine/motion/measure.ts';
import type {
  DistanceContext,
  GroundMotionModel,
  SiteContext,
} from '../../../api/engine/motion/types.ts';
import type { Rupture } from '../../../api/engine/ruptures/rupture.ts';

/**
 * Indices of the ruptures of one tectonic setting that count for a site: those with
 * Rjb <= maxDistanceKm (farther ones are skipped, the usual integration cut-off).
 * `distances[i]` belongs to `ruptures[i]`.
 */
export function selectRuptures(
  ruptures: readonly Rupture[],
  distances: readonly DistanceContext[],
  setting: TectonicSetting,
  maxDistanceKm: number,
): Int32Array {
  if (distances.length !== ruptures.length) {
    throw new TremoraError(
      `expected one distance context per rupture (${ruptures.length}), got ${distances.length}`,
    );
  }
  const kept: number[] = [];
  ruptures.forEach((rupture, i) => {
    if (
      rupture.context.setting === setting &&
      (distances[i] as DistanceContext).rjbKm <= maxDistanceKm
    )
      kept.push(i);
  });
  return Int32Array.from(kept);
}

/**
 * One model's prediction of one measure for each selected rupture at one site: the model is
 * evaluated once per rupture and every hazard level is then read from (ln median, σ).
 */
export interface RupturePredictions {
  /** Index into the rupture list of each rupture kept. */
  readonly ruptureIndex: Int32Array;
  readonly lnMedian: Float64Array;
  readonly sigma: Float64Array;
  /** How many of them fall outside the model's validity, and the first such note. */
  readonly outsideValidity: number;
  readonly firstNote: string | null;
}

export function predictRuptures(
  model: GroundMotionModel,
  measure: Measure,
  ruptures: readonly Rupture[],
  distances: readonly DistanceContext[],
  site: SiteContext,
  selected: Int32Array,
): RupturePredictions {
  const lnMedian = new Float64Array(selected.length);
  const sigma = new Float64Array(selected.length);
  let outsideValidity = 0;
  let firstNote: string | null = null;
  selected.forEach((ruptureIndex, k) => {
    const rupture = ruptures[ruptureIndex] as Rupture;
    const prediction = model.predict(
      gmmInput(rupture.context, distances[ruptureIndex] as DistanceContext, site),
      measure,
    );
    if (
      !Number.isFinite(prediction.lnMedian) ||
      !(prediction.sigma >= 0 && Number.isFinite(prediction.sigma))
    ) {
      throw new TremoraError(
        `${model.name} gave ln median ${prediction.lnMedian} and sigma ${prediction.sigma} for ${measureLabel(measure)} ` +
          `from a rupture of source "${rupture.sourceId}"; expected finite numbers with sigma >= 0`,
      );
    }
    lnMedian[k] = prediction.lnMedian;
    sigma[k] = prediction.sigma;
    if (!prediction.applicable) {
      outsideValidity++;
      firstNote ??= prediction.notes[0] ?? `${model.name}: outside its validity range`;
    }
  });
  return { ruptureIndex: selected, lnMedian, sigma, outsideValidity, firstNote };
}
