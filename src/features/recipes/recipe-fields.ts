import { z } from 'zod';

export const SERVINGS_MAX = 100;

/** Title and servings as every recipe form checks them (the server's limits, in the cook's words). */
export const recipeTitleField = z.string().trim().min(1, { error: 'Give the recipe a title.' }).max(200, { error: 'Keep the title under 200 characters.' });

export const recipeServingsField = z
  .number({ error: 'Enter how many servings the recipe makes.' })
  .int({ error: 'Use a whole number of servings.' })
  .min(1, { error: 'A recipe makes at least 1 serving.' })
  .max(SERVINGS_MAX, { error: `Up to ${SERVINGS_MAX} servings.` });
