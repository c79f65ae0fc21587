import type { CatalogEvent } from './event.ts';

/** The magnitude scales a catalog may be converted from. */
export type ConvertibleScale = 'ML' | 'mb' | 'Ms';

/** One published relation from a magnitude scale to moment magnitude, on its validity range. */
export interface MagnitudeRelation {
  readonly id: string;
  readonly scale: ConvertibleScale;
  /** Author, year, journal; where each coefficient comes from. */
  readonly source: string;
  /** Validity range of the scale's magnitude, inclusive. */
  readonly min: number;
  readonly max: number;
  /** Moment magnitude from the scale's magnitude, inside the range. */
  readonly toMw: (m: number) => number;
}

/**
 * The relations the user may choose from. Coefficients are recalled, not read from the papers
 * here: each says so ("from memory") and should be checked against the paper before a result
 * is relied on.
 */
export const MAGNITUDE_RELATIONS: readonly MagnitudeRelation[] = [
  {
    id: 'scordilis2006-ms',
    scale: 'Ms',
    source:
      'Scordilis (2006), Empirical global relations converting MS and mb to moment magnitude, J. Seismology 10, 225–236: Mw = 0.67 Ms + 2.07 for Ms 3.0–6.1, Mw = 0.99 Ms + 0.08 for Ms 6.2–8.2 (from memory); between 6.1 and 6.2 the nearer branch',
    min: 3.0,
    max: 8.2,
    toMw: (ms) => (ms < 6.15 ? 0.67 * ms + 2.07 : 0.99 * ms + 0.08),
  },
  {
    id: 'scordilis2006-mb',
    scale: 'mb',
    source:
      'Scordilis (2006), J. Seismology 10, 225–236: Mw = 0.85 mb + 1.03 for mb 3.5–6.2 (from memory)',
    min: 3.5,
    max: 6.2,
    toMw: (mb) => 0.85 * mb + 1.03,
  },
  {
    id: 'grunthal2009-ml',
    scale: 'ML',
    source:
      'Grünthal, Wahlström & Stromeyer (2009), The unified catalogue of earthquakes in central, northern, and northwestern Europe (CENEC), J. Seismology 13, 517–541: Mw = 0.53 + 0.646 ML + 0.0376 ML² (from memory); range ML 3.0–6.0 taken here (from memory, conservative)',
    min: 3.0,
    max: 6.0,
    toMw: (ml) => 0.53 + 0.646 * ml + 0.0376 * ml * ml,
  },
];

/** The scale a reported magnitude type belongs to (IASPEI names, any case), if it is convertible. */
export function convertibleScale(magnitudeType: string): ConvertibleScale | undefined {
  const t = magnitudeType.trim();
  if (/^m_?lv?$/i.test(t)) return 'ML';
  // mB (broadband body-wave) is a different magnitude from short-period mb: not taken as mb.
  if (t !== 'mB' && /^m_?b$/i.test(t)) return 'mb';
  if (/^m_?s(_?20)?$/i.test(t)) return 'Ms';
  return undefined;
}

/** A converted event keeps what was reported, and the relation used. */
export interface ConvertedEvent extends CatalogEvent {
  readonly convertedFrom: {
    readonly magnitude: number;
    readonly magnitudeType: string;
    readonly relation: string;
  };
}

export interface MagnitudeConversion {
  /** Every event, converted ones as moment magnitudes (magnitudeType 'Mw', with convertedFrom). */
  readonly events: readonly (CatalogEvent | ConvertedEvent)[];
  /** Converted events by relation id. */
  readonly converted: Readonly<Record<string, number>>;
  /** Events of a chosen scale outside its relation's validity range: left unconverted (so left out of moment-magnitude analyses). */
  readonly outsideRange: Readonly<Record<string, number>>;
}

/**
 * Converts events of the chosen scales to moment magnitude, each by the relation the user
 * chose for it (relation ids from MAGNITUDE_RELATIONS). A magnitude outside its relation's
 * validity range is not extrapolated: the event keeps its own type and is counted.
 */
export function convertMagnitudes(
  events: readonly CatalogEvent[],
  relationIds: readonly string[],
): MagnitudeConversion {
  const byScale = new Map<ConvertibleScale, MagnitudeRelation>();
  for (const id of relationIds) {
    const relation = MAGNITUDE_RELATIONS.find((r) => r.id === id);
    if (!relation)
      throw new RangeError(
        `unknown magnitude relation "${id}"; expected one of ${MAGNITUDE_RELATIONS.map((r) => r.id).join(', ')}`,
      );
    byScale.set(relation.scale, relation);
  }
  const converted: Record<string, number> = {};
  const outsideRange: Record<string, number> = {};
  const out = events.map((event) => {
    const scale = convertibleScale(event.magnitudeType);
    const relation = scale === undefined ? undefined : byScale.get(scale);
    if (!relation) return event;
    if (event.magnitude < relation.min || event.magnitude > relation.max) {
      outsideRange[relation.id] = (outsideRange[relation.id] ?? 0) + 1;
      return event;
    }
    converted[relation.id] = (converted[relation.id] ?? 0) + 1;
    const mw: ConvertedEvent = {
      ...event,
      magnitude: relation.toMw(event.magnitude),
      magnitudeType: 'Mw',
      convertedFrom: {
        magnitude: event.magnitude,
        magnitudeType: event.magnitudeType,
        relation: relation.id,
      },
    };
    return mw;
  });
  return { events: out, converted, outsideRange };
}
