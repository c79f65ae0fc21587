import { InvalidInput } from '../errors.ts';
import { betaOf, exponentialMass, type BinProbabilities } from './truncated-gr.ts';

/**
 * The characteristic magnitude distribution of Youngs & Coppersmith (1985), "Implications of
 * fault slip rates and earthquake recurrence models to probabilistic seismic hazard
 * estimates", BSSA 75(4), 939–964 (their eqs. as recalled, from memory). With mc = mMax - Δm2:
 * a truncated exponential on [mMin, mc], and a uniform box on [mc, mMax] whose density equals
 * the exponential density at mc - Δm1, where Δm2 = 0.5 and Δm1 = 1.0 are their stated
 * assumptions (the box is 0.5 magnitude units wide, centred on mChar = mMax - 0.25). The whole
 * is normalised to 1, so the exponential part carries 1 / (1 + c2) and the box c2 / (1 + c2), with
 *   c2 = β e^{-β(mc - Δm1 - mMin)} Δm2 / (1 - e^{-β(mc - mMin)}).
 */
export const CHARACTERISTIC_BOX_WIDTH = 0.5;
/** Δm1: the box's height is the exponential density this far below the box's lower edge. */
export const CHARACTERISTIC_HEIGHT_OFFSET = 1.0;

/** Probability of each bin [edges[i], edges[i+1]] under the Youngs & Coppersmith distribution. */
export const characteristicBinProbabilities: BinProbabilities = (edges, mMin, mMax, bValue) => {
  const beta = betaOf(bValue);
  const mc = mMax - CHARACTERISTIC_BOX_WIDTH;
  if (!(mc > mMin)) {
    throw new InvalidInput([
      {
        path: 'recurrence.mMin',
        message: `the characteristic shape needs mMax - mMin > ${CHARACTERISTIC_BOX_WIDTH}, got ${mMax - mMin}`,
      },
    ]);
  }
  const normaliser = exponentialMass(beta, 0, mc - mMin);
  const boxDensity =
    (beta * Math.exp(-beta * (mc - CHARACTERISTIC_HEIGHT_OFFSET - mMin))) / normaliser;
  const c2 = boxDensity * CHARACTERISTIC_BOX_WIDTH;
  const out: number[] = [];
  for (let i = 0; i + 1 < edges.length; i++) {
    const lo = edges[i] as number;
    const hi = edges[i + 1] as number;
    const eLo = Math.max(lo, mMin);
    const eHi = Math.min(hi, mc);
    const exponential = eHi > eLo ? exponentialMass(beta, eLo - mMin, eHi - mMin) / normaliser : 0;
    const box = Math.max(0, Math.min(hi, mMax) - Math.max(lo, mc)) * boxDensity;
    out.push((exponential + box) / (1 + c2));
  }
  return out;
};
