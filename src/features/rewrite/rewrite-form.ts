/**
 * The targets form: what the cook types (text in every number box, so an empty box means "no limit"),
 * what it becomes (numbers), the defaults, and the request it makes.
 */
import { z } from 'zod';
import { DIET_FLAGS, type DietFlag } from '../../../shared/food';
import type { Nutrients } from '../../../shared/nutrition';
import type { LineInput } from '../../../shared/schemas/analyze';
import { OBJECTIVES, targetsSchema, type RewriteRequest, type TargetsInput } from '../../../shared/schemas/rewrite';
import type { RewriteObjective, Suggestion, TargetName } from '../../../shared/rewrite/types';
import type { LineFunction } from '../../../shared/culinary/types';
import { readRequiredNumber } from '../../lib/read-number';

/** More protein and fewer calories than the dish as written: the starting point of a rewrite. */
export const DEFAULT_PROTEIN_GAIN = 0.3;
export const DEFAULT_KCAL_CUT = 0.2;
export const DEFAULT_VOLUME_TOLERANCE_PCT = 10;
export const MAX_VOLUME_TOLERANCE_PCT = 50;
export const MAX_SWAPS_LIMIT = 100;

export const OPTIONAL_TARGETS = ['fiberMinG', 'fatMaxG', 'satFatMaxG', 'sodiumMaxMg', 'sugarMaxG'] as const satisfies readonly TargetName[];
export type OptionalTarget = (typeof OPTIONAL_TARGETS)[number];

interface AmountRule {
  /** "the protein floor", as it reads in a message */
  name: string;
  unit: string;
  max: number;
  integer?: boolean;
  /** the value must be above 0, not just at least 0 */
  positive?: boolean;
}

function readAmount(text: string, rule: AmountRule, ctx: z.RefinementCtx): number | typeof z.NEVER {
  const n = readRequiredNumber(text);
  const fail = (message: string) => {
    ctx.addIssue({ code: 'custom', message });
    return z.NEVER;
  };
  if (!Number.isFinite(n)) return fail(`Enter ${rule.name} as a number.`);
  if (n < 0) return fail(`${capitalise(rule.name)} cannot be negative.`);
  if (rule.positive && n === 0) return fail(`${capitalise(rule.name)} must be above 0.`);
  if (rule.integer && !Number.isInteger(n)) return fail(`Use a whole number for ${rule.name}.`);
  if (n > rule.max) return fail(`${capitalise(rule.name)} is at most ${rule.max.toLocaleString('en-US')}${rule.unit ? ` ${rule.unit}` : ''}.`);
  return n;
}

function capitalise(text: string): string {
  return text.charAt(0).toUpperCase() + text.slice(1);
}

const requiredAmount = (rule: AmountRule) =>
  z.string().transform((raw, ctx): number => {
    const text = raw.trim();
    if (text === '') {
      ctx.addIssue({ code: 'custom', message: `Enter ${rule.name}.` });
      return z.NEVER;
    }
    return readAmount(text, rule, ctx);
  });

const optionalAmount = (rule: AmountRule) =>
  z.string().transform((raw, ctx): number | undefined => {
    const text = raw.trim();
    return text === '' ? undefined : readAmount(text, rule, ctx);
  });

// The bounds match targetsSchema's; it checks the result once more below, so the two can't drift apart unseen.
const targetFields = z.object({
  proteinMinG: requiredAmount({ name: 'the protein floor', unit: 'g', max: 500 }),
  kcalMax: requiredAmount({ name: 'the calorie ceiling', unit: 'kcal', max: 10_000, positive: true }),
  fiberMinG: optionalAmount({ name: 'the fiber floor', unit: 'g', max: 200 }),
  fatMaxG: optionalAmount({ name: 'the fat ceiling', unit: 'g', max: 500 }),
  satFatMaxG: optionalAmount({ name: 'the saturated-fat ceiling', unit: 'g', max: 200 }),
  sodiumMaxMg: optionalAmount({ name: 'the sodium ceiling', unit: 'mg', max: 20_000 }),
  sugarMaxG: optionalAmount({ name: 'the sugar ceiling', unit: 'g', max: 500 }),
});

const excludedFood = z.object({ id: z.number().int().positive(), name: z.string() });

export const rewriteFormSchema = z
  .object({
    targets: targetFields,
    volumeTolerancePct: requiredAmount({ name: 'the volume tolerance', unit: '%', max: MAX_VOLUME_TOLERANCE_PCT }),
    maxSwaps: optionalAmount({ name: 'the number of swaps', unit: '', max: MAX_SWAPS_LIMIT, integer: true }),
    lockedLines: z.array(z.number().int().min(0)),
    excludedFoods: z.array(excludedFood).max(500, { message: 'Leave out at most 500 foods.' }),
    diet: z.array(z.enum(DIET_FLAGS)),
    objective: z.enum(OBJECTIVES),
  })
  .superRefine((values, ctx) => {
    const checked = targetsSchema.safeParse(cleanTargets(values.targets));
    if (checked.success) return;
    for (const issue of checked.error.issues) ctx.addIssue({ code: 'custom', message: issue.message, path: ['targets', ...issue.path.map(String)] });
  });

export type RewriteFormInput = z.input<typeof rewriteFormSchema>;
export type RewriteFormValues = z.output<typeof rewriteFormSchema>;
export type TargetTexts = RewriteFormInput['targets'];

/** Targets without the limits left empty. */
export function cleanTargets(targets: Partial<Record<TargetName, number | undefined>>): TargetsInput {
  const out: Record<string, number> = {};
  for (const [key, value] of Object.entries(targets)) if (value !== undefined) out[key] = value;
  return out as TargetsInput;
}

/** Where the starting targets came from: the dish itself, or the cook's coach. */
export type TargetSource = { kind: 'recipe' } | { kind: 'coach'; coachName: string };

export interface DefaultTargets {
  proteinMinG: number;
  kcalMax: number;
  source: TargetSource;
}

/**
 * The coach's per-meal targets for a client; otherwise the dish as written with 30 % more protein
 * (rounded up to the gram) and 20 % fewer calories (rounded down to 5 kcal).
 */
export function defaultTargets(perServing: Nutrients, coach: { coachName: string; kcal: number; proteinG: number } | null): DefaultTargets {
  if (coach) {
    return { proteinMinG: Math.round(coach.proteinG), kcalMax: Math.round(coach.kcal), source: { kind: 'coach', coachName: coach.coachName } };
  }
  const protein = Math.ceil(perServing.proteinG * (1 + DEFAULT_PROTEIN_GAIN) - 1e-9);
  const kcal = Math.floor((perServing.kcal * (1 - DEFAULT_KCAL_CUT)) / 5 + 1e-9) * 5;
  return { proteinMinG: Math.max(0, protein), kcalMax: Math.max(5, kcal), source: { kind: 'recipe' } };
}

export function initialFormInput(defaults: DefaultTargets): RewriteFormInput {
  return {
    targets: {
      proteinMinG: String(defaults.proteinMinG),
      kcalMax: String(defaults.kcalMax),
      fiberMinG: '',
      fatMaxG: '',
      satFatMaxG: '',
      sodiumMaxMg: '',
      sugarMaxG: '',
    },
    volumeTolerancePct: String(DEFAULT_VOLUME_TOLERANCE_PCT),
    maxSwaps: '',
    lockedLines: [],
    excludedFoods: [],
    diet: [],
    objective: 'closest',
  };
}

/** The lines as the request sends them: the text and the cook's pins, nothing else. */
export function requestLines(lines: LineInput[]): LineInput[] {
  return lines.map(({ input, foodId, grams }) => ({ input, ...(foodId !== undefined && { foodId }), ...(grams !== undefined && { grams }) }));
}

/** The request for the recipe's lines (with the cook's pins) and the form's values. */
export function rewriteRequestFor(
  recipe: { lines: LineInput[]; servings: number; lineRoles?: Partial<Record<number, LineFunction>> },
  values: RewriteFormValues,
): RewriteRequest {
  const lockedLines = [...new Set(values.lockedLines)].filter((i) => i < recipe.lines.length).sort((a, b) => a - b);
  const request: RewriteRequest = {
    lines: requestLines(recipe.lines),
    servings: recipe.servings,
    targets: cleanTargets(values.targets),
    volumeTolerancePct: values.volumeTolerancePct,
    objective: values.objective,
  };
  if (values.maxSwaps !== undefined) request.maxSwaps = values.maxSwaps;
  if (lockedLines.length > 0) request.lockedLines = lockedLines;
  if (values.excludedFoods.length > 0) request.excludedFoodIds = [...new Set(values.excludedFoods.map((f) => f.id))];
  if (values.diet.length > 0) request.diet = [...values.diet] as DietFlag[];
  const lineRoles = Object.entries(recipe.lineRoles ?? {}).filter(([i, role]) => role !== undefined && Number(i) < recipe.lines.length);
  if (lineRoles.length > 0) request.lineRoles = Object.fromEntries(lineRoles) as Record<string, LineFunction>;
  return request;
}

/** A stable text for "the same request": equal requests give equal signatures. */
export function requestSignature(request: unknown): string {
  return JSON.stringify(request, (_key, value: unknown) =>
    value && typeof value === 'object' && !Array.isArray(value)
      ? Object.fromEntries(Object.entries(value as Record<string, unknown>).sort(([a], [b]) => a.localeCompare(b)))
      : value,
  );
}

/** The recipe the rewrite is for: the lines as sent and the servings. */
export function recipeSignature(recipe: { lines?: LineInput[]; servings: number }): string {
  return requestSignature({ lines: requestLines(recipe.lines ?? []), servings: recipe.servings });
}

/**
 * Locks follow their lines when lines are added or removed: a lock on "1 lb ground beef" stays on
 * that line wherever it now stands; locks on lines that are gone fall away.
 */
export function carryLocks(locked: number[], before: string[], after: string[]): number[] {
  const wanted = new Map<string, number>();
  for (const i of locked) {
    const text = before[i];
    if (text !== undefined) wanted.set(text, (wanted.get(text) ?? 0) + 1);
  }
  const out: number[] = [];
  after.forEach((text, i) => {
    const left = wanted.get(text) ?? 0;
    if (left > 0) {
      out.push(i);
      wanted.set(text, left - 1);
    }
  });
  return out;
}

export const OBJECTIVE_WORDS: Record<RewriteObjective, { label: string; description: string }> = {
  closest: {
    label: 'Closest to the original',
    description:
      'Reaches your targets with the fewest swaps, then the smallest changes in amounts. A swap your coach approved is chosen before one they have not.',
  },
  'max-protein': {
    label: 'Most protein',
    description: 'Packs in as much protein per serving as it can while staying under the calorie ceiling and keeping the pan as full.',
  },
  'min-kcal': {
    label: 'Fewest calories',
    description: 'Cuts as many calories per serving as it can while still reaching the protein floor and keeping the pan as full.',
  },
};

export const DIET_WORDS: Record<DietFlag, string> = {
  vegetarian: 'Vegetarian',
  vegan: 'Vegan',
  'dairy-free': 'Dairy-free',
  'gluten-free': 'Gluten-free',
};

/**
 * The form fields a one-click suggestion changes, as the texts the boxes hold. A suggestion that
 * moves several targets at once changes every one of them.
 */
export function suggestionFields(s: Suggestion): { name: 'maxSwaps' | 'volumeTolerancePct' | `targets.${TargetName}`; value: string }[] {
  switch (s.kind) {
    case 'more-swaps':
      return [{ name: 'maxSwaps', value: String(s.value) }];
    case 'volume-tolerance':
      return [{ name: 'volumeTolerancePct', value: String(s.value) }];
    case 'target':
      return s.target ? [{ name: `targets.${s.target}`, value: String(s.value) }] : [];
    case 'targets':
      return Object.entries(s.targets ?? {}).flatMap(([target, value]) =>
        value === undefined ? [] : [{ name: `targets.${target as TargetName}` as const, value: String(value) }],
      );
  }
}
