/**
 * The Kitchen's paste form, checked. The form loads this module when the cook first submits, so zod
 * stays out of the Kitchen's first visit.
 */
import { z } from 'zod';
import { MAX_LINES } from '../../../shared/recipe-limits';
import { ingredientLines, RECIPE_TEXT_MAX_LENGTH, SERVINGS_MAX } from './recipe-input';

export const recipeInputSchema = z.object({
  text: z
    .string()
    .max(RECIPE_TEXT_MAX_LENGTH, { error: `Keep the recipe under ${RECIPE_TEXT_MAX_LENGTH.toLocaleString('en-US')} characters.` })
    .refine((text) => ingredientLines(text).length > 0, { error: 'Paste at least one ingredient line.' })
    .refine((text) => ingredientLines(text).length <= MAX_LINES, {
      error: (issue) =>
        `A recipe has at most ${MAX_LINES} ingredient lines; this has ${ingredientLines(String(issue.input)).length}. Split it or leave out the lines that aren’t ingredients.`,
    }),
  servings: z
    .number({ error: 'Enter how many servings the recipe makes.' })
    .int({ error: 'Use a whole number of servings.' })
    .min(1, { error: 'A recipe makes at least 1 serving.' })
    .max(SERVINGS_MAX, { error: `Up to ${SERVINGS_MAX} servings at a time.` }),
});

export type RecipeInput = z.infer<typeof recipeInputSchema>;

export type RecipeInputErrors = Partial<Record<keyof RecipeInput, string>>;

/** The first message for each field, or null when the input is good. */
export function recipeInputErrors(values: { text: string; servings: number }): RecipeInputErrors | null {
  const result = recipeInputSchema.safeParse(values);
  if (result.success) return null;
  const errors: RecipeInputErrors = {};
  for (const issue of result.error.issues) {
    const field = issue.path[0] as keyof RecipeInput;
    errors[field] ??= issue.message;
  }
  return errors;
}
