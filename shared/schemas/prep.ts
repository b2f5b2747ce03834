import { z } from 'zod';
import type { Allergen } from '../allergens';
import type { StorageGuidance } from '../food-safety';
import type { LabelPanel } from '../label-rounding';
import type { Nutrients } from '../nutrition';
import type { FoodSummary } from './analyze';
import type { VersionKind } from './recipes';

const portions = z.coerce
  .number({ message: 'portions must be a whole number from 1 to 100.' })
  .int({ message: 'portions must be a whole number from 1 to 100.' })
  .min(1, { message: 'portions must be at least 1.' })
  .max(100, { message: 'portions is at most 100.' });

export const prepQuerySchema = z.object({ portions });

export const shoppingListSchema = z.object({
  items: z
    .array(z.object({ recipeId: z.number().int().positive(), versionNumber: z.number().int().min(1), portions }))
    .min(1, { message: 'Add at least one version to shop for.' })
    .max(20, { message: 'At most 20 versions in one list.' }),
  unitSystem: z.enum(['us', 'metric']).optional(),
});

export type ShoppingListInput = z.output<typeof shoppingListSchema>;

// --- Answers of GET /api/recipes/:id/versions/:number/prep and POST /api/shopping-lists.

/** A catalogue food, or a line no catalogue food matched (id null, the line's own words as name). */
export type PrepFood = FoodSummary | { id: null; source: null; sourceId: null; name: string };

export interface PrepWeight {
  food: PrepFood;
  /** rounded for a kitchen scale: tenths under 10 g, whole grams above */
  grams: number;
  display: string;
}

export interface PrepShoppingItem {
  food: PrepFood;
  grams: number;
  /** how it is bought: "3 large eggs", "about 2 cups", "1 lb 2 oz"; empty when there is no hint */
  purchase: string;
}

export interface PrepBatchWeight extends PrepWeight {
  /** the line's own household measure, scaled to the batch: "1 1/2 cups", "2 cans (15 oz)"; '' when it has none */
  household: string;
}

export interface PrepResponse {
  recipe: { id: number; title: string; method: string; notes: string; photoUrl: string | null };
  version: { number: number; kind: VersionKind; servings: number };
  portions: number;
  perPortion: PrepWeight[];
  batch: PrepBatchWeight[];
  shopping: PrepShoppingItem[];
  shoppingText: string;
  storage: StorageGuidance;
  allergens: Allergen[];
  label: LabelPanel;
  perServing: Nutrients;
}

export interface ShoppingListResponse {
  sources: { recipeId: number; title: string; versionNumber: number; portions: number }[];
  /** merged by food across every batch, in the order each food first appears */
  items: PrepShoppingItem[];
  text: string;
}
