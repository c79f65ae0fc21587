import { describe, expect, it } from 'vitest';
import { createRandom, randomFromState, seedState, splitMix64 } from '../../api/engine/random.ts';
import { expectClose } from '../helpers/close.ts';

describe('xoshiro128**', () => {
  it('gives the outputs of the published algorithm from a known state', () => {
    // Hand computation from the xoshiro128** step of Blackman & Vigna (2021), ACM TOMS 47(4),
    // art. 36 (result = rotl(s1 * 5, 7) * 9; t = s1 << 9; s2 ^= s0; s3 ^= s1; s1 ^= s2; s0 ^= s3;
    // s2 ^= t; s3 = rotl(s3, 11)), from state [1, 2, 3, 4]: 2·5 = 10, rotl 7 = 1280, ·9 = 11520;
    // next state [7, 0, 1026, 12288] gives 0; then [12295, 1029, 1029, 25165824] gives
    // 5145·128·9 = 5927040; then s1 = 12295 gives 61475·128·9 = 70819200.
    const r = randomFromState([1, 2, 3, 4]);
    expect([r.nextUint32(), r.nextUint32(), r.nextUint32(), r.nextUint32()]).toEqual([
      11520, 0, 5927040, 70819200,
    ]);
  });

  it('refuses the all-zero state, which the generator never leaves', () => {
    expect(() => randomFromState([0, 0, 0, 0])).toThrow(/all zero/);
  });
});

describe('SplitMix64 seeding', () => {
  it('matches the reference outputs from state 0', () => {
    // SplitMix64 from state 0 (Steele, Lea & Flood 2014, with the mixing constants of the
    // xoshiro authors' splitmix64.c): 0xe220a8397b1dcdaf, 0x6e789e6aa1b965f4,
    // 0x06c45d188009454f — from memory.
    let state = 0n;
    const outputs: bigint[] = [];
    for (let i = 0; i < 3; i++) {
      const step = splitMix64(state);
      state = step.state;
      outputs.push(step.output);
    }
    expect(outputs).toEqual([0xe220a8397b1dcdafn, 0x6e789e6aa1b965f4n, 0x06c45d188009454fn]);
  });

  it('fills the state from the low and high halves of two outputs', () => {
    // From the reference outputs above: low then high 32 bits of each.
    expect(seedState(0)).toEqual([0x7b1dcdaf, 0xe220a839, 0xa1b965f4, 0x6e789e6a]);
  });

  it('refuses a seed that is not a safe integer', () => {
    expect(() => createRandom(1.5)).toThrow(/safe integer/);
  });
});

describe('uniform floats', () => {
  it('are reproducible from the seed', () => {
    const a = createRandom(2024);
    const b = createRandom(2024);
    const c = createRandom(2025);
    const first = Array.from({ length: 5 }, () => a.nextFloat());
    expect(Array.from({ length: 5 }, () => b.nextFloat())).toEqual(first);
    expect(Array.from({ length: 5 }, () => c.nextFloat())).not.toEqual(first);
  });

  it('have the mean 1/2 and variance 1/12 of the uniform distribution', () => {
    // Uniform on [0, 1): mean 1/2, variance 1/12 (textbook). With n = 200 000 draws the sample
    // mean has standard error sqrt(1/12 / n) = 6.5e-4; the tolerance is 4 of those. The sample
    // variance has standard error sqrt((1/80 − 1/144) / n) = 1.7e-4; tolerance 4 of those.
    const r = createRandom(7);
    const n = 200_000;
    let sum = 0;
    let sumSq = 0;
    let outside = 0;
    for (let i = 0; i < n; i++) {
      const u = r.nextFloat();
      sum += u;
      sumSq += u * u;
      if (!(u >= 0 && u < 1)) outside++;
    }
    expect(outside).toBe(0);
    const mean = sum / n;
    expectClose(mean, 0.5, 4 * Math.sqrt(1 / 12 / n), 'uniform mean 1/2 (textbook)');
    expectClose(
      sumSq / n - mean * mean,
      1 / 12,
      4 * Math.sqrt((1 / 80 - 1 / 144) / n),
      'uniform variance 1/12 (textbook)',
    );
  });

  it('nextOpenFloat never returns 0', () => {
    const r = createRandom(11);
    let zeros = 0;
    for (let i = 0; i < 10_000; i++) if (!(r.nextOpenFloat() > 0)) zeros++;
    expect(zeros).toBe(0);
  });
});
