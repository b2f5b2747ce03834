import { queryOptions } from '@tanstack/react-query';
import type { z } from 'zod';
import type {
  createRecipeSchema,
  createVersionSchema,
  RecipeDetail,
  RecipeSort,
  RecipeSummary,
  updateRecipeSchema,
  VersionDetail,
} from '../../../shared/schemas/recipes';
import { api } from '../api-client';
import { queryKeys } from '../query-keys';
import { uploadFile } from '../upload-file';

// One fetcher per server call under /api/recipes, and the query options every reader shares.

export function fetchRecipes(q: string, sort: RecipeSort, signal?: AbortSignal): Promise<{ recipes: RecipeSummary[] }> {
  const params = new URLSearchParams({ sort });
  if (q) params.set('q', q);
  return api.get<{ recipes: RecipeSummary[] }>(`/api/recipes?${params}`, { signal });
}

export function fetchRecipe(id: number, signal?: AbortSignal): Promise<RecipeDetail> {
  return api.get<RecipeDetail>(`/api/recipes/${id}`, { signal });
}

export function fetchVersion(recipeId: number, number: number, signal?: AbortSignal): Promise<VersionDetail> {
  return api.get<VersionDetail>(`/api/recipes/${recipeId}/versions/${number}`, { signal });
}

/** The signed-in cook's recipes whose title holds `q` (trimmed), in the order `sort` asks for. */
export function recipeListQuery(q: string, sort: RecipeSort) {
  const query = q.trim();
  return queryOptions({
    queryKey: queryKeys.recipes.listed(query, sort),
    queryFn: ({ signal }) => fetchRecipes(query, sort, signal),
  });
}

/** One recipe with its timeline of versions, for its owner or the owner's coach; a null id asks nothing. */
export function recipeQuery(id: number | null) {
  return queryOptions({
    queryKey: queryKeys.recipes.detail(id ?? 'none'),
    queryFn: ({ signal }) => fetchRecipe(id as number, signal),
    enabled: id !== null,
  });
}

/** One saved version with its lines and nutrients; null for either part asks nothing. */
export function versionQuery(recipeId: number | null, number: number | null) {
  return queryOptions({
    queryKey: queryKeys.recipes.version(recipeId ?? 0, number ?? 0),
    queryFn: ({ signal }) => fetchVersion(recipeId as number, number as number, signal),
    enabled: recipeId !== null && number !== null,
    // A saved version is never edited; restoring copies it forward as a new number.
    staleTime: Infinity,
  });
}

/**
 * What POST /api/recipes takes:
 * - `title` (1–200 characters) and `servings` (whole number, 1–100);
 * - `notes?`, `method?`: free text, up to 20,000 characters each;
 * - the ingredients, one of
 *   - `text`: pasted lines, one ingredient a line (the server reads, matches and weighs each), or
 *   - `lines`: `[{ input, foodId?, grams? }]` as typed, or `[{ food: { id }, grams, input? }]` as a rewrite returns them.
 * The ingredients become version 1, kind "original" ("As written").
 */
export type CreateRecipeInput = z.input<typeof createRecipeSchema>;

export function createRecipe(input: CreateRecipeInput): Promise<RecipeDetail> {
  return api.post<RecipeDetail>('/api/recipes', input);
}

/** `revision` is the one the cook read; a stale one is refused with 409 and nothing changes. */
export type UpdateRecipeInput = z.input<typeof updateRecipeSchema> & { id: number };

export function updateRecipe({ id, ...body }: UpdateRecipeInput): Promise<RecipeDetail> {
  return api.patch<RecipeDetail>(`/api/recipes/${id}`, body);
}

export interface DeleteRecipeInput {
  id: number;
  revision: number;
}

export function deleteRecipe({ id, revision }: DeleteRecipeInput): Promise<{ id: number; deleted: true; revision: number }> {
  return api.delete(`/api/recipes/${id}`, { revision });
}

/** Undo of a delete: the recipe comes back with every version. */
export function undeleteRecipe(id: number): Promise<RecipeDetail> {
  return api.post<RecipeDetail>(`/api/recipes/${id}/undelete`);
}

/** A new recipe whose first version is a copy of this one's newest. */
export function duplicateRecipe(id: number): Promise<RecipeDetail> {
  return api.post<RecipeDetail>(`/api/recipes/${id}/duplicate`);
}

/**
 * What POST /api/recipes/:id/versions takes, plus the recipe it goes onto:
 * - `recipeId`: the recipe's id;
 * - `kind`: "original" | "rewrite" | "edit" (shown as "As written", "Lighter rewrite", "Your edit");
 * - `lines` (1–100): `[{ food: { id }, grams, input? }]` as a rewrite's `after.lines` come back
 *   (map each to `{ food: { id: line.food.id }, grams: line.grams }`), or `[{ input, foodId?, grams? }]` as typed;
 * - `servings?`: defaults to the recipe's servings;
 * - `targets?`: the per-serving targets the rewrite was asked for (`{ proteinMinG, kcalMax, … }`), or null;
 * - `note?`: up to 2,000 characters, shown on the timeline (e.g. "Ricotta to part-skim, turkey for beef");
 * - `parentNumber?`: the version it was made from; defaults to the newest one.
 */
export type SaveVersionInput = z.input<typeof createVersionSchema> & { recipeId: number };

export function saveVersion({ recipeId, ...body }: SaveVersionInput): Promise<VersionDetail> {
  return api.post<VersionDetail>(`/api/recipes/${recipeId}/versions`, body);
}

export interface RestoreVersionInput {
  recipeId: number;
  number: number;
}

/** Copies version `number` forward as the newest; nothing in between is lost. */
export function restoreVersion({ recipeId, number }: RestoreVersionInput): Promise<VersionDetail> {
  return api.post<VersionDetail>(`/api/recipes/${recipeId}/restore/${number}`);
}

/** The first recipe of the file; a whole-book file brings the rest too (`alsoImported`). */
export type ImportedRecipe = RecipeDetail & { importedFrom?: string; importedCount?: number; alsoImported?: { id: number; title: string }[] };

export function importRecipe(file: File): Promise<ImportedRecipe> {
  return uploadFile<ImportedRecipe>('/api/recipes/import', file);
}

/** Sends the revision the page read: the server answers 409 when the recipe changed meanwhile. */
export function uploadPhoto(
  recipeId: number,
  revision: number,
  file: File,
  onProgress?: (fraction: number) => void,
  signal?: AbortSignal,
): Promise<RecipeDetail> {
  return uploadFile<RecipeDetail>(`/api/recipes/${recipeId}/photo`, file, {
    fields: { revision: String(revision) },
    onProgress: (p) => onProgress?.(p.fraction),
    signal,
  });
}

export function removePhoto(recipeId: number, revision: number): Promise<RecipeDetail> {
  return api.delete<RecipeDetail>(`/api/recipes/${recipeId}/photo`, { revision });
}
