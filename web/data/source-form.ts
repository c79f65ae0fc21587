import type { InputIssue } from '../../api/engine/errors.ts';

/** Which kind of source a form describes: a fault trace, a zone polygon or a point. */
export type SourceKind = 'fault' | 'zone' | 'point';

/** The order of the two numbers on each typed coordinate line, or `auto` to tell from the values. */
export type CoordinateOrder = 'auto' | 'lon-lat' | 'lat-lon';

/** The text fields of the source form, in the form's groups; blanks are left out of the feature. */
export const SOURCE_FIELD_GROUPS = {
  about: ['id', 'name', 'setting', 'mechanism'],
  fault: ['dip', 'dipDirection', 'upperDepthKm', 'lowerDepthKm'],
  area: ['depthKm'],
  recurrence: [
    'recurrence.type',
    'recurrence.bValue',
    'recurrence.mMin',
    'recurrence.mMax',
    'recurrence.rate',
    'recurrence.slipRateMmYr',
    'recurrence.shape',
    'recurrence.magnitude',
  ],
} as const;

export type SourceTextField =
  (typeof SOURCE_FIELD_GROUPS)[keyof typeof SOURCE_FIELD_GROUPS][number];

export const SOURCE_TEXT_FIELDS: readonly SourceTextField[] =
  Object.values(SOURCE_FIELD_GROUPS).flat();

/** What the source form posts, as text. */
export type SourceForm = Readonly<Record<SourceTextField, string>> & {
  readonly kind: SourceKind;
  readonly coordinates: string;
  readonly order: CoordinateOrder;
};

/** Which property fields belong to each kind (the rest of the form is not sent for it). */
const KIND_FIELDS: Record<SourceKind, readonly SourceTextField[]> = {
  fault: ['dip', 'dipDirection', 'upperDepthKm', 'lowerDepthKm'],
  zone: ['depthKm'],
  point: ['depthKm'],
};

/** Which recurrence fields belong to each recurrence type. */
const RECURRENCE_FIELDS: Record<string, readonly SourceTextField[]> = {
  'gutenberg-richter': [
    'recurrence.bValue',
    'recurrence.mMin',
    'recurrence.mMax',
    'recurrence.rate',
  ],
  'moment-balanced': [
    'recurrence.slipRateMmYr',
    'recurrence.bValue',
    'recurrence.mMin',
    'recurrence.mMax',
    'recurrence.shape',
  ],
  fixed: ['recurrence.magnitude', 'recurrence.rate'],
};

const TEXT_VALUED = new Set<SourceTextField>([
  'id',
  'name',
  'setting',
  'mechanism',
  'recurrence.type',
  'recurrence.shape',
]);

/** A number as typed (a decimal comma accepted); text that is not a number stays text, for the schema to name. */
function numberOrText(text: string): number | string {
  const value = Number(text.replace(',', '.'));
  return text !== '' && Number.isFinite(value) ? value : text;
}

export type ParsedCoordinates =
  | { readonly ok: true; readonly points: [number, number][] }
  | { readonly ok: false; readonly issue: InputIssue };

const coordinateIssue = (message: string): ParsedCoordinates => ({
  ok: false,
  issue: { path: 'coordinates', message },
});

/**
 * Typed or pasted coordinates, one point a line: two numbers in decimal degrees separated by a
 * comma, a semicolon, spaces or a tab ("-140.2 -47.4" or "-47.4, -140.2"). `lon-lat` and
 * `lat-lon` say the order; `auto` takes it from the values (a first number beyond ±90 can only be
 * a longitude, and so for the second) and asks for the order when every point would fit either.
 * Points come out longitude first, as GeoJSON has them.
 */
export function parseCoordinates(text: string, order: CoordinateOrder): ParsedCoordinates {
  const pairs: [number, number][] = [];
  const lines = text.split(/\r\n|\r|\n/);
  for (const [i, raw] of lines.entries()) {
    const line = raw.trim();
    if (line === '') continue;
    const parts = line.split(/\s*[,;\t]\s*|\s+/).filter((p) => p !== '');
    const numbers = parts.map(Number);
    if (parts.length !== 2 || numbers.some((n) => !Number.isFinite(n)))
      return coordinateIssue(
        `line ${i + 1}: expected two numbers in decimal degrees ("lon lat" or "lat, lon"), got "${line}"`,
      );
    pairs.push(numbers as [number, number]);
  }
  if (pairs.length === 0)
    return coordinateIssue('expected one point a line in decimal degrees, got no coordinates');
  let chosen = order;
  if (chosen === 'auto') {
    const firstIsLon = pairs.some(([a]) => Math.abs(a) > 90);
    const secondIsLon = pairs.some(([, b]) => Math.abs(b) > 90);
    if (firstIsLon === secondIsLon)
      return coordinateIssue(
        firstIsLon
          ? 'both numbers of some lines are beyond ±90, so neither can be a latitude; expected a longitude and a latitude on each line'
          : 'every number is within ±90, so the order cannot be told from the values; choose whether each line is "longitude latitude" or "latitude, longitude"',
      );
    chosen = firstIsLon ? 'lon-lat' : 'lat-lon';
  }
  return { ok: true, points: pairs.map(([a, b]) => (chosen === 'lon-lat' ? [a, b] : [b, a])) };
}

/** The geometry of a form's points: a trace, a closed ring (closed here if it is not), or a point. */
function geometryOf(kind: SourceKind, points: [number, number][]): Record<string, unknown> {
  if (kind === 'fault') return { type: 'LineString', coordinates: points };
  if (kind === 'point') return { type: 'Point', coordinates: points[0] };
  const first = points[0] as [number, number];
  const last = points[points.length - 1] as [number, number];
  const closed = first[0] === last[0] && first[1] === last[1] ? points : [...points, first];
  return { type: 'Polygon', coordinates: [closed] };
}

/**
 * A source form as a GeoJSON Feature for the study document, or the problem with its
 * coordinates. Only the fields of the chosen kind and recurrence type are kept; the study's
 * validation checks the rest (source-schema.ts), so a problem is named as for an upload.
 */
export function sourceFromForm(
  form: SourceForm,
): { ok: true; feature: Record<string, unknown> } | { ok: false; issue: InputIssue } {
  const parsed = parseCoordinates(form.coordinates, form.order);
  if (!parsed.ok) return parsed;
  if (form.kind === 'point' && parsed.points.length !== 1)
    return {
      ok: false,
      issue: {
        path: 'coordinates',
        message: `expected one point for a point source, got ${parsed.points.length}`,
      },
    };
  const recurrenceType = form['recurrence.type'].trim();
  const wanted = new Set<SourceTextField>([
    'id',
    'name',
    'setting',
    'mechanism',
    ...KIND_FIELDS[form.kind],
    ...(RECURRENCE_FIELDS[recurrenceType] ?? []),
  ]);
  const properties: Record<string, unknown> = {};
  const recurrence: Record<string, unknown> = { type: recurrenceType };
  for (const key of SOURCE_TEXT_FIELDS) {
    const text = form[key].trim();
    if (!wanted.has(key) || text === '') continue;
    const value = TEXT_VALUED.has(key) ? text : numberOrText(text);
    if (key.startsWith('recurrence.')) recurrence[key.slice('recurrence.'.length)] = value;
    else properties[key] = value;
  }
  properties.recurrence = recurrence;
  return {
    ok: true,
    feature: { type: 'Feature', geometry: geometryOf(form.kind, parsed.points), properties },
  };
}

/** A stored source feature back as the form's text (coordinates one "lon lat" line a point). */
export function formOfFeature(feature: {
  geometry?: { type?: string; coordinates?: unknown };
  properties?: Record<string, unknown>;
}): SourceForm {
  const g = feature.geometry ?? {};
  const kind: SourceKind =
    g.type === 'LineString' ? 'fault' : g.type === 'Polygon' ? 'zone' : 'point';
  const points = (
    kind === 'fault'
      ? g.coordinates
      : kind === 'zone'
        ? (g.coordinates as unknown[])?.[0]
        : [g.coordinates]
  ) as number[][];
  const props = feature.properties ?? {};
  const recurrence = (props.recurrence ?? {}) as Record<string, unknown>;
  const text = (value: unknown) => (value === undefined || value === null ? '' : String(value));
  const form = Object.fromEntries(
    SOURCE_TEXT_FIELDS.map((key) => [
      key,
      key.startsWith('recurrence.')
        ? text(recurrence[key.slice('recurrence.'.length)])
        : text(props[key]),
    ]),
  ) as Record<SourceTextField, string>;
  return {
    ...form,
    kind,
    order: 'lon-lat',
    coordinates: (points ?? []).map((p) => `${p[0]} ${p[1]}`).join('\n'),
  };
}

/** The form field a problem of the source at `index` concerns, for showing it beside that field. */
export function sourceIssueField(path: string, index: number): string | undefined {
  const prefix = `sources.features[${index}]`;
  if (path === 'coordinates') return 'coordinates';
  if (!path.startsWith(prefix)) return undefined;
  const rest = path.slice(prefix.length).replace(/^\./, '');
  if (rest.startsWith('geometry')) return 'coordinates';
  const property = rest.replace(/^properties\.?/, '');
  if (property.startsWith('recurrence.')) return property.split(/[.[]/).slice(0, 2).join('.');
  if (property === 'recurrence') return 'recurrence.type';
  return property.split(/[.[]/)[0] || undefined;
}
