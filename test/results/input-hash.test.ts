import { describe, expect, it } from 'vitest';
import { modelCatalog } from '../../api/engine/motion/registry.ts';
import { canonicalJson, inputHash, sha256Hex } from '../../api/results/input-hash.ts';
import { loadStudy } from '../../api/study/load-study.ts';
import { smallStudy } from '../service/helpers/small-study.ts';

const load = (raw: unknown) => {
  const result = loadStudy(raw, { models: modelCatalog });
  if (!result.ok) throw new Error(JSON.stringify(result.issues));
  return result.study;
};

/** The same object with its keys in reverse order at every depth. */
function reverseKeys(value: unknown): unknown {
  if (Array.isArray(value)) return value.map(reverseKeys);
  if (value === null || typeof value !== 'object') return value;
  return Object.fromEntries(
    Object.entries(value)
      .reverse()
      .map(([k, v]) => [k, reverseKeys(v)]),
  );
}

describe('canonicalJson', () => {
  it('sorts keys at every depth, keeps array order, drops undefined keys', () => {
    const value = { b: 1, a: { d: [1, { z: true, y: null }], c: 'x', skip: undefined } };
    expect(canonicalJson(value)).toBe('{"a":{"c":"x","d":[1,{"y":null,"z":true}]},"b":1}');
    expect(canonicalJson(reverseKeys(value))).toBe(canonicalJson(value));
    expect(canonicalJson([undefined, 2])).toBe('[null,2]');
  });
});

describe('sha256Hex', () => {
  it('matches the published SHA-256 test vectors', () => {
    // FIPS 180-2, Appendix B.1 ("abc") and the digest of the empty message (from memory).
    expect(sha256Hex('abc')).toBe(
      'ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad',
    );
    expect(sha256Hex('')).toBe('e3b0c44298fc1c149afbf4c8996fb92427ae41e4649b934ca495991b7852b855');
  });
});

describe('inputHash', () => {
  it('is the same for the same study written with its keys in another order', () => {
    expect(inputHash(load(reverseKeys(smallStudy())))).toBe(inputHash(load(smallStudy())));
    expect(inputHash(load(smallStudy()))).toBe(sha256Hex(canonicalJson(load(smallStudy()))));
  });

  it('changes when an input changes', () => {
    const other = smallStudy();
    (other.settings as { truncationSigma: number }).truncationSigma = 2;
    expect(inputHash(load(other))).not.toBe(inputHash(load(smallStudy())));
  });
});
