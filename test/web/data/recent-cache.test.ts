import { describe, expect, test } from 'vitest';
import { RecentCache } from '../../../web/data/recent-cache.ts';

describe('RecentCache', () => {
  test('keeps the most recently read values up to its capacity, loading each key once while kept', () => {
    const loads: string[] = [];
    const cache = new RecentCache<string>(2);
    const read = (key: string) =>
      cache.get(key, () => {
        loads.push(key);
        return key.toUpperCase();
      });
    expect(read('a')).toBe('A');
    expect(read('b')).toBe('B');
    expect(read('a')).toBe('A'); // a is now the newest, b the oldest
    expect(read('c')).toBe('C'); // over capacity: b goes
    expect(read('a')).toBe('A');
    expect(read('b')).toBe('B'); // loaded again
    expect(loads).toEqual(['a', 'b', 'c', 'b']);
  });

  test('keeps nothing when the load has no value', () => {
    let calls = 0;
    const cache = new RecentCache<string>(2);
    const missing = () => {
      calls++;
      return undefined;
    };
    expect(cache.get('x', missing)).toBeUndefined();
    expect(cache.get('x', missing)).toBeUndefined();
    expect(calls).toBe(2);
  });
});
