import { describe, expect, it } from 'vitest';
import { rewriteRequestSchema } from '../../../shared/schemas/rewrite';
import { lineInputs, lineRolesFor, withRole, type KitchenLine } from '../../../src/features/analysis/kitchen-lines';
import { parseKitchen, serializeKitchen } from '../../../src/features/analysis/kitchen-storage';
import { rewriteFormSchema, rewriteRequestFor } from '../../../src/features/rewrite/rewrite-form';

const lines: KitchenLine[] = [
  { key: 'a', input: '1 lb ground beef' },
  { key: 'b', input: '1 onion, chopped' },
  { key: 'c', input: '1 teaspoon salt' },
];

describe("the cook's line functions", () => {
  it('are set and cleared per line, and stay out of the analysis request', () => {
    const set = withRole(lines, 'b', 'vegetable');
    expect(set[1].role).toBe('vegetable');
    expect(lineInputs(set)).toEqual(lines.map(({ input }) => ({ input })));
    expect(withRole(set, 'b', null)[1].role).toBeUndefined();
  });

  it('follow the answered lines by key, even when lines moved since', () => {
    const set = withRole(withRole(lines, 'b', 'vegetable'), 'c', 'seasoning');
    expect(lineRolesFor(set, ['a', 'b', 'c'])).toEqual({ 1: 'vegetable', 2: 'seasoning' });
    expect(lineRolesFor(set, ['c', 'a'])).toEqual({ 0: 'seasoning' });
  });

  it('survive a reload, and a stored unknown function is refused', () => {
    const snapshot = { pastedText: '', source: null, lines: withRole(lines, 'b', 'vegetable'), servings: 4, analysis: null, answered: null };
    expect(parseKitchen(serializeKitchen(snapshot))?.lines[1].role).toBe('vegetable');
    const bad = serializeKitchen({ ...snapshot, lines: [{ key: 'x', input: 'x', role: 'garnish-ish' as never }] });
    expect(parseKitchen(bad)).toBeNull();
  });

  it('are sent with the rewrite as lineRoles, which the request schema accepts', () => {
    const values = rewriteFormSchema.parse({
      targets: { proteinMinG: '30', kcalMax: '600', fiberMinG: '', fatMaxG: '', satFatMaxG: '', sodiumMaxMg: '', sugarMaxG: '' },
      volumeTolerancePct: '10',
      maxSwaps: '',
      objective: 'closest',
      lockedLines: [],
      excludedFoods: [],
      diet: [],
    });
    const request = rewriteRequestFor({ lines: lineInputs(lines), servings: 4, lineRoles: { 1: 'vegetable', 7: 'other' } }, values);
    expect(request.lineRoles).toEqual({ 1: 'vegetable' });
    expect(rewriteRequestSchema.safeParse(request).success).toBe(true);
    expect(rewriteRequestFor({ lines: lineInputs(lines), servings: 4 }, values).lineRoles).toBeUndefined();
  });
});
