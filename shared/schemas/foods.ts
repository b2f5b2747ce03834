import { z } from 'zod';
import { ROLES } from '../food';
import { MIN_SERVING, panelIssues, type LabelPanel } from '../label-food';
import type { FoodDetail, FoodSummary } from './analyze';

export const foodSearchQuerySchema = z.object({
  q: z
    .string({ message: 'q is required.' })
    .trim()
    .min(1, { message: 'q needs at least one character.' })
    .max(200, { message: 'q is at most 200 characters.' }),
  limit: z.coerce
    .number({ message: 'limit must be a number.' })
    .int()
    .min(1, { message: 'limit is at least 1.' })
    .max(50, { message: 'limit is at most 50.' })
    .default(10),
});

export const foodIdParamSchema = z.object({
  id: z.coerce.number({ message: 'id must be a number.' }).int({ message: 'id must be a whole number.' }).positive({ message: 'id must be positive.' }),
});

/** A label amount per serving: a finite number ≥ 0 (JSON's 1e999 arrives as Infinity and is refused). */
const amount = (field: string, max: number) =>
  z
    .number({ message: `${field} must be a number.` })
    .refine((v) => Number.isFinite(v), { message: `${field} must be a finite number.` })
    .refine((v) => v >= 0, { message: `${field} cannot be negative.` })
    .refine((v) => v <= max, { message: `${field} is at most ${max.toLocaleString('en-US')}.` });

const servingSize = (field: string) =>
  z
    .number({ message: `${field} must be a number.` })
    .refine((v) => Number.isFinite(v), { message: `${field} must be a finite number.` })
    .refine((v) => v >= MIN_SERVING, { message: `${field}: a serving is at least ${MIN_SERVING} ${field === 'servingSizeMl' ? 'mL' : 'g'}.` })
    .refine((v) => v <= 5_000, { message: `${field} is at most 5,000.` });

const labelFields = {
  name: z.string({ message: 'Name the food.' }).trim().min(2, { message: 'Name the food.' }).max(200, { message: 'name is at most 200 characters.' }),
  servingSizeG: servingSize('servingSizeG').optional(),
  servingSizeMl: servingSize('servingSizeMl').optional(),
  densityGPerMl: z
    .number({ message: 'densityGPerMl must be a number.' })
    .min(0.05, { message: 'densityGPerMl is at least 0.05.' })
    .max(2, { message: 'densityGPerMl is at most 2.' })
    .optional(),
  servingLabel: z.string({ message: 'servingLabel must be text.' }).trim().max(80, { message: 'servingLabel is at most 80 characters.' }).optional(),
  kcal: amount('kcal', 5_000).optional(),
  proteinG: amount('proteinG', 5_000),
  fatG: amount('fatG', 5_000),
  satFatG: amount('satFatG', 5_000).optional(),
  carbsG: amount('carbsG', 5_000),
  fiberG: amount('fiberG', 5_000).optional(),
  sugarG: amount('sugarG', 5_000).optional(),
  sodiumMg: amount('sodiumMg', 200_000).optional(),
  barcode: z
    .string({ message: 'barcode must be text.' })
    .trim()
    .regex(/^\d{6,14}$/, { message: 'barcode is 6 to 14 digits (UPC or EAN).' })
    .optional(),
  roles: z
    .array(z.enum(ROLES, { message: 'roles: choose from the listed culinary roles.' }))
    .max(5, { message: 'roles: at most 5.' })
    .optional(),
};

/** Physical limits per 100 g (shared/label-food.ts), each failure naming its field. */
function checkPanel(value: LabelPanel, ctx: z.RefinementCtx) {
  if (value.servingSizeG === undefined && value.servingSizeMl === undefined) {
    ctx.addIssue({ code: 'custom', message: 'Give the serving size in g or mL.', path: ['servingSizeG'] });
    return;
  }
  for (const issue of panelIssues(value)) ctx.addIssue({ code: 'custom', message: `${issue.field}: ${issue.message}`, path: [issue.field] });
}

/** `POST /api/foods`: a packaged food from its Nutrition Facts panel, per serving as printed. */
export const labelFoodSchema = z.object(labelFields).superRefine(checkPanel);
export type LabelFoodInput = z.infer<typeof labelFoodSchema>;

/** `PATCH /api/foods/:id`: any fields; the merged panel is checked again as a whole. */
export const labelFoodPatchSchema = z
  .object(labelFields)
  .partial()
  .refine((v) => Object.keys(v).length > 0, { message: 'Send at least one field to change.' });
export type LabelFoodPatch = z.infer<typeof labelFoodPatchSchema>;

/** What a label photo was read as: every field may be missing when the panel did not show it. */
export interface LabelScanFields {
  servingSizeG: number | null;
  servingSizeMl: number | null;
  servingLabel: string | null;
  kcal: number | null;
  fatG: number | null;
  satFatG: number | null;
  carbsG: number | null;
  fiberG: number | null;
  sugarG: number | null;
  proteinG: number | null;
  sodiumMg: number | null;
}

export interface LabelScanResponse {
  fields: LabelScanFields;
  /** 0–1: the OCR engine's mean word confidence, times the share of panel fields found */
  confidence: number;
  text: string;
  /** what the cook should check, e.g. "Sugars said “Less than 1g”: read as 0.5 g" */
  notes: string[];
}

/** A food the viewer entered (or their coach did), as `GET /api/foods/mine` lists it. */
export interface MyFood extends FoodDetail {
  ownerId: number;
  /** 'you' for the viewer's own foods, 'coach' for their coach's */
  owner: 'you' | 'coach';
  servingSizeG: number | null;
  servingSizeMl: number | null;
  servingLabel: string | null;
  barcode: string | null;
  /** the panel as it was entered, per serving */
  label: LabelPanel;
  energyFromAtwater: boolean;
  createdAt: string;
  updatedAt: string;
}

export interface SavedFoodResponse extends MyFood {
  warnings: string[];
}

/** One hit of GET /api/foods/search. */
export interface FoodSearchHit extends FoodSummary {
  foodGroup: string;
  roles: string[];
  branded: boolean;
  kcalPer100g: number;
  proteinPer100g: number;
  /** 0..1, how well the name answers the query */
  score: number;
  /** a food entered from a label: 'you' entered it, or your 'coach' did; null for catalogue foods */
  owner: 'you' | 'coach' | null;
}

export interface FoodSearchResponse {
  query: string;
  results: FoodSearchHit[];
}
