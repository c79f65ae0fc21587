import { describe, expect, it } from 'vitest';
import { mmiRoman } from '../../../api/engine/intensity/mmi-roman.ts';

describe('mmiRoman (rounded to the nearest level)', () => {
  it('names the nearest level: 6.97 is VII, 6.49 is VI, 6.5 is VII', () => {
    expect([
      mmiRoman(1),
      mmiRoman(4.99),
      mmiRoman(6),
      mmiRoman(6.49),
      mmiRoman(6.5),
      mmiRoman(6.97),
      mmiRoman(8.57),
      mmiRoman(10),
    ]).toEqual(['I', 'V', 'VI', 'VI', 'VII', 'VII', 'IX', 'X']);
  });
  it('holds to I–XII', () => {
    expect([mmiRoman(0.2), mmiRoman(12), mmiRoman(14)]).toEqual(['I', 'XII', 'XII']);
  });
});
