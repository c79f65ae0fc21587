import { bearing, lineString, nearestPointOnLine, point } from '@turf/turf';
import type { Community, Source, Study } from '../../api/engine/model.ts';
import type { NearestFault } from '../../api/engine/results.ts';
import { INK, PAPER } from '../style/palette.ts';
import type { Translator } from '../text/translator.ts';
import { mapFrame, type MapFrame } from './map-frame.ts';
import { StudyMap } from './study-map.tsx';

/** The village map's box, px (the handout's; slides and the poster scale the SVG). */
export const VILLAGE_MAP = { width: 480, maxHeight: 480, padding: 4 } as const;

/**
 * Smallest and largest half-width of a village map, km: a few hours' walk to a day's drive
 * (common practice for a local sketch map). A plate boundary farther off is pointed at from
 * the map's edge.
 */
const MIN_RADIUS_KM = 15;
const MAX_RADIUS_KM = 60;
/** Room beyond the farthest fault shown, as a share of its distance (common practice: a margin). */
const MARGIN_SHARE = 0.2;
/** Places closer than this to the map's edge are left off: their names would run off it, px. */
const EDGE_INSET_PX = 30;
/** Crustal faults the map is sized to show, nearest first. */
const FAULTS_SHOWN = 2;

type FaultSource = Source & { kind: 'fault' };

/** The study's subduction interface (the plate boundary), if it has one. */
export function plateBoundary(study: Pick<Study, 'sources'>): FaultSource | undefined {
  return study.sources.find(
    (s): s is FaultSource => s.kind === 'fault' && s.setting === 'interface',
  );
}

/**
 * Where a fault meets the surface (its trace; the plate boundary's, for the handout) seen
 * from the village: distance, km, and bearing, degrees from north. turf's nearestPointOnLine and bearing are spherical (a
 * sphere of 6371.0088 km): at these distances that differs from the ellipsoid by under half
 * a percent, far below what a sketch map and a sentence show.
 */
export function traceFrom(
  community: Community,
  fault: FaultSource,
): { readonly distanceKm: number; readonly bearingDeg: number } {
  const here = point([community.lon, community.lat]);
  const nearest = nearestPointOnLine(lineString(fault.trace.map((p) => [...p])), here, {
    units: 'kilometers',
  });
  return {
    distanceKm: nearest.properties.dist,
    bearingDeg: (bearing(here, nearest) + 360) % 360,
  };
}

/**
 * Half-width of the village map, km: enough to show the nearest crustal faults and the
 * plate boundary's trace with a margin, within MIN_RADIUS_KM and MAX_RADIUS_KM.
 */
export function villageRadiusKm(
  study: Pick<Study, 'sources'>,
  community: Community,
  nearest: readonly NearestFault[],
): number {
  const boundary = plateBoundary(study);
  const crustal = nearest
    .filter((f) => f.sourceId !== boundary?.id)
    .slice(0, FAULTS_SHOWN)
    .map((f) => f.distanceKm);
  const reach = [...crustal, ...(boundary ? [traceFrom(community, boundary).distanceKm] : [])];
  const farthest = Math.max(0, ...reach) * (1 + MARGIN_SHARE);
  return Math.min(MAX_RADIUS_KM, Math.max(MIN_RADIUS_KM, farthest));
}

/** The frame of a village's map: a square around it, north up. */
export function villageFrame(
  study: Study,
  community: Community,
  nearest: readonly NearestFault[],
  box: {
    readonly width: number;
    readonly maxHeight: number;
    readonly padding: number;
  } = VILLAGE_MAP,
): MapFrame {
  return mapFrame(study, {
    ...box,
    around: {
      center: [community.lon, community.lat],
      radiusKm: villageRadiusKm(study, community, nearest),
    },
  });
}

/**
 * A village's own map: its faults and the plate boundary as lines with their names, the
 * places inside the square, scale bar and north arrow. No screening bands: the map is for
 * residents, and a band is the planner's word.
 */
export function VillageMap(props: {
  readonly tr: Translator;
  readonly study: Study;
  readonly community: Community;
  readonly frame: MapFrame;
  readonly idPrefix: string;
}) {
  const { study, frame } = props;
  const inside = (c: Community) => {
    const [x, y] = frame.project([c.lon, c.lat]);
    return (
      x >= EDGE_INSET_PX &&
      x <= frame.width - EDGE_INSET_PX &&
      y >= EDGE_INSET_PX &&
      y <= frame.height - EDGE_INSET_PX
    );
  };
  const edgeKm = Math.min(frame.width, frame.height) / 2 / frame.scale;
  // Faults whose trace comes within the map's corners (half its diagonal); the others would
  // only leave a stray label at the edge.
  const cornerKm = Math.hypot(frame.width, frame.height) / 2 / frame.scale;
  const shown: Study = {
    ...study,
    communities: study.communities.filter((c) => c.id === props.community.id || inside(c)),
    sources: study.sources.filter(
      (s) => s.kind !== 'fault' || traceFrom(props.community, s).distanceKm <= cornerKm,
    ),
  };
  const boundary = plateBoundary(study);
  const trace = boundary ? traceFrom(props.community, boundary) : undefined;
  return (
    <StudyMap
      tr={props.tr}
      study={shown}
      frame={frame}
      idPrefix={props.idPrefix}
      highlight={props.community.id}
      showZones={false}
      overlay={
        trace && trace.distanceKm > edgeKm ? (
          <PointerToBoundary tr={props.tr} frame={frame} community={props.community} {...trace} />
        ) : undefined
      }
    />
  );
}

/** Length of the pointer and its gap from the map's edge, px. */
const POINTER_PX = 56;
const EDGE_GAP_PX = 14;

/**
 * A plate boundary beyond the map, pointed at: a dashed arrow (drawn as the interface is) at
 * the edge, in its direction, with its distance in words.
 */
function PointerToBoundary(props: {
  readonly tr: Translator;
  readonly frame: MapFrame;
  readonly community: Community;
  readonly distanceKm: number;
  readonly bearingDeg: number;
}) {
  const { tr, frame } = props;
  const [cx, cy] = frame.project([props.community.lon, props.community.lat]);
  const radians = (props.bearingDeg * Math.PI) / 180;
  const dx = Math.sin(radians);
  const dy = -Math.cos(radians);
  // How far along the bearing the village's point is from the frame's edge, px.
  const reach = Math.min(
    dx > 0 ? (frame.width - cx) / dx : dx < 0 ? -cx / dx : Infinity,
    dy > 0 ? (frame.height - cy) / dy : dy < 0 ? -cy / dy : Infinity,
  );
  const tip = [cx + dx * (reach - EDGE_GAP_PX), cy + dy * (reach - EDGE_GAP_PX)] as const;
  const tail = [tip[0] - dx * POINTER_PX, tip[1] - dy * POINTER_PX] as const;
  const head = `${tip[0]},${tip[1]} ${tip[0] - dx * 12 - dy * 7},${tip[1] - dy * 12 + dx * 7} ${tip[0] - dx * 12 + dy * 7},${tip[1] - dy * 12 - dx * 7}`;
  // The words beside the arrow's tip, along the edge, clear of the village in the middle.
  const anchor = dx < -0.3 ? 'start' : dx > 0.3 ? 'end' : 'middle';
  const labelX = tip[0];
  const labelY = tip[1] + (dy < -0.3 ? 28 : dy > 0.3 ? -16 : 20);
  return (
    <g class="boundary-pointer" data-bearing-deg={Math.round(props.bearingDeg)}>
      <line x1={tail[0]} y1={tail[1]} x2={tip[0]} y2={tip[1]} stroke={PAPER} stroke-width={7} />
      <line
        x1={tail[0]}
        y1={tail[1]}
        x2={tip[0]}
        y2={tip[1]}
        stroke={INK}
        stroke-width={3}
        stroke-dasharray="10 4"
      />
      <polygon points={head} fill={INK} />
      <text
        x={labelX}
        y={labelY}
        text-anchor={anchor}
        font-size={12}
        font-style="italic"
        fill={INK}
        paint-order="stroke"
        stroke={PAPER}
        stroke-width={3}
        lang={tr.fallbackLang('material.boundaryPointer')}
      >
        {tr.t('material.boundaryPointer', { km: tr.number(props.distanceKm) })}
      </text>
    </g>
  );
}
