import { describe, expect, it } from 'vitest';
import { readRecipeText } from '../../shared/recipe-text';

describe('readRecipeText keeps ingredient lines apart from the rest of a pasted recipe', () => {
  it('reads a whole recipe page: title, servings, headings, sub-headings and method set aside', () => {
    const read = readRecipeText(
      [
        'Weeknight beef chili',
        'Serves 6',
        '',
        'Ingredients',
        '- 2 lb ground beef',
        '• 1 onion, chopped',
        'For the topping:',
        '1 cup shredded cheddar',
        'salt and pepper to taste',
        'Instructions',
        '1. Brown the beef in a large pot over medium heat, about 8 minutes.',
        '2. Add the onion and cook until soft.',
      ].join('\n'),
    );
    expect(read.title).toBe('Weeknight beef chili');
    expect(read.servings).toBe(6);
    expect(read.ingredients).toEqual(['2 lb ground beef', '1 onion, chopped', '1 cup shredded cheddar', 'salt and pepper to taste']);
    expect(read.method).toEqual(['Brown the beef in a large pot over medium heat, about 8 minutes.', 'Add the onion and cook until soft.']);
    expect(read.setAside.map((l) => l.why)).toEqual(['title', 'servings', 'heading', 'heading', 'heading', 'method', 'method']);
  });

  it('reads a bare ingredient list as the Kitchen asks for it: every line an ingredient, numbering removed', () => {
    const read = readRecipeText('Salt\n2 cups flour\n1. 3 eggs\n\n  1/2 tsp baking soda  ');
    expect(read.title).toBeNull();
    expect(read.ingredients).toEqual(['Salt', '2 cups flour', '3 eggs', '1/2 tsp baking soda']);
    expect(read.setAside).toEqual([]);
  });

  it('takes the first line of a list followed by a method as the title, never a line with an amount', () => {
    expect(readRecipeText('Beef chili\n2 lb ground beef\nMethod\nBrown it.').title).toBe('Beef chili');
    const numbered = readRecipeText('2 lb ground beef\n1 onion\nMethod\nBrown it.');
    expect(numbered.title).toBeNull();
    expect(numbered.ingredients).toEqual(['2 lb ground beef', '1 onion']);
  });

  it('reads an uploaded file with no headings as title, then amount or bullet lines, then notes', () => {
    const read = readRecipeText('Pancakes\nA family breakfast.\n- 1 cup flour\n2 eggs', 'title-and-notes');
    expect(read.title).toBe('Pancakes');
    expect(read.ingredients).toEqual(['1 cup flour', '2 eggs']);
    expect(read.notes).toEqual(['A family breakfast.']);
  });

  it('keeps a line that only looks like a heading when it carries an amount', () => {
    expect(readRecipeText('2 cups milk:\n1 tbsp butter').ingredients).toEqual(['2 cups milk:', '1 tbsp butter']);
  });
});
