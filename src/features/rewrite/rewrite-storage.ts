/**
 * The panel's targets and last rewrite in sessionStorage, beside the Kitchen's own state, so signing in
 * to save (or a reload) comes back to the same rewrite. Kept only for the recipe it was made for.
 */
import type { RewriteRequest } from '../../../shared/schemas/rewrite';
import type { RewriteFormInput } from './rewrite-form';
import type { RewriteAnswer } from './rewrite-types';

export const REWRITE_STORAGE_KEY = 'hearthswap:rewrite';
const VERSION = 1;

export interface RewriteSnapshot {
  /** recipeSignature() of the lines and servings the values were set for */
  recipe: string;
  values: RewriteFormInput;
  /** the last answer and the request it answers */
  last: { request: RewriteRequest; answer: RewriteAnswer } | null;
}

const isObject = (v: unknown): v is Record<string, unknown> => typeof v === 'object' && v !== null && !Array.isArray(v);

function isFormInput(v: unknown): v is RewriteFormInput {
  return (
    isObject(v) &&
    isObject(v.targets) &&
    Object.values(v.targets).every((t) => typeof t === 'string') &&
    typeof v.volumeTolerancePct === 'string' &&
    typeof v.maxSwaps === 'string' &&
    Array.isArray(v.lockedLines) &&
    Array.isArray(v.excludedFoods) &&
    Array.isArray(v.diet) &&
    typeof v.objective === 'string'
  );
}

function isLast(v: unknown): v is RewriteSnapshot['last'] {
  if (v === null) return true;
  return isObject(v) && isObject(v.request) && isObject(v.answer) && isObject(v.answer.before) && isObject(v.answer.after) && Array.isArray(v.answer.changes);
}

export function loadRewrite(storage: Storage | undefined, recipe: string): RewriteSnapshot | null {
  try {
    const raw = storage?.getItem(REWRITE_STORAGE_KEY);
    if (!raw) return null;
    const parsed: unknown = JSON.parse(raw);
    if (!isObject(parsed) || parsed.version !== VERSION || parsed.recipe !== recipe) return null;
    if (!isFormInput(parsed.values) || !isLast(parsed.last)) return null;
    return { recipe, values: parsed.values, last: parsed.last };
  } catch {
    return null;
  }
}

export function saveRewrite(storage: Storage | undefined, snapshot: RewriteSnapshot): void {
  try {
    // The model text is for reading once; it stays out of storage.
    const last = snapshot.last && { ...snapshot.last, answer: { ...snapshot.last.answer, solver: { ...snapshot.last.answer.solver, model: undefined } } };
    storage?.setItem(REWRITE_STORAGE_KEY, JSON.stringify({ version: VERSION, ...snapshot, last }));
  } catch {
    // A full or blocked storage only costs the restore after a reload.
  }
}

export function sessionStore(): Storage | undefined {
  return typeof window === 'undefined' ? undefined : window.sessionStorage;
}
