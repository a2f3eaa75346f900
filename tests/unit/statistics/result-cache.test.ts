import { describe, expect, it } from 'vitest';
import { ResultCache } from '../../../src/lib/server/statistics/result-cache';

describe('the answer cache', () => {
  it('keeps the most recently used answers within its size', () => {
    const cache = new ResultCache(10);
    cache.set('a', '1234');
    cache.set('b', '5678');
    expect(cache.get('a')).toBe('1234');
    cache.set('c', 'xyz');
    expect(cache.get('b')).toBeUndefined();
    expect(cache.get('a')).toBe('1234');
    expect(cache.get('c')).toBe('xyz');
    expect(cache.stats()).toEqual({ entries: 2, chars: 7 });
  });

  it('refuses an answer larger than the whole cache and bounds the number of entries', () => {
    const cache = new ResultCache(100, 2);
    cache.set('big', 'x'.repeat(101));
    expect(cache.get('big')).toBeUndefined();
    cache.set('1', 'a');
    cache.set('2', 'b');
    cache.set('3', 'c');
    expect(cache.stats().entries).toBe(2);
    expect(cache.get('1')).toBeUndefined();
  });

  it('replaces an entry under the same key without counting it twice', () => {
    const cache = new ResultCache(100);
    cache.set('k', 'aaaa');
    cache.set('k', 'bb');
    expect(cache.stats()).toEqual({ entries: 1, chars: 2 });
  });
});
