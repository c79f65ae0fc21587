import { describe, expect, test } from 'vitest';
import { fleschKincaidGrade } from '../../../web/format/readability.ts';
import type { TextKey } from '../../../web/text/text-key.ts';
import { EN } from '../helpers/bundles.ts';
import { fill, translator } from '../../../web/text/translator.ts';

/**
 * The community page's prose for residents must read at grade 8 or below by the
 * Flesch–Kincaid grade level (Kincaid et al. 1975; counting rules in web/format/readability.ts).
 * Each block is checked alone, and the whole page's prose together.
 */
const MAX_GRADE = 8;

const en = translator('en');
const chance = en.chance(0.15);

const blocks: Record<string, string> = {
  headline:
    fill(EN['community.headline'], {
      name: 'Harbour Point',
      chance: chance.frequency,
      years: 50,
      percent: chance.percent,
    }) +
    ' ' +
    EN['community.headlineStrongWhat'],
  levels: [
    EN['community.levelIntro'],
    fill(EN['community.level'], { period: '475' }),
    fill(EN['community.levelChance'], { frequency: 'about 1 in 10', years: 50, percent: '10%' }),
  ].join('\n'),
  sources: [
    fill(EN['community.sourcesIntro'], { period: '475' }),
    fill(EN['community.sourcesMean'], { magnitude: '7.1', km: '37' }),
  ].join('\n'),
  curve: EN['community.curveIntro'],
  felt: [
    EN['community.feltIntro'],
    fill(EN['community.feltCounts'], { felt: 'three', strong: 'one' }),
  ].join('\n'),
  safetyBefore: EN['safety.before'],
  safetyDuring: EN['safety.during'],
  safetyAfter: EN['safety.after'],
  tsunami: EN['tsunami.text'],
  limits: [EN['limits.intro'], EN['limits.list'], EN['limits.source']].join('\n'),
  caution: EN['caution.text'],
  bands: (['refer-first', 'refer-soon', 'prepare', 'inform'] as const)
    .map((b) => EN[`band.${b}.meaning` as TextKey])
    .join('\n'),
};
for (let level = 1; level <= 10; level++) {
  blocks[`mmi ${level}`] = [
    EN[`mmi.${level}.feel` as TextKey],
    EN[`mmi.${level}.buildings` as TextKey],
  ].join('\n');
}

describe(`community-page prose reads at grade ${MAX_GRADE} or below (Flesch–Kincaid)`, () => {
  for (const [name, text] of Object.entries(blocks)) {
    test(name, () => {
      const grade = fleschKincaidGrade(text);
      expect(grade, `${name}: grade ${grade.toFixed(2)}\n${text}`).toBeLessThanOrEqual(MAX_GRADE);
    });
  }

  test('all of it together', () => {
    const grade = fleschKincaidGrade(Object.values(blocks).join('\n'));
    expect(grade, `grade ${grade.toFixed(2)}`).toBeLessThanOrEqual(MAX_GRADE);
  });
});
