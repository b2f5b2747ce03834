/**
 * Storage guidance checked against USDA FSIS consumer guidance: "Leftovers and Food Safety" and
 * "Freezing and Food Safety" (values as the product brief quotes them; wording beyond that from memory).
 * Where FSIS gives a range, the point Hearthswap picks is *common practice*.
 */
import { describe, expect, it } from 'vitest';
import type { Role } from '../../shared/food';
import { FSIS, mentionsFoil, storageFor } from '../../shared/food-safety';

const dish = (...roles: Role[][]) => roles.map((r) => ({ roles: r }));
const chili = dish(['ground-meat'], ['legume'], ['tomato-sauce'], ['vegetable'], ['herb-spice']);

describe('FSIS figures', () => {
  it('match USDA FSIS "Leftovers and Food Safety"', () => {
    // USDA FSIS, Leftovers and Food Safety: refrigerate within 2 hours, 1 hour above 90 °F
    expect(FSIS.refrigerateWithinHours).toBe(2);
    expect(FSIS.refrigerateWithinHoursHot).toBe(1);
    expect(FSIS.hotAirF).toBe(90);
    // 90 °F = 32.2 °C
    expect(FSIS.hotAirC).toBe(Math.round(((FSIS.hotAirF - 32) * 5) / 9));
    // USDA FSIS, Leftovers and Food Safety: leftovers keep 3 to 4 days in a refrigerator at 40 °F (4 °C) or below
    expect(FSIS.fridgeDays).toEqual({ min: 3, max: 4 });
    expect(FSIS.fridgeMaxF).toBe(40);
    expect(FSIS.fridgeMaxC).toBe(4);
    // USDA FSIS, Leftovers and Food Safety: reheat leftovers to 165 °F (74 °C)
    expect(FSIS.reheatF).toBe(165);
    expect(FSIS.reheatC).toBe(74);
    expect(FSIS.reheatC).toBe(Math.round(((FSIS.reheatF - 32) * 5) / 9));
  });

  it('match USDA FSIS "Freezing and Food Safety"', () => {
    // USDA FSIS, Freezing and Food Safety: food kept at 0 °F (−18 °C) is always safe
    expect(FSIS.freezerF).toBe(0);
    expect(FSIS.freezerC).toBe(-18);
    expect(FSIS.freezerC).toBe(Math.round(((FSIS.freezerF - 32) * 5) / 9));
    // USDA FSIS, Leftovers and Food Safety / Freezing and Food Safety: frozen leftovers, best quality within 2–3 months
    expect(FSIS.freezerQualityMonths).toEqual({ min: 2, max: 3 });
  });
});

describe('storageFor', () => {
  it('gives a plain dish the long end of both FSIS ranges and the FSIS reheat temperature', () => {
    const s = storageFor({ foods: chili });
    expect(s.fridgeDays).toBe(FSIS.fridgeDays.max); // USDA FSIS: 3–4 days
    expect(s.freezerMonths).toBe(FSIS.freezerQualityMonths.max); // USDA FSIS: 2–3 months
    expect(s.reheatF).toBe(165); // USDA FSIS: 165 °F
    expect(s.reheatC).toBe(74);
    expect([s.fridgeMaxF, s.fridgeMaxC, s.freezerF, s.freezerC]).toEqual([40, 4, 0, -18]);
  });

  it.each<[string, Role]>([
    ['fish or seafood', 'fish-seafood'],
    ['a soft cheese', 'soft-cheese'],
    ['a cream sauce base', 'cream-sauce-base'],
  ])('keeps a dish with %s to 3 fridge days (*common practice*, inside FSIS 3–4 days)', (_what, role) => {
    const s = storageFor({ foods: [...chili, { roles: [role] }] });
    expect(s.fridgeDays).toBe(3);
    expect(s.fridgeDays).toBeGreaterThanOrEqual(FSIS.fridgeDays.min);
    expect(s.notes.join(' ')).toMatch(/short end of USDA’s 3–4 days/);
  });

  it.each<[string, Role]>([
    ['a cream sauce base', 'cream-sauce-base'],
    ['cream', 'cream'],
    ['sour cream or yogurt', 'sour-cream-yogurt'],
  ])('gives a dish with %s 2 freezer months for texture (*common practice*, inside FSIS 2–3 months)', (_what, role) => {
    const s = storageFor({ foods: [...chili, { roles: [role] }] });
    expect(s.freezerMonths).toBe(2);
    expect(s.freezerMonths).toBeGreaterThanOrEqual(FSIS.freezerQualityMonths.min);
  });

  it('keeps fridge and freezer choices apart: seafood shortens the fridge only, sour cream the freezer only', () => {
    expect(storageFor({ foods: dish(['fish-seafood'], ['rice-grain']) })).toMatchObject({ fridgeDays: 3, freezerMonths: 3 });
    expect(storageFor({ foods: dish(['ground-meat'], ['sour-cream-yogurt']) })).toMatchObject({ fridgeDays: 4, freezerMonths: 2 });
  });

  it('writes the FSIS handling notes and the caution', () => {
    const s = storageFor({ foods: chili });
    const text = s.notes.join('\n');
    // USDA FSIS, Leftovers and Food Safety: 2-hour rule (1 hour above 90 °F), shallow containers, 40 °F fridge
    expect(text).toMatch(/Refrigerate within 2 hours.*within 1 hour above 90 °F/);
    expect(text).toMatch(/shallow containers/);
    expect(text).toMatch(/40 °F \(4 °C\) or below and eat within 4 days/);
    // USDA FSIS, Freezing and Food Safety: safe indefinitely at 0 °F; quality
    expect(text).toMatch(/0 °F \(-18 °C\) it stays safe indefinitely; eat within 3 months/);
    // USDA FSIS, Leftovers and Food Safety: thaw in the refrigerator; reheat to 165 °F
    expect(text).toMatch(/Thaw in the refrigerator/);
    expect(text).toMatch(/Reheat to 165 °F \(74 °C\)/);
    // product brief cautions
    expect(text).toMatch(/Not medical advice\. Local food codes govern food sold to others\./);
    expect(text).not.toMatch(/foil/i);
  });

  it.each([
    'Wrap each burrito tightly in foil and bake 20 minutes.',
    'Cover the dish with aluminum foil.',
    'Line the tray with aluminium foil',
    'Tent loosely with tin foil',
    'Bake in tinfoil packets',
    'Use a foil-lined sheet pan.',
  ])('adds the microwave foil warning when the method says: %s', (method) => {
    const s = storageFor({ foods: chili, method });
    expect(s.notes.some((n) => n.startsWith('Never put metal foil in a microwave'))).toBe(true);
  });

  it.each(['Bake uncovered on parchment.', 'Serve with a trefoil garnish', '', null, undefined])('adds no foil warning for %s', (method) => {
    expect(mentionsFoil(method)).toBe(false);
    expect(storageFor({ foods: chili, method }).notes.join(' ')).not.toMatch(/foil/i);
  });

  it('handles a recipe with no foods', () => {
    expect(storageFor({ foods: [] })).toMatchObject({ fridgeDays: 4, freezerMonths: 3, reheatF: 165 });
  });
});
