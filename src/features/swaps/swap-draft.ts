import { ROLES } from '../../../shared/food';
import type { FieldErrors } from '../../lib/api-client';
import type { Swap, SwapRequest } from '../../../shared/schemas/swaps';
import { readNumber } from '../../lib/read-number';
import { parseTags } from '../../lib/swap-words';

/** A food chosen in a picker; catalogue search hits and swap foods both fit. */
export interface PickedFood {
  id: number;
  name: string;
  kcalPer100g?: number;
  proteinPer100g?: number;
}

export interface SwapDraft {
  fromKind: 'food' | 'role';
  fromFood: PickedFood | null;
  fromRole: string;
  toFood: PickedFood | null;
  /** as typed */
  volumeRatio: string;
  note: string;
  /** comma-separated, as typed */
  tags: string;
  publishNow: boolean;
}

export type SwapDraftField = 'fromFood' | 'fromRole' | 'toFood' | 'volumeRatio' | 'note' | 'tags';
export type SwapDraftErrors = Partial<Record<SwapDraftField, string>>;

// The server's limits (shared/schemas/coaching.ts), checked here first so the coach sees them at once.
export const MAX_VOLUME_RATIO = 4;
export const MAX_NOTE_CHARS = 2_000;
export const MAX_TAGS = 20;
export const MAX_TAG_CHARS = 40;

export function emptySwapDraft(): SwapDraft {
  return { fromKind: 'food', fromFood: null, fromRole: '', toFood: null, volumeRatio: '1', note: '', tags: '', publishNow: false };
}

export function draftFromSwap(swap: Swap): SwapDraft {
  return {
    fromKind: swap.fromRole ? 'role' : 'food',
    fromFood: swap.fromFood ? { id: swap.fromFood.id, name: swap.fromFood.name } : null,
    fromRole: swap.fromRole ?? '',
    toFood: swap.toFood,
    volumeRatio: String(swap.volumeRatio),
    note: swap.note,
    tags: swap.tags.join(', '),
    publishNow: swap.status === 'published',
  };
}

export type SwapDraftResult = { ok: true; request: SwapRequest } | { ok: false; errors: SwapDraftErrors };

/** Checks a draft and builds the request; `status` is only sent for a new swap. */
export function swapRequestFromDraft(draft: SwapDraft, options: { isNew: boolean }): SwapDraftResult {
  const errors: SwapDraftErrors = {};
  if (draft.fromKind === 'food' && !draft.fromFood) errors.fromFood = 'Choose the food this swap replaces.';
  if (draft.fromKind === 'role' && !(ROLES as readonly string[]).includes(draft.fromRole)) {
    errors.fromRole = 'Choose the role this swap covers.';
  }
  if (!draft.toFood) errors.toFood = 'Choose the food to use instead.';
  else if (draft.fromKind === 'food' && draft.fromFood && draft.fromFood.id === draft.toFood.id) {
    errors.toFood = 'Choose a different food from the one it replaces.';
  }

  const ratio = readNumber(draft.volumeRatio) ?? 1;
  if (!Number.isFinite(ratio) || ratio <= 0) errors.volumeRatio = 'Enter a number above 0, such as 1 or 1.25.';
  else if (ratio > MAX_VOLUME_RATIO) errors.volumeRatio = `Use at most ${MAX_VOLUME_RATIO} times the volume.`;

  const note = draft.note.trim();
  if (note.length > MAX_NOTE_CHARS) errors.note = `Keep the note to ${MAX_NOTE_CHARS.toLocaleString('en-US')} characters.`;

  const tags = parseTags(draft.tags);
  if (tags.length > MAX_TAGS) errors.tags = `Use at most ${MAX_TAGS} tags.`;
  else if (tags.some((t) => t.length > MAX_TAG_CHARS)) errors.tags = `Keep each tag to ${MAX_TAG_CHARS} characters.`;

  if (Object.keys(errors).length > 0 || !draft.toFood) return { ok: false, errors };
  return {
    ok: true,
    request: {
      fromFoodId: draft.fromKind === 'food' ? (draft.fromFood?.id ?? null) : null,
      fromRole: draft.fromKind === 'role' ? draft.fromRole : null,
      toFoodId: draft.toFood.id,
      volumeRatio: ratio,
      note,
      tags,
      ...(options.isNew ? { status: draft.publishNow ? 'published' : 'draft' } : {}),
    },
  };
}

const SERVER_FIELDS: Record<string, SwapDraftField> = {
  fromFoodId: 'fromFood',
  fromRole: 'fromRole',
  toFoodId: 'toFood',
  volumeRatio: 'volumeRatio',
  note: 'note',
  tags: 'tags',
};

/** The server's field messages under the form's own field names. */
export function swapDraftErrorsFrom(fieldErrors: FieldErrors, fromKind: SwapDraft['fromKind']): SwapDraftErrors {
  const errors: SwapDraftErrors = {};
  for (const [key, message] of Object.entries(fieldErrors)) {
    const field = SERVER_FIELDS[key.split('.')[0]];
    if (!field) continue;
    // "Give either fromFoodId or fromRole" belongs to whichever the coach is filling in.
    const shown = field === 'fromFood' && fromKind === 'role' ? 'fromRole' : field;
    errors[shown] ??= message;
  }
  return errors;
}
