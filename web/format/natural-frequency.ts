/**
 * A probability as people read it best: a natural frequency ("about 1 in 8") beside a
 * percentage ("12%"). Gigerenzer & Hoffrage (1995) showed that frequencies are understood
 * more readily than probabilities; the wording here is ours.
 *
 * The rounding rule, in one place (every page and the handout use it). The percentage is shown
 * first: rounded to a whole percent from 1% up, to one significant figure below 1% (0.3%), and
 * said as "less than 0.1%" below 0.1%. The natural frequency restates that shown percentage P,
 * so the two never disagree ("about 1 in 11 (10%)" cannot happen):
 * - P below 0.1% (zero included): "less than 1 in 1,000";
 * - P below 40%: "about 1 in N", N = 100 / P rounded to the nearest whole number when that is
 *   20 or less, else to two significant figures (1 in 25, 1 in 330);
 * - P from 40% and below 95%: "about K in 10", K = P / 10 rounded to a whole number, so that the
 *   chances either side of an even one read alike (49% and 51% are both "about 5 in 10");
 * - P of 95% or more: "more than 9 in 10".
 */
export type NaturalFrequency =
  | { readonly kind: 'less-than'; readonly n: 1000 }
  | { readonly kind: 'one-in'; readonly n: number }
  | { readonly kind: 'in-ten'; readonly k: number }
  | { readonly kind: 'more-than-nine-in-ten' };

const roundToSignificant = (x: number, digits: number): number => Number(x.toPrecision(digits));

/** Below this shown percentage a chance is said as "1 in N", from it as "K in 10". */
export const IN_TEN_FROM_PERCENT = 40;

/** The natural frequency of a probability in [0, 1] by the rule above. */
export function naturalFrequency(probability: number): NaturalFrequency {
  const percent = shownPercent(checkProbability(probability));
  if (percent === undefined) return { kind: 'less-than', n: 1000 };
  if (percent < IN_TEN_FROM_PERCENT) {
    const inverse = 100 / percent;
    const n = Math.round(inverse) <= 20 ? Math.round(inverse) : roundToSignificant(inverse, 2);
    return { kind: 'one-in', n };
  }
  if (percent < 95) return { kind: 'in-ten', k: Math.round(percent / 10) };
  return { kind: 'more-than-nine-in-ten' };
}

/** The percentage of a probability as text without the % sign ("12", "0.3", "<0.1"), by the rule above. */
export function percentText(probability: number): string {
  const percent = shownPercent(checkProbability(probability));
  return percent === undefined ? '<0.1' : String(percent);
}

/** The percentage as shown, or undefined below 0.1%. */
function shownPercent(p: number): number | undefined {
  const percent = p * 100;
  if (percent < 0.1) return undefined;
  if (percent < 1) return roundToSignificant(percent, 1);
  return Math.round(percent);
}

function checkProbability(p: number): number {
  if (!(Number.isFinite(p) && p >= 0 && p <= 1))
    throw new RangeError(`expected a probability in [0, 1], got ${p}`);
  return p;
}
