import type { SetAsideLine } from '../recipe-text';
import { z } from 'zod';
import type { Nutrients } from '../nutrition';
import type { DishType, LineFunction } from '../culinary/types';

export const MAX_LINES = 100;
export const MAX_TEXT_CHARS = 20_000;

/** One ingredient line as the cook wrote it, optionally pinned to a food or a weight. */
export const lineInputSchema = z.object({
  input: z.string({ message: 'Each line needs its text.' }).max(1_000, { message: 'A line is at most 1,000 characters.' }),
  foodId: z.number().int().positive().optional(),
  grams: z
    .number({ message: 'grams must be a number.' })
    .min(0, { message: 'grams cannot be negative.' })
    .max(100_000, { message: 'grams is at most 100,000.' })
    .optional(),
});
export type LineInput = z.infer<typeof lineInputSchema>;

export const servingsSchema = z
  .number({ message: 'servings must be a number from 1 to 100.' })
  .int({ message: 'servings must be a whole number.' })
  .min(1, { message: 'servings must be at least 1.' })
  .max(100, { message: 'servings is at most 100.' });

export const recipeSourceSchema = z
  .object({
    text: z
      .string()
      .max(MAX_TEXT_CHARS, { message: `text is at most ${MAX_TEXT_CHARS.toLocaleString('en-US')} characters.` })
      .optional(),
    lines: z
      .array(lineInputSchema)
      .max(MAX_LINES, { message: `A recipe has at most ${MAX_LINES} lines.` })
      .optional(),
    servings: servingsSchema,
  })
  .refine((v) => v.text !== undefined || v.lines !== undefined, { message: 'Send the recipe as text or as lines.', path: ['text'] });

export const analyzeRequestSchema = recipeSourceSchema;
export type AnalyzeRequest = z.infer<typeof analyzeRequestSchema>;

export interface FoodSummary {
  id: number;
  source: 'usda-sr28' | 'custom';
  sourceId: string;
  name: string;
}

export interface FoodDetail extends FoodSummary {
  foodGroup: string;
  roles: string[];
  diet: string[];
  branded: boolean;
  densityGPerMl: number;
  per100g: Nutrients & { waterG: number | null };
  portions: { label: string; amount: number; measure: string; grams: number }[];
}

export interface AnalyzedLine {
  input: string;
  parsed: { quantity: number | null; unit: string | null; name: string; comment: string | null };
  food: FoodSummary | null;
  alternatives: FoodSummary[];
  confidence: number;
  grams: number;
  volumeMl: number;
  nutrients: Nutrients;
  warnings: string[];
  /** household measure used to weigh the line, e.g. "1 cup, shredded" */
  portionUsed: string | null;
  /** the cook pinned the food or the grams */
  pinned: { food: boolean; grams: boolean };
  /** a weak or generic match the cook should check ("cheese", "oil", a word the food lacks) */
  checkMatch: boolean;
  /** a word of the line that changes the food ("turkey", "low-fat") and that no catalogue food has */
  missingModifier: string | null;
  /** what the line does in the dish, inferred from the whole recipe */
  role?: LineFunction;
}

export interface AnalyzeResponse {
  servings: number;
  /** the kind of dish, inferred from every line */
  dishType?: DishType;
  lines: AnalyzedLine[];
  totals: Nutrients;
  perServing: Nutrients;
  totalGrams: number;
  volumeMl: number;
  /** for pasted text: what was read around the ingredient lines and left out of them */
  fromText?: { title: string | null; servings: number | null; setAside: SetAsideLine[] };
}
