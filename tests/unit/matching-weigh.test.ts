/**
 * weighLine on hand-made foods and lines, so each rule is seen alone. Mass and volume factors are
 * the exact NIST Handbook 44 Appendix C values (1 lb = 453.59237 g, 1 oz = 28.349523125 g,
 * 1 cup = 236.5882365 mL, 1 fl oz = 29.5735295625 mL). The portions are invented for the test.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { CatalogueFood, Portion } from '../../shared/food';
import type { ParsedLine } from '../../shared/parse-line';
import { UNITS } from '../../shared/units';
import { fallbackCount, resetFallbacks } from '../../shared/fallbacks';
import { WARNING_NO_FOOD, WARNING_SET_AMOUNT, weighLine } from '../../server/matching/weigh-line';

function line(p: Partial<ParsedLine>): ParsedLine {
  return {
    input: '',
    quantity: 1,
    range: null,
    unit: null,
    unitText: null,
    name: 'test food',
    preparation: null,
    comment: null,
    size: null,
    sizeText: null,
    equivalents: [],
    needsAmount: false,
    flags: [],
    ...p,
  };
}

const portion = (amount: number, measure: string, grams: number): Portion => ({ label: `${amount} ${measure}`, amount, measure, grams });

const CHEESE_PORTIONS = [portion(1, 'cup, shredded', 112), portion(1, 'cup, diced', 132), portion(1, 'oz', 28.35), portion(1, 'slice (1 oz)', 28)];

function food(p: Partial<CatalogueFood> = {}): CatalogueFood {
  return {
    id: 1,
    source: 'custom',
    sourceId: '',
    name: 'Test cheese',
    sourceName: 'Test cheese',
    foodGroup: '',
    per100g: { kcal: 300, proteinG: 20, fatG: 24, satFatG: 14, carbsG: 2, fiberG: 0, sugarG: 1, sodiumMg: 600, waterG: 50 },
    portions: CHEESE_PORTIONS,
    densityGPerMl: 0.47,
    densitySource: 'portion',
    roles: ['melting-cheese'],
    diet: ['vegetarian'],
    branded: false,
    ...p,
  };
}

describe('mass units', () => {
  it('convert exactly, whatever the food', () => {
    // NIST Handbook 44 Appendix C.
    expect(weighLine(line({ quantity: 2, unit: 'lb' }), food(), CHEESE_PORTIONS).grams).toBe(907.18474);
    expect(weighLine(line({ quantity: 3, unit: 'oz' }), food(), CHEESE_PORTIONS).grams).toBeCloseTo(85.048569375, 12);
    expect(weighLine(line({ quantity: 250, unit: 'g' }), food(), CHEESE_PORTIONS).grams).toBe(250);
  });

  it('get a volume from the best volume portion', () => {
    const w = weighLine(line({ quantity: 112, unit: 'g', preparation: 'shredded' }), food(), CHEESE_PORTIONS);
    expect(w.volumeMl).toBeCloseTo(236.5882365, 9);
  });

  it('keep their grams when no food matched, without a volume', () => {
    const w = weighLine(line({ quantity: 1, unit: 'lb' }), null, []);
    expect(w.grams).toBe(453.59237);
    expect(w.volumeMl).toBeNull();
    expect(w.warnings).toContain(WARNING_NO_FOOD);
  });
});

describe('volume units', () => {
  it('use the portion whose measure names the preparation', () => {
    expect(weighLine(line({ quantity: 2, unit: 'cup', preparation: 'shredded' }), food(), CHEESE_PORTIONS)).toMatchObject({
      grams: 224,
      portionUsed: '1 cup, shredded',
    });
    // "cubed" packs like "diced" (common practice).
    expect(weighLine(line({ quantity: 1, unit: 'cup', preparation: 'cubed' }), food(), CHEESE_PORTIONS).grams).toBe(132);
  });

  it('scale a portion given for half a cup', () => {
    const w = weighLine(line({ quantity: 1, unit: 'cup' }), food({ portions: [] }), [portion(0.5, 'cup', 121)]);
    expect(w.grams).toBeCloseTo(242, 9);
  });

  it("fall back to the food's density, and say when it is its role's default", () => {
    const guess = weighLine(line({ quantity: 1, unit: 'cup' }), food({ densityGPerMl: 0.9, densitySource: 'role-default' }), []);
    expect(guess.grams).toBeCloseTo(0.9 * 236.5882365, 9);
    expect(guess.warnings.join(' ')).toMatch(/usual density of its kind \(0\.9 g\/mL\)/);
    const known = weighLine(line({ quantity: 1, unit: 'cup' }), food({ densityGPerMl: 0.9, densitySource: 'portion' }), []);
    expect(known.warnings).toEqual([]);
  });

  it('keep their volume but weigh 0 g when no food matched', () => {
    const w = weighLine(line({ quantity: 2, unit: 'cup' }), null, []);
    expect(w.grams).toBe(0);
    expect(w.volumeMl).toBeCloseTo(2 * 236.5882365, 9);
    expect(w.warnings).toContain(WARNING_NO_FOOD);
  });

  it('take a stated weight over any density: "10 tbsp (140 g)"', () => {
    const w = weighLine(line({ quantity: 10, unit: 'tbsp', equivalents: [{ quantity: 140, unit: 'g' }] }), food(), CHEESE_PORTIONS);
    expect(w.grams).toBe(140);
  });
});

describe('counts and household pieces', () => {
  const egg = [
    portion(1, 'large', 50),
    portion(1, 'extra large', 56),
    portion(1, 'medium', 44),
    portion(1, 'small', 38),
    portion(1, 'cup (4.86 large eggs)', 243),
  ];

  it('use the size the line names', () => {
    expect(weighLine(line({ quantity: 2, unit: 'small' }), food(), egg).grams).toBe(76);
    expect(weighLine(line({ quantity: 1, unit: 'extra-large' }), food(), egg).grams).toBe(56);
  });

  it('take the medium portion for a bare count and say so, or the default the caller gives', () => {
    const bare = weighLine(line({ quantity: 3 }), food(), egg);
    expect(bare.grams).toBe(132);
    expect(bare.warnings).toEqual(['No size given: weighed as 1 medium (44 g each).']);
    expect(weighLine(line({ quantity: 3 }), food(), egg, { countDefault: 'large' }).grams).toBe(150);
  });

  it('warn when the named size has no portion', () => {
    const w = weighLine(line({ quantity: 1, unit: 'jumbo' }), food(), egg);
    expect(w.grams).toBeGreaterThan(0);
    expect(w.warnings.join(' ')).toMatch(/No "jumbo" weight/);
  });

  it('read a piece given for several: "3 cloves" = 9 g', () => {
    const garlic = [portion(1, 'cup', 136), portion(3, 'cloves', 9)];
    expect(weighLine(line({ quantity: 2, unit: 'clove' }), food(), garlic).grams).toBeCloseTo(6, 12);
  });

  it('pick a tortilla by its diameter', () => {
    const tortillas = [
      portion(1, 'tortilla', 48),
      portion(1, 'tortilla medium (approx 6" dia)', 30),
      portion(1, 'tortilla (approx 10" dia)', 72),
      portion(1, 'tortilla (approx 7-8" dia)', 49),
    ];
    expect(weighLine(line({ quantity: 2, sizeText: '8-inch', name: 'flour tortillas' }), food(), tortillas).grams).toBe(98);
    expect(weighLine(line({ quantity: 1, sizeText: '10-inch', name: 'flour tortilla' }), food(), tortillas).grams).toBe(72);
    expect(weighLine(line({ quantity: 1, name: 'flour tortilla' }), food(), tortillas).grams).toBe(48);
  });

  it('never use a slice or a serving for a bare count', () => {
    const onion = [portion(1, 'slice, large (1/4" thick)', 38), portion(1, 'NLEA serving', 148), portion(1, 'medium (2-1/2" dia)', 110)];
    expect(weighLine(line({ quantity: 1, name: 'onion' }), food(), onion).grams).toBe(110);
  });

  it('weigh a package of stated size: "1 (15 oz) can", "1 (14 fl oz) can"', () => {
    const can = weighLine(line({ quantity: 1, unit: 'can', size: { quantity: 15, unit: 'oz' } }), food(), []);
    expect(can.grams).toBeCloseTo(15 * 28.349523125, 9);
    const milk = weighLine(line({ quantity: 1, unit: 'can', size: { quantity: 14, unit: 'fl-oz' } }), food({ portions: [] }), [portion(1, 'cup', 240)]);
    expect(milk.volumeMl).toBeCloseTo(14 * 29.5735295625, 9);
    expect(milk.grams).toBeCloseTo((14 * 29.5735295625 * 240) / 236.5882365, 9);
  });

  it('weigh 0 g with a clear warning for a piece the food has no portion for', () => {
    const w = weighLine(line({ quantity: 1, unit: 'bunch', unitText: 'bunch' }), food(), CHEESE_PORTIONS);
    expect(w.grams).toBe(0);
    expect(w.warnings).toEqual(['No household weight for "bunch" of this food: give the amount in grams, ounces or cups.']);
  });
});

describe('lines without an amount', () => {
  it('weigh 0 g and ask for an amount', () => {
    for (const l of [line({ quantity: null, needsAmount: true, flags: ['to-taste'] }), line({ quantity: 0 })]) {
      const w = weighLine(l, food(), CHEESE_PORTIONS);
      expect(w.grams).toBe(0);
      expect(w.warnings).toEqual([WARNING_SET_AMOUNT]);
    }
  });
  it('weigh the amount a line gives even when it adds "or more to taste"', () => {
    const w = weighLine(line({ quantity: 1, flags: ['to-taste'] }), food(), CHEESE_PORTIONS);
    // one piece of the portions above: "1 slice (1 oz)", 28 g
    expect(w.grams).toBe(28);
    expect(w.warnings).not.toContain(WARNING_SET_AMOUNT);
  });
});

describe('any line', () => {
  const units = [null, ...UNITS.map((u) => u.id), 'furlong', ''];
  it('gives finite, non-negative grams and volume without falling back', () => {
    // weighLine catches anything thrown inside and counts it: none may happen.
    resetFallbacks();
    fc.assert(
      fc.property(
        fc.oneof(fc.double(), fc.constant(null), fc.constant(Number.NaN), fc.constant(Infinity), fc.constant(-3)),
        fc.constantFrom(...units),
        fc.option(fc.record({ quantity: fc.double(), unit: fc.constantFrom(...UNITS.map((u) => u.id)) })),
        fc.option(fc.string({ maxLength: 12 })),
        fc.boolean(),
        (quantity, unit, size, sizeText, withFood) => {
          const w = weighLine(line({ quantity, unit, size, sizeText }), withFood ? food() : null, withFood ? CHEESE_PORTIONS : []);
          expect(Number.isFinite(w.grams)).toBe(true);
          expect(w.grams).toBeGreaterThanOrEqual(0);
          if (w.volumeMl !== null) {
            expect(Number.isFinite(w.volumeMl)).toBe(true);
            expect(w.volumeMl).toBeGreaterThanOrEqual(0);
          }
        },
      ),
      { numRuns: 500 },
    );
    expect(fallbackCount('weigh-line')).toBe(0);
  });

  it('counts a fallback, and asks for grams, when weighing throws inside', () => {
    resetFallbacks();
    const broken = new Proxy(CHEESE_PORTIONS, {
      get() {
        throw new Error('portion table broken');
      },
    });
    const w = weighLine(line({ quantity: 1, unit: 'cup' }), food(), broken);
    expect(w.grams).toBe(0);
    expect(w.warnings.join(' ')).toMatch(/grams/);
    expect(fallbackCount('weigh-line')).toBe(1);
    resetFallbacks();
  });
});
