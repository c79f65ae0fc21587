import { UnsupportedMeasure } from '../errors.ts';

/**
 * An intensity measure. PGA and SA are in g, PGV in cm/s; SA is 5%-damped pseudo-spectral
 * acceleration at `periodS` seconds (RotD50 for the NGA-West2 models).
 */
export type Measure =
  | { readonly kind: 'PGA' }
  | { readonly kind: 'PGV' }
  | { readonly kind: 'SA'; readonly periodS: number };

const SA_PATTERN = /^SA\(\s*(\d+(?:\.\d+)?)\s*\)$/;

/** Parses "PGA", "PGV" or "SA(T)" (T in seconds, > 0). */
export function parseMeasure(text: string): Measure {
  if (text === 'PGA') return { kind: 'PGA' };
  if (text === 'PGV') return { kind: 'PGV' };
  const match = SA_PATTERN.exec(text);
  if (!match)
    throw new UnsupportedMeasure(
      text,
      'expected "PGA", "PGV" or "SA(T)" with T in seconds, e.g. "SA(0.2)"',
    );
  const periodS = Number(match[1]);
  if (!(periodS > 0)) throw new UnsupportedMeasure(text, 'the period must be greater than 0 s');
  return { kind: 'SA', periodS };
}

export const measureUnit = (m: Measure): 'g' | 'cm/s' => (m.kind === 'PGV' ? 'cm/s' : 'g');

export function measureLabel(m: Measure): string {
  return m.kind === 'SA' ? `SA(${m.periodS})` : m.kind;
}
