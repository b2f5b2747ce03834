import type { InfeasibleDetails, RewriteRequest, RewriteResponse, SkippedLine } from '../../shared/schemas/rewrite';
import type { RewriteLine, RewriteResult, Plan, Change, FoodRef } from '../../shared/rewrite/types';
import { RewriteSolverError } from '../../shared/rewrite/solve-log';
import type { FoodEngine } from './food-engine';
import type { CatalogueFood } from '../../shared/food';
import type { LineFunction } from '../../shared/culinary/types';
import { analyzeLines, culinaryLineOf, requestLines, type FoodVisibility } from './analysis';
import { recipeCandidates, type ApprovedSwap } from './candidates';
import { foodSummary } from './foods';
import { writtenFoodName } from '../../shared/rewritten-line-text';
import { runRewrite, SOLVER_TIMEOUT_MS } from './solver-pool';
import { HttpError, badRequest } from '../lib/http-error';

export interface RewriteViewer {
  approvedSwaps: ApprovedSwap[];
  canUse?: FoodVisibility;
  /** the viewer's foods from labels, then their coach's: matched first, and swap candidates for their roles */
  ownFoods?: readonly CatalogueFood[];
}

function publicFood(engine: FoodEngine, ref: FoodRef) {
  const food = engine.byId.get(ref.foodId);
  return food ? foodSummary(food) : { id: ref.foodId, source: 'usda-sr28' as const, sourceId: '', name: ref.name };
}

function publicPlan(engine: FoodEngine, plan: Plan) {
  return { ...plan, lines: plan.lines.map((l) => ({ ...l, food: publicFood(engine, l.food) })) };
}

function publicChange(engine: FoodEngine, change: Change) {
  return { ...change, from: publicFood(engine, change.from), to: publicFood(engine, change.to) };
}

/**
 * Analyses the recipe, builds each line's candidates and solves the rewrite in the worker pool.
 * Lines with no matched food or no weight cannot take part; they are listed in `skippedLines`.
 */
export async function rewriteRecipe(engine: FoodEngine, input: RewriteRequest, viewer: RewriteViewer, explain: boolean): Promise<RewriteResponse> {
  const lines = requestLines(input);
  const locked = new Set(input.lockedLines ?? []);
  for (const index of locked) {
    if (index >= lines.length)
      throw badRequest(`lockedLines: line ${index} does not exist (the recipe has ${lines.length}).`, {
        fieldErrors: { lockedLines: ['Unknown line index.'] },
      });
  }
  const lineRoles: Record<number, LineFunction> = {};
  for (const [key, role] of Object.entries(input.lineRoles ?? {})) {
    const index = Number(key);
    if (index >= lines.length)
      throw badRequest(`lineRoles: line ${index} does not exist (the recipe has ${lines.length}).`, { fieldErrors: { lineRoles: ['Unknown line index.'] } });
    lineRoles[index] = role;
  }
  const analysis = analyzeLines(engine, lines, input.servings, viewer.canUse, viewer.ownFoods ?? []);
  const culinary = recipeCandidates(engine, analysis.lines.map(culinaryLineOf), {
    diet: input.diet ?? [],
    excludedFoodIds: new Set(input.excludedFoodIds ?? []),
    approved: viewer.approvedSwaps,
    allowAllergens: input.allowAllergens ?? [],
    lineRoles,
    canUse: viewer.canUse,
  });
  const modelLines: RewriteLine[] = [];
  const skippedLines: SkippedLine[] = [];
  analysis.lines.forEach((line, index) => {
    if (!line.matchedFood) return skippedLines.push({ line: index, input: line.input, reason: 'no food matched' });
    if (line.grams <= 0) return skippedLines.push({ line: index, input: line.input, reason: 'no amount' });
    const c = culinary.lines[index];
    const written = writtenFoodName(line.input);
    const isLocked = locked.has(index);
    modelLines.push({
      index,
      foodId: line.matchedFood.id,
      grams: line.grams,
      volumeMl: line.volumeMl,
      locked: isLocked,
      role: c.role,
      candidates: isLocked ? c.candidates.filter((x) => x.original) : c.candidates,
      ...(c.heldReason ? { heldReason: c.heldReason } : {}),
      ...(written ? { writtenName: written } : {}),
      ...(c.keepScale && !isLocked ? { keepScale: c.keepScale } : {}),
    });
  });
  if (modelLines.length === 0) {
    throw new HttpError(422, 'nothing_to_rewrite', 'No line has both a matched food and an amount, so there is nothing to rewrite.', { skippedLines });
  }

  let result: RewriteResult;
  try {
    result = await runRewrite({
      lines: modelLines,
      targets: input.targets,
      servings: input.servings,
      options: {
        objective: input.objective ?? 'closest',
        volumeTolerancePct: input.volumeTolerancePct,
        lineTolerancePct: input.lineTolerancePct,
        maxSwaps: input.maxSwaps,
        timeoutMs: SOLVER_TIMEOUT_MS,
        explain,
      },
    });
  } catch (error) {
    if (error instanceof RewriteSolverError || (error as Error)?.name === 'RewriteSolverError') {
      throw new HttpError(503, 'solver_failed', `The solver could not finish this rewrite: ${(error as Error).message}.`);
    }
    throw error;
  }

  if (result.status === 'infeasible') {
    throw new HttpError(422, 'infeasible', result.message, {
      bestReachable: result.bestReachable,
      binding: result.binding,
      suggestions: result.suggestions,
      before: publicPlan(engine, result.before),
      closest: publicPlan(engine, result.closest),
      held: result.held ?? [],
      skippedLines,
      solver: result.solver,
    } satisfies InfeasibleDetails);
  }
  return {
    status: result.status,
    before: publicPlan(engine, result.before),
    after: publicPlan(engine, result.after),
    changes: result.changes.map((c) => publicChange(engine, c)),
    ...(result.held ? { held: result.held } : {}),
    dishType: culinary.dishType,
    skippedLines,
    solver: result.solver,
  };
}
