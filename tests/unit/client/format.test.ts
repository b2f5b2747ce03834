import { describe, expect, it } from 'vitest';
import { everydayWeight, formatGrams, formatKcal, formatMacroG, formatMg, formatNumber, formatWeight } from '../../../src/lib/format';

describe('format', () => {
  it('keeps one decimal under 10 and whole numbers above', () => {
    expect(formatGrams(0.44)).toBe('0.4 g');
    expect(formatGrams(7.25)).toBe('7.3 g');
    expect(formatGrams(128.4)).toBe('128 g');
    expect(formatGrams(1250)).toBe('1,250 g');
    expect(formatMacroG(12.6)).toBe('13 g');
  });
  it('rounds energy and sodium to whole units', () => {
    expect(formatKcal(451.6)).toBe('452 kcal');
    expect(formatMg(539.5)).toBe('540 mg');
  });
  it('never shows -0 or NaN', () => {
    expect(formatNumber(-0.001, 1)).toBe('0');
    expect(formatKcal(Number.NaN)).toBe('0 kcal');
  });
  // NIST Handbook 44 Appendix C: 1 oz = 28.349523125 g; 1 lb = 453.59237 g.
  it('converts with the NIST ounce', () => {
    expect(everydayWeight(453.59237, 'us')).toBe('1 lb');
    expect(everydayWeight(28.349523125 * 3, 'us')).toBe('3 oz');
    expect(everydayWeight(1250, 'us')).toBe('2 lb 12.1 oz');
    // 15.97 oz rounds to 16.0 oz: shown as the next pound, never "1 lb 16 oz" or "16 oz"
    expect(everydayWeight(28.349523125 * 31.97, 'us')).toBe('2 lb');
  });
  it('shows kilograms beside grams only from 1 kg in metric', () => {
    expect(everydayWeight(500, 'metric')).toBeNull();
    expect(formatWeight(1250, 'metric')).toBe('1,250 g (1.25 kg)');
    expect(formatWeight(227, 'us')).toBe('227 g (8 oz)');
    expect(formatWeight(0, 'us')).toBe('0 g');
  });
});
