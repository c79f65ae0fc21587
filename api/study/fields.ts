import { z } from 'zod';

/**
 * Field validators whose messages say what was expected and what was got, with units, e.g.
 * `expected a number in (0, 90] degrees, got 120`. zod's own messages name types only; a
 * user fixing a study needs the range.
 */

/** A short, safe rendering of a received value for a message. */
export function describeValue(value: unknown): string {
  if (value === undefined) return 'nothing';
  if (typeof value === 'number') return Number.isNaN(value) ? 'NaN' : String(value);
  if (typeof value === 'string')
    return JSON.stringify(value.length > 40 ? `${value.slice(0, 40)}…` : value);
  if (Array.isArray(value)) return `a list of ${value.length}`;
  if (value === null) return 'null';
  if (typeof value === 'object') return 'an object';
  return String(value);
}

export interface NumberRange {
  readonly min?: number;
  readonly max?: number;
  /** Excludes `min` itself: the interval is open on the left. */
  readonly minOpen?: boolean;
  readonly maxOpen?: boolean;
  readonly integer?: boolean;
  /** Appended to the interval in messages, e.g. "km". */
  readonly unit?: string;
}

export function describeRange(range: NumberRange): string {
  const kind = range.integer ? 'a whole number' : 'a number';
  const unit = range.unit ? ` ${range.unit}` : '';
  const { min, max } = range;
  if (min !== undefined && max !== undefined) {
    return `${kind} in ${range.minOpen ? '(' : '['}${min}, ${max}${range.maxOpen ? ')' : ']'}${unit}`;
  }
  if (min !== undefined) return `${kind} ${range.minOpen ? '>' : '>='} ${min}${unit}`;
  if (max !== undefined) return `${kind} ${range.maxOpen ? '<' : '<='} ${max}${unit}`;
  return `${kind}${unit}`;
}

export function inRange(value: number, range: NumberRange): boolean {
  if (!Number.isFinite(value)) return false;
  if (range.integer && !Number.isInteger(value)) return false;
  if (range.min !== undefined && (range.minOpen ? value <= range.min : value < range.min))
    return false;
  if (range.max !== undefined && (range.maxOpen ? value >= range.max : value > range.max))
    return false;
  return true;
}

/** A finite number within `range`. */
export function numberIn(range: NumberRange = {}) {
  const expected = describeRange(range);
  return z.unknown().transform((value, ctx): number => {
    if (typeof value !== 'number' || !inRange(value, range)) {
      ctx.addIssue({
        code: 'custom',
        message: `expected ${expected}, got ${describeValue(value)}`,
      });
      return z.NEVER;
    }
    return value;
  });
}

/** One of a fixed list of strings. */
export function oneOf<const T extends readonly string[]>(choices: T) {
  const expected = `one of ${choices.map((c) => `"${c}"`).join(', ')}`;
  return z.unknown().transform((value, ctx): T[number] => {
    if (typeof value !== 'string' || !choices.includes(value)) {
      ctx.addIssue({
        code: 'custom',
        message: `expected ${expected}, got ${describeValue(value)}`,
      });
      return z.NEVER;
    }
    return value as T[number];
  });
}

/** A non-empty string of at most `maxLength` characters, trimmed. */
export function text(maxLength: number, what = 'text') {
  return z.unknown().transform((value, ctx): string => {
    const trimmed = typeof value === 'string' ? value.trim() : '';
    if (typeof value !== 'string' || trimmed.length === 0 || trimmed.length > maxLength) {
      ctx.addIssue({
        code: 'custom',
        message: `expected ${what} of 1 to ${maxLength} characters, got ${describeValue(value)}`,
      });
      return z.NEVER;
    }
    return trimmed;
  });
}

/**
 * An identifier: letters, digits, '-', '_' and '.', starting with a letter or digit, so it is
 * safe in URLs, CSV and file names.
 */
export function identifier() {
  return z.unknown().transform((value, ctx): string => {
    if (typeof value !== 'string' || !/^[A-Za-z0-9][A-Za-z0-9._-]{0,63}$/.test(value)) {
      ctx.addIssue({
        code: 'custom',
        message: `expected an id of 1 to 64 letters, digits, '-', '_' or '.', starting with a letter or digit, got ${describeValue(value)}`,
      });
      return z.NEVER;
    }
    return value;
  });
}

export function yesNo() {
  return z.unknown().transform((value, ctx): boolean => {
    if (typeof value !== 'boolean') {
      ctx.addIssue({
        code: 'custom',
        message: `expected true or false, got ${describeValue(value)}`,
      });
      return z.NEVER;
    }
    return value;
  });
}

/** A list of at least `minItems` (at most `maxItems`) of `item`. */
export function listOf<T extends z.ZodType>(
  item: T,
  minItems: number,
  maxItems: number,
  what: string,
) {
  return z.unknown().pipe(
    z
      .array(item, {
        error: (iss) => `expected a list of ${what}, got ${describeValue(iss.input)}`,
      })
      .min(minItems, { error: `expected at least ${minItems} ${what}` })
      .max(maxItems, { error: `expected at most ${maxItems} ${what}` }),
  );
}
