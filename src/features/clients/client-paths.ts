/** Addresses of the coach's client pages, in one place. */
export function clientPath(clientId: number): string {
  return `/clients/${clientId}`;
}

export function clientVersionPath(clientId: number, recipeId: number, number: number): string {
  return `/clients/${clientId}/versions/${recipeId}/${number}`;
}

/** A whole positive number from a path parameter, else null. */
export function positiveId(value: string | undefined): number | null {
  if (!value || !/^\d+$/.test(value)) return null;
  const n = Number(value);
  return Number.isSafeInteger(n) && n > 0 ? n : null;
}
