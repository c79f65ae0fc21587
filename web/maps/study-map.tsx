import type { Child } from 'hono/jsx';
import type { ScreeningBandId } from '../../api/engine/intensity/screening-band.ts';
import type { LonLat, Source, Study } from '../../api/engine/model.ts';
import { BAND_STYLES, INK, MAP_COLOURS, PAPER } from '../style/palette.ts';
import type { Translator } from '../text/translator.ts';
import { LegendBox, LegendLine, LegendSymbol } from '../components/legend-symbol.tsx';
import { BandMarker } from './band-marker.tsx';
import { MapFurniture, ZoneHatch } from './map-furniture.tsx';
import type { MapFrame } from './map-frame.ts';
import { placeLabels, type LabelRequest } from './label-placement.ts';

export interface StudyMapProps {
  readonly tr: Translator;
  readonly study: Study;
  readonly frame: MapFrame;
  /** Ids unique to this map on its page (patterns, title). */
  readonly idPrefix: string;
  /** Each community's band, once screened; unscreened communities are drawn as plain circles. */
  readonly bands?: ReadonlyMap<string, ScreeningBandId>;
  /** Community drawn larger (the community page's own). */
  readonly highlight?: string;
  /**
   * A layer of grid cells (a hazard map, maps/hazard-layer.tsx; a scenario's shaking): drawn
   * above the land and below the coast, sources and communities.
   */
  readonly hazardLayer?: Child;
  /** Id of the text that describes the layer in words (its range and download), for assistive technology. */
  readonly describedBy?: string;
  /** Drawn above everything else (scenario rupture). */
  readonly overlay?: Child;
  readonly labels?: boolean;
  /** Zones hatched (default) or left out (a scenario map, where the shaking layer must read clearly). */
  readonly showZones?: boolean;
  /** Text added to a community's label, by id (a scenario's MMI). */
  readonly labelSuffix?: ReadonlyMap<string, string>;
}

const lineOf = (s: Source & { kind: 'fault' }) => ({
  type: 'LineString' as const,
  coordinates: s.trace.map((p) => [...p]),
});
/**
 * A contoured fault's contours, each with its depth, km. The top one is the fault's trace, drawn
 * as the trace; it is labelled with its depth like the others.
 */
const contoursOf = (s: Source & { kind: 'fault' }) =>
  (s.contours?.lines ?? []).map((line, k) => ({
    top: k === 0,
    line: { type: 'LineString' as const, coordinates: line.map((p) => [...p]) },
    end: line[line.length - 1] as LonLat,
    depthKm: s.contours?.depthsKm[k] as number,
  }));
const polygonOf = (rings: Study['outline'] & object) => ({
  type: 'Polygon' as const,
  coordinates: rings.map((r) => r.map((p) => [...p])),
});

/** The study drawn from its own data: outline, zones, faults, points, communities; scale bar and north arrow. */
export function StudyMap(props: StudyMapProps) {
  const { tr, study, frame, idPrefix } = props;
  const hatch = `${idPrefix}-hatch`;
  const titleId = `${idPrefix}-title`;
  const faults = study.sources.filter((s): s is Source & { kind: 'fault' } => s.kind === 'fault');
  const sizeOf = (id: string) => (props.highlight === id ? 9 : 6.5);
  const communityPoints = study.communities.map((c) => frame.project([c.lon, c.lat]));
  const faultPoints = faults.map((s) =>
    frame.project(s.trace[Math.floor((s.trace.length - 1) / 2)] ?? (s.trace[0] as LonLat)),
  );
  const requests: LabelRequest[] = [
    ...study.communities.map((c, i) => ({
      x: (communityPoints[i] as readonly [number, number])[0],
      y: (communityPoints[i] as readonly [number, number])[1],
      text: `${c.name}${props.labelSuffix?.get(c.id) ?? ''}`,
      fontSize: props.highlight === c.id ? 14 : 12,
      clearance: sizeOf(c.id),
    })),
    ...faults.map((s, i) => ({
      x: (faultPoints[i] as readonly [number, number])[0],
      y: (faultPoints[i] as readonly [number, number])[1],
      alternatives: s.trace.map((p) => frame.project(p)),
      text: s.name,
      fontSize: 11,
      clearance: 3,
    })),
  ];
  const placed = props.labels === false ? [] : placeLabels(requests, frame.width, frame.height);
  // Over a layer of cells, dark lines and marks get a paper halo so they show on the darkest cells too.
  const halo = props.hazardLayer !== undefined;
  const communityLabel = (i: number) => placed[i];
  const faultLabel = (i: number) => placed[study.communities.length + i];
  return (
    <svg
      class="map"
      viewBox={`0 0 ${frame.width} ${frame.height}`}
      width={frame.width}
      height={frame.height}
      role="img"
      aria-labelledby={titleId}
      aria-describedby={props.describedBy}
      font-family="inherit"
    >
      <title id={titleId} lang={tr.fallbackLang('map.title')}>
        {tr.t('map.title', { name: study.name })}
      </title>
      <defs>
        <ZoneHatch id={hatch} />
      </defs>
      {/* Sea only where an outline says where the land is; without one the background is blank. */}
      <rect
        width={frame.width}
        height={frame.height}
        fill={(study.outline?.length ?? 0) > 0 ? MAP_COLOURS.sea : PAPER}
      />
      <g class="map-land">
        {(study.outline ?? []).map((ring) => (
          <path
            d={frame.path(polygonOf([ring]))}
            fill={MAP_COLOURS.land}
            stroke={MAP_COLOURS.coast}
            stroke-width={1.2}
          />
        ))}
      </g>
      <g class="map-hazard-layer" data-layer="hazard">
        {props.hazardLayer}
      </g>
      <g class="map-coast">
        {(study.outline ?? []).map((ring) => (
          <path
            d={frame.path(polygonOf([ring]))}
            fill="none"
            stroke={MAP_COLOURS.coast}
            stroke-width={1.2}
          />
        ))}
      </g>
      <g class="map-zones">
        {props.showZones !== false &&
          study.sources
            .filter((s) => s.kind === 'zone')
            .map((s) => (
              <path
                d={frame.path(polygonOf((s as Source & { kind: 'zone' }).rings))}
                fill={`url(#${hatch})`}
                fill-opacity={0.35}
                stroke={MAP_COLOURS.zoneHatch}
                stroke-width={1}
                stroke-dasharray="5 3"
                data-source={s.id}
              />
            ))}
      </g>
      <g class="map-faults">
        {faults.map((s, i) => {
          const interfaceLike = s.setting === 'interface';
          const label = faultLabel(i);
          return (
            <g data-source={s.id}>
              {contoursOf(s).map((contour) => {
                const [x, y] = frame.project(contour.end);
                return (
                  <g
                    class={contour.top ? 'map-contour-top' : 'map-contour'}
                    data-depth-km={contour.depthKm}
                  >
                    {!contour.top && (
                      <path
                        d={frame.path(contour.line)}
                        fill="none"
                        stroke={MAP_COLOURS.fault}
                        stroke-width={1}
                        stroke-dasharray="2 3"
                      />
                    )}
                    <text
                      x={x}
                      y={y - 3}
                      text-anchor="middle"
                      font-size={10}
                      fill={INK}
                      paint-order="stroke"
                      stroke={PAPER}
                      stroke-width={3}
                      lang={tr.fallbackLang('map.contourDepth')}
                    >
                      {tr.t('map.contourDepth', { depth: String(Math.round(contour.depthKm)) })}
                    </text>
                  </g>
                );
              })}
              {(interfaceLike || halo) && (
                <path
                  d={frame.path(lineOf(s))}
                  fill="none"
                  stroke={PAPER}
                  stroke-width={interfaceLike ? 7 : 5}
                />
              )}
              <path
                d={frame.path(lineOf(s))}
                fill="none"
                stroke={MAP_COLOURS.fault}
                stroke-width={interfaceLike ? 3 : 2}
                stroke-dasharray={interfaceLike ? '10 4' : undefined}
                stroke-linecap="round"
              />
              {label && (
                <text
                  x={label.x}
                  y={label.y}
                  text-anchor={label.anchor}
                  font-size={11}
                  font-style="italic"
                  fill={INK}
                  class="map-label map-label-source"
                  paint-order="stroke"
                  stroke={PAPER}
                  stroke-width={3}
                >
                  {s.name}
                </text>
              )}
            </g>
          );
        })}
      </g>
      <g class="map-points">
        {study.sources
          .filter((s): s is Source & { kind: 'point' } => s.kind === 'point')
          .map((s) => {
            const [x, y] = frame.project(s.location);
            const cross = `M${x - 5},${y - 5}L${x + 5},${y + 5}M${x - 5},${y + 5}L${x + 5},${y - 5}`;
            return (
              <g data-source={s.id}>
                {halo && <path d={cross} stroke={PAPER} stroke-width={5} stroke-linecap="round" />}
                <path d={cross} stroke={INK} stroke-width={2} />
              </g>
            );
          })}
      </g>
      {props.overlay}
      <g class="map-communities">
        {study.communities.map((c, i) => {
          const [x, y] = communityPoints[i] as readonly [number, number];
          const band = props.bands?.get(c.id);
          const style = band ? BAND_STYLES[band] : undefined;
          const size = sizeOf(c.id);
          const label = communityLabel(i);
          return (
            <g data-community={c.id}>
              <BandMarker
                shape={style?.shape ?? 'circle'}
                fill={style?.fill ?? PAPER}
                size={size}
                x={x}
                y={y}
                halo={props.hazardLayer !== undefined}
              />
              {label && (
                <text
                  x={label.x}
                  y={label.y}
                  text-anchor={label.anchor}
                  font-size={props.highlight === c.id ? 14 : 12}
                  font-weight={props.highlight === c.id ? 'bold' : undefined}
                  fill={INK}
                  paint-order="stroke"
                  stroke={PAPER}
                  stroke-width={3}
                  class="map-label"
                >
                  {`${c.name}${props.labelSuffix?.get(c.id) ?? ''}`}
                </text>
              )}
            </g>
          );
        })}
      </g>
      <MapFurniture frame={frame} tr={tr} />
    </svg>
  );
}

/** The legend of a study map, in words, with the symbols it explains. */
export function StudyMapLegend(props: {
  readonly tr: Translator;
  readonly idPrefix: string;
  readonly bands: boolean;
  readonly study: Study;
  readonly extra?: Child;
}) {
  const { tr, study } = props;
  const has = (kind: Source['kind'], setting?: string) =>
    study.sources.some(
      (s) =>
        s.kind === kind &&
        (setting === undefined || (setting === 'interface') === (s.setting === 'interface')),
    );
  const hatch = `${props.idPrefix}-legend-hatch`;
  const entry = (symbol: Child, words: Child) => (
    <li>
      <LegendSymbol height={16}>{symbol}</LegendSymbol> {words}
    </li>
  );
  return (
    <div class="map-legend">
      <h3 class="legend-title">{tr.text('map.legend')}</h3>
      <svg width="0" height="0" class="defs-only" aria-hidden="true" focusable="false">
        <defs>
          <ZoneHatch id={hatch} />
        </defs>
      </svg>
      <ul>
        {(study.outline?.length ?? 0) > 0 &&
          entry(
            <LegendBox fill={MAP_COLOURS.land} stroke={MAP_COLOURS.coast} />,
            tr.text('map.land'),
          )}
        {(study.outline?.length ?? 0) > 0
          ? entry(
              <LegendBox fill={MAP_COLOURS.sea} stroke={MAP_COLOURS.grid} />,
              tr.text('map.sea'),
            )
          : entry(<LegendBox fill={PAPER} stroke={MAP_COLOURS.grid} />, tr.text('map.noOutline'))}
        {has('fault', 'interface') &&
          entry(
            <>
              <LegendLine height={16} stroke={PAPER} strokeWidth={7} />
              <LegendLine height={16} stroke={INK} strokeWidth={3} strokeDasharray="10 4" />
            </>,
            tr.text('map.interface'),
          )}
        {has('fault', 'crustal') &&
          entry(<LegendLine height={16} stroke={INK} strokeWidth={2} />, tr.text('map.fault'))}
        {study.sources.some((s) => s.kind === 'fault' && s.contours) &&
          entry(
            <LegendLine
              height={16}
              stroke={MAP_COLOURS.fault}
              strokeWidth={1}
              strokeDasharray="2 3"
            />,
            tr.text('map.contours'),
          )}
        {has('zone') &&
          entry(
            <LegendBox
              fill={`url(#${hatch})`}
              fillOpacity={0.6}
              stroke={MAP_COLOURS.zoneHatch}
              strokeDasharray="5 3"
            />,
            tr.text('map.zone'),
          )}
        {has('point') &&
          entry(
            <path d="M9,3L19,13M9,13L19,3" stroke={INK} stroke-width={2} />,
            tr.text('map.point'),
          )}
        {props.bands ? (
          <li>
            {tr.text('map.community')}:
            <ul class="legend-bands">
              {(['refer-first', 'refer-soon', 'prepare', 'inform'] as const).map((id) =>
                entry(
                  <BandMarker
                    shape={BAND_STYLES[id].shape}
                    fill={BAND_STYLES[id].fill}
                    size={6}
                    x={14}
                    y={8}
                  />,
                  tr.text(`band.${id}`),
                ),
              )}
            </ul>
          </li>
        ) : (
          entry(
            <BandMarker shape="circle" fill={PAPER} size={6} x={14} y={8} />,
            tr.text('overview.communities'),
          )
        )}
        {props.extra}
      </ul>
      <p class="legend-note">{tr.text('map.projection')}</p>
    </div>
  );
}
