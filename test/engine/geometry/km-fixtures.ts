import { faultSurface, type FaultSurface } from '../../../api/engine/geometry/fault-surface.ts';
import { createLocalFrame, type LocalFrame } from '../../../api/engine/geometry/projection.ts';
import type {
  FaultSource,
  GroundMotionBranches,
  LonLat,
  PointSource,
  Recurrence,
  Settings,
  ZoneSource,
} from '../../../api/engine/model.ts';
import { testSettings } from '../../helpers/test-settings.ts';

/**
 * Hand-made sources drawn in local km, so expected distances can be worked by hand. The frame
 * sits in open ocean; positions are converted to [lon, lat] through it and come back within
 * about 1e-9 km (tested in projection.test.ts).
 */
export const FRAME: LocalFrame = createLocalFrame([-150, -47]);

export const toLonLat = (
  points: readonly (readonly [number, number])[],
  frame: LocalFrame = FRAME,
): LonLat[] => points.map(([x, y]) => frame.toLonLat({ x, y }));

export const FIXED_M7: Recurrence = { type: 'fixed', magnitude: 7, rate: 0.01 };

export interface FaultOptions {
  readonly dipDeg: number;
  readonly dipDirectionDeg: number;
  readonly upperDepthKm: number;
  readonly lowerDepthKm: number;
  readonly recurrence?: Recurrence;
  readonly mechanism?: FaultSource['mechanism'];
  readonly setting?: FaultSource['setting'];
  readonly id?: string;
}

/**
 * A fault whose trace runs north `legKm` from the origin, then east `legKm` (one joint, a right
 * angle), dipping `dipDeg` towards 135°, from the surface to 12 km.
 */
export function bentFaultSurface(legKm: number, dipDeg: number): FaultSurface {
  const trace: [number, number][] = [
    [0, 0],
    [0, legKm],
    [legKm, legKm],
  ];
  return faultSurface(
    faultKm(trace, { dipDeg, dipDirectionDeg: 135, upperDepthKm: 0, lowerDepthKm: 12 }),
    FRAME,
  );
}
/** A test fault (crustal strike-slip, M 7 at 0.01 a year unless the options say otherwise) with its trace in [lon, lat]. */
export function faultLonLat(trace: readonly LonLat[], options: FaultOptions): FaultSource {
  return {
    kind: 'fault',
    id: options.id ?? 'test-fault',
    name: options.id ?? 'Test fault',
    setting: options.setting ?? 'crustal',
    mechanism: options.mechanism ?? 'strike-slip',
    rakeDeg: 0,
    recurrence: options.recurrence ?? FIXED_M7,
    trace: [...trace],
    dipDeg: options.dipDeg,
    dipDirectionDeg: options.dipDirectionDeg,
    upperDepthKm: options.upperDepthKm,
    lowerDepthKm: options.lowerDepthKm,
  };
}

export function faultKm(
  traceKm: readonly (readonly [number, number])[],
  options: FaultOptions,
  frame: LocalFrame = FRAME,
): FaultSource {
  return faultLonLat(toLonLat(traceKm, frame), options);
}

/**
 * A fault given by depth contours drawn in local km (lines in order down dip, one depth each,
 * km); its trace, depths and dip are the outline the study schema would give it.
 */
export function contouredKm(
  linesKm: readonly (readonly (readonly [number, number])[])[],
  depthsKm: readonly number[],
  options: Omit<FaultOptions, 'upperDepthKm' | 'lowerDepthKm'> & {
    readonly meshSpacingKm?: number;
  },
  frame: LocalFrame = FRAME,
): FaultSource {
  const lines = linesKm.map((line) => toLonLat(line, frame));
  return {
    ...faultKm(
      linesKm[0] as (readonly [number, number])[],
      {
        ...options,
        upperDepthKm: depthsKm[0] as number,
        lowerDepthKm: depthsKm[depthsKm.length - 1] as number,
      },
      frame,
    ),
    contours: { lines, depthsKm, meshSpacingKm: options.meshSpacingKm ?? 5 },
  };
}

/** A crustal strike-slip test zone with its rings in [lon, lat]. */
export function zoneLonLat(
  rings: readonly (readonly LonLat[])[],
  recurrence: Recurrence,
  depthKm = 10,
): ZoneSource {
  return {
    kind: 'zone',
    id: 'test-zone',
    name: 'Test zone',
    setting: 'crustal',
    mechanism: 'strike-slip',
    rakeDeg: 0,
    recurrence,
    rings: rings.map((ring) => [...ring]),
    depthKm,
  };
}

export function zoneKm(
  ringsKm: readonly (readonly (readonly [number, number])[])[],
  recurrence: Recurrence,
  depthKm = 10,
  frame: LocalFrame = FRAME,
): ZoneSource {
  return zoneLonLat(
    ringsKm.map((ring) => toLonLat(ring, frame)),
    recurrence,
    depthKm,
  );
}

export function pointKm(
  x: number,
  y: number,
  recurrence: Recurrence,
  depthKm = 8,
  frame: LocalFrame = FRAME,
): PointSource {
  return {
    kind: 'point',
    id: 'test-point',
    name: 'Test point',
    setting: 'crustal',
    mechanism: 'reverse',
    rakeDeg: 90,
    recurrence,
    location: frame.toLonLat({ x, y }),
    depthKm,
  };
}

export const SETTINGS: Settings = testSettings();

/** One model per setting: BSSA14 for crustal sources, AGA16 for interface and intraslab ones. */
export const ONE_MODEL_PER_SETTING: GroundMotionBranches = {
  crustal: [{ model: 'BSSA14', weight: 1 }],
  interface: [{ model: 'AGA16', weight: 1 }],
  intraslab: [{ model: 'AGA16', weight: 1 }],
};

/**
 * A circular arc in the local frame (km): `points` vertices about `centreKm` at `radiusKm`, from
 * `fromDeg` in steps of `stepDeg` (degrees anticlockwise from east). Plain geometry, for
 * contours bent in plan.
 */
export const arcKm = (
  centreKm: [number, number],
  radiusKm: number,
  fromDeg: number,
  stepDeg: number,
  points = 81,
): [number, number][] =>
  Array.from({ length: points }, (_, k) => {
    const angle = ((fromDeg + stepDeg * k) * Math.PI) / 180;
    return [centreKm[0] + radiusKm * Math.cos(angle), centreKm[1] + radiusKm * Math.sin(angle)];
  });
