/** The Kitchen's paste form without its checks (recipe-input-schema.ts, loaded on submit): limits and the lines it reads. */
import { readRecipeText } from '../../../shared/recipe-text';

export const RECIPE_TEXT_MAX_LENGTH = 10_000;
export const SERVINGS_MAX = 50;

/** The ingredient lines of pasted text, as the server will read them (title, headings and method set aside). */
export function ingredientLines(text: string): string[] {
  return readRecipeText(text).ingredients;
}
