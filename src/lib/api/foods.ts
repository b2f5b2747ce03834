import { queryOptions } from '@tanstack/react-query';
import type { FoodDetail } from '../../../shared/schemas/analyze';
import type { FoodSearchResponse, LabelFoodInput, LabelScanResponse, MyFood, SavedFoodResponse } from '../../../shared/schemas/foods';
import { api } from '../api-client';
import { queryKeys } from '../query-keys';
import { uploadFile } from '../upload-file';

export const DEFAULT_SEARCH_LIMIT = 10;

export function searchFoods(q: string, limit = DEFAULT_SEARCH_LIMIT, signal?: AbortSignal): Promise<FoodSearchResponse> {
  const params = new URLSearchParams({ q, limit: String(limit) });
  return api.get<FoodSearchResponse>(`/api/foods/search?${params}`, { signal });
}

export function fetchFood(id: number, signal?: AbortSignal): Promise<FoodDetail> {
  return api.get<FoodDetail>(`/api/foods/${id}`, { signal });
}

export function fetchMyFoods(signal?: AbortSignal): Promise<{ foods: MyFood[] }> {
  return api.get<{ foods: MyFood[] }>('/api/foods/mine', { signal });
}

/** Catalogue search for a query that is already debounced (trimmed here); an empty query asks nothing. */
export function foodSearchQuery(q: string, limit = DEFAULT_SEARCH_LIMIT) {
  const query = q.trim();
  return queryOptions({
    queryKey: queryKeys.foods.search(query, limit),
    queryFn: ({ signal }) => searchFoods(query, limit, signal),
    enabled: query.length > 0,
    staleTime: 5 * 60_000,
  });
}

/** One food with its nutrients per 100 g and household portions; a null id asks nothing. */
export function foodQuery(id: number | null) {
  return queryOptions({
    queryKey: queryKeys.foods.detail(id ?? 'none'),
    queryFn: ({ signal }) => fetchFood(id as number, signal),
    enabled: id !== null && Number.isInteger(id) && id > 0,
    staleTime: 30 * 60_000,
  });
}

/** GET /api/foods/mine: the foods you entered from labels, then your coach's. */
export function myFoodsQuery() {
  return queryOptions({ queryKey: queryKeys.foods.mine(), queryFn: ({ signal }) => fetchMyFoods(signal) });
}

/** POST /api/foods: a food from a package label, stored per 100 g (cooks and coaches). */
export function createLabelFood(input: LabelFoodInput): Promise<SavedFoodResponse> {
  return api.post<SavedFoodResponse>('/api/foods', input);
}

export function updateLabelFood(id: number, input: LabelFoodInput): Promise<SavedFoodResponse> {
  return api.patch<SavedFoodResponse>(`/api/foods/${id}`, input);
}

/** DELETE /api/foods/:id; `hidden` when saved versions use the food and keep it. */
export function deleteLabelFood(id: number): Promise<{ deleted: true; hidden: boolean }> {
  return api.delete<{ deleted: true; hidden: boolean }>(`/api/foods/${id}`);
}

/** POST /api/foods/label-scan: the photo is read on the server; nothing is saved. */
export function scanLabel(photo: File): Promise<LabelScanResponse> {
  return uploadFile<LabelScanResponse>('/api/foods/label-scan', photo, { fieldName: 'image' });
}
