import { z } from 'zod';
import type { Mechanism, Source } from '../engine/model.ts';
import { TECTONIC_SETTINGS } from '../engine/model.ts';
import { describeValue, identifier, numberIn, oneOf, text } from './fields.ts';
import { formatPath, type IssueList } from './issues.ts';
import { contourOutline, readContourDepths, readContourLines } from './contour-geometry.ts';
import { readRecurrence } from './recurrence-schema.ts';
import {
  MAX_STUDY_VERTICES,
  readSourceGeometry,
  rightHandDipDirectionDeg,
  vertexCount,
} from './source-geometry.ts';

/** Most sources one study may hold. */
export const MAX_SOURCES = 500;

const MECHANISMS = ['strike-slip', 'reverse', 'normal'] as const;
/** Depth of earthquakes accepted, km: the deepest known events are near 700 km. */
const DEPTH_KM = { min: 0, max: 700, unit: 'km' } as const;

/** Properties every source may have. */
const COMMON_KEYS = ['id', 'name', 'setting', 'mechanism', 'rake', 'recurrence'];
const FAULT_KEYS = [...COMMON_KEYS, 'dip', 'dipDirection', 'upperDepthKm', 'lowerDepthKm'];
const CONTOUR_KEYS = [...COMMON_KEYS, 'contourDepthsKm', 'meshSpacingKm'];
const POINT_KEYS = [...COMMON_KEYS, 'depthKm', 'upperDepthKm', 'lowerDepthKm'];

const commonSchema = z.object({
  id: identifier(),
  name: text(120, 'a name').optional(),
  setting: oneOf(TECTONIC_SETTINGS),
  mechanism: oneOf(MECHANISMS).optional(),
  rake: numberIn({ min: -180, max: 180, unit: 'degrees' }).optional(),
});

const faultSchema = z.object({
  dip: numberIn({ min: 0, max: 90, minOpen: true, unit: 'degrees' }),
  dipDirection: numberIn({ min: 0, max: 360, maxOpen: true, unit: 'degrees' }).optional(),
  upperDepthKm: numberIn(DEPTH_KM).optional(),
  lowerDepthKm: numberIn({ ...DEPTH_KM, minOpen: true }),
});

/** The seismogenic depths of a zone or point source, km (ruptures/virtual-ruptures.ts). */
const seismogenicDepths = {
  upperDepthKm: numberIn(DEPTH_KM).optional(),
  lowerDepthKm: numberIn({ ...DEPTH_KM, minOpen: true }).optional(),
};
const pointSchema = z.object({ depthKm: numberIn(DEPTH_KM), ...seismogenicDepths });

const ZONE_KEYS = [...POINT_KEYS, 'depthFromSource', 'depths'];
/** Weights of a zone's depths sum to 1 within this (as the logic tree's do). */
const WEIGHT_SUM_SLACK = 1e-6;
const zoneSchema = z.object({
  ...seismogenicDepths,
  depthKm: numberIn(DEPTH_KM).optional(),
  depthFromSource: z
    .object({ id: identifier(), offsetKm: numberIn({ min: -50, max: 300, unit: 'km' }).optional() })
    .strict()
    .optional(),
  depths: z
    .array(
      z.object({
        depthKm: numberIn(DEPTH_KM),
        weight: numberIn({ min: 0, max: 1, minOpen: true }),
      }),
    )
    .min(1)
    .max(20)
    .optional(),
});

/** Mesh spacing of a contoured fault, km: 5 km (the default rupture spacing) unless given. */
const DEFAULT_MESH_SPACING_KM = 5;
const contourSchema = z.object({
  meshSpacingKm: numberIn({ min: 0.5, max: 50, unit: 'km' }).optional(),
});

/** The rake of a pure mechanism (Aki & Richards convention), degrees. */
const RAKE_OF: Record<Mechanism, number> = { 'strike-slip': 0, reverse: 90, normal: -90 };

/**
 * Mechanism class of a rake: normal for -150 < rake < -30, reverse for 30 < rake < 150,
 * strike-slip otherwise (the ranges of Boore et al. 2014, from memory; common practice).
 */
export function mechanismOfRake(rakeDeg: number): Mechanism {
  if (rakeDeg > -150 && rakeDeg < -30) return 'normal';
  if (rakeDeg > 30 && rakeDeg < 150) return 'reverse';
  return 'strike-slip';
}

/**
 * Whether a source's upper and lower depths (km), where both are given, run downwards; if not,
 * the issue at lowerDepthKm says so.
 */
function depthsInOrder(
  upperDepthKm: number | undefined,
  lowerDepthKm: number | undefined,
  propsPath: readonly PropertyKey[],
  issues: IssueList,
): boolean {
  if (upperDepthKm === undefined || lowerDepthKm === undefined || upperDepthKm < lowerDepthKm)
    return true;
  issues.add(
    [...propsPath, 'lowerDepthKm'],
    `expected lowerDepthKm greater than upperDepthKm (${upperDepthKm} km), got ${lowerDepthKm} km`,
  );
  return false;
}

/** Validates one GeoJSON source feature at `path`; every problem goes to `issues`. */
export function readSource(
  raw: unknown,
  issues: IssueList,
  path: readonly PropertyKey[],
): Source | undefined {
  if (typeof raw !== 'object' || raw === null || (raw as { type?: unknown }).type !== 'Feature') {
    issues.add(
      [...path, 'type'],
      `expected a GeoJSON "Feature", got ${describeValue(typeof raw === 'object' && raw ? (raw as { type?: unknown }).type : raw)}`,
    );
    return undefined;
  }
  const feature = raw as { geometry?: unknown; properties?: unknown };
  const propsPath = [...path, 'properties'];
  const isContoured = (feature.geometry as { type?: unknown } | null)?.type === 'MultiLineString';
  const geometry = isContoured
    ? readContoured(feature.geometry, issues, [...path, 'geometry'])
    : readSourceGeometry(feature.geometry, issues, [...path, 'geometry']);
  const props = feature.properties;
  if (typeof props !== 'object' || props === null) {
    issues.add(
      propsPath,
      `expected an object of source properties (id, setting, recurrence, ...), got ${describeValue(props)}`,
    );
    return undefined;
  }
  const isFault =
    isContoured || (feature.geometry as { type?: unknown } | null)?.type === 'LineString';
  if (geometry)
    issues.warnUnknownKeys(
      props,
      isContoured
        ? CONTOUR_KEYS
        : isFault
          ? FAULT_KEYS
          : geometry.kind === 'zone'
            ? ZONE_KEYS
            : POINT_KEYS,
      propsPath,
    );

  const common = issues.parse(commonSchema, props, propsPath);
  if (common && common.mechanism === undefined && common.rake === undefined) {
    issues.add(
      [...propsPath, 'mechanism'],
      `expected a mechanism (${MECHANISMS.join(', ')}) or a rake in degrees, got neither`,
    );
  }
  const recurrence = readRecurrence(
    (props as { recurrence?: unknown }).recurrence,
    isFault,
    issues,
    [...propsPath, 'recurrence'],
    common?.id,
  );
  const shape = geometry
    ? issues.parse(
        isContoured
          ? contourSchema
          : isFault
            ? faultSchema
            : geometry.kind === 'zone'
              ? zoneSchema
              : pointSchema,
        props,
        propsPath,
      )
    : undefined;
  const depthsKm =
    geometry?.kind === 'contours'
      ? readContourDepths(
          (props as { contourDepthsKm?: unknown }).contourDepthsKm,
          geometry.lines.length,
          issues,
          [...propsPath, 'contourDepthsKm'],
        )
      : undefined;
  if (
    !geometry ||
    !common ||
    !recurrence ||
    !shape ||
    (common.mechanism === undefined && common.rake === undefined)
  )
    return undefined;

  if (geometry.kind === 'contours' && !depthsKm) return undefined;
  const rakeDeg = common.rake ?? RAKE_OF[common.mechanism as Mechanism];
  const base = {
    id: common.id,
    name: common.name ?? common.id,
    setting: common.setting,
    mechanism: common.mechanism ?? mechanismOfRake(rakeDeg),
    rakeDeg,
    recurrence,
  };
  if (geometry.kind === 'contours') {
    const depths = depthsKm as number[];
    const { dipDeg, dipDirectionDeg } = contourOutline(geometry.lines, depths);
    return {
      ...base,
      kind: 'fault',
      trace: geometry.lines[0] as [number, number][],
      dipDeg,
      dipDirectionDeg,
      upperDepthKm: depths[0] as number,
      lowerDepthKm: depths[depths.length - 1] as number,
      contours: {
        lines: geometry.lines,
        depthsKm: depths,
        meshSpacingKm:
          (shape as z.output<typeof contourSchema>).meshSpacingKm ?? DEFAULT_MESH_SPACING_KM,
      },
    };
  }
  if (geometry.kind === 'fault') {
    const f = shape as z.output<typeof faultSchema>;
    const upperDepthKm = f.upperDepthKm ?? 0;
    if (!depthsInOrder(upperDepthKm, f.lowerDepthKm, propsPath, issues)) return undefined;
    return {
      ...base,
      kind: 'fault',
      trace: geometry.trace,
      dipDeg: f.dip,
      dipDirectionDeg: f.dipDirection ?? rightHandDipDirectionDeg(geometry.trace),
      upperDepthKm,
      lowerDepthKm: f.lowerDepthKm,
    };
  }
  const layer = shape as { upperDepthKm?: number; lowerDepthKm?: number };
  if (!depthsInOrder(layer.upperDepthKm, layer.lowerDepthKm, propsPath, issues)) return undefined;
  const seismogenic = {
    ...(layer.upperDepthKm !== undefined ? { upperDepthKm: layer.upperDepthKm } : {}),
    ...(layer.lowerDepthKm !== undefined ? { lowerDepthKm: layer.lowerDepthKm } : {}),
  };
  if (geometry.kind === 'zone') {
    const zone = shape as z.output<typeof zoneSchema>;
    const given = [zone.depthKm, zone.depthFromSource, zone.depths].filter((v) => v !== undefined);
    if (given.length !== 1) {
      issues.add(
        [...propsPath, 'depthKm'],
        `expected one of depthKm, depthFromSource ({ id, offsetKm }) or depths ([{ depthKm, weight }]), got ${given.length}`,
      );
      return undefined;
    }
    const weightSum = zone.depths?.reduce((sum, d) => sum + d.weight, 0) ?? 1;
    if (Math.abs(weightSum - 1) > WEIGHT_SUM_SLACK) {
      issues.add(
        [...propsPath, 'depths'],
        `expected weights summing to 1 (within ${WEIGHT_SUM_SLACK}), got ${weightSum}`,
      );
      return undefined;
    }
    const depthKm =
      zone.depthKm ??
      zone.depths?.reduce((sum, d) => sum + d.depthKm * d.weight, 0) ??
      Math.max(0, zone.depthFromSource?.offsetKm ?? 0);
    return {
      ...base,
      kind: 'zone',
      rings: geometry.rings,
      depthKm,
      ...(zone.depthFromSource
        ? {
            depthFrom: {
              sourceId: zone.depthFromSource.id,
              offsetKm: zone.depthFromSource.offsetKm ?? 0,
            },
          }
        : {}),
      ...(zone.depths ? { depths: zone.depths } : {}),
      ...seismogenic,
    };
  }
  const { depthKm } = shape as z.output<typeof pointSchema>;
  return { ...base, kind: 'point', location: geometry.location, depthKm, ...seismogenic };
}

/** A contoured fault's MultiLineString, as its lines (contour-geometry.ts). */
function readContoured(
  raw: unknown,
  issues: IssueList,
  path: readonly PropertyKey[],
): { readonly kind: 'contours'; readonly lines: [number, number][][] } | undefined {
  const lines = readContourLines((raw as { coordinates?: unknown }).coordinates, issues, [
    ...path,
    'coordinates',
  ]);
  return lines ? { kind: 'contours', lines } : undefined;
}

/** Validates a GeoJSON FeatureCollection of sources at `path`, with unique ids. */
export function readSources(
  raw: unknown,
  issues: IssueList,
  path: readonly PropertyKey[],
): Source[] {
  const features = (raw as { features?: unknown } | null)?.features;
  if (
    typeof raw !== 'object' ||
    raw === null ||
    (raw as { type?: unknown }).type !== 'FeatureCollection' ||
    !Array.isArray(features)
  ) {
    issues.add(
      path,
      `expected a GeoJSON FeatureCollection with a list of features, got ${describeValue(raw)}`,
    );
    return [];
  }
  if (features.length === 0 || features.length > MAX_SOURCES) {
    issues.add(
      [...path, 'features'],
      `expected 1 to ${MAX_SOURCES} sources, got ${features.length}`,
    );
    return [];
  }
  const vertices = features.reduce(
    (n: number, f) => n + vertexCount((f as { geometry?: unknown } | null)?.geometry),
    0,
  );
  if (vertices > MAX_STUDY_VERTICES) {
    issues.add(
      [...path, 'features'],
      `expected at most ${MAX_STUDY_VERTICES} vertices over all sources (the limit), got ${vertices}; simplify the traces and outlines`,
    );
    return [];
  }
  const out: Source[] = [];
  const seen = new Map<string, number>();
  features.forEach((feature, i) => {
    const featurePath = [...path, 'features', i];
    const source = readSource(feature, issues, featurePath);
    if (!source) return;
    const first = seen.get(source.id);
    if (first !== undefined) {
      issues.add(
        [...featurePath, 'properties', 'id'],
        `duplicate id "${source.id}"; expected unique ids (first used at ${formatPath([...path, 'features', first])})`,
      );
      return;
    }
    seen.set(source.id, i);
    out.push(source);
  });
  // A zone naming a source refused above is not refused again: that source's own problems say
  // what to fix.
  const refusedIds = new Set(
    features
      .map((f) => (f as { properties?: { id?: unknown } } | null)?.properties?.id)
      .filter((id) => typeof id === 'string' && !seen.has(id)),
  );
  out.forEach((source) => {
    if (source.kind !== 'zone' || !source.depthFrom) return;
    const named = out.find((s) => s.id === source.depthFrom?.sourceId);
    if (named?.kind === 'fault' && named.contours) return;
    if (!named && refusedIds.has(source.depthFrom.sourceId)) return;
    issues.add(
      [...path, 'features', seen.get(source.id) as number, 'properties', 'depthFromSource', 'id'],
      `expected the id of a source given by depth contours (a MultiLineString fault) in this study, got "${source.depthFrom.sourceId}"`,
    );
  });
  return out;
}
