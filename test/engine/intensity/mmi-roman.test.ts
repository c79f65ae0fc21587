import { describe, expect, it } from 'vitest';
import { mmiRoman } from '../../../api/engine/intensity/mmi-roman.ts';

describe('mmiRoman (rounded down to the level reached; common practice)', () => {
  it('names the level reached', () => {
    expect([mmiRoman(1), mmiRoman(4.99), mmiRoman(6), mmiRoman(6.8), mmiRoman(7), mmiRoman(8.57), mmiRoman(10)]).toEqual([
      'I', 'IV', 'VI', 'VI', 'VII', 'VIII', 'X',
    ]);
  });
  it('holds to I–XII', () => {
    expect([mmiRoman(0.2), mmiRoman(12), mmiRoman(14)]).toEqual(['I', 'XII', 'XII']);
  });
});
