import { INK, MAP_COLOURS, PAPER } from '../style/palette.ts';
import type { Translator } from '../text/translator.ts';
import { scaleBarKm, type MapFrame } from './map-frame.ts';

/** Scale bar (km) in the lower left and north arrow in the upper right of a map. */
export function MapFurniture(props: { readonly frame: MapFrame; readonly tr: Translator }) {
  const { frame, tr } = props;
  const km = scaleBarKm(frame.scale, frame.width / 4);
  const barPx = km * frame.scale;
  const x0 = 16;
  const y0 = frame.height - 18;
  const nx = frame.width - 30;
  const ny = 20;
  return (
    <g class="map-furniture">
      <g class="scale-bar">
        <rect x={x0 - 6} y={y0 - 22} width={barPx + 40} height={32} fill={PAPER} opacity={0.85} />
        <rect x={x0} y={y0 - 4} width={barPx / 2} height={6} fill={INK} />
        <rect
          x={x0 + barPx / 2}
          y={y0 - 4}
          width={barPx / 2}
          height={6}
          fill={PAPER}
          stroke={INK}
          stroke-width={1}
        />
        <text x={x0} y={y0 - 8} font-size={12} fill={INK}>
          0
        </text>
        <text
          x={x0 + barPx}
          y={y0 - 8}
          font-size={12}
          fill={INK}
          text-anchor="middle"
          lang={tr.fallbackLang('map.scale')}
        >
          {tr.t('map.scale', { km: tr.number(km) })}
        </text>
      </g>
      <g class="north-arrow" transform={`translate(${nx},${ny})`}>
        <circle r={17} cy={12} fill={PAPER} opacity={0.85} />
        <polygon points="0,-2 7,18 0,13 -7,18" fill={INK} />
        <text
          y={30}
          font-size={11}
          fill={INK}
          text-anchor="middle"
          lang={tr.fallbackLang('map.north')}
        >
          {tr.t('map.north')}
        </text>
      </g>
      <rect
        x={0.5}
        y={0.5}
        width={frame.width - 1}
        height={frame.height - 1}
        fill="none"
        stroke={MAP_COLOURS.axis}
        stroke-width={1}
      />
    </g>
  );
}

/** Hatch pattern of zones, with an id unique to the map it is in. */
export function ZoneHatch(props: { readonly id: string }) {
  return (
    <pattern
      id={props.id}
      patternUnits="userSpaceOnUse"
      width={8}
      height={8}
      patternTransform="rotate(45)"
    >
      <line x1={0} y1={0} x2={0} y2={8} stroke={MAP_COLOURS.zoneHatch} stroke-width={1.4} />
    </pattern>
  );
}
