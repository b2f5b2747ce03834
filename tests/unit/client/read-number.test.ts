import { describe, expect, it } from 'vitest';
import { numberText, readNumber, readRequiredNumber } from '../../../src/lib/read-number';
import { emptySwapDraft, swapRequestFromDraft } from '../../../src/features/swaps/swap-draft';
import { initialFormInput, rewriteFormSchema } from '../../../src/features/rewrite/rewrite-form';
import { emptyEstimate, estimateInput } from '../../../src/features/clients/estimate-form';

describe('readNumber: the one reader of typed numbers', () => {
  it('tells an empty box from a number', () => {
    expect(readNumber('')).toBeUndefined();
    expect(readNumber('   ')).toBeUndefined();
    expect(readRequiredNumber('')).toBeNaN();
  });

  it('reads plain numbers, a leading dot and a sign', () => {
    expect(readNumber('42')).toBe(42);
    expect(readNumber(' 2.5 ')).toBe(2.5);
    expect(readNumber('.5')).toBe(0.5);
    expect(readNumber('-3')).toBe(-3);
    expect(readNumber('+7')).toBe(7);
  });

  it('reads thousands grouped by commas or by spaces alike', () => {
    for (const text of ['1000', '1,000', '1 000', '1\u00a0000', '1\u202f000']) expect(readNumber(text), text).toBe(1000);
    expect(readNumber('12,500')).toBe(12500);
    expect(readNumber('1,250.5')).toBe(1250.5);
    expect(readNumber('1 250,5')).toBe(1250.5);
    expect(readNumber('2,000,000')).toBe(2_000_000);
  });

  it('reads a decimal comma', () => {
    expect(readNumber('2,5')).toBe(2.5);
    expect(readNumber('0,125')).toBe(0.125);
  });

  it('refuses what is not one number', () => {
    for (const text of ['12g', '1 2', '1,2,3', '1/2', 'abc', '1..2', '1 00', ',5', '-']) expect(readNumber(text), text).toBeNaN();
  });

  it('writes a figure back for a field', () => {
    expect(numberText(1250)).toBe('1250');
    expect(numberText(2.345, 1)).toBe('2.3');
    expect(numberText(undefined)).toBe('');
  });
});

describe('every number box reads "1 000" and "1,25" the same way', () => {
  it('the rewrite targets', () => {
    const input = initialFormInput({ proteinMinG: 40, kcalMax: 600, source: { kind: 'recipe' } });
    const parsed = rewriteFormSchema.safeParse({ ...input, targets: { ...input.targets, kcalMax: '1 000', proteinMinG: '42,5' } });
    expect(parsed.success && parsed.data.targets).toMatchObject({ kcalMax: 1000, proteinMinG: 42.5 });
  });

  it("a coach's swap volume ratio", () => {
    const draft = { ...emptySwapDraft(), toFood: { id: 2, name: 'Part-skim ricotta' }, fromRole: 'melting-cheese', fromKind: 'role' as const };
    const result = swapRequestFromDraft({ ...draft, volumeRatio: '1,25' }, { isNew: true });
    expect(result.ok && result.request.volumeRatio).toBe(1.25);
  });

  it('a target estimate', () => {
    const values = {
      ...emptyEstimate('us'),
      sex: 'female',
      ageYears: '40',
      heightFeet: '5',
      heightInches: '6',
      activity: 'light',
      goal: 'lose',
      mealsPerDay: '3',
    };
    const dot = estimateInput({ ...values, weightLb: '180.5' });
    const comma = estimateInput({ ...values, weightLb: '180,5' });
    expect(dot.ok).toBe(true);
    expect(comma).toEqual(dot);
    const garbled = estimateInput({ ...values, weightLb: '1 80' });
    expect(garbled.ok ? null : garbled.errors.weight).toBe('Enter their weight in pounds.');
  });
});
