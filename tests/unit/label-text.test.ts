import { describe, expect, it } from 'vitest';
import { readLabelText } from '../../shared/label-text';
import { TORTILLA_LABEL } from '../helpers/label-panels';

describe('readLabelText — panel text as OCR gives it', () => {
  it('reads a vertical panel, with "Less than 1g" as 0.5 g (the least FDA 21 CFR 101.9(c) allows it to mean)', () => {
    const r = readLabelText(`Nutrition Facts
8 servings per container
Serving size 1 tortilla (45g)
Amount per serving
Calories 70
% Daily Value*
Total Fat 2.5g 3%
Saturated Fat 0g 0%
Trans Fat 0g
Cholesterol 0mg 0%
Sodium 450mg 20%
Total Carbohydrate 19g 7%
Dietary Fiber 14g 50%
Total Sugars Less than 1g
Includes 0g Added Sugars 0%
Protein 6g`);
    expect(r.fields).toEqual({ ...TORTILLA_LABEL, servingSizeMl: null });
    expect(r.found).toHaveLength(10);
    expect(r.notes.join(' ')).toMatch(/less than 1 g.*0\.5 g/);
  });

  it('reads "Sodium 450mg", "<1g", thousands and a one-line panel', () => {
    const r = readLabelText(
      'Nutrition Facts Serving size 17 slices (30g) Calories 70 Total Fat 3g (4% DV), Sat. Fat 1g (5% DV), Trans Fat 0g, Sodium 1,200mg (52% DV), Total Carb. 0g (0% DV), Fiber <1g, Total Sugars 0g (Incl. 0g Added Sugars, 0% DV), Protein 9g',
    );
    expect(r.fields).toMatchObject({
      servingSizeG: 30,
      servingLabel: '17 slices',
      kcal: 70,
      fatG: 3,
      satFatG: 1,
      sodiumMg: 1200,
      carbsG: 0,
      fiberG: 0.5,
      sugarG: 0,
      proteinG: 9,
    });
  });

  it('reads "Serving size 1 tortilla (45g)", "2/3 cup (55g)", "45g (1 tortilla)" and millilitres', () => {
    expect(readLabelText('Serving size 1 tortilla (45g)').fields).toMatchObject({ servingSizeG: 45, servingLabel: '1 tortilla' });
    expect(readLabelText('Serving Size 2/3 cup (55g)').fields).toMatchObject({ servingSizeG: 55, servingLabel: '2/3 cup' });
    expect(readLabelText('Serving size 45g (1 tortilla)').fields).toMatchObject({ servingSizeG: 45, servingLabel: '1 tortilla' });
    expect(readLabelText('Serving size 1 cup (240mL)').fields).toMatchObject({ servingSizeMl: 240, servingSizeG: null, servingLabel: '1 cup' });
  });

  it('undoes the usual OCR slips: "g" read as 9, "0" read as O', () => {
    const r = readLabelText('Serving size 1 tortilla (459)\nCalories 70\nTotal Fat 2.59 3%\nSaturated Fat Og\nTotal Carbohydrate 199 7%\nProtein 6g');
    expect(r.fields).toMatchObject({ servingSizeG: 45, fatG: 2.5, satFatG: 0, carbsG: 19, proteinG: 6 });
    // 19 g is 7 % of the 275 g Daily Value (FDA 21 CFR 101.9(c)(8)(iv), from memory); 199 g would be 72 %
    expect(r.notes.some((n) => n.includes('Total carbohydrate'))).toBe(true);
  });

  it('keeps "Added Sugars" and "Calories from Fat" out, and leaves what is missing as null', () => {
    const r = readLabelText('Calories 120 Calories from Fat 40\nIncludes 3g Added Sugars 6%\nProtein 4g');
    expect(r.fields.kcal).toBe(120);
    expect(r.fields.sugarG).toBeNull();
    expect(r.fields.fatG).toBeNull();
    expect(r.found).toEqual(['kcal', 'proteinG']);
    expect(readLabelText('A photo of a sunset over the lake').found).toEqual([]);
  });
});
