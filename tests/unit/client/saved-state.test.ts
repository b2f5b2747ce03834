import { describe, expect, it } from 'vitest';
import { deletedRecipeFrom } from '../../../src/features/recipes/deleted-recipe-state';
import { initialFormInput } from '../../../src/features/rewrite/rewrite-form';
import { loadRewrite, REWRITE_STORAGE_KEY } from '../../../src/features/rewrite/rewrite-storage';
import { isValidPortions, parsePickParam } from '../../../src/features/shopping/shopping-picks';

/** sessionStorage holding one entry under the rewrite key. */
const storageWith = (value: unknown) => ({ getItem: (key: string) => (key === REWRITE_STORAGE_KEY ? JSON.stringify(value) : null) }) as unknown as Storage;

describe('saved state is read through its zod guard', () => {
  it('a shopping pick from the prep link', () => {
    expect(parsePickParam('12.3.6')).toEqual({ recipeId: 12, versionNumber: 3, portions: 6 });
    expect(parsePickParam('12.0.6')).toBeNull();
    expect(parsePickParam('12.3.101')).toBeNull();
    expect(parsePickParam('99999999999999999.1.1')).toBeNull();
    expect(isValidPortions(100)).toBe(true);
    expect(isValidPortions(1.5)).toBe(false);
  });

  it('the deleted recipe the book offers to bring back', () => {
    expect(deletedRecipeFrom({ deletedRecipe: { id: 4, title: 'Lasagne' }, key: 'x' })).toEqual({ id: 4, title: 'Lasagne' });
    expect(deletedRecipeFrom({ deletedRecipe: { id: '4', title: 'Lasagne' } })).toBeNull();
    expect(deletedRecipeFrom(null)).toBeNull();
  });

  it('the rewrite panel, kept only for the recipe it was made for', () => {
    const values = initialFormInput({ proteinMinG: 30, kcalMax: 500, source: { kind: 'recipe' } });
    const stored = { version: 1, recipe: 'r1', values, last: null };
    expect(loadRewrite(storageWith(stored), 'r1')).toEqual({ recipe: 'r1', values, last: null });
    expect(loadRewrite(storageWith(stored), 'r2')).toBeNull();
    expect(loadRewrite(storageWith({ ...stored, version: 0 }), 'r1')).toBeNull();
    expect(loadRewrite(storageWith({ ...stored, values: { ...values, maxSwaps: 3 } }), 'r1')).toBeNull();
    expect(loadRewrite(storageWith({ ...stored, last: { request: {}, answer: { before: {}, after: {} } } }), 'r1')).toBeNull();
  });
});
