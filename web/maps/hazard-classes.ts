import { scaleLinear } from 'd3-scale';

/**
 * Classes of a hazard map's values for drawing and for its legend in words. Class limits are
 * round numbers (common practice for map legends, so a reader can say them aloud). Values that
 * span a factor of ten or more get limits spaced by ratio: steps of a decade from the finest set
 * that gives no more classes than asked, else whole decades, every second or third one where
 * the values span many. Narrower ranges get evenly spaced limits, d3-scale's linear ticks (1, 2
 * or 5 × 10^k apart), as many as fit. Each class takes a step of the dusk scale
 * (style/palette.ts) from 1 to 6, spread as evenly as the count allows; step 0 is left out, as
 * it is too close to the map's sea and land to show a cell.
 */

/** Values spanning at least this ratio (max / min) get limits spaced by ratio rather than evenly. */
const RATIO_SPACED_FROM = 10;

/**
 * Values closer together than this (g, cm/s or a probability) make one class: no legend shows
 * them apart, and round limits that fine underflow.
 */
const SMALLEST_SPAN = 1e-12;

/** Round numbers within a decade, finest first. */
const DECADE_STEPS: readonly (readonly number[])[] = [
  [1, 1.5, 2, 3, 4, 5, 6, 8],
  [1, 2, 5],
  [1, 3],
  [1],
];

/** Lightest and darkest dusk steps a cell may take. */
const FIRST_STEP = 1;
const LAST_STEP = 6;

export const MAX_CLASSES = LAST_STEP - FIRST_STEP + 1;

export interface ValueClass {
  /** Lowest value in the class (inclusive); null for the lowest class, open below. */
  readonly from: number | null;
  /** Value where the next class starts (exclusive); null for the highest class, open above. */
  readonly to: number | null;
  /** Index into DUSK. */
  readonly step: number;
  /** How many of the values fall in it. */
  readonly count: number;
}

export interface ValueClasses {
  readonly classes: readonly ValueClass[];
  /** The class limits, increasing: a value v is in class (number of limits <= v). */
  readonly limits: readonly number[];
  readonly min: number;
  readonly max: number;
}

/** s × 10^k without binary noise (3 × 0.1 reads 0.3). */
const round = (x: number): number => Number(x.toPrecision(6));

/** Round numbers of the decade steps `steps` in (min, max]. */
function limitsWith(
  steps: readonly number[],
  min: number,
  max: number,
  smallestPositive: number,
): number[] {
  const limits: number[] = [];
  for (let k = Math.floor(Math.log10(smallestPositive)); k <= Math.ceil(Math.log10(max)); k++) {
    for (const s of steps) {
      const limit = round(s * 10 ** k);
      if (limit > min && limit <= max) limits.push(limit);
    }
  }
  return limits;
}

/** Limits spaced by ratio: the finest decade steps that fit, else every few decades. */
function ratioLimits(
  min: number,
  max: number,
  smallestPositive: number,
  maxClasses: number,
): number[] {
  const fits = DECADE_STEPS.map((steps) => limitsWith(steps, min, max, smallestPositive)).find(
    (l) => l.length <= maxClasses - 1,
  );
  if (fits) return fits;
  const decades = limitsWith([1], min, max, smallestPositive);
  const every = Math.ceil(decades.length / (maxClasses - 1));
  return decades.filter((_, i) => i % every === every - 1);
}

/** Evenly spaced round limits in (min, max]: the most of d3-scale's linear ticks that fit. */
function evenLimits(min: number, max: number, maxClasses: number): number[] {
  for (let count = 2 * maxClasses; count >= 1; count--) {
    const limits = scaleLinear()
      .domain([min, max])
      .ticks(count)
      .map(round)
      .filter((t) => t > min && t <= max);
    if (limits.length <= maxClasses - 1) return limits;
  }
  return [];
}

/** The class of `value` among `limits` (ValueClasses.limits). */
export function classIndex(limits: readonly number[], value: number): number {
  let i = 0;
  while (i < limits.length && (limits[i] as number) <= value) i++;
  return i;
}

/** Classes of `values` (finite, at least one), at most `maxClasses` of them (1 to MAX_CLASSES). */
export function valueClasses(
  values: readonly number[],
  maxClasses: number = MAX_CLASSES,
): ValueClasses {
  if (values.length === 0) throw new RangeError('expected at least one value to class');
  if (!(Number.isInteger(maxClasses) && maxClasses >= 1 && maxClasses <= MAX_CLASSES))
    throw new RangeError(`expected 1 to ${MAX_CLASSES} classes, got ${maxClasses}`);
  let min = Infinity;
  let max = -Infinity;
  let smallestPositive = Infinity;
  for (const v of values) {
    if (!Number.isFinite(v)) throw new RangeError(`expected finite values, got ${v}`);
    min = Math.min(min, v);
    max = Math.max(max, v);
    if (v > 0) smallestPositive = Math.min(smallestPositive, v);
  }
  let limits: number[] = [];
  if (maxClasses > 1 && max - min > SMALLEST_SPAN)
    limits =
      min > 0 && max / min >= RATIO_SPACED_FROM
        ? ratioLimits(min, max, smallestPositive, maxClasses)
        : evenLimits(min, max, maxClasses);
  const counts = new Array<number>(limits.length + 1).fill(0);
  for (const v of values) counts[classIndex(limits, v)]! += 1;
  const n = counts.length;
  const classes = counts.map((count, i) => ({
    from: i === 0 ? null : (limits[i - 1] as number),
    to: i === n - 1 ? null : (limits[i] as number),
    step: n === 1 ? 4 : FIRST_STEP + Math.round((i * (LAST_STEP - FIRST_STEP)) / (n - 1)),
    count,
  }));
  return { classes, limits, min, max };
}
