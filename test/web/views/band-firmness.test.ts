import { describe, expect, it } from 'vitest';
import type { BandRobustness } from '../../../api/engine/results.ts';
import { translator } from '../../../web/text/translator.ts';
import { bandFirmnessText } from '../../../web/views/band-firmness.tsx';

// A made-up robustness (wording only; the numbers are not checked here).
const robustness: BandRobustness = {
  bandShares: { 'refer-first': 0.42, 'refer-soon': 0.58, prepare: 0, inform: 0 },
  combinations: 576,
  sampled: null,
  hinges: [
    {
      choice: 'shape',
      setting: 'crustal',
      sourceId: 'fault-a',
      sourceName: 'Fault A',
      mmiShift: 0.34,
      changesBand: true,
      alternatives: [
        { value: 'gutenberg-richter', weight: 0.5, mmi475: 8.14, bandId: 'refer-first' },
        { value: 'characteristic', weight: 0.5, mmi475: 7.8, bandId: 'refer-soon' },
      ],
    },
  ],
};

describe('band firmness in words', () => {
  it('names the weight in each band and the choice the band hinges on most (English)', () => {
    expect(bandFirmnessText(translator('en'), robustness)).toBe(
      "Of the weight of the choices behind these numbers, 42% gives Refer first, 58% gives Refer soon. The band hinges most on Fault A's magnitude–frequency shape: with gutenberg-richter, Refer first, with characteristic, Refer soon.",
    );
  });

  it('in French, with the band names of the French bundle or the English fallback', () => {
    const text = bandFirmnessText(translator('fr'), robustness);
    expect(text).toContain('La classe dépend surtout de la forme magnitude–fréquence de Fault A');
  });

  it('names the one band every alternative gives, and starts each sentence with a capital', () => {
    const steady: BandRobustness = {
      ...robustness,
      bandShares: { 'refer-first': 0, 'refer-soon': 1, prepare: 0, inform: 0 },
      hinges: [
        {
          choice: 'groundMotion',
          setting: 'interface',
          mmiShift: 0.21,
          changesBand: false,
          alternatives: [
            { value: 'model-a', weight: 0.5, mmi475: 7.62, bandId: 'refer-soon' },
            { value: 'model-b', weight: 0.5, mmi475: 7.41, bandId: 'refer-soon' },
          ],
        },
      ],
    };
    const en = bandFirmnessText(translator('en'), steady);
    expect(en).toBe(
      'Of the weight of the choices behind these numbers, 100% gives Refer soon. No single choice moves it to another band. Even the plate-interface ground-motion model, the choice that moves its intensity most, gives Refer soon with every alternative.',
    );
    const fr = bandFirmnessText(translator('fr'), steady);
    expect(fr).toContain(
      'Aucun choix seul ne change la classe. Même le modèle de mouvement du sol',
    );
    for (const text of [en, fr]) {
      expect(text).not.toContain('model-a');
      for (const sentence of text.split(/(?<=\.) /))
        expect(sentence[0], sentence).toBe(sentence[0]!.toLocaleUpperCase());
    }
  });

  it('says when no single choice changes the band', () => {
    const steady = {
      ...robustness,
      bandShares: { 'refer-first': 0, 'refer-soon': 1, prepare: 0, inform: 0 },
      hinges: [{ ...robustness.hinges[0]!, changesBand: false }],
    };
    expect(bandFirmnessText(translator('en'), steady)).toContain(
      'No single choice moves it to another band.',
    );
  });
});
