import { UnsupportedMeasure } from '../errors.ts';
import type { Measure } from './measure.ts';
import { measureLabel } from './measure.ts';
import { insideRange } from './prepared-period.ts';
import type {
  GmmInput,
  GmmPrediction,
  GroundMotionModel,
  PreparedMotion,
  RuptureContext,
  ValidityRange,
} from './types.ts';
import { validityNotes } from './validity.ts';

/**
 * Cornell, C. A., Banon, H. & Shakal, A. F. (1979). Seismic motion and response prediction
 * alternatives. Earthquake Engineering & Structural Dynamics 7(4), 295–315 (citation from
 * memory). Used here as J. W. Baker's "An introduction to probabilistic seismic hazard analysis"
 * (white paper, 2008 v1.3) uses it for its worked examples: a textbook model for checking the
 * hazard integral, not a model for screening real places.
 *
 *   mean ln PGA = −0.152 + 0.859 M − 1.803 ln(R + 25),   σ(ln PGA) = 0.57
 *
 * PGA in g; M magnitude; R hypocentral distance in km (as the white paper states it).
 * The coefficients are those printed in the white paper (from
 * memory); a three-coefficient formula has no period columns to check for smoothness.
 * Only a total σ is given, so it is reported as within-event (phi) with tau 0.
 * No site term: the prediction ignores Vs30.
 *
 * Validity: the paper's data range is not restated here. The range below is a screening
 * choice (common practice for a model of this vintage): M 4–8, R 0–200 km, any Vs30.
 * PGA only: SA and PGV are refused with UnsupportedMeasure.
 */

const C0 = -0.152;
const C_MAGNITUDE = 0.859;
const C_LN_DISTANCE = -1.803;
const DISTANCE_OFFSET_KM = 25;
const SIGMA = 0.57;

const VALIDITY: ValidityRange = { magnitude: [4, 8], distanceKm: [0, 200], vs30: [0, 10_000] };

/** Mean ln PGA (g) of Cornell et al. (1979) for magnitude M and hypocentral distance, km. */
export function cornell79LnPga(magnitude: number, rhypoKm: number): number {
  return C0 + C_MAGNITUDE * magnitude + C_LN_DISTANCE * Math.log(rhypoKm + DISTANCE_OFFSET_KM);
}

function predict(input: GmmInput, measure: Measure): GmmPrediction {
  if (measure.kind !== 'PGA') {
    throw new UnsupportedMeasure(
      measureLabel(measure),
      'Cornell79 (Cornell et al. 1979) predicts PGA only',
    );
  }
  const notes = validityNotes('Cornell79', VALIDITY, input, input.rhypoKm);
  return {
    lnMedian: cornell79LnPga(input.magnitude, input.rhypoKm),
    sigma: SIGMA,
    tau: 0,
    phi: SIGMA,
    applicable: notes.length === 0,
    notes,
  };
}

/**
 * The fast path's predictor (GroundMotionModel.prepare): C0 + 0.859 M once per rupture, so a
 * pair costs one logarithm; the same numbers as predict(), digit for digit (the same operations).
 */
function prepare(ruptures: readonly RuptureContext[], measure: Measure): PreparedMotion {
  if (measure.kind !== 'PGA') {
    throw new UnsupportedMeasure(
      measureLabel(measure),
      'Cornell79 (Cornell et al. 1979) predicts PGA only',
    );
  }
  const magnitudeTerm = new Float64Array(ruptures.length);
  const magnitudeInside = new Uint8Array(ruptures.length);
  ruptures.forEach((r, i) => {
    magnitudeTerm[i] = C0 + C_MAGNITUDE * r.magnitude;
    magnitudeInside[i] = insideRange(r.magnitude, VALIDITY.magnitude) ? 1 : 0;
  });
  return {
    distances: ['rhypoKm'],
    predictPairs(site, pairs, out) {
      const siteInside = insideRange(site.vs30, VALIDITY.vs30) ? 1 : 0;
      for (let k = 0; k < pairs.count; k++) {
        const r = pairs.rupture[k] as number;
        const rhypoKm = pairs.rhypoKm[k] as number;
        out.lnMedian[k] =
          (magnitudeTerm[r] as number) + C_LN_DISTANCE * Math.log(rhypoKm + DISTANCE_OFFSET_KM);
        out.sigma[k] = SIGMA;
        out.applicable[k] =
          (magnitudeInside[r] as number) &
          siteInside &
          (insideRange(rhypoKm, VALIDITY.distanceKm) ? 1 : 0);
      }
    },
  };
}

export const cornell79: GroundMotionModel = {
  name: 'Cornell79',
  citation:
    'Cornell, Banon & Shakal (1979), Seismic motion and response prediction alternatives, Earthquake Eng. Struct. Dyn. 7(4)',
  settings: ['crustal'],
  distanceMetric: 'rhypo',
  periodsS: [],
  hasPga: true,
  hasPgv: false,
  validity: VALIDITY,
  predict,
  prepare,
};
