import { describe, expect, it } from 'vitest';
import { kitchenQuantity, measureWord, nearestKitchenFraction } from '../../shared/kitchen-amounts';

// The measures a US measuring set holds (cups and spoons in halves, thirds, quarters, eighths): common practice.
describe('nearestKitchenFraction', () => {
  it('rounds to the quarter a cook measures', () => {
    expect(nearestKitchenFraction(1.7, [4])).toBe(1.75);
    expect(nearestKitchenFraction(0.62, [4])).toBe(0.5);
    expect(nearestKitchenFraction(2.1, [4])).toBe(2);
  });

  it('takes a third where a third is nearer than any quarter', () => {
    expect(nearestKitchenFraction(0.33, [4, 3])).toBeCloseTo(1 / 3, 12);
    expect(nearestKitchenFraction(1.68, [4, 3])).toBeCloseTo(1 + 2 / 3, 12);
    expect(nearestKitchenFraction(0.76, [4, 3])).toBe(0.75);
  });

  it('reaches eighths only when asked', () => {
    expect(nearestKitchenFraction(0.13, [8, 3])).toBe(0.125);
    expect(nearestKitchenFraction(0.13, [4])).toBe(0.25);
  });

  it('rounds up into the next whole number instead of writing 4/4', () => {
    expect(nearestKitchenFraction(1.97, [4, 3])).toBe(2);
  });
});

describe('kitchenQuantity', () => {
  it('writes amounts as a recipe card does', () => {
    expect(kitchenQuantity(1.75)).toBe('1 3/4');
    expect(kitchenQuantity(1 / 3)).toBe('1/3');
    expect(kitchenQuantity(2 + 2 / 3)).toBe('2 2/3');
    expect(kitchenQuantity(0.125)).toBe('1/8');
    expect(kitchenQuantity(0.5)).toBe('1/2');
    expect(kitchenQuantity(3)).toBe('3');
  });

  it('writes nothing as 0, not as an empty amount', () => {
    expect(kitchenQuantity(0)).toBe('0');
  });

  it('keeps ASCII fractions, the form the rest of the app shows', () => {
    expect(kitchenQuantity(1.5)).not.toMatch(/[½¼¾⅓⅔⅛]/);
  });
});

describe('measureWord', () => {
  it('keeps the measure singular up to one and plural above', () => {
    expect(`${kitchenQuantity(0.5)} ${measureWord('cup', 0.5)}`).toBe('1/2 cup');
    expect(`${kitchenQuantity(1)} ${measureWord('cup', 1)}`).toBe('1 cup');
    expect(`${kitchenQuantity(1.5)} ${measureWord('cup', 1.5)}`).toBe('1 1/2 cups');
    expect(measureWord('cups', 1)).toBe('cup');
  });

  it('knows the irregular plurals of the kitchen', () => {
    expect(measureWord('leaf', 3)).toBe('leaves');
    expect(measureWord('loaf', 2)).toBe('loaves');
    expect(measureWord('pinch', 2)).toBe('pinches');
    expect(measureWord('bunch', 2)).toBe('bunches');
  });
});
