import { describe, expect, it } from 'vitest';
import { findUnsafeText, textProblem } from '../../shared/text-safety';
import { jsonNestingDepth } from '../../server/services/recipe-import';

describe('findUnsafeText', () => {
  it('names the first NUL or lone surrogate by its zod-style path, keys included', () => {
    expect(findUnsafeText({ lines: [{ input: 'egg' }, { input: 'milk\u0000' }] })?.field).toBe('lines.1.input');
    expect(findUnsafeText({ tags: ['ok', 'x\udc00'] })?.field).toBe('tags.1');
    expect(findUnsafeText({ targets: { 'bad\u0000key': 1 } })?.field).toBe('targets');
    expect(findUnsafeText('\ud800')?.field).toBe('body');
  });

  it('accepts well-formed text: accents, emoji (surrogate pairs) and other control characters', () => {
    expect(findUnsafeText({ title: 'Crème brûlée 🍮', note: 'tab\tand\nnewline', n: 4, nothing: null })).toBeNull();
    expect(textProblem('🍝')).toBeNull();
    expect(textProblem('\ud83c')).toMatch(/surrogate/);
    expect(textProblem('\udf5d\ud83c')).toMatch(/surrogate/); // a pair in the wrong order is two lone halves
  });

  it('walks 100,000 levels without recursion', () => {
    let deep: unknown = 'x\u0000';
    for (let i = 0; i < 100_000; i++) deep = [deep];
    expect(findUnsafeText(deep)?.field.split('.')).toHaveLength(100_000);
  });
});

describe('jsonNestingDepth', () => {
  it('counts arrays and objects, not brackets inside strings or escaped quotes', () => {
    expect(jsonNestingDepth('{"a":[1,{"b":[]}]}')).toBe(4);
    expect(jsonNestingDepth('{"a":"[[[[\\"[[[["}')).toBe(1);
    expect(jsonNestingDepth('"just text"')).toBe(0);
    expect(jsonNestingDepth('['.repeat(10_000) + ']'.repeat(10_000))).toBe(10_000);
  });
});
