import { InvalidInput } from '../errors.ts';
import type { GmmInput, ValidityRange } from './types.ts';

/** Throws InvalidInput naming `path` unless `value` is finite and `ok`; `expected` says what was wanted. */
export function requireInput(
  modelName: string,
  path: string,
  value: number,
  expected: string,
  ok: (v: number) => boolean,
): void {
  if (!Number.isFinite(value) || !ok(value)) {
    throw new InvalidInput(
      [{ path, message: `expected ${expected}, got ${value}` }],
      `${modelName} input`,
    );
  }
}

type Rule = readonly [expected: string, ok: (v: number) => boolean];
const anyFinite = (): boolean => true;
const atLeastZero = (v: number): boolean => v >= 0;

/** What the models ask of each input they read, in the words of the error they throw. */
const INPUT_RULES = {
  magnitude: ['a finite moment magnitude', anyFinite],
  rakeDeg: ['a finite rake in degrees', anyFinite],
  dipDeg: ['a dip above 0° and at most 90°', (v) => v > 0 && v <= 90],
  ztorKm: ['a finite depth to the top of rupture of at least 0 km', atLeastZero],
  widthKm: ['a finite down-dip width of at least 0 km', atLeastZero],
  hypoDepthKm: ['a finite hypocentral depth of at least 0 km', atLeastZero],
  rrupKm: ['a finite rupture distance of at least 0 km', atLeastZero],
  rjbKm: ['a finite Joyner–Boore distance of at least 0 km', atLeastZero],
  rxKm: ['a finite Rx in km', anyFinite],
  ry0Km: ['a finite Ry0 of at least 0 km', atLeastZero],
  vs30: ['a finite Vs30 above 0 m/s', (v) => v > 0],
  z1Km: ['a finite Z1 of at least 0 km', atLeastZero],
  z2p5Km: ['a finite Z2.5 of at least 0 km', atLeastZero],
} as const satisfies Record<string, Rule>;

/** Site inputs a model may do without (it then uses its own default). */
const OPTIONAL: ReadonlySet<InputName> = new Set(['z1Km', 'z2p5Km']);

export type InputName = keyof typeof INPUT_RULES;

/**
 * requireInput for each of `names` in order (the first bad one throws), by the rules above; an
 * optional site input that is absent is not checked.
 */
export function requireInputs(
  modelName: string,
  input: Partial<Record<InputName, number>>,
  names: readonly InputName[],
): void {
  for (const name of names) {
    const value = input[name];
    if (value === undefined && OPTIONAL.has(name)) continue;
    const [expected, ok]: Rule = INPUT_RULES[name];
    requireInput(modelName, name, value as number, expected, ok);
  }
}

/** Whether `value` lies outside [min, max] (NaN lies inside: the input checks refuse it first). */
const isOutside = (value: number, range: readonly [number, number]): boolean =>
  value < range[0] || value > range[1];

/**
 * Notes for every input outside a model's stated validity range; empty when all are inside.
 * `distanceKm` is the model's own metric, chosen by the caller.
 */
export function validityNotes(
  modelName: string,
  range: ValidityRange,
  input: GmmInput,
  distanceKm: number,
): string[] {
  const notes: string[] = [];
  const outside = (
    label: string,
    value: number,
    limits: readonly [number, number],
    unit: string,
  ): void => {
    if (isOutside(value, limits)) {
      notes.push(
        `${modelName}: ${label} ${round(value)}${unit} is outside its range ${limits[0]}–${limits[1]}${unit}`,
      );
    }
  };
  outside('magnitude M', input.magnitude, range.magnitude, '');
  outside('distance', distanceKm, range.distanceKm, ' km');
  outside('Vs30', input.vs30, range.vs30, ' m/s');
  if (range.depthKm) outside('depth', input.hypoDepthKm, range.depthKm, ' km');
  return notes;
}

/**
 * Whether validityNotes would be empty, without building a note: the fast path asks this of
 * every rupture–site pair.
 */
export function insideValidity(range: ValidityRange, input: GmmInput, distanceKm: number): boolean {
  return !(
    isOutside(input.magnitude, range.magnitude) ||
    isOutside(distanceKm, range.distanceKm) ||
    isOutside(input.vs30, range.vs30) ||
    (range.depthKm !== undefined && isOutside(input.hypoDepthKm, range.depthKm))
  );
}

/** Whether `value` lies within [min, max], as the models' own extra range checks ask. */
export const within = (value: number, min: number, max: number): boolean =>
  !(value < min || value > max);

/**
 * validityNotes of a model of shallow crustal earthquakes (the NGA-West2 models' own scope),
 * after, first, a note when the earthquake is of another setting.
 */
export function crustalValidityNotes(
  modelName: string,
  range: ValidityRange,
  input: GmmInput,
  distanceKm: number,
): string[] {
  const notes = validityNotes(modelName, range, input, distanceKm);
  if (input.setting !== 'crustal')
    notes.unshift(
      `${modelName}: it is a model for shallow crustal earthquakes, not ${input.setting} ones`,
    );
  return notes;
}

const round = (x: number): string => String(Math.round(x * 100) / 100);
