/**
 * The panel's targets and last rewrite in sessionStorage, beside the Kitchen's own state, so signing in
 * to save (or a reload) comes back to the same rewrite. Kept only for the recipe it was made for.
 */
import { z } from 'zod';
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

// The form as typed (every box is text) and the outline of our own server's answer: enough to refuse a stale or foreign entry.
const formInputSchema = z.looseObject({
  targets: z.record(z.string(), z.string()),
  volumeTolerancePct: z.string(),
  maxSwaps: z.string(),
  lockedLines: z.array(z.unknown()),
  excludedFoods: z.array(z.unknown()),
  diet: z.array(z.unknown()),
  objective: z.string(),
});
const lastSchema = z
  .looseObject({
    request: z.looseObject({}),
    answer: z.looseObject({ before: z.looseObject({}), after: z.looseObject({}), changes: z.array(z.unknown()) }),
  })
  .nullable();
const storedSchema = z.looseObject({ version: z.literal(VERSION), recipe: z.string(), values: formInputSchema, last: lastSchema });

export function loadRewrite(storage: Storage | undefined, recipe: string): RewriteSnapshot | null {
  try {
    const raw = storage?.getItem(REWRITE_STORAGE_KEY);
    if (!raw) return null;
    const parsed = storedSchema.safeParse(JSON.parse(raw));
    if (!parsed.success || parsed.data.recipe !== recipe) return null;
    return { recipe, values: parsed.data.values as RewriteFormInput, last: parsed.data.last as RewriteSnapshot['last'] };
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
