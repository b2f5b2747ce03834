import { describe, expect, it } from 'vitest';
import { estimateTargets } from '../../../shared/targets';
import { cmFromFeetInches, feetInchesFromCm, kgFromPounds, poundsFromKg } from '../../../src/features/clients/body-units';
import { emptyEstimate, estimateErrorsFrom, estimateInput, estimateValuesFrom } from '../../../src/features/clients/estimate-form';
import { applyEstimate, meetsPerMeal, targetsErrorsFrom, targetsFromValues, targetsValues } from '../../../src/features/clients/targets-form';

describe('body units', () => {
  // NIST Handbook 44 Appendix C: 1 in = 2.54 cm, 1 lb = 0.45359237 kg (both exact).
  it('converts US measures exactly', () => {
    expect(cmFromFeetInches(5, 6)).toBeCloseTo(66 * 2.54, 10);
    expect(cmFromFeetInches(6, 0)).toBeCloseTo(182.88, 10);
    expect(kgFromPounds(150)).toBeCloseTo(68.0388555, 10);
    expect(poundsFromKg(0.45359237)).toBeCloseTo(1, 12);
  });
  it('splits centimetres into feet and inches', () => {
    expect(feetInchesFromCm(167.64)).toEqual({ feet: 5, inches: 6 });
    // 182.87 cm rounds to 72.0 in: a whole 6 ft, never "5 ft 12 in"
    expect(feetInchesFromCm(182.87)).toEqual({ feet: 6, inches: 0 });
  });
});

describe('estimateInput', () => {
  const us = {
    ...emptyEstimate('us'),
    sex: 'female',
    ageYears: '34',
    heightFeet: '5',
    heightInches: '6',
    weightLb: '150',
    activity: 'moderate',
    goal: 'lose',
    mealsPerDay: '3',
  };

  it('converts US stats to what the estimate takes', () => {
    const r = estimateInput(us);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.input.heightCm).toBeCloseTo(167.64, 10);
    expect(r.input.weightKg).toBeCloseTo(68.0388555, 10);
    expect(r.input).toMatchObject({ sex: 'female', ageYears: 34, activity: 'moderate', goal: 'lose', mealsPerDay: 3 });
  });
  it('gives the same input from metric stats', () => {
    const metric = {
      ...emptyEstimate('metric'),
      sex: 'female',
      ageYears: '34',
      heightCm: '167.64',
      weightKg: '68.0388555',
      activity: 'moderate',
      goal: 'lose',
      mealsPerDay: '3',
    };
    const a = estimateInput(us);
    const b = estimateInput(metric);
    expect(a.ok && b.ok).toBe(true);
    if (a.ok && b.ok) expect(estimateTargets(a.input).kcalPerDay).toBeCloseTo(estimateTargets(b.input).kcalPerDay, 6);
  });
  it('turns minors away to a physician or dietitian and checks the ranges', () => {
    const r = estimateInput({ ...us, ageYears: '16', heightFeet: '3', weightLb: '700', mealsPerDay: '2.5' });
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.errors.ageYears).toMatch(/dietitian/);
    expect(Object.keys(r.errors).sort()).toEqual(['ageYears', 'height', 'mealsPerDay', 'weight']);
    expect(estimateInput({ ...us, heightInches: '12' }).ok).toBe(false);
    expect(estimateInput({ ...us, sex: '' }).ok).toBe(false);
  });
  it('places the server message on the field it names', () => {
    expect(estimateErrorsFrom({ heightCm: 'too tall', weightKg: 'too heavy', other: 'x' })).toEqual({ height: 'too tall', weight: 'too heavy' });
  });
});

describe('saved body stats back in the estimator', () => {
  it('gives back what the coach typed in US measures, and the same stats once read again', () => {
    const us = { sex: 'male', ageYears: '52', heightFeet: '5', heightInches: '10.5', weightLb: '187.5', activity: 'light', goal: 'lose', mealsPerDay: '4' };
    const first = estimateInput({ ...emptyEstimate('us'), ...us });
    if (!first.ok) throw new Error('the typed stats should be valid');
    const shown = estimateValuesFrom({ ...first.input, units: 'us' });
    expect(shown).toMatchObject({ units: 'us', ...us });
    // metric fields filled too, so switching units keeps the stats (1 in = 2.54 cm, NIST Handbook 44)
    expect(shown.heightCm).toBe('179.1');
    const again = estimateInput(shown);
    expect(again.ok && again.input).toEqual(first.input);
  });
  it('gives back metric stats as typed', () => {
    const typed = { ...emptyEstimate('metric'), sex: 'female', ageYears: '29', heightCm: '168.5', weightKg: '61.2' };
    const first = estimateInput(typed);
    if (!first.ok) throw new Error('the typed stats should be valid');
    expect(estimateValuesFrom({ ...first.input, units: 'metric' })).toMatchObject({
      units: 'metric',
      heightCm: '168.5',
      weightKg: '61.2',
      activity: 'moderate',
    });
  });
});

describe('targets form', () => {
  const estimate = {
    bmrKcal: 1397.15,
    tdeeKcal: 2165.58,
    kcalPerDay: 1732.47,
    proteinGPerDay: 136.08,
    proteinGPerKg: 2,
    perMeal: { kcal: 577.49, proteinG: 45.36 },
    cautions: [],
  };

  it('applies an estimate as whole numbers and keeps the rest of the form', () => {
    const before = { ...targetsValues(null), fiberMinG: '8', note: 'Keep lunches light.' };
    expect(applyEstimate(before, estimate, 3)).toEqual({
      perMealKcal: '577',
      perMealProteinG: '45',
      // the day is the meals added up (577 × 3, 45 × 3), so no screen shows 136 g beside 3 × 45 g
      kcalPerDay: '1731',
      proteinGPerDay: '135',
      mealsPerDay: '3',
      fiberMinG: '8',
      sodiumMaxMg: '',
      note: 'Keep lunches light.',
    });
  });
  it('round-trips saved targets', () => {
    const saved = { perMeal: { kcal: 550, proteinG: 40 }, kcalPerDay: 2200, proteinGPerDay: 160, mealsPerDay: 4, note: 'Build block' };
    expect(targetsFromValues(targetsValues(saved))).toEqual({ ok: true, targets: saved });
  });
  it('needs the per-meal pair and keeps to the server limits', () => {
    const r = targetsFromValues({ ...targetsValues(null), perMealKcal: '0', mealsPerDay: '2.5', sodiumMaxMg: '30000' });
    expect(r.ok).toBe(false);
    if (!r.ok) expect(Object.keys(r.errors).sort()).toEqual(['mealsPerDay', 'perMealKcal', 'perMealProteinG', 'sodiumMaxMg']);
  });
  it('maps nested server fields', () => {
    expect(targetsErrorsFrom({ 'perMeal.proteinG': 'too much' })).toEqual({ perMealProteinG: 'too much' });
  });
  it('judges a version against the per-meal targets', () => {
    const targets = { perMeal: { kcal: 550, proteinG: 40 } };
    expect(meetsPerMeal({ kcal: 550, proteinG: 40 }, targets)).toEqual({ kcal: true, protein: true });
    expect(meetsPerMeal({ kcal: 611, proteinG: 25 }, targets)).toEqual({ kcal: false, protein: false });
    expect(meetsPerMeal({ kcal: 1, proteinG: 1 }, null)).toBeNull();
  });
});
