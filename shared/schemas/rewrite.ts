import { z } from 'zod';
import type { Nutrients } from '../nutrition';
import type { DishType } from '../culinary/types';
import type { Change, HeldLine, Plan, PlanLine, SolverInfo, Suggestion, TargetName } from '../rewrite/types';
import type { FoodSummary } from './analyze';
import { DIET_FLAGS } from '../food';
import { ALLERGENS } from '../allergens';
import { LINE_FUNCTIONS, type LineFunction } from '../culinary/types';
import { lineInputSchema, MAX_LINES, MAX_TEXT_CHARS, servingsSchema } from './analyze';

const positive = (field: string, max: number) =>
  z
    .number({ message: `${field} must be a number.` })
    .min(0, { message: `${field} cannot be negative.` })
    .max(max, { message: `${field} is at most ${max.toLocaleString('en-US')}.` });

export const targetsSchema = z.object({
  proteinMinG: positive('proteinMinG', 500),
  kcalMax: positive('kcalMax', 10_000).refine((v) => v > 0, { message: 'kcalMax must be above 0.' }),
  fiberMinG: positive('fiberMinG', 200).optional(),
  fatMaxG: positive('fatMaxG', 500).optional(),
  satFatMaxG: positive('satFatMaxG', 200).optional(),
  sodiumMaxMg: positive('sodiumMaxMg', 20_000).optional(),
  sugarMaxG: positive('sugarMaxG', 500).optional(),
});
export type TargetsInput = z.infer<typeof targetsSchema>;

/** `?explain=1` (or `true`) asks for the solved model as CPLEX LP text; `0`/`false` or nothing does not. */
export const rewriteQuerySchema = z.object({
  explain: z
    .enum(['1', 'true', '0', 'false'], { message: 'explain must be 1, true, 0 or false.' })
    .optional()
    .transform((v) => v === '1' || v === 'true'),
});

export const OBJECTIVES = ['closest', 'max-protein', 'min-kcal'] as const;

export const rewriteRequestSchema = z
  .object({
    text: z.string().max(MAX_TEXT_CHARS).optional(),
    lines: z.array(lineInputSchema).max(MAX_LINES).optional(),
    servings: servingsSchema,
    targets: targetsSchema,
    volumeTolerancePct: z
      .number({ message: 'volumeTolerancePct must be a number.' })
      .min(0)
      .max(50, { message: 'volumeTolerancePct is at most 50.' })
      .optional(),
    lineTolerancePct: z.number({ message: 'lineTolerancePct must be a number.' }).min(0).max(100, { message: 'lineTolerancePct is at most 100.' }).optional(),
    maxSwaps: z.number({ message: 'maxSwaps must be a whole number.' }).int().min(0).max(MAX_LINES).optional(),
    lockedLines: z
      .array(z.number().int().min(0, { message: 'lockedLines holds line indexes from 0.' }))
      .max(MAX_LINES)
      .optional(),
    excludedFoodIds: z.array(z.number().int().positive()).max(500).optional(),
    diet: z
      .array(z.enum(DIET_FLAGS, { message: `diet holds ${DIET_FLAGS.join(', ')}.` }))
      .max(DIET_FLAGS.length)
      .optional(),
    objective: z.enum(OBJECTIVES, { message: `objective is one of ${OBJECTIVES.join(', ')}.` }).optional(),
    candidatesPerLine: z.number().int().min(1).max(20).optional(),
    /** the cook's choice of what a line does, by line index ("3": "vegetable" unlocks an aromatic) */
    lineRoles: z
      .record(
        z.string().regex(/^\d+$/, { message: 'lineRoles is keyed by line index (0, 1, 2…).' }),
        z.enum(LINE_FUNCTIONS as [LineFunction, ...LineFunction[]], { message: `lineRoles values are one of ${LINE_FUNCTIONS.join(', ')}.` }),
        { message: 'lineRoles maps line indexes to line functions.' },
      )
      .optional(),
    /** major allergens a swap may bring into the recipe */
    allowAllergens: z
      .array(z.enum(ALLERGENS, { message: `allowAllergens holds ${ALLERGENS.join(', ')}.` }))
      .max(ALLERGENS.length)
      .optional(),
  })
  .refine((v) => v.text !== undefined || v.lines !== undefined, { message: 'Send the recipe as text or as lines.', path: ['text'] });
export type RewriteRequest = z.infer<typeof rewriteRequestSchema>;

// --- POST /api/rewrite answers. The solver's own types (shared/rewrite/types.ts) name foods by id only;
// the server answers with the catalogue's food summary in their place.

/** A plan line as answered: the line's position in the recipe as sent, and its food's summary. */
export type RewritePlanLine = Omit<PlanLine, 'food'> & { food: FoodSummary };

export type RewritePlan = Omit<Plan, 'lines'> & { lines: RewritePlanLine[] };

export type RewriteChange = Omit<Change, 'from' | 'to'> & { from: FoodSummary; to: FoodSummary };

/** A line the rewrite left out: no food matched, or no amount. */
export interface SkippedLine {
  line: number;
  input: string;
  reason: string;
}

export interface RewriteResponse {
  status: 'optimal';
  before: RewritePlan;
  after: RewritePlan;
  changes: RewriteChange[];
  /** lines kept exactly as written because of what they do in the dish */
  held?: HeldLine[];
  skippedLines: SkippedLine[];
  solver: SolverInfo;
  /** the kind of dish the recipe was read as */
  dishType?: DishType;
}

/** The details of a 422 `infeasible`: how close the dish can get, and what would make it reachable. */
export interface InfeasibleDetails {
  bestReachable: Nutrients;
  binding: TargetName[];
  suggestions: Suggestion[];
  before: RewritePlan;
  closest: RewritePlan;
  held: HeldLine[];
  skippedLines: SkippedLine[];
  solver?: SolverInfo;
}
