import type { Context } from 'hono';
import { z } from 'zod';
import {
  CATALOG_FORMAT_LABELS,
  CATALOG_FORMAT_NAMES,
  CATALOG_FORMATS,
  formatOfMediaType,
} from '../catalog/catalog-formats.ts';
import type { CatalogFitOptions } from '../catalog/catalog-fit.ts';
import type { CatalogFormat } from '../catalog/catalog-formats.ts';
import { parseIsoTimeMs } from '../catalog/iso-time.ts';
import { readZonePolygon } from '../catalog/zone-geojson.ts';
import type { CompletenessPeriod } from '../engine/catalog/completeness-periods.ts';
import { MAGNITUDE_RELATIONS } from '../engine/catalog/magnitude-conversion.ts';
import { InvalidInput } from '../engine/errors.ts';
import { HttpError } from './http-error.ts';
import { mediaType, readJsonObject } from './request-body.ts';
import { describeValue, listOf, numberIn, oneOf, text, yesNo } from '../study/fields.ts';
import { IssueList } from '../study/issues.ts';

/**
 * The bodies of the catalog routes, read and validated: a catalog upload (PUT
 * /api/studies/{id}/catalog) and a fit request (POST /api/catalog/fit). Every problem is an
 * InvalidInput issue with the path of its field.
 */

/** Keys of a POST /api/catalog/fit body. */
export const CATALOG_FIT_KEYS = [
  'text',
  'format',
  'polygon',
  'mMax',
  'decluster',
  'magnitudes',
  'conversions',
  'magnitudeStep',
  'completeness',
  'startTime',
  'endTime',
] as const;
const COMPLETENESS_KEYS = ['method', 'mc', 'correction', 'periods', 'eventsPerWindow'] as const;

/** Magnitudes as the study format bounds them (api/study/recurrence-schema.ts). */
const magnitude = numberIn({ min: 0, max: 10, unit: '(moment magnitude)' });

/** The catalog itself, as a string in any of the three formats. */
function catalogTextField() {
  return z.unknown().transform((value, ctx): string => {
    if (typeof value !== 'string') {
      ctx.addIssue({
        code: 'custom',
        message: `expected the catalog text (${CATALOG_FORMAT_LABELS}) as a string, got ${describeValue(value)}`,
      });
      return z.NEVER;
    }
    return value;
  });
}

const fitSchema = z.object({
  text: catalogTextField(),
  format: oneOf(CATALOG_FORMAT_NAMES).optional(),
  mMax: magnitude.optional(),
  decluster: yesNo().optional(),
  magnitudes: oneOf(['moment', 'all'] as const).optional(),
  // Relations converting ML, mb or Ms to Mw (engine/catalog/magnitude-conversion.ts); none by default.
  conversions: listOf(
    oneOf(MAGNITUDE_RELATIONS.map((r) => r.id)),
    0,
    MAGNITUDE_RELATIONS.length,
    'magnitude relation ids',
  ).optional(),
  // The engine's bins take widths in (0, 1] (engine/catalog/magnitude-bins.ts).
  magnitudeStep: numberIn({ min: 0, minOpen: true, max: 1 }).optional(),
});

const completenessSchema = z.object({
  method: oneOf(['max-curvature', 'fixed'] as const).optional(),
  mc: magnitude.optional(),
  // A correction beyond one magnitude unit would discard most of any catalog.
  correction: numberIn({ min: 0, max: 1 }).optional(),
  // completenessOverTime's own floor: fewer than 10 events per window is no histogram.
  eventsPerWindow: numberIn({ min: 10, max: 100_000, integer: true }).optional(),
});

const periodSchema = z.object({ magnitude, start: z.unknown() });

/** A parsed fit request: the catalog text, its format if stated, and the fit's options. */
export interface CatalogFitRequest {
  readonly text: string;
  readonly format?: CatalogFormat;
  readonly options: CatalogFitOptions;
}

function readTime(
  raw: unknown,
  issues: IssueList,
  path: readonly PropertyKey[],
): number | undefined {
  if (raw === undefined) return undefined;
  if (typeof raw !== 'string') {
    issues.add(
      path,
      `expected an ISO 8601 time such as 2021-03-04T05:06:07Z, got ${describeValue(raw)}`,
    );
    return undefined;
  }
  const parsed = parseIsoTimeMs(raw);
  if (!parsed.ok) issues.add(path, parsed.message);
  return parsed.ok ? parsed.timeMs : undefined;
}

function unknownKeys(
  raw: Record<string, unknown>,
  known: readonly string[],
  issues: IssueList,
  path: readonly PropertyKey[],
): void {
  for (const key of Object.keys(raw))
    if (!known.includes(key))
      issues.add([...path, key], `unknown key; expected one of ${known.join(', ')}`);
}

function readPeriods(
  raw: unknown,
  issues: IssueList,
): readonly CompletenessPeriod[] | 'proposed' | undefined {
  if (raw === undefined || raw === 'proposed') return raw;
  const path = ['completeness', 'periods'];
  if (!Array.isArray(raw)) {
    issues.add(
      path,
      `expected a list of completeness periods ({ magnitude, start }) or "proposed", got ${describeValue(raw)}`,
    );
    return undefined;
  }
  const list = issues.parse(
    listOf(z.unknown(), 1, 50, 'completeness periods ({ magnitude, start }) or "proposed"'),
    raw,
    path,
  );
  if (!list) return undefined;
  const periods: CompletenessPeriod[] = [];
  list.forEach((item, i) => {
    if (typeof item !== 'object' || item === null || Array.isArray(item)) {
      issues.add(
        [...path, i],
        `expected a completeness period { magnitude, start }, got ${describeValue(item)}`,
      );
      return;
    }
    const fields = issues.parse(periodSchema, item, [...path, i]);
    if (!fields) return;
    if (fields.start === undefined)
      issues.add(
        [...path, i, 'start'],
        'expected the ISO 8601 time from which the magnitude is complete, got nothing',
      );
    const startMs = readTime(fields.start, issues, [...path, i, 'start']);
    if (startMs !== undefined) periods.push({ magnitude: fields.magnitude, startMs });
  });
  return periods.length === list.length ? periods : undefined;
}

/** Validates a POST /api/catalog/fit body; throws InvalidInput listing every problem with its path. */
export function readCatalogFitRequest(raw: Record<string, unknown>): CatalogFitRequest {
  const issues = new IssueList();
  unknownKeys(raw, CATALOG_FIT_KEYS, issues, []);
  const fields = issues.parse(fitSchema, raw, []);
  let rings: CatalogFitOptions['rings'];
  if (raw.polygon !== undefined) {
    try {
      rings = readZonePolygon(raw.polygon, 'polygon');
    } catch (error) {
      if (!(error instanceof InvalidInput)) throw error;
      error.issues.forEach((i) => issues.issues.push(i));
    }
  }
  const given = raw.completeness;
  let completeness: z.output<typeof completenessSchema> | undefined = {};
  let periods: ReturnType<typeof readPeriods>;
  if (given !== undefined) {
    if (typeof given !== 'object' || given === null || Array.isArray(given)) {
      issues.add(
        ['completeness'],
        `expected { method?, mc?, correction?, periods?, eventsPerWindow? }, got ${describeValue(given)}`,
      );
    } else {
      unknownKeys(given as Record<string, unknown>, COMPLETENESS_KEYS, issues, ['completeness']);
      completeness = issues.parse(completenessSchema, given, ['completeness']);
      periods = readPeriods((given as Record<string, unknown>).periods, issues);
    }
  }
  const method =
    completeness?.method ?? (completeness?.mc === undefined ? 'max-curvature' : 'fixed');
  if (method === 'fixed' && completeness?.mc === undefined)
    issues.add(
      ['completeness', 'mc'],
      'expected a completeness magnitude for method "fixed", got nothing',
    );
  if (method === 'max-curvature' && completeness?.mc !== undefined)
    issues.add(
      ['completeness', 'mc'],
      'expected no mc with method "max-curvature" (it finds Mc); use method "fixed" to give one',
    );
  const scales = (fields?.conversions ?? []).map(
    (id) => MAGNITUDE_RELATIONS.find((r) => r.id === id)?.scale,
  );
  scales.forEach((scale, i) => {
    if (scales.indexOf(scale) !== i)
      issues.add(
        ['conversions', i],
        `expected at most one relation per scale, got a second for ${scale} ("${fields?.conversions?.[i]}")`,
      );
  });
  const startMs = readTime(raw.startTime, issues, ['startTime']);
  const endMs = readTime(raw.endTime, issues, ['endTime']);
  if ((raw.startTime === undefined) !== (raw.endTime === undefined)) {
    issues.add(
      [raw.startTime === undefined ? 'startTime' : 'endTime'],
      'expected startTime and endTime together (the observation span), or neither',
    );
  }
  if (startMs !== undefined && endMs !== undefined && !(endMs > startMs))
    issues.add(
      ['endTime'],
      `expected an end after the start ${raw.startTime as string}, got ${raw.endTime as string}`,
    );
  if (issues.issues.length > 0 || !fields || !completeness)
    throw new InvalidInput(issues.issues, 'invalid catalog fit request');
  const options: CatalogFitOptions = {
    ...(rings ? { rings } : {}),
    ...(fields.mMax === undefined ? {} : { mMax: fields.mMax }),
    ...(fields.decluster === undefined ? {} : { decluster: fields.decluster }),
    ...(fields.magnitudes === undefined ? {} : { magnitudes: fields.magnitudes }),
    ...(fields.conversions === undefined || fields.conversions.length === 0
      ? {}
      : { conversions: fields.conversions }),
    ...(fields.magnitudeStep === undefined ? {} : { magnitudeStep: fields.magnitudeStep }),
    ...(completeness.mc === undefined ? {} : { mc: completeness.mc }),
    ...(completeness.correction === undefined ? {} : { mcCorrection: completeness.correction }),
    ...(completeness.eventsPerWindow === undefined
      ? {}
      : { eventsPerWindow: completeness.eventsPerWindow }),
    ...(periods === undefined ? {} : { periods }),
    ...(startMs === undefined || endMs === undefined ? {} : { startMs, endMs }),
  };
  return { text: fields.text, ...(fields.format ? { format: fields.format } : {}), options };
}

/** A raw catalog body's format is its media type's; JSON bodies say theirs (or it is detected). */
const CATALOG_TYPES = [...CATALOG_FORMATS.flatMap((f) => f.mediaTypes), 'application/json'];
const RAW_TYPES_TEXT = CATALOG_FORMATS.map((f) => `${f.mediaTypes[0]} (${f.label})`).join(', ');

const fileNameField = () =>
  // eslint-disable-next-line no-control-regex -- control characters are what the pattern looks for
  text(200, 'a file name').refine((name) => !/[\u0000-\u001f\u007f]/.test(name), {
    message: 'expected a file name without control characters',
  });

const uploadSchema = z.object({
  text: catalogTextField(),
  format: oneOf(CATALOG_FORMAT_NAMES).optional(),
  fileName: fileNameField().optional(),
});
const UPLOAD_KEYS = Object.keys(uploadSchema.shape);

export interface CatalogUpload {
  readonly text: string;
  readonly format?: CatalogFormat;
  readonly fileName?: string;
}

/** The catalog of a PUT: raw text whose media type gives the format, or JSON `{ fileName?, format?, text }`. */
export async function readCatalogUpload(c: Context): Promise<CatalogUpload> {
  const type = mediaType(c);
  const format = type === undefined ? undefined : formatOfMediaType(type);
  if (format) {
    const issues = new IssueList();
    const fileName =
      c.req.query('fileName') === undefined
        ? undefined
        : issues.parse(fileNameField(), c.req.query('fileName'), ['fileName']);
    if (issues.issues.length > 0) throw new InvalidInput(issues.issues, 'invalid catalog upload');
    return { text: await c.req.text(), format, ...(fileName ? { fileName } : {}) };
  }
  if (type !== 'application/json') {
    throw new HttpError(
      415,
      `expected a catalog as ${RAW_TYPES_TEXT} or application/json ({ fileName?, format?, text }), got ${type ?? 'no Content-Type'}`,
      [],
      { Accept: CATALOG_TYPES.join(', ') },
    );
  }
  const { value } = await readJsonObject(
    c,
    'a catalog upload ({ "fileName": ..., "format": ..., "text": ... })',
  );
  const issues = new IssueList();
  for (const key of Object.keys(value))
    if (!UPLOAD_KEYS.includes(key))
      issues.add([key], `unknown key; expected one of ${UPLOAD_KEYS.join(', ')}`);
  const fields = issues.parse(uploadSchema, value, []);
  if (issues.issues.length > 0 || !fields)
    throw new InvalidInput(issues.issues, 'invalid catalog upload');
  return fields;
}
