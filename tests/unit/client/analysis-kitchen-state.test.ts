import { describe, expect, it } from 'vitest';
import type { AnalyzeResponse } from '../../../shared/schemas/analyze';
import { zeroNutrients } from '../../../shared/nutrition';
import {
  lineInputs,
  linesFromAnalysis,
  newLineKey,
  requestSignature,
  withFood,
  withGrams,
  withoutLine,
  type KitchenLine,
} from '../../../src/features/analysis/kitchen-lines';
import {
  KITCHEN_STORAGE_KEY,
  loadKitchen,
  parseKitchen,
  saveKitchen,
  serializeKitchen,
  type KitchenSnapshot,
} from '../../../src/features/analysis/kitchen-storage';

const lines: KitchenLine[] = [
  { key: 'a', input: '12 oz elbow macaroni' },
  { key: 'b', input: '2 cups shredded sharp cheddar', foodId: 9 },
  { key: 'c', input: 'salt to taste', grams: 2 },
];

describe('kitchen lines', () => {
  it('gives every line its own key', () => {
    const keys = new Set(Array.from({ length: 500 }, newLineKey));
    expect(keys.size).toBe(500);
    let n = 0;
    expect(linesFromAnalysis([{ input: 'x' }, { input: 'y' }], () => `k${++n}`)).toEqual([
      { key: 'k1', input: 'x' },
      { key: 'k2', input: 'y' },
    ]);
  });
  it('sends lines without keys or unset pins', () => {
    expect(lineInputs(lines)).toEqual([
      { input: '12 oz elbow macaroni' },
      { input: '2 cups shredded sharp cheddar', foodId: 9 },
      { input: 'salt to taste', grams: 2 },
    ]);
    expect(Object.keys(lineInputs([{ key: 'z', input: 'x', foodId: undefined }])[0])).toEqual(['input']);
  });
  it('pins and unpins a food, keeping pinned grams', () => {
    const pinned = withFood(withGrams(lines, 'a', 200), 'a', 42);
    expect(pinned[0]).toEqual({ key: 'a', input: '12 oz elbow macaroni', foodId: 42, grams: 200 });
    expect(withFood(pinned, 'a', null)[0]).toEqual({ key: 'a', input: '12 oz elbow macaroni', grams: 200 });
    expect(pinned[1]).toBe(lines[1]);
    expect(lines[0]).toEqual({ key: 'a', input: '12 oz elbow macaroni' });
  });
  it('pins and unpins grams, including zero', () => {
    expect(withGrams(lines, 'c', 0)[2].grams).toBe(0);
    expect('grams' in withGrams(lines, 'c', null)[2]).toBe(false);
  });
  it('removes one line by key', () => {
    expect(withoutLine(lines, 'b').map((l) => l.key)).toEqual(['a', 'c']);
  });
  it('tells requests apart by lines, pins and servings, not keys', () => {
    const same = lines.map((l) => ({ ...l, key: `${l.key}2` }));
    expect(requestSignature(same, 4)).toBe(requestSignature(lines, 4));
    expect(requestSignature(lines, 5)).not.toBe(requestSignature(lines, 4));
    expect(requestSignature(withGrams(lines, 'a', 1), 4)).not.toBe(requestSignature(lines, 4));
  });
});

function analysisOf(n: number): AnalyzeResponse {
  return {
    servings: 4,
    lines: Array.from({ length: n }, (_, i) => ({
      input: `line ${i}`,
      parsed: { quantity: 1, unit: 'cup', name: 'milk', comment: null },
      food: { id: 70, source: 'usda-sr28', sourceId: '01077', name: 'Milk, whole' },
      alternatives: [],
      confidence: 1,
      grams: 244,
      volumeMl: 236.6,
      nutrients: { ...zeroNutrients(), kcal: 149 },
      warnings: [],
      portionUsed: '1 cup',
      pinned: { food: false, grams: false },
      checkMatch: false,
      missingModifier: null,
    })),
    totals: { ...zeroNutrients(), kcal: 149 * n },
    perServing: { ...zeroNutrients(), kcal: (149 * n) / 4 },
    totalGrams: 244 * n,
    volumeMl: 236.6 * n,
  };
}

describe('kitchen storage', () => {
  const snapshot: KitchenSnapshot = {
    pastedText: '1 cup milk\n1 cup milk\n1 cup milk',
    source: { recipeId: 7, title: 'Milk pudding', versionNumber: 2, latestNumber: 3, openedLines: '[]' },
    lines,
    servings: 4,
    analysis: analysisOf(3),
    answered: { keys: ['a', 'b', 'c'], lines: lineInputs(lines), servings: 4 },
  };

  it('reads back what it wrote', () => {
    expect(parseKitchen(serializeKitchen(snapshot))).toEqual(snapshot);
  });
  it('refuses other versions, broken JSON and wrong shapes', () => {
    expect(parseKitchen(null)).toBeNull();
    expect(parseKitchen('{not json')).toBeNull();
    expect(parseKitchen(JSON.stringify({ ...JSON.parse(serializeKitchen(snapshot)), v: 0 }))).toBeNull();
    expect(parseKitchen(JSON.stringify({ v: 1, lines: [{ input: 3 }], servings: 4 }))).toBeNull();
    expect(parseKitchen(JSON.stringify({ v: 1, lines, servings: 0 }))).toBeNull();
    expect(parseKitchen(JSON.stringify({ v: 1, lines: [{ key: 'a', input: 'x', grams: -1 }], servings: 2 }))).toBeNull();
    expect(parseKitchen(JSON.stringify({ v: 1, lines: [{ key: 'a', input: 'x', foodId: 0 }], servings: 2 }))).toBeNull();
    expect(parseKitchen(JSON.stringify({ v: 1, lines: [{ key: 'a', input: 'x', role: 'not-a-role' }], servings: 2 }))).toBeNull();
    expect(parseKitchen(JSON.stringify({ v: 1, lines: [{ input: 'x' }], servings: 2 }))).toBeNull();
    expect(parseKitchen(JSON.stringify({ v: 1, lines: {}, servings: 2 }))).toBeNull();
    expect(parseKitchen(JSON.stringify({ v: 1, lines, servings: 2.5 }))).toBeNull();
    expect(parseKitchen('[1]')).toBeNull();
  });
  it('drops a stored source or analysis of the wrong shape and keeps the lines', () => {
    const raw = JSON.parse(serializeKitchen(snapshot));
    const back = parseKitchen(JSON.stringify({ ...raw, source: { ...raw.source, recipeId: 0 }, analysis: { ...raw.analysis, totalGrams: 'many' } }));
    expect(back?.lines).toEqual(lines);
    expect(back?.source).toBeNull();
    expect(back?.analysis).toBeNull();
    expect(back?.answered).toBeNull();
    expect(parseKitchen(JSON.stringify({ ...raw, pastedText: 7 }))?.pastedText).toBe('');
  });
  it('keeps the lines but drops an analysis that does not line up with its keys', () => {
    const raw = JSON.parse(serializeKitchen(snapshot));
    raw.answered.keys = ['a', 'b'];
    const back = parseKitchen(JSON.stringify(raw));
    expect(back?.lines).toEqual(lines);
    expect(back?.analysis).toBeNull();
    expect(back?.answered).toBeNull();
  });
  it('survives storage that throws, and clears an empty kitchen', () => {
    const broken = {
      getItem: () => {
        throw new Error('denied');
      },
      setItem: () => {
        throw new Error('quota');
      },
      removeItem: () => {},
    };
    expect(loadKitchen(broken)).toBeNull();
    expect(() => saveKitchen(broken, snapshot)).not.toThrow();

    const store = new Map<string, string>();
    const memory = {
      getItem: (k: string) => store.get(k) ?? null,
      setItem: (k: string, v: string) => void store.set(k, v),
      removeItem: (k: string) => void store.delete(k),
    };
    saveKitchen(memory, snapshot);
    expect(loadKitchen(memory)).toEqual(snapshot);
    saveKitchen(memory, { ...snapshot, lines: [], pastedText: '', analysis: null, answered: null });
    expect(store.has(KITCHEN_STORAGE_KEY)).toBe(false);
  });
});
