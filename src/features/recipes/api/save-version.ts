import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import type { VersionDetail, createVersionSchema } from '../../../../shared/schemas/recipes';
import { api } from '../../../lib/api-client';
import { storeVersion } from './recipe-cache';

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

/** Adds a version to a recipe: `mutate(input: SaveVersionInput)` → the new VersionDetail (201), numbered after the newest. */
export function useSaveVersion() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: saveVersion,
    onSuccess: (version, input) => storeVersion(queryClient, input.recipeId, version),
  });
}
