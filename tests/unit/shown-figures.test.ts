import { describe, expect, it } from 'vitest';
import { mealTargets, meetsShown, servingVolumeMl, shownGrams, shownKcal } from '../../shared/shown-figures';
import { estimateTargets } from '../../shared/targets';
import { storageFor } from '../../shared/food-safety';

describe('one rounding for every screen', () => {
  it('rounds grams to 0.1 g under 10 g and whole from 10 g, kcal whole, halves away from zero', () => {
    expect(shownGrams(0.44)).toBe(0.4);
    expect(shownGrams(9.95)).toBe(10);
    expect(shownGrams(63.5)).toBe(64);
    expect(shownGrams(63.49)).toBe(63);
    expect(shownKcal(281.5)).toBe(282);
  });

  it('coach view: a version shown as 64 g meets a 64 g target (it was 63.6 g unrounded)', () => {
    expect(meetsShown({ kcal: 500, proteinG: 63.6 }, { kcal: 600, proteinG: 64 })).toEqual({ kcal: true, protein: true });
    expect(meetsShown({ kcal: 600.4, proteinG: 63.4 }, { kcal: 600, proteinG: 64 })).toEqual({ kcal: true, protein: false });
    expect(meetsShown({ kcal: 600.5, proteinG: 70 }, { kcal: 600, proteinG: 64 })).toEqual({ kcal: false, protein: true });
  });

  it('coach targets: protein a day is the meals added up, in the estimate and in the saved targets', () => {
    // Mifflin–St Jeor estimate; 95.7 kg at 2.0 g/kg is 191.4 g a day, 63.8 g a meal over 3 meals
    const estimate = estimateTargets({ sex: 'male', weightKg: 95.7, heightCm: 180, ageYears: 40, activity: 'moderate', goal: 'lose', mealsPerDay: 3 });
    const rounded = mealTargets(estimate.kcalPerDay, estimate.proteinGPerDay, 3);
    expect(rounded.perMeal.proteinG).toBe(64);
    expect(rounded.proteinGPerDay).toBe(192);
    expect(rounded.proteinGPerDay).toBe(rounded.perMeal.proteinG * 3);
    expect(rounded.kcalPerDay).toBe(rounded.perMeal.kcal * 3);
  });

  it('Kitchen and Compare: one volume per serving for one dish volume', () => {
    expect(servingVolumeMl(2764, 4)).toBe(691);
    expect(servingVolumeMl(2765.9, 4)).toBe(691);
    expect(servingVolumeMl(100, 0)).toBe(0);
  });

  it('prep and print: one fridge life, from USDA FSIS guidance (3–4 days; the short end for seafood and cream sauces)', () => {
    const cream = storageFor({ foods: [{ roles: ['cream'] } as never], method: '' });
    const plain = storageFor({ foods: [], method: '' });
    expect([3, 4]).toContain(cream.fridgeDays);
    expect(plain.fridgeDays).toBe(4);
  });
});
