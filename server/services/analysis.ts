import { parseLine, type ParsedLine } from '../../shared/parse-line';
import { readRecipeText } from '../../shared/recipe-text';
import { readDish } from '../../shared/culinary/infer-dish';
import type { CulinaryLine } from '../../shared/culinary/types';
import { divideNutrients, nutrientsForGrams, sumNutrients, zeroNutrients, type Nutrients } from '../../shared/nutrition';
import type { AnalyzeRequest, AnalyzeResponse, AnalyzedLine, LineInput } from '../../shared/schemas/analyze';
import type { CatalogueFood } from '../../shared/food';
import { MAX_LINES } from '../../shared/schemas/analyze';
import { weighLine } from '../matching/weigh-line';
import { CHECK_MATCH_BELOW } from '../matching/match-line';
import { drainedShareFor, isDrainedSolids } from '../matching/drained-share';
import type { FoodEngine } from './food-engine';
import { foodSummary } from './foods';
import { badRequest } from '../lib/http-error';
import { matchOwnFood } from './own-food-match';
import { readLine, weighReading } from './line-readings';

/** The ingredient lines of pasted text: headings, a title, "Serves 4" and method steps set aside. */
export function textToLines(text: string): LineInput[] {
  return readRecipeText(text).ingredients.map((input) => ({ input }));
}

/** The request's lines, and for pasted text what was read around them (title, servings, method). */
export function readRequest(request: Pick<AnalyzeRequest, 'text' | 'lines'>): { lines: LineInput[]; fromText?: AnalyzeResponse['fromText'] } {
  let lines = request.lines;
  let fromText: AnalyzeResponse['fromText'];
  if (lines === undefined) {
    const { ingredients, title, servings, method, setAside } = readRecipeText(request.text ?? '');
    lines = ingredients.map((input) => ({ input }));
    fromText = { title, servings, method, setAside };
    if (lines.length === 0) {
      throw badRequest('The text has no ingredient lines: paste them one per line, under an "Ingredients" heading if the recipe has one.', {
        fieldErrors: { text: ['No ingredient lines found.'] },
      });
    }
  }
  if (lines.length > MAX_LINES) {
    throw badRequest(`A recipe has at most ${MAX_LINES} ingredient lines.`, { fieldErrors: { text: [`At most ${MAX_LINES} lines.`] } });
  }
  return { lines, fromText };
}

export function requestLines(request: Pick<AnalyzeRequest, 'text' | 'lines'>): LineInput[] {
  return readRequest(request).lines;
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
export function analyzeLine(
  engine: FoodEngine<CatalogueFood>,
  line: LineInput,
  canUse: FoodVisibility = catalogueOnly,
  ownFoods: readonly CatalogueFood[] = [],
): AnalyzedLineWithFood {
  const reading = readLine(engine, line.input);
  const { parsed, match } = reading;
  const warnings: string[] = [];
  const own = ownFoods.length > 0 ? matchOwnFood(parsed.name || line.input, ownFoods) : null;
  if (!own) warnings.push(...match.warnings);
  let food: CatalogueFood | null = match.food;
  let confidence = match.confidence;
  let alternatives = match.alternatives;
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
    volumeMl = lineVolumeMl(engine, line.input, food, grams, parsed);
  } else {
    // A drained-solids food weighed from its can's net size keeps only the drained share, whatever the line says.
    const drained = (match.drained || isDrainedSolids(food)) && food ? { share: drainedShareFor(food.name)?.share ?? null } : null;
    const weighed = weighReading(reading, food, () =>
      weighLine(parsed, food, food?.portions ?? [], {
        countDefault: food ? engine.countDefaults.get(food.id) : null,
        nearPortions: food ? engine.nearPortions.get(food.id) : undefined,
        drained,
      }),
    );
    grams = weighed.grams;
    volumeMl = weighed.volumeMl ?? (food && grams > 0 ? grams / food.densityGPerMl : 0);
    portionUsed = weighed.portionUsed;
    warnings.push(...weighed.warnings);
  }
  grams = finite(grams);
  const pinnedFood = line.foodId !== undefined && food?.id === line.foodId;
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
    pinned: { food: pinnedFood, grams: line.grams !== undefined },
    checkMatch: Boolean(food) && !pinnedFood && !own && (match.checkMatch || confidence < CHECK_MATCH_BELOW),
    missingModifier: pinnedFood || own ? null : match.missingModifier,
    matchedFood: food,
  };
}

/**
 * A line's volume for `grams` of its food: the volume its own text measures, in proportion when the
 * grams were changed (a pinned weight, a rewrite), else grams ÷ the food's density. The Kitchen,
 * saved versions and Compare all use this one, so a dish has one volume per serving everywhere.
 */
export function lineVolumeMl(
  engine: FoodEngine<CatalogueFood>,
  input: string,
  food: CatalogueFood | null,
  grams: number,
  parsed: ParsedLine = parseLine(input),
): number {
  if (!food || !(grams > 0)) return 0;
  const weighed = weighLine(parsed, food, food.portions ?? [], { countDefault: engine.countDefaults.get(food.id) });
  if (weighed.volumeMl !== null && weighed.volumeMl > 0 && weighed.grams > 0) return (weighed.volumeMl * grams) / weighed.grams;
  return grams / food.densityGPerMl;
}

/** What the culinary reading (dish type, line functions) needs of an analysed line. */
export function culinaryLineOf(line: AnalyzedLineWithFood): CulinaryLine & { food: CatalogueFood | null } {
  return { phrase: line.parsed.name || line.input, comment: line.parsed.comment, food: line.matchedFood, grams: line.grams };
}

export function analyzeLines(
  engine: FoodEngine<CatalogueFood>,
  lines: LineInput[],
  servings: number,
  canUse: FoodVisibility = catalogueOnly,
  ownFoods: readonly CatalogueFood[] = [],
) {
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
  const dish = readDish(result.lines.map(culinaryLineOf));
  return {
    ...result,
    dishType: dish.dishType,
    lines: result.lines.map(({ matchedFood: _food, ...line }, i) => ({ ...line, role: dish.lines[i].role })),
  };
}
