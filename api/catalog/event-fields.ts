import type { CatalogEvent } from '../engine/catalog/event.ts';
import { parseIsoTimeMs } from './iso-time.ts';

/** The fields of one event as text, whatever the format. */
export interface EventFields {
  readonly id: string;
  readonly time: string | undefined;
  readonly lon: string | undefined;
  readonly lat: string | undefined;
  /** Kilometres; QuakeML's metres are converted before this. */
  readonly depthKm: string | undefined;
  readonly magnitude: string | undefined;
  readonly magnitudeType: string | undefined;
}

/**
 * Plausibility ranges (common practice): hypocentres from 10 km above sea level (some
 * catalogs give negative depths for shallow events under high ground) to 800 km, a little
 * below the deepest earthquakes; magnitudes from −3 to 10.
 */
const DEPTH_KM_RANGE = [-10, 800] as const;
const MAGNITUDE_RANGE = [-3, 10] as const;

const NUMBER_PATTERN = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;

/** An event from its text fields, or every reason it cannot be one. */
export function eventFromFields(
  f: EventFields,
): { readonly event: CatalogEvent } | { readonly reasons: string[] } {
  const reasons: string[] = [];
  const number = (
    name: string,
    raw: string | undefined,
    [min, max]: readonly [number, number],
    unit: string,
  ): number => {
    const text = raw?.trim() ?? '';
    if (text === '') {
      reasons.push(`${name}: missing; expected a number from ${min} to ${max}${unit}`);
      return NaN;
    }
    const value = NUMBER_PATTERN.test(text) ? Number(text) : NaN;
    if (!(value >= min && value <= max))
      reasons.push(`${name}: expected a number from ${min} to ${max}${unit}; got "${text}"`);
    return value;
  };
  let timeMs = NaN;
  if (f.time === undefined || f.time.trim() === '')
    reasons.push('time: missing; expected an ISO 8601 time');
  else {
    const parsed = parseIsoTimeMs(f.time);
    if (parsed.ok) timeMs = parsed.timeMs;
    else reasons.push(`time: ${parsed.message}`);
  }
  const lon = number('lon', f.lon, [-180, 180], ' degrees');
  const lat = number('lat', f.lat, [-90, 90], ' degrees');
  // A depth left empty is no depth (many historical events have none); one given must be a number.
  const depthKm =
    (f.depthKm?.trim() ?? '') === '' ? null : number('depthKm', f.depthKm, DEPTH_KM_RANGE, ' km');
  const magnitude = number('magnitude', f.magnitude, MAGNITUDE_RANGE, '');
  if (reasons.length > 0) return { reasons };
  const type = f.magnitudeType?.trim() ?? '';
  return {
    event: {
      id: f.id,
      timeMs,
      lon,
      lat,
      depthKm,
      magnitude,
      magnitudeType: type === '' ? 'unknown' : type,
    },
  };
}
