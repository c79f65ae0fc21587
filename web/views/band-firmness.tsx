import type { ScreeningBandId } from '../../api/engine/intensity/screening-band.ts';
import { SCREENING_BANDS } from '../../api/engine/intensity/screening-band.ts';
import type { BandHinge, BandRobustness } from '../../api/engine/results.ts';
import type { TextKey } from '../text/text-key.ts';
import type { Translator } from '../text/translator.ts';

/** Bands with less weight than this are not named (they would read as "0%"). */
const MIN_NAMED_SHARE = 0.005;

/** "Vennick Fault's magnitude–frequency shape" or "the crustal ground-motion model". */
function subject(tr: Translator, hinge: BandHinge): string {
  const choice = tr.t(`firmness.choice.${hinge.choice}` as TextKey);
  return hinge.sourceName
    ? tr.t('firmness.subject.source', { source: hinge.sourceName, choice })
    : tr.t('firmness.subject.setting', {
        choice,
        setting: tr.t(`firmness.setting.${hinge.setting}` as TextKey),
      });
}

const bandName = (tr: Translator, id: string): string =>
  tr.t(`band.${id as ScreeningBandId}` as TextKey);

/**
 * How firm a community's band is, in words: where the logic tree's weight falls, and the one
 * choice the band hinges on most (with the band each of its alternatives would give). When no
 * alternative of that choice changes the band, the band they all give is named once instead.
 * The choice is never the first word of a sentence, so its lower-case article stays right.
 */
export function bandFirmnessText(tr: Translator, robustness: BandRobustness): string {
  const shares = SCREENING_BANDS.filter(
    (b) => (robustness.bandShares[b.id] ?? 0) >= MIN_NAMED_SHARE,
  )
    .map((b) =>
      tr.t('firmness.share', {
        percent: `${Math.round(robustness.bandShares[b.id]! * 100)}%`,
        band: bandName(tr, b.id),
      }),
    )
    .join(', ');
  const sentences = [tr.t('firmness.shares', { shares })];
  const first = robustness.hinges[0];
  if (first && first.mmiShift > 0 && first.changesBand) {
    const alternatives = first.alternatives
      .map((a) => tr.t('firmness.alternative', { value: a.value, band: bandName(tr, a.bandId) }))
      .join(', ');
    sentences.push(tr.t('firmness.hinge', { subject: subject(tr, first), alternatives }));
  } else if (first && first.mmiShift > 0) {
    // Every alternative gives the same band (changesBand false): named once, not listed.
    const band = first.alternatives[0]?.bandId ?? '';
    sentences.push(
      tr.t('firmness.steadyBand', { subject: subject(tr, first), band: bandName(tr, band) }),
    );
  }
  return sentences.join(' ');
}

/** The community page's paragraph on how firm its band is. */
export function BandFirmness(props: { tr: Translator; robustness: BandRobustness | undefined }) {
  const { tr, robustness } = props;
  if (!robustness) return null;
  return (
    <p class="band-firmness">
      {tr.text('firmness.title')}: {bandFirmnessText(tr, robustness)}
    </p>
  );
}
