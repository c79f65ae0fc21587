import { BAND_STYLES } from '../style/palette.ts';
import type { ScreeningBandId } from '../../api/engine/intensity/screening-band.ts';
import type { Translator } from '../text/translator.ts';
import { BandMarker } from '../maps/band-marker.tsx';

/** A band's shape and colour beside its name: the name carries the meaning, the swatch repeats it. */
export function BandSwatch(props: { readonly tr: Translator; readonly bandId: ScreeningBandId }) {
  const style = BAND_STYLES[props.bandId];
  return (
    <span class={`band band-${props.bandId}`}>
      <svg
        class="band-icon"
        viewBox="-8 -8 16 16"
        width="16"
        height="16"
        aria-hidden="true"
        focusable="false"
      >
        <BandMarker shape={style.shape} fill={style.fill} size={6.5} />
      </svg>
      <span class="band-name">{props.tr.text(`band.${props.bandId}`)}</span>
    </span>
  );
}
