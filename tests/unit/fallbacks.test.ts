import { afterEach, describe, expect, it } from 'vitest';
import { fallbackCount, onFallback, recordFallback, resetFallbacks } from '../../shared/fallbacks';

describe('counted fallbacks', () => {
  afterEach(() => resetFallbacks());

  it('counts each site apart and in total, and tells listeners until they stop', () => {
    const heard: string[] = [];
    const stop = onFallback((site, error) => heard.push(`${site}: ${(error as Error).message}`));
    recordFallback('parse-line', new Error('a'));
    recordFallback('weigh-line', new Error('b'));
    recordFallback('weigh-line', new Error('c'));
    stop();
    recordFallback('food-match', new Error('d'));
    expect(fallbackCount('parse-line')).toBe(1);
    expect(fallbackCount('weigh-line')).toBe(2);
    expect(fallbackCount('food-search')).toBe(0);
    expect(fallbackCount()).toBe(4);
    expect(heard).toEqual(['parse-line: a', 'weigh-line: b', 'weigh-line: c']);
    resetFallbacks();
    expect(fallbackCount()).toBe(0);
  });
});
