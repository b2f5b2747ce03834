import { ALLERGEN_LABELS, type Allergen } from '../../../shared/allergens';
import type { VersionKind } from '../../../shared/schemas/recipes';
import { countOf } from '../../lib/words';

export const MIN_PORTIONS = 1;
export const MAX_PORTIONS = 100;

const KIND_WORDS: Record<VersionKind, string> = {
  original: 'as first written',
  rewrite: 'a lighter rewrite',
  edit: 'an edit',
};

/** "Version 3, an edit · written for 6 servings" */
export function versionLine(version: { number: number; kind: VersionKind; servings: number }): string {
  const servings = countOf(version.servings, 'serving');
  return `Version ${version.number}, ${KIND_WORDS[version.kind]} · written for ${servings}`;
}

export function portionsWord(portions: number): string {
  return countOf(portions, 'portion');
}

/** "Milk, Egg and Wheat" in the order the server gives (the fixed order of the nine). */
export function allergenWords(allergens: readonly Allergen[]): string {
  const names = allergens.map((a) => ALLERGEN_LABELS[a]);
  return names.length <= 1 ? (names[0] ?? '') : `${names.slice(0, -1).join(', ')} and ${names[names.length - 1]}`;
}

/** Each batch size keeps its own ticks: 6 portions and 12 portions are different shopping trips. */
export function prepChecksKey(recipeId: number, versionNumber: number, portions: number): string {
  return `hearthswap:prep-checks:${recipeId}:${versionNumber}:${portions}`;
}

/** Method text as steps: one step a line, any "1." or "Step 1:" the cook typed left off. */
export function methodSteps(method: string): string[] {
  return method
    .split(/\r?\n/)
    .map((line) => line.trim().replace(/^(?:step\s*)?\d+[.):]\s*/i, ''))
    .filter(Boolean);
}

/** A whole positive number from a path parameter, else null. */
export function positiveInt(value: string | null | undefined): number | null {
  if (!value || !/^\d+$/.test(value)) return null;
  const n = Number(value);
  return Number.isSafeInteger(n) && n > 0 ? n : null;
}

/**
 * The portions the address asks for. Anything numeric is passed on as asked, so the server's answer
 * (a 400 naming portions) can say what is wrong with it; a missing or non-numeric value is null.
 */
export function portionsParam(value: string | null): number | null {
  if (value === null || value.trim() === '') return null;
  const n = Number(value);
  return Number.isFinite(n) ? n : null;
}

/** A batch size to start from: the version's servings, kept inside 1–100. */
export function startingPortions(servings: number | null | undefined): number {
  if (!servings || !Number.isFinite(servings)) return MIN_PORTIONS;
  return Math.min(MAX_PORTIONS, Math.max(MIN_PORTIONS, Math.round(servings)));
}
