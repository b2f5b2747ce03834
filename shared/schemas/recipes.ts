import { z } from 'zod';
import { MAX_LINES, MAX_TEXT_CHARS, servingsSchema } from './analyze';
import { targetsSchema } from './rewrite';
import type { Nutrients } from '../nutrition';
import { RECIPE_SORTS, type RecipeSort } from '../recipe-sorts';

export const VERSION_KINDS = ['original', 'rewrite', 'edit'] as const;
export type VersionKind = (typeof VERSION_KINDS)[number];

/** A version's line as stored: the text as written (or generated for a rewrite), the food and its grams. */
export interface StoredLine {
  input: string;
  foodId: number | null;
  foodName: string | null;
  grams: number;
  /** what the cook was told when the line was saved (0 g, a word not honoured…); absent on older versions */
  warnings?: string[];
  /** the match was weak or generic when saved: "check this match" */
  checkMatch?: boolean;
}

const title = z
  .string({ message: 'Give the recipe a title.' })
  .trim()
  .min(1, { message: 'Give the recipe a title.' })
  .max(200, { message: 'title is at most 200 characters.' });
const notes = z.string().max(20_000, { message: 'notes are at most 20,000 characters.' });
const revision = z.number({ message: 'revision is required: send the revision you read.' }).int().min(1);

/**
 * A line to save: as a rewrite returns it ({ food: { id }, grams, input? }) or as typed ({ input, foodId?, grams? }).
 * The food form comes first: a rewrite line with its text must keep its food, not be matched again from the text.
 */
export const versionLineSchema = z.union([
  z.object({
    food: z.object({ id: z.number().int().positive(), name: z.string().max(500).optional() }),
    grams: z.number({ message: 'grams must be a number.' }).min(0).max(100_000),
    input: z.string().max(1_000).optional(),
  }),
  z.object({
    input: z.string().max(1_000),
    foodId: z.number().int().positive().nullable().optional(),
    grams: z.number().min(0).max(100_000).optional(),
  }),
]);
export type VersionLineInput = z.infer<typeof versionLineSchema>;

export const createRecipeSchema = z
  .object({
    title,
    servings: servingsSchema,
    notes: notes.optional(),
    method: notes.optional(),
    text: z.string().max(MAX_TEXT_CHARS).optional(),
    lines: z
      .array(versionLineSchema)
      .max(MAX_LINES, { message: `A recipe has at most ${MAX_LINES} lines.` })
      .optional(),
  })
  .refine((v) => v.text !== undefined || v.lines !== undefined, { message: 'Send the ingredients as text or as lines.', path: ['text'] });

export const updateRecipeSchema = z.object({
  revision,
  title: title.optional(),
  servings: servingsSchema.optional(),
  notes: notes.optional(),
  method: notes.optional(),
});

/** Form fields beside a photo upload: the revision the client read, checked when sent. */
export const photoUploadFieldsSchema = z.object({
  revision: z.coerce.number({ message: 'revision must be the revision you read.' }).int().min(1).optional(),
});

/** `GET /api/recipes/:id/photo?size=thumb` for the list's small square; the full photo without it. */
export const photoQuerySchema = z.object({ size: z.enum(['full', 'thumb'], { message: 'size is full or thumb.' }).default('full') });

export const deleteRecipeSchema = z.object({ revision: z.coerce.number({ message: 'revision is required: send the revision you read.' }).int().min(1) });

export const createVersionSchema = z.object({
  kind: z.enum(VERSION_KINDS, { message: 'kind is one of original, rewrite, edit.' }),
  lines: z
    .array(versionLineSchema)
    .min(1, { message: 'A version needs at least one line.' })
    .max(MAX_LINES, { message: `A recipe has at most ${MAX_LINES} lines.` }),
  servings: servingsSchema.optional(),
  targets: targetsSchema.nullable().optional(),
  note: z.string().max(2_000, { message: 'note is at most 2,000 characters.' }).optional(),
  parentNumber: z.number().int().min(1).optional(),
});

export { RECIPE_SORTS, type RecipeSort };

export const recipeListQuerySchema = z.object({
  q: z.string().max(200).optional(),
  sort: z.enum(RECIPE_SORTS, { message: 'sort is one of updated, title, kcal, protein.' }).default('updated'),
});

export const idParam = z.object({ id: z.coerce.number({ message: 'id must be a number.' }).int().positive({ message: 'id must be positive.' }) });
export const versionParam = idParam.extend({ number: z.coerce.number({ message: 'number must be a number.' }).int().min(1) });

/** `?version=N` picks the version to export; without it, the latest. */
export const exportQuerySchema = z.object({
  version: z.coerce
    .number({ message: 'version must be a version number.' })
    .int({ message: 'version must be a version number.' })
    .min(1, { message: 'version must be a version number.' })
    .optional(),
});

export interface VersionSummary {
  number: number;
  kind: VersionKind;
  parentNumber: number | null;
  servings: number;
  perServing: Nutrients;
  note: string;
  createdAt: string;
}

export interface VersionDetail extends VersionSummary {
  /** `incomplete`: no food or 0 g, so the line adds nothing to the totals */
  lines: (StoredLine & { nutrients: Nutrients; volumeMl: number; incomplete: boolean; warnings: string[] })[];
  targets: z.infer<typeof targetsSchema> | null;
  totals: Nutrients;
  volumeMl: number;
}

export interface RecipeSummary {
  id: number;
  title: string;
  servings: number;
  revision: number;
  versionCount: number;
  latest: VersionSummary | null;
  hasPhoto: boolean;
  /** a small square of the photo for lists (`GET /api/recipes/:id/photo?size=thumb`) */
  thumbnailUrl: string | null;
  updatedAt: string;
  createdAt: string;
}

export interface RecipeDetail extends RecipeSummary {
  notes: string;
  method: string;
  photoUrl: string | null;
  versions: VersionSummary[];
}
