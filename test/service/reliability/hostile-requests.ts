import fc from 'fast-check';
import { createApp } from '../../../api/service/app.ts';
import type { ServiceContext } from '../../../api/operations/service-context.ts';
import { openStore } from '../../../api/store/store.ts';
import { modelCatalog } from '../../../api/engine/motion/registry.ts';
import { COMMUNITY_COLUMNS } from '../../../api/study/community-schema.ts';
import { createPages } from '../../../web/pages.tsx';
import { smallStudy, sourcesCollection } from '../helpers/small-study.ts';

/**
 * Generated malformed and hostile HTTP requests for the API fuzz (fuzz.test.ts): wrong types,
 * missing fields, huge numbers, NaN and Infinity as strings, deep nesting, very long strings,
 * invalid UTF-8, wrong content types, truncated bodies, hostile ids in paths. Built with
 * fast-check from a fixed seed, so a run is repeatable.
 */

export interface RouteSpec {
  readonly method: string;
  /** hono path with `:param` placeholders, e.g. /api/studies/:id/runs. */
  readonly path: string;
}

/**
 * The routes of the app, API and pages, as hono registered them (method and path), so routes
 * added later are fuzzed without editing this list. The context's pools and scheduler are never called while
 * routes are registered.
 */
export function appRoutes(): RouteSpec[] {
  const store = openStore(':memory:');
  try {
    const ctx = {
      store,
      models: modelCatalog,
      toolVersion: 'fuzz',
      workBudget: 1,
    } as unknown as ServiceContext;
    const seen = new Set<string>();
    return createApp(ctx, { pages: createPages(ctx) })
      .routes.filter((r) => r.method !== 'ALL' && !r.path.includes('*'))
      .map((r) => ({ method: r.method, path: r.path }))
      .filter((r) =>
        seen.has(`${r.method} ${r.path}`) ? false : (seen.add(`${r.method} ${r.path}`), true),
      );
  } finally {
    store.close();
  }
}

export interface FuzzRequest {
  /** What kind of hostility, for the counts. */
  readonly kind: string;
  readonly method: string;
  /** Path with query, already percent-encoded where needed. */
  readonly path: string;
  readonly headers: Record<string, string>;
  readonly body?: Uint8Array;
}

/** Ids of things that exist in the fuzzed service, by path parameter name. */
export type KnownIds = Readonly<Record<string, readonly string[]>>;

const utf8 = (text: string): Uint8Array => new TextEncoder().encode(text);

/** Hostile values for a JSON field. */
export const hostileValueArb: fc.Arbitrary<unknown> = fc.oneof(
  fc.constantFrom<unknown>(
    'NaN',
    'Infinity',
    '-Infinity',
    'nan',
    '1e999',
    '-0',
    '',
    ' ',
    null,
    true,
    false,
    [],
    {},
    [[]],
    { $ne: 1 },
  ),
  fc.constantFrom<unknown>(
    1e308,
    -1e308,
    Number.MAX_SAFE_INTEGER,
    -Number.MAX_SAFE_INTEGER,
    5e-324,
    0,
    -1,
    1e21,
  ),
  fc.constantFrom(
    '<script>alert(1)</script>',
    '"><img src=x onerror=alert(1)>',
    "'; DROP TABLE studies; --",
    '../../../etc/passwd',
    '\u0000',
    '\uFEFF',
    '\u202E',
    "=cmd|' /C calc'!A0",
    '%s%n%x',
  ),
  fc.string({ unit: 'binary', maxLength: 40 }),
  fc.integer({ min: 1_000, max: 200_000 }).map((n) => 'x'.repeat(n)),
  fc.integer({ min: 2, max: 40 }).map((n) => JSON.parse('['.repeat(n) + ']'.repeat(n)) as unknown),
  fc.double(),
  fc.jsonValue({ maxDepth: 3 }),
);

/** A field path of the small study (or a scenario or probe request) to break. */
const STUDY_FIELDS: readonly (readonly (string | number)[])[] = [
  ['name'],
  ['communities'],
  ['communities', 0],
  ['communities', 0, 'id'],
  ['communities', 0, 'lon'],
  ['communities', 0, 'lat'],
  ['communities', 0, 'vs30'],
  ['communities', 0, 'population'],
  ['sources'],
  ['sources', 'type'],
  ['sources', 'features'],
  ['sources', 'features', 0],
  ['sources', 'features', 0, 'geometry'],
  ['sources', 'features', 0, 'geometry', 'coordinates'],
  ['sources', 'features', 0, 'geometry', 'coordinates', 0],
  ['sources', 'features', 0, 'properties'],
  ['sources', 'features', 0, 'properties', 'id'],
  ['sources', 'features', 0, 'properties', 'setting'],
  ['sources', 'features', 0, 'properties', 'depthKm'],
  ['sources', 'features', 0, 'properties', 'recurrence'],
  ['sources', 'features', 0, 'properties', 'recurrence', 'rate'],
  ['sources', 'features', 0, 'properties', 'recurrence', 'magnitude'],
  ['groundMotion'],
  ['groundMotion', 'crustal'],
  ['groundMotion', 'crustal', 0, 'model'],
  ['groundMotion', 'crustal', 0, 'weight'],
  ['settings'],
  ['settings', 'measures'],
  ['settings', 'levels'],
  ['settings', 'levels', 'PGA'],
  ['settings', 'truncationSigma'],
  ['settings', 'maxDistanceKm'],
  ['settings', 'magnitudeStep'],
  ['settings', 'ruptureSpacingKm'],
  ['settings', 'horizonsYears'],
  ['outline'],
  ['unknownKey'],
];

/** A copy of `doc` with the value at `path` replaced (or, for `undefined`, removed). */
function withValue(doc: unknown, path: readonly (string | number)[], value: unknown): unknown {
  const copy = structuredClone(doc) as Record<string | number, unknown>;
  let node: Record<string | number, unknown> = copy;
  for (const key of path.slice(0, -1)) {
    const next = node[key];
    if (typeof next !== 'object' || next === null) return copy;
    node = next as Record<string | number, unknown>;
  }
  const last = path[path.length - 1] as string | number;
  if (value === undefined) delete node[last];
  else node[last] = value;
  return copy;
}

const scenarioBody = (study: unknown): Record<string, unknown> => ({
  study,
  sourceId: 'spot-below',
  magnitude: 6.5,
});
const PROBE = { model: 'BSSA14', magnitude: 6.5, rjbKm: 10, vs30: 400 };

/** A JSON body that is a valid document (study, scenario, probe) with one field broken or missing. */
const brokenDocumentArb = fc
  .tuple(
    fc.constantFrom(...STUDY_FIELDS),
    fc.oneof(
      { weight: 4, arbitrary: hostileValueArb },
      { weight: 1, arbitrary: fc.constant(undefined) },
    ),
    fc.constantFrom('study', 'scenario', 'probe', 'sources', 'scenario-saved'),
    fc.constantFrom(
      'model',
      'magnitude',
      'rjbKm',
      'vs30',
      'measures',
      'dipDeg',
      'mechanism',
      'extra',
    ),
  )
  .map(([path, value, shape, probeKey]) => {
    if (shape === 'probe') return withValue(PROBE, [probeKey], value);
    if (shape === 'sources') return withValue(sourcesCollection(), path.slice(1), value);
    if (shape === 'scenario-saved')
      return withValue(
        { sourceId: 'spot-below', magnitude: 6.5, gridSpacingKm: 5 },
        [path[path.length - 1] as string],
        value,
      );
    const study = withValue(smallStudy('Fuzzed'), path, value);
    return shape === 'scenario' ? scenarioBody(study) : study;
  });

/** Text bodies that are not the JSON they claim to be, or not a sensible one. */
const badTextArb: fc.Arbitrary<{ kind: string; text: string }> = fc.oneof(
  fc
    .integer({ min: 1, max: 400 })
    .map((cut) => ({ kind: 'truncated JSON', text: JSON.stringify(smallStudy()).slice(0, cut) })),
  fc
    .constantFrom(
      '',
      ' ',
      'null',
      '[]',
      '0',
      '"study"',
      'true',
      '{',
      '}',
      '{"a":}',
      "{'name':'x'}",
      '{"name":"x",}',
      'NaN',
      '{"name": NaN}',
      '{"n":1e99999}',
      '\uFEFF{}',
      '{"__proto__":{"polluted":1},"constructor":{"prototype":{"polluted":1}},"name":"x"}',
    )
    .map((text) => ({ kind: 'malformed JSON', text })),
  fc.constantFrom(1_000, 60, 65, 100_000, 1_000_000).map((depth) => ({
    kind: 'deep nesting',
    text: `{"name":"deep","x":${'['.repeat(depth)}${']'.repeat(depth)}}`,
  })),
  fc.constantFrom(100_000, 1_000_000).map((depth) => ({
    kind: 'deep nesting',
    text: '{"a":'.repeat(depth) + '1' + '}'.repeat(depth),
  })),
  fc.constantFrom(100_000, 4_000_000).map((n) => ({
    kind: 'very long string',
    text: JSON.stringify({ ...smallStudy(), name: 'n'.repeat(n) }),
  })),
  fc.constantFrom(50_000).map((n) => ({
    kind: 'many keys',
    text: JSON.stringify({
      ...smallStudy(),
      ...Object.fromEntries(Array.from({ length: n }, (_, i) => [`k${i}`, i])),
    }),
  })),
  fc
    .constantFrom('1e400', '-1e400', '123456789012345678901234567890', '0.' + '0'.repeat(400) + '1')
    .map((n) => ({
      kind: 'huge number',
      text: JSON.stringify(smallStudy()).replace('"magnitude":6.5', `"magnitude":${n}`),
    })),
  fc
    .jsonValue({ maxDepth: 4 })
    .map((v) => ({ kind: 'random JSON', text: JSON.stringify(v) ?? 'null' })),
);

/** Communities CSV bodies: broken headers, rows, quotes, formulas, binary. */
const badCsvArb: fc.Arbitrary<string> = fc.oneof(
  fc.constantFrom(
    '',
    'id,name\n',
    'id,name,lon,lat,vs30\n',
    'id,name,lon,lat,vs30\na,"unclosed,1,2,300\n',
    'id,name,lon,lat,vs30\n=HYPERLINK("x"),+1,-150,-47,400\n',
    'id,name,lon,lat,vs30\na,b,NaN,Infinity,1e999\n',
    '\uFEFFid,name,lon,lat,vs30\r\na,b,-150,-47,400\r\n',
    'id,name,lon,lat,vs30\n' + 'a,b,-150,-47,400,extra,extra\n'.repeat(50),
    'id,name,lon,lat,vs30\n' +
      Array.from({ length: 2_100 }, (_, i) => `c${i},n,-150,-47,400`).join('\n'),
    'id,name,lon,lat,vs30,' + Array.from({ length: 5_000 }, (_, i) => `x${i}`).join(',') + '\n',
  ),
  fc.string({ unit: 'binary', maxLength: 200 }).map((s) => `id,name,lon,lat,vs30\n${s}`),
);

/** An entity that expands a thousand-fold per level ("billion laughs"). */
const LAUGHS = `<!DOCTYPE q [<!ENTITY a "ha"><!ENTITY b "&a;&a;&a;&a;&a;&a;&a;&a;&a;&a;"><!ENTITY c "&b;&b;&b;&b;&b;&b;&b;&b;&b;&b;"><!ENTITY d "&c;&c;&c;&c;&c;&c;&c;&c;&c;&c;"><!ENTITY e "&d;&d;&d;&d;&d;&d;&d;&d;&d;&d;">]>`;
const QUAKEML_EVENT =
  '<event publicID="e1"><origin><time><value>2001-01-01T00:00:00Z</value></time><latitude><value>-47</value></latitude><longitude><value>-150</value></longitude><depth><value>10000</value></depth></origin><magnitude><mag><value>5</value></mag><type>Mw</type></magnitude></event>';

/** Catalog bodies (our CSV, FDSN text, QuakeML): XML bombs and external entities, deep nesting, broken records. */
const badCatalogArb: fc.Arbitrary<{ kind: string; type: string; text: string }> = fc.oneof(
  fc.constantFrom(
    {
      kind: 'XML entity bomb',
      type: 'application/xml',
      text: `<?xml version="1.0"?>${LAUGHS}<quakeml><eventParameters>${QUAKEML_EVENT.replace('e1', '&e;')}</eventParameters></quakeml>`,
    },
    {
      kind: 'XML external entity',
      type: 'application/xml',
      text: `<?xml version="1.0"?><!DOCTYPE q [<!ENTITY x SYSTEM "file:///etc/passwd">]><quakeml><eventParameters>${QUAKEML_EVENT.replace('e1', '&x;')}</eventParameters></quakeml>`,
    },
    {
      kind: 'deep XML',
      type: 'application/xml',
      text: `<quakeml><eventParameters>${'<a>'.repeat(50_000)}${'</a>'.repeat(50_000)}</eventParameters></quakeml>`,
    },
    {
      kind: 'malformed XML',
      type: 'application/xml',
      text: '<quakeml><eventParameters><event></quakeml>',
    },
    {
      kind: 'bad catalog',
      type: 'text/csv',
      text: 'time,lat,lon,depth,mag\nyesterday,NaN,Infinity,-5,=1+1\n',
    },
    { kind: 'bad catalog', type: 'text/plain', text: '#EventID|Time|Latitude\n|||||||||||||\n' },
    {
      kind: 'bad catalog',
      type: 'application/json',
      text: JSON.stringify({ format: 'quakeml', fileName: '../../etc/passwd', text: '<x/>' }),
    },
  ),
  fc
    .string({ unit: 'binary', maxLength: 300 })
    .map((text) => ({ kind: 'bad catalog', type: 'text/csv', text })),
);

const HOSTILE_IDS = [
  'nope',
  'x'.repeat(5_000),
  '..%2F..%2Fetc%2Fpasswd',
  '%00',
  '%E0%A4%A',
  '%3Cscript%3E',
  "'%20OR%201=1--",
  '%F0%9F%92%A5',
  '-1',
  '0',
  'NaN',
  '.',
  '%2e%2e',
  encodeURIComponent('ÿ'.repeat(30)),
];

const WRONG_TYPES = [
  'text/plain',
  'application/xml',
  'multipart/form-data; boundary=x',
  'application/x-www-form-urlencoded',
  'application/json; charset=utf-16',
  'text/html',
  '',
  'application/jsonx',
  'json',
];

/** The path of `route` with each parameter a known id, an unknown one, or a hostile one. */
function pathArb(
  route: RouteSpec,
  ids: KnownIds,
): fc.Arbitrary<{ path: string; hostileId: boolean }> {
  const params = route.path.match(/:[A-Za-z]+/g) ?? [];
  if (params.length === 0) {
    return fc.oneof(
      { weight: 5, arbitrary: fc.constant({ path: route.path, hostileId: false }) },
      {
        weight: 1,
        arbitrary: fc
          .constantFrom(
            '?x=%00',
            '?a[]=1&a[]=2',
            `?q=${'z'.repeat(4_000)}`,
            '/',
            '//',
            '/..',
            '%20',
          )
          .map((s) => ({ path: route.path + s, hostileId: true })),
      },
    );
  }
  return fc
    .tuple(
      ...params.map((p) =>
        fc.oneof(
          { weight: 4, arbitrary: fc.constantFrom(...(ids[p.slice(1)] ?? ['none-known'])) },
          { weight: 1, arbitrary: fc.constantFrom(...HOSTILE_IDS) },
        ),
      ),
    )
    .map((values) => {
      let path = route.path;
      params.forEach((p, i) => (path = path.replace(p, values[i] as string)));
      return { path, hostileId: values.some((v) => HOSTILE_IDS.includes(v)) };
    });
}

/** Requests to one route: hostile bodies for writes, hostile paths and headers for all. */
export function requestsFor(route: RouteSpec, ids: KnownIds): fc.Arbitrary<FuzzRequest> {
  const isCsv = route.path.endsWith('/communities');
  const writes = route.method !== 'GET' && route.method !== 'HEAD';
  const path = pathArb(route, ids);
  if (!writes) {
    return fc
      .tuple(
        path,
        fc.constantFrom<Record<string, string>>(
          {},
          { accept: 'text/html' },
          { 'content-type': 'application/json' },
          { origin: 'http://elsewhere.invalid' },
          { range: 'bytes=0-1' },
        ),
      )
      .map(([p, headers]) => ({
        kind: p.hostileId ? 'hostile path' : 'plain read',
        method: route.method,
        path: p.path,
        headers,
      }));
  }
  const isPage = !route.path.startsWith('/api');
  const isCatalog = !isPage && /\/catalog(\/fit)?$/.test(route.path);
  const body: fc.Arbitrary<{ kind: string; type: string; bytes?: Uint8Array }> = fc.oneof(
    isCatalog
      ? {
          weight: 3,
          arbitrary: badCatalogArb.map(({ kind, type, text }) => ({
            kind,
            type,
            bytes: utf8(text),
          })),
        }
      : isPage
        ? hostileFormArb.map((form) => ({
            kind: 'hostile form',
            type: 'application/x-www-form-urlencoded',
            bytes: utf8(form),
          }))
        : isCsv
          ? badCsvArb.map((text) => ({ kind: 'bad CSV', type: 'text/csv', bytes: utf8(text) }))
          : brokenDocumentArb.map((doc) => ({
              kind: 'broken field',
              type: 'application/json',
              bytes: utf8(JSON.stringify(doc) ?? 'null'),
            })),
    badTextArb.map(({ kind, text }) => ({
      kind,
      type: isCsv ? 'text/csv' : 'application/json',
      bytes: utf8(text),
    })),
    fc.constantFrom(...WRONG_TYPES).map((type) => ({
      kind: 'wrong content type',
      type,
      bytes: utf8(JSON.stringify(smallStudy())),
    })),
    fc.uint8Array({ minLength: 1, maxLength: 300 }).map((bytes) => ({
      kind: 'invalid UTF-8',
      type: isCsv ? 'text/csv' : 'application/json',
      bytes: Uint8Array.from([0x7b, 0x22, 0xff, 0xfe, ...bytes, 0xc3]),
    })),
    fc.constant({ kind: 'no body', type: isCsv ? 'text/csv' : 'application/json' }),
  );
  return fc.tuple(path, body).map(([p, b]): FuzzRequest => ({
    kind: p.hostileId ? 'hostile path' : b.kind,
    method: route.method,
    path: p.path,
    headers: b.type === '' ? {} : { 'content-type': b.type },
    ...(b.bytes ? { body: b.bytes } : {}),
  }));
}

/** Form fields the pages read, with hostile values (the pages' forms post urlencoded). */
const FORM_FIELDS = [
  ...COMMUNITY_COLUMNS,
  'sourceId',
  'magnitude',
  'position',
  'csv',
  'geojson',
  'catalog',
  'text',
  'lang',
  'back',
  'communityId',
] as const;
const hostileFormArb: fc.Arbitrary<string> = fc
  .array(
    fc.tuple(
      fc.constantFrom(...FORM_FIELDS),
      hostileValueArb.map((v) => (typeof v === 'string' ? v : (JSON.stringify(v) ?? ''))),
    ),
    { maxLength: 8 },
  )
  .map((pairs) => new URLSearchParams(pairs).toString());

/** Requests for a method the path does not take (405) and for paths that do not exist (404). */
export const strayRequestArb: fc.Arbitrary<FuzzRequest> = fc.oneof(
  fc
    .tuple(
      fc.constantFrom('PATCH', 'OPTIONS', 'TRACE', 'PUT', 'DELETE'),
      fc.constantFrom('/api/studies', '/api/health', '/api/validate', '/api/compute'),
    )
    .map(([method, path]) => ({ kind: 'wrong method', method, path, headers: {} })),
  fc
    .constantFrom(
      '/api',
      '/api/',
      '/api/nothing',
      '/api/studies/a/b/c/d',
      '/api/%2e%2e/%2e%2e/etc/passwd',
      '/.git/config',
      `/api/${'y'.repeat(6_000)}`,
      '/api/runs',
      '/\u0000'.replace('\u0000', '%00'),
    )
    .map((path) => ({ kind: 'unknown path', method: 'GET', path, headers: {} })),
);
