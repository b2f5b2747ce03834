import { describe, expect, it } from 'vitest';
import { foodWords, shoppingCheckItem } from '../../../src/lib/shopping-items';

const sr28 = (id: number, name: string) => ({ id, source: 'usda-sr28' as const, sourceId: String(id).padStart(5, '0'), name });

describe('a food on the shopping list and the scale list', () => {
  it('reads as a cook says it, not as the catalogue files it', () => {
    expect(foodWords(sr28(1168, 'Cheese, cheddar, reduced fat'))).toBe('reduced-fat cheddar cheese');
    expect(foodWords(sr28(2047, 'Salt, table'))).toBe('table salt');
    const item = shoppingCheckItem({ food: sr28(1168, 'Cheese, cheddar, reduced fat'), grams: 417, purchase: '4 cups' } as Parameters<
      typeof shoppingCheckItem
    >[0]);
    expect(item.label).toBe('reduced-fat cheddar cheese');
    expect(item.detail).toBe('Buy 4 cups');
  });

  it("keeps a label food's own name and an unmatched line's words", () => {
    expect(foodWords({ id: 9001, source: 'custom', sourceId: 'x', name: 'Cloudmeadow carb-smart tortilla' })).toBe('Cloudmeadow carb-smart tortilla');
    expect(foodWords({ id: null, source: null, sourceId: null, name: 'a pinch of love' })).toBe('a pinch of love');
  });
});
