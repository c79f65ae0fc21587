/**
 * The engine's only source of randomness: a seeded generator passed in by the caller, so a
 * synthetic catalog or a sample is reproducible from its seed.
 *
 * Generator: xoshiro128** of Blackman & Vigna (2021), "Scrambled linear pseudorandom number
 * generators", ACM Transactions on Mathematical Software 47(4), article 36,
 * doi:10.1145/3460772 — 128 bits of state, period 2^128 − 1, 32-bit outputs.
 * Seeding: the 128-bit state is filled from two outputs of SplitMix64 (Steele, Lea & Flood 2014,
 * "Fast splittable pseudorandom number generators", OOPSLA; with the mixing constants of the
 * authors' reference seeding code, as Blackman & Vigna recommend — from memory), which never
 * leaves the state all zero and decorrelates neighbouring seeds.
 */

/** A stream of pseudo-random numbers. Each call advances the stream. */
export interface RandomSource {
  /** An integer uniform in [0, 2^32). */
  nextUint32(): number;
  /** A float uniform in [0, 1), 53 random bits. */
  nextFloat(): number;
  /** A float uniform in (0, 1): safe under a logarithm. */
  nextOpenFloat(): number;
}

export type XoshiroState = readonly [number, number, number, number];

const rotl = (x: number, k: number): number => ((x << k) | (x >>> (32 - k))) >>> 0;

const MASK_64 = (1n << 64n) - 1n;

/** One SplitMix64 step: the new 64-bit state and its output. */
export function splitMix64(state: bigint): { readonly state: bigint; readonly output: bigint } {
  const next = (state + 0x9e3779b97f4a7c15n) & MASK_64;
  let z = next;
  z = ((z ^ (z >> 30n)) * 0xbf58476d1ce4e5b9n) & MASK_64;
  z = ((z ^ (z >> 27n)) * 0x94d049bb133111ebn) & MASK_64;
  return { state: next, output: z ^ (z >> 31n) };
}

/** The xoshiro128** state a seed expands to (low 32 bits of each SplitMix64 output first). */
export function seedState(seed: number): XoshiroState {
  if (!Number.isSafeInteger(seed)) throw new RangeError(`seed must be a safe integer; got ${seed}`);
  let s = BigInt.asUintN(64, BigInt(seed));
  const words: number[] = [];
  for (let i = 0; i < 2; i++) {
    const step = splitMix64(s);
    s = step.state;
    words.push(Number(step.output & 0xffffffffn), Number(step.output >> 32n));
  }
  return words as unknown as XoshiroState;
}

/** A generator started from an explicit xoshiro128** state (not all zero). */
export function randomFromState(state: XoshiroState): RandomSource {
  const s = Uint32Array.from(state);
  if (s[0] === 0 && s[1] === 0 && s[2] === 0 && s[3] === 0) {
    throw new RangeError('xoshiro128** state must not be all zero');
  }
  const nextUint32 = (): number => {
    const s0 = s[0] as number;
    const s1 = s[1] as number;
    const result = Math.imul(rotl(Math.imul(s1, 5) >>> 0, 7), 9) >>> 0;
    const t = (s1 << 9) >>> 0;
    s[2] = (s[2] as number) ^ s0;
    s[3] = (s[3] as number) ^ s1;
    s[1] = s1 ^ (s[2] as number);
    s[0] = s0 ^ (s[3] as number);
    s[2] = (s[2] as number) ^ t;
    s[3] = rotl(s[3] as number, 11);
    return result;
  };
  // 53-bit float from the top 27 and 26 bits of two outputs: every double in [0, 1) on the
  // 2^-53 grid equally likely (common practice).
  const nextFloat = (): number =>
    ((nextUint32() >>> 5) * 67108864 + (nextUint32() >>> 6)) / 9007199254740992;
  const nextOpenFloat = (): number => {
    for (;;) {
      const u = nextFloat();
      if (u > 0) return u;
    }
  };
  return { nextUint32, nextFloat, nextOpenFloat };
}

/** A generator from an integer seed; the same seed always gives the same stream. */
export function createRandom(seed: number): RandomSource {
  return randomFromState(seedState(seed));
}
