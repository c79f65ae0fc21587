import { describe, expect, test } from 'vitest';
import { naturalFrequency, percentText } from '../../../web/format/natural-frequency.ts';
import { translator } from '../../../web/text/translator.ts';

// The rule under test is ours (stated in web/format/natural-frequency.ts), and so is the worked
// example "about 1 in 8 over the next 50 years (12%)": 1/0.12 = 8.3, rounded to 8.
describe('naturalFrequency', () => {
  test('the worked example: 12% is about 1 in 8', () => {
    expect(naturalFrequency(0.12)).toEqual({ kind: 'one-in', n: 8 });
    expect(percentText(0.12)).toBe('12');
    const en = translator('en');
    const c = en.chance(0.12);
    expect(
      en.t('chance.overYears', { frequency: c.frequency, years: 50, percent: c.percent }),
    ).toBe('about 1 in 8 over the next 50 years (12%)');
  });

  test('100 / P (P the shown percentage) rounds to the nearest whole number up to 20', () => {
    expect(naturalFrequency(0.3)).toEqual({ kind: 'one-in', n: 3 }); // 3.33
    expect(naturalFrequency(0.15)).toEqual({ kind: 'one-in', n: 7 }); // 6.67
    expect(naturalFrequency(0.1)).toEqual({ kind: 'one-in', n: 10 });
    expect(naturalFrequency(0.05)).toEqual({ kind: 'one-in', n: 20 });
  });

  test('the frequency restates the shown percentage: 9.5% is 10%, so about 1 in 10, never 1 in 11', () => {
    const en = translator('en');
    expect(en.chance(0.095)).toEqual({ frequency: 'about 1 in 10', percent: '10%' });
    expect(en.chance(0.1)).toEqual({ frequency: 'about 1 in 10', percent: '10%' });
    expect(en.chance(0.104)).toEqual({ frequency: 'about 1 in 10', percent: '10%' });
    expect(en.chance(0.0949)).toEqual({ frequency: 'about 1 in 11', percent: '9%' });
    // Every shown percentage from 2% to 100% gets exactly one frequency, whatever the probability behind it.
    for (let percent = 2; percent <= 100; percent++) {
      const low = en.chance(Math.max(0, (percent - 0.499) / 100));
      const high = en.chance(Math.min(1, (percent + 0.499) / 100));
      expect(low.percent).toBe(`${percent}%`);
      expect(high).toEqual(low);
    }
  });

  test('above 20, 100 / P keeps two significant figures', () => {
    expect(naturalFrequency(0.04)).toEqual({ kind: 'one-in', n: 25 });
    expect(naturalFrequency(0.0033)).toEqual({ kind: 'one-in', n: 330 }); // 0.3%: 333
    expect(naturalFrequency(0.0021)).toEqual({ kind: 'one-in', n: 500 }); // 0.2%
    expect(naturalFrequency(0.001)).toEqual({ kind: 'one-in', n: 1000 });
  });

  test('below 1 in 1,000, and zero, say "less than"', () => {
    expect(naturalFrequency(0.00099)).toEqual({ kind: 'less-than', n: 1000 });
    expect(naturalFrequency(0)).toEqual({ kind: 'less-than', n: 1000 });
    expect(translator('en').chance(0).frequency).toBe('less than 1 in 1,000');
  });

  test('from 40%, K in 10, so both sides of an even chance read alike; from 95%, more than 9 in 10', () => {
    expect(naturalFrequency(0.394)).toEqual({ kind: 'one-in', n: 3 }); // 39%
    expect(naturalFrequency(0.395)).toEqual({ kind: 'in-ten', k: 4 }); // 40%
    expect(naturalFrequency(0.49)).toEqual({ kind: 'in-ten', k: 5 });
    expect(naturalFrequency(0.5)).toEqual({ kind: 'in-ten', k: 5 });
    expect(naturalFrequency(0.51)).toEqual({ kind: 'in-ten', k: 5 });
    expect(naturalFrequency(0.69)).toEqual({ kind: 'in-ten', k: 7 });
    expect(naturalFrequency(0.9449)).toEqual({ kind: 'in-ten', k: 9 });
    expect(naturalFrequency(0.95)).toEqual({ kind: 'more-than-nine-in-ten' });
    expect(naturalFrequency(1)).toEqual({ kind: 'more-than-nine-in-ten' });
  });

  test('percentages: whole from 1%, one significant figure below, "less than 0.1%" below that', () => {
    expect(percentText(0.155)).toBe('16');
    expect(percentText(0.01)).toBe('1');
    expect(percentText(0.0034)).toBe('0.3');
    expect(percentText(0.00096)).toBe('<0.1');
    expect(translator('en').chance(0.00096).percent).toBe('less than 0.1%');
    expect(translator('fr').chance(0.0034).percent).toBe('0,3 %');
  });

  test('a value that is not a probability is refused, never shown as NaN', () => {
    expect(() => naturalFrequency(Number.NaN)).toThrow(
      /expected a probability in \[0, 1\], got NaN/,
    );
    expect(() => percentText(1.2)).toThrow(/got 1.2/);
  });
});
