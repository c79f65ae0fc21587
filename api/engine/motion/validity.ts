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
    [min, max]: readonly [number, number],
    unit: string,
  ): void => {
    if (value < min || value > max) {
      notes.push(
        `${modelName}: ${label} ${round(value)}${unit} is outside its range ${min}–${max}${unit}`,
      );
    }
  };
  outside('magnitude M', input.magnitude, range.magnitude, '');
  outside('distance', distanceKm, range.distanceKm, ' km');
  outside('Vs30', input.vs30, range.vs30, ' m/s');
  if (range.depthKm) outside('depth', input.hypoDepthKm, range.depthKm, ' km');
  return notes;
}

const round = (x: number): string => String(Math.round(x * 100) / 100);
