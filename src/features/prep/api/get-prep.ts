import { useQuery } from '@tanstack/react-query';
import type { Allergen } from '../../../../shared/allergens';
import type { StorageGuidance } from '../../../../shared/food-safety';
import type { LabelPanel } from '../../../../shared/label-rounding';
import type { Nutrients } from '../../../../shared/nutrition';
import type { VersionKind } from '../../../../shared/schemas/recipes';
import { api } from '../../../lib/api-client';
import { queryKeys } from '../../../lib/query-keys';

/** A catalogue food, or a line no catalogue food matched (id null, the line's own words as name). */
export type PrepFood = { id: number; source: string; sourceId: string; name: string } | { id: null; source?: null; sourceId?: null; name: string };

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

export interface Prep {
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

export function prepPath(id: number, number: number, portions: number): string {
  return `/api/recipes/${id}/versions/${number}/prep?${new URLSearchParams({ portions: String(portions) })}`;
}

export function getPrep(id: number, number: number, portions: number, signal?: AbortSignal): Promise<Prep> {
  return api.get<Prep>(prepPath(id, number, portions), { signal });
}

/**
 * A saved version scaled to `portions`. The key sits under the recipe's detail key, so whatever
 * refreshes a recipe (a new version, an edit) refreshes its prep too.
 */
export function usePrep(id: number | null, number: number | null, portions: number | null) {
  return useQuery({
    queryKey: [...queryKeys.recipes.detail(id ?? 'none'), 'prep', number, portions] as const,
    queryFn: ({ signal }) => getPrep(id as number, number as number, portions as number, signal),
    enabled: id !== null && number !== null && portions !== null,
  });
}
