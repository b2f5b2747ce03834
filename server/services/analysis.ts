import { parseLine, type ParsedLine } from '../../shared/parse-line';
import { divideNutrients, nutrientsForGrams, sumNutrients, zeroNutrients, type Nutrients } from '../../shared/nutrition';
import type { AnalyzeRequest, AnalyzeResponse, AnalyzedLine, LineInput } from '../../shared/schemas/analyze';
import type { CatalogueFood } from '../../shared/food';
import { MAX_LINES } from '../../shared/schemas/analyze';
import { weighLine } from '../matching/weigh-line';
import type { FoodEngine } from './food-engine';
import { foodSummary } from './foods';
import { badRequest } from '../lib/http-error';
import { matchOwnFood } from './own-food-match';

/** Splits pasted text into ingredient lines: blank lines and bullet marks dropped. */
export function textToLines(text: string): LineInput[] {
  return text
    .split(/\r\n|\r|\n/)
    .map((line) => line.replace(/^\s*(?:[-*•·▢□☐]|\d+[.)](?=\s))\s*/u, '').trim())
    .filter((line) => line.length > 0)
    .map((input) => ({ input }));
}

export function requestLines(request: Pick<AnalyzeRequest, 'text' | 'lines'>): LineInput[] {
  const lines = request.lines ?? textToLines(request.text ?? '');
  if (lines.length > MAX_LINES) {
    throw badRequest(`A recipe has at most ${MAX_LINES} ingredient lines.`, { fieldErrors: { text: [`At most ${MAX_LINES} lines.`] } });
  }
  return lines;
}

export interface AnalyzedLineWithFood extends AnalyzedLine {
  /** the matched food itself, for the rewrite */
  matchedFood: CatalogueFood | null;
}

function finite(n: number): number {
  return Number.isFinite(n) && n > 0 ? n : 0;
}

/** Which foods a viewer may pin: catalogue foods always; a coach's custom foods for that coach and their clients. */
export type FoodVisibility = (food: CatalogueFood) => boolean;
const catalogueOnly: FoodVisibility = (food) => food.source === 'usda-sr28';

/**
 * One line matched and weighed. `ownFoods` (the viewer's foods from labels, then their coach's) are
 * tried first: a phrase that names one of them gets it, weighed by its household measure.
 */
export function analyzeLine(engine: FoodEngine, line: LineInput, canUse: FoodVisibility = catalogueOnly, ownFoods: readonly CatalogueFood[] = []): AnalyzedLineWithFood {
  const parsed: ParsedLine = parseLine(line.input);
  const warnings: string[] = [];
  const phrase = parsed.name || line.input;
  const match = engine.matcher.match(phrase);
  let food: CatalogueFood | null = match.food;
  let confidence = match.confidence;
  let alternatives = match.alternatives;
  const own = ownFoods.length > 0 ? matchOwnFood(phrase, ownFoods) : null;
  if (own) {
    alternatives = [...(food ? [food] : []), ...alternatives].filter((f) => f.id !== own.id);
    food = own;
    confidence = 1;
  }
  if (line.foodId !== undefined) {
    const found = engine.byId.get(line.foodId);
    const pinned = found && canUse(found) ? found : undefined;
    if (pinned) {
      if (food && food.id !== pinned.id) alternatives = [food, ...alternatives.filter((f) => f.id !== pinned.id)];
      food = pinned;
      confidence = 1;
    } else {
      warnings.push(`Food ${line.foodId} is not in the catalogue; matched the line's text instead.`);
    }
  }
  if (!food) warnings.push(`No confident match for “${parsed.name || line.input}”; pick a food from the suggestions.`);
  else if (food.branded) warnings.push('This is a brand-named or restaurant entry.');

  let grams = 0;
  let volumeMl = 0;
  let portionUsed: string | null = null;
  if (line.grams !== undefined) {
    grams = line.grams;
    volumeMl = food ? grams / food.densityGPerMl : 0;
  } else {
    const weighed = weighLine(parsed, food, food?.portions ?? [], { countDefault: food ? engine.countDefaults.get(food.id) : null });
    grams = weighed.grams;
    volumeMl = weighed.volumeMl ?? (food && grams > 0 ? grams / food.densityGPerMl : 0);
    portionUsed = weighed.portionUsed;
    warnings.push(...weighed.warnings);
  }
  grams = finite(grams);
  volumeMl = finite(volumeMl);
  const nutrients: Nutrients = food ? nutrientsForGrams(food.per100g, grams) : zeroNutrients();
  return {
    input: line.input,
    parsed: { quantity: parsed.quantity, unit: parsed.unit, name: parsed.name, comment: parsed.comment },
    food: food ? foodSummary(food) : null,
    alternatives: alternatives.slice(0, 5).map(foodSummary),
    confidence: food ? confidence : 0,
    grams,
    volumeMl,
    nutrients,
    warnings: [...new Set(warnings)],
    portionUsed,
    pinned: { food: line.foodId !== undefined && food?.id === line.foodId, grams: line.grams !== undefined },
    matchedFood: food,
  };
}

export function analyzeLines(engine: FoodEngine, lines: LineInput[], servings: number, canUse: FoodVisibility = catalogueOnly, ownFoods: readonly CatalogueFood[] = []) {
  const analyzed = lines.map((line) => analyzeLine(engine, line, canUse, ownFoods));
  const totals = sumNutrients(analyzed.map((l) => l.nutrients));
  return {
    servings,
    lines: analyzed,
    totals,
    perServing: divideNutrients(totals, servings),
    totalGrams: analyzed.reduce((s, l) => s + l.grams, 0),
    volumeMl: analyzed.reduce((s, l) => s + l.volumeMl, 0),
  };
}

/** The public answer: the in-memory food objects stripped. */
export function toAnalyzeResponse(result: ReturnType<typeof analyzeLines>): AnalyzeResponse {
  return { ...result, lines: result.lines.map(({ matchedFood: _food, ...line }) => line) };
}
