/**
 * A probability as people read it best: a natural frequency ("about 1 in 8") beside a
 * percentage ("12%"). Gigerenzer & Hoffrage (1995) showed that frequencies are understood
 * more readily than probabilities; the wording here is ours.
 *
 * The rounding rule, in one place (every page and the handout use it):
 * - below 1 in 1,000 (p < 0.001, zero included): "less than 1 in 1,000";
 * - up to an even chance (p <= 0.5): "about 1 in N", N = 1 / p rounded to the nearest whole
 *   number when that is 20 or less, else to two significant figures (1 in 25, 1 in 300);
 * - above an even chance and below 0.95: "about K in 10", K = 10 p rounded to a whole number;
 * - 0.95 or more: "more than 9 in 10".
 * The percentage is rounded to a whole percent from 1% up, to one significant figure below 1%
 * (0.3%), and said as "less than 0.1%" below 0.1%.
 */
export type NaturalFrequency =
  | { readonly kind: 'less-than'; readonly n: 1000 }
  | { readonly kind: 'one-in'; readonly n: number }
  | { readonly kind: 'in-ten'; readonly k: number }
  | { readonly kind: 'more-than-nine-in-ten' };

const roundToSignificant = (x: number, digits: number): number => Number(x.toPrecision(digits));

/** The natural frequency of a probability in [0, 1] by the rule above. */
export function naturalFrequency(probability: number): NaturalFrequency {
  const p = checkProbability(probability);
  if (p < 0.001) return { kind: 'less-than', n: 1000 };
  if (p <= 0.5) {
    const inverse = 1 / p;
    const n = Math.round(inverse) <= 20 ? Math.round(inverse) : roundToSignificant(inverse, 2);
    return { kind: 'one-in', n };
  }
  if (p < 0.95) return { kind: 'in-ten', k: Math.round(10 * p) };
  return { kind: 'more-than-nine-in-ten' };
}

/** The percentage of a probability as text without the % sign ("12", "0.3", "<0.1"), by the rule above. */
export function percentText(probability: number): string {
  const percent = checkProbability(probability) * 100;
  if (percent < 0.1) return '<0.1';
  if (percent < 1) return String(roundToSignificant(percent, 1));
  return String(Math.round(percent));
}

function checkProbability(p: number): number {
  if (!(Number.isFinite(p) && p >= 0 && p <= 1)) throw new RangeError(`expected a probability in [0, 1], got ${p}`);
  return p;
}
