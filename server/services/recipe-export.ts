import type { Recipe as SchemaRecipe, NutritionInformation } from 'schema-dts';
import type { Nutrients } from '../../shared/nutrition';
import type { StoredLine, VersionKind } from '../../shared/schemas/recipes';
import type { TargetsInput } from '../../shared/schemas/rewrite';
import { JSONLD_CONTEXT, type ExportedLine, type ExportedVersion } from '../../shared/schemas/recipe-jsonld';
import type { CatalogueFood } from '../../shared/food';

function grams(n: number) {
  return `${(Math.round(n * 10) / 10).toString()} g`;
}

/** Per-serving nutrition as schema.org NutritionInformation (values unrounded to 0.1; units in the text). */
export function nutritionInformation(perServing: Nutrients): NutritionInformation {
  return {
    '@type': 'NutritionInformation',
    calories: `${Math.round(perServing.kcal)} kcal`,
    proteinContent: grams(perServing.proteinG),
    fatContent: grams(perServing.fatG),
    saturatedFatContent: grams(perServing.satFatG),
    carbohydrateContent: grams(perServing.carbsG),
    fiberContent: grams(perServing.fiberG),
    sugarContent: grams(perServing.sugarG),
    sodiumContent: `${Math.round(perServing.sodiumMg)} mg`,
  };
}

export function methodSteps(method: string): string[] {
  return method
    .split(/\r?\n/)
    .map((s) => s.replace(/^\s*(?:\d+[.)]|[-*•])\s*/, '').trim())
    .filter(Boolean);
}

interface VersionRow {
  number: number;
  kind: VersionKind;
  parentNumber: number | null;
  servings: number;
  note: string;
  targets: TargetsInput | null;
  lines: StoredLine[];
  perServing: Nutrients;
}

type FoodLookup = (id: number) => Pick<CatalogueFood, 'source' | 'sourceId' | 'name'> | undefined;

function exportedLine(line: StoredLine, foodOf: FoodLookup): ExportedLine {
  const food = line.foodId != null ? foodOf(line.foodId) : undefined;
  const out: ExportedLine = {
    'hearthswap:text': line.input,
    'hearthswap:food':
      line.foodId == null
        ? null
        : food
          ? { 'hearthswap:source': food.source, 'hearthswap:sourceId': food.sourceId, name: food.name }
          : { 'hearthswap:source': 'custom', 'hearthswap:sourceId': String(line.foodId), name: line.foodName ?? '' },
    'hearthswap:grams': line.grams,
  };
  if (line.warnings?.length) out['hearthswap:warnings'] = line.warnings;
  if (line.checkMatch) out['hearthswap:checkMatch'] = true;
  return out;
}

function exportedVersion(v: VersionRow, foodOf: FoodLookup): ExportedVersion {
  return {
    'hearthswap:number': v.number,
    'hearthswap:kind': v.kind,
    'hearthswap:parentNumber': v.parentNumber,
    'hearthswap:servings': v.servings,
    'hearthswap:note': v.note,
    'hearthswap:targets': v.targets,
    'hearthswap:lines': v.lines.map((l) => exportedLine(l, foodOf)),
  };
}

type RecipeNode = SchemaRecipe & { 'hearthswap:versions': ExportedVersion[] };

/** A recipe as a schema.org Recipe: `shown` in the standard fields, every version in `hearthswap:versions`. */
function recipeNode(
  recipe: { title: string; notes: string; method: string; createdAt: Date },
  shown: VersionRow,
  versions: VersionRow[],
  foodOf: FoodLookup,
): RecipeNode {
  const steps = methodSteps(recipe.method);
  const doc: RecipeNode = {
    '@type': 'Recipe',
    name: recipe.title,
    recipeYield: `${shown.servings} servings`,
    recipeIngredient: shown.lines.map((l) => l.input),
    nutrition: nutritionInformation(shown.perServing),
    dateCreated: recipe.createdAt.toISOString(),
    version: String(shown.number),
    'hearthswap:versions': versions.map((v) => exportedVersion(v, foodOf)),
  };
  if (recipe.notes) doc.description = recipe.notes;
  if (steps.length) doc.recipeInstructions = steps.map((text) => ({ '@type': 'HowToStep', text }));
  return doc;
}

/** One recipe as a JSON-LD document. */
export function toJsonLd(
  recipe: { title: string; notes: string; method: string; createdAt: Date },
  shown: VersionRow,
  versions: VersionRow[],
  foodOf: FoodLookup,
): RecipeNode & { '@context': typeof JSONLD_CONTEXT } {
  return { '@context': JSONLD_CONTEXT, ...recipeNode(recipe, shown, versions, foodOf) };
}

/** Every recipe of an account, each with all its versions, as one JSON-LD `@graph`. */
export function recipesToJsonLd(
  recipes: { recipe: { title: string; notes: string; method: string; createdAt: Date }; versions: VersionRow[] }[],
  foodOf: FoodLookup,
) {
  return {
    '@context': JSONLD_CONTEXT,
    '@graph': recipes.filter((r) => r.versions.length > 0).map((r) => recipeNode(r.recipe, r.versions.at(-1)!, r.versions, foodOf)),
  };
}
