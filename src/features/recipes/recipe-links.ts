/** Addresses of the recipe pages and downloads, in one place. */
export function recipePath(id: number, version?: number | null): string {
  return version ? `/recipes/${id}?version=${version}` : `/recipes/${id}`;
}

export function comparePath(id: number, a: number, b: number): string {
  return `/recipes/${id}/compare?${new URLSearchParams({ a: String(a), b: String(b) })}`;
}

export function printPath(id: number, version?: number | null): string {
  return version ? `/recipes/${id}/print?version=${version}` : `/recipes/${id}/print`;
}

/** The batch-prep page of one version: grams per portion, shopping, storage. */
export function prepPath(id: number, version: number): string {
  return `/recipes/${id}/versions/${version}/prep`;
}

/** The JSON-LD download of one version (the newest when none is named). */
export function exportHref(id: number, version?: number | null): string {
  return version ? `/api/recipes/${id}/export.jsonld?version=${version}` : `/api/recipes/${id}/export.jsonld`;
}

/** Every recipe of the signed-in cook with every version, as one JSON-LD file. */
export const BOOK_EXPORT_HREF = '/api/recipes/export.jsonld';

/** A whole positive number from a path or search parameter, else null. */
export function positiveInt(value: string | null | undefined): number | null {
  if (!value || !/^\d+$/.test(value)) return null;
  const n = Number(value);
  return Number.isSafeInteger(n) && n > 0 ? n : null;
}

/** The Kitchen with one saved version's lines on the board, ready to edit, rewrite and save as a new version. */
export function kitchenPath(id: number, version: number): string {
  return `/?${new URLSearchParams({ recipe: String(id), version: String(version) })}`;
}
