import { describe, expect, it } from 'vitest';
import { navItemsFor } from '../../../src/app/access';
import { ingredientLines, recipeInputSchema } from '../../../src/features/analysis/components/recipe-input-form';
import { safeNextPath, signInPathFor } from '../../../src/lib/safe-redirect';
import type { User } from '../../../src/lib/user';

const user = (role: User['role']): User => ({ id: 1, email: 'a@b.test', displayName: 'A', role, coachId: null, unitSystem: 'us' });

describe('safeNextPath', () => {
  it('keeps same-site paths', () => {
    expect(safeNextPath('/recipes?tab=2#x')).toBe('/recipes?tab=2#x');
  });
  it('refuses off-site and odd targets', () => {
    for (const bad of ['https://evil.test', '//evil.test', '/\\evil.test', 'recipes', '/sign-in', '/sign-up?next=/x', '/a\nb']) {
      expect(safeNextPath(bad)).toBe('/');
    }
  });
  it('builds the sign-in link for where the person was', () => {
    expect(signInPathFor({ pathname: '/recipes', search: '?q=1' })).toBe('/sign-in?next=%2Frecipes%3Fq%3D1');
    expect(signInPathFor({ pathname: '/' })).toBe('/sign-in');
  });
});

describe('navItemsFor', () => {
  const labels = (u: User | null) => navItemsFor(u).map((i) => i.label);
  it('shows each role its own pages', () => {
    expect(labels(null)).toEqual(['Kitchen', 'Foods']);
    expect(labels(user('cook'))).toEqual(['Kitchen', 'Foods', 'My foods', 'Recipe book', 'Shopping', 'My coach']);
    expect(labels(user('coach'))).toEqual(['Kitchen', 'Foods', 'My foods', 'Swap library', 'Clients']);
    expect(labels(user('admin'))).toEqual(['Kitchen', 'Foods', 'People', 'Outbox']);
  });
});

describe('recipe input', () => {
  it('reads non-blank trimmed lines', () => {
    expect(ingredientLines('  2 cups milk \r\n\n 1 egg\n   ')).toEqual(['2 cups milk', '1 egg']);
    // the counter and the 100-line check count what the server will weigh, not the method under it
    expect(ingredientLines('Ingredients\n2 cups milk\nMethod\n1. Warm the milk.\n2. Serve.')).toEqual(['2 cups milk']);
  });
  it('validates text and servings', () => {
    expect(recipeInputSchema.safeParse({ text: '1 egg', servings: 2 }).success).toBe(true);
    expect(recipeInputSchema.safeParse({ text: '  \n ', servings: 2 }).success).toBe(false);
    expect(recipeInputSchema.safeParse({ text: '1 egg', servings: Number.NaN }).success).toBe(false);
    expect(recipeInputSchema.safeParse({ text: '1 egg', servings: 2.5 }).success).toBe(false);
    expect(recipeInputSchema.safeParse({ text: '1 egg', servings: 0 }).success).toBe(false);
  });
});
