import { describe, expect, it } from 'vitest';
import { energyWarning, panelIssues, panelPer100g, panelPortions, readServingLabel } from '../../shared/label-food';
import { labelFoodSchema } from '../../shared/schemas/foods';

const tortilla = { servingSizeG: 45, servingLabel: '1 tortilla', kcal: 70, fatG: 2.5, carbsG: 19, fiberG: 14, proteinG: 6, sodiumMg: 450 };

describe('a label panel per 100 g', () => {
  it('scales per-serving values and takes energy from 4/4/9 when absent (USDA Handbook 74 general factors)', () => {
    expect(panelPer100g(tortilla).per100g.kcal).toBeCloseTo(155.555, 2);
    const noKcal = panelPer100g({ ...tortilla, kcal: undefined });
    expect(noKcal.energyFromAtwater).toBe(true);
    expect(noKcal.per100g.kcal).toBeCloseTo(((4 * 6 + 4 * 19 + 9 * 2.5) * 100) / 45, 9);
  });

  it('turns the household measure into a portion: "17 slices" = 30 g, "1/4 cup" gives a density (NIST cup 236.5882365 mL)', () => {
    expect(readServingLabel('17 slices')).toEqual({ amount: 17, measure: 'slices' });
    expect(readServingLabel('about a handful')).toBeNull();
    expect(panelPortions({ ...tortilla, servingLabel: '17 slices', servingSizeG: 30 }, 30).portions[0]).toMatchObject({
      amount: 17,
      measure: 'slices',
      grams: 30,
    });
    const cup = panelPortions({ servingSizeG: 28, servingLabel: '1/4 cup', proteinG: 1, fatG: 1, carbsG: 1 }, 28);
    expect(cup.densityGPerMl).toBeCloseTo(28 / (236.5882365 / 4), 9);
  });

  it('names what is impossible and allows label rounding', () => {
    expect(panelIssues(tortilla)).toEqual([]);
    expect(panelIssues({ ...tortilla, servingSizeG: 4.9e-324 }).map((i) => i.field)).toEqual(['servingSizeG']);
    expect(panelIssues({ ...tortilla, servingSizeG: 10 }).map((i) => i.field)).toContain('carbsG');
    expect(panelIssues({ ...tortilla, sodiumMg: 20_000 }).map((i) => i.field)).toEqual(['sodiumMg']);
    // 1 g packet printing 1 g of carbohydrate: 100 g per 100 g, fine; rounding lets 101 g pass too
    expect(panelIssues({ servingSizeG: 1, carbsG: 1, proteinG: 0, fatG: 0 })).toEqual([]);
    expect(panelIssues({ servingSizeG: 100, proteinG: 80, fatG: 6, carbsG: 15 })).toEqual([]);
    expect(panelIssues({ servingSizeG: 100, proteinG: 80, fatG: 10, carbsG: 15 }).map((i) => i.field)).toEqual(['carbsG']);
  });

  it('warns, fiber-aware, when printed energy strays more than 20 % from 4/4/9', () => {
    expect(energyWarning(tortilla)).toBeNull(); // 66.5–122.5 kcal at 0–4 kcal per g of fiber
    expect(energyWarning({ ...tortilla, kcal: 200 })).toMatch(/4\/4\/9/);
    expect(energyWarning({ ...tortilla, kcal: undefined })).toBeNull();
  });

  it('the schema refuses non-finite numbers and names the field', () => {
    const r = labelFoodSchema.safeParse({ name: 'x food', ...tortilla, proteinG: Number.POSITIVE_INFINITY });
    expect(r.success).toBe(false);
    expect(r.error!.issues.map((i) => i.path.join('.'))).toContain('proteinG');
  });
});
