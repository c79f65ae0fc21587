import type { InputIssue } from '../../engine/errors.ts';
import { TECTONIC_SETTINGS, type TectonicSetting } from '../../engine/model.ts';
import { readNumber } from '../community-files/cell-values.ts';
import { describeRange, describeValue, inRange, type NumberRange } from '../fields.ts';

/**
 * What an imported fault gets where its file has no value: the tectonic setting of all of
 * them, geometry and slip rate where the file lacks them, and the moment-balanced recurrence's
 * magnitude range and b-value (which fault databases rarely hold).
 */
export interface FaultDefaults {
  readonly setting: TectonicSetting;
  readonly dip?: number;
  readonly rake?: number;
  readonly upperDepthKm?: number;
  readonly lowerDepthKm?: number;
  readonly slipRateMmYr?: number;
  readonly bValue: number;
  readonly mMin: number;
  readonly mMax: number;
}

export const DEFAULT_NUMBERS = [
  'dip',
  'rake',
  'upperDepthKm',
  'lowerDepthKm',
  'slipRateMmYr',
  'bValue',
  'mMin',
  'mMax',
] as const;
export type DefaultNumber = (typeof DEFAULT_NUMBERS)[number];

/** The defaults as typed (a form, the CLI's options). */
export type DefaultsText = Partial<Record<DefaultNumber | 'setting', string>>;

/**
 * The defaults a new import starts from: crustal faults from the top of the crust (upper depth
 * 0 km), b = 1 and mMin 5 (common practice for fault sources); the rest is left to the user.
 */
export const STARTING_DEFAULTS: DefaultsText = {
  setting: 'crustal',
  upperDepthKm: '0',
  bValue: '1',
  mMin: '5',
};

/** The ranges of a source's own fields (source-schema.ts, recurrence-schema.ts). */
const RANGES: Readonly<Record<DefaultNumber, NumberRange>> = {
  dip: { min: 0, max: 90, minOpen: true, unit: 'degrees' },
  rake: { min: -180, max: 180, unit: 'degrees' },
  upperDepthKm: { min: 0, max: 700, unit: 'km' },
  lowerDepthKm: { min: 0, max: 700, minOpen: true, unit: 'km' },
  slipRateMmYr: { min: 0, minOpen: true, max: 200, unit: 'mm/yr' },
  bValue: { min: 0.3, max: 2.5, minOpen: true, maxOpen: true },
  mMin: { min: 0, max: 10 },
  mMax: { min: 0, max: 10 },
};

const REQUIRED: readonly DefaultNumber[] = ['bValue', 'mMin', 'mMax'];

/** Reads typed defaults; problems come back by field (`defaults.dip`), and then no defaults. */
export function readFaultDefaults(
  text: DefaultsText,
): { ok: true; defaults: FaultDefaults } | { ok: false; issues: InputIssue[] } {
  const issues: InputIssue[] = [];
  const numbers: Partial<Record<DefaultNumber, number>> = {};
  for (const key of DEFAULT_NUMBERS) {
    const value = readNumber(text[key]);
    if (value === undefined) {
      if (REQUIRED.includes(key))
        issues.push({
          path: `defaults.${key}`,
          message: `expected ${describeRange(RANGES[key])} for every imported fault, got nothing`,
        });
      continue;
    }
    if (typeof value !== 'number' || !inRange(value, RANGES[key])) {
      issues.push({
        path: `defaults.${key}`,
        message: `expected ${describeRange(RANGES[key])}, got ${describeValue(value)}`,
      });
      continue;
    }
    numbers[key] = value;
  }
  const setting = text.setting ?? 'crustal';
  if (!TECTONIC_SETTINGS.includes(setting as TectonicSetting))
    issues.push({
      path: 'defaults.setting',
      message: `expected one of ${TECTONIC_SETTINGS.join(', ')}, got ${describeValue(setting)}`,
    });
  if (issues.length === 0 && (numbers.mMin as number) >= (numbers.mMax as number))
    issues.push({
      path: 'defaults.mMax',
      message: `expected mMax greater than mMin (${numbers.mMin}), got ${numbers.mMax}`,
    });
  if (issues.length > 0) return { ok: false, issues };
  return {
    ok: true,
    defaults: { ...numbers, setting: setting as TectonicSetting } as FaultDefaults,
  };
}
