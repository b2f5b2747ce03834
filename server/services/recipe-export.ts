import type { Recipe as SchemaRecipe, NutritionInformation, WithContext } from 'schema-dts';
import type { Nutrients } from '../../shared/nutrition';
import type { StoredLine } from '../../shared/schemas/recipes';

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

/** A saved version as a schema.org Recipe document. */
export function toJsonLd(
  recipe: { title: string; notes: string; method: string; createdAt: Date },
  version: { servings: number; lines: StoredLine[]; perServing: Nutrients; number: number },
): WithContext<SchemaRecipe> {
  const steps = methodSteps(recipe.method);
  const doc: WithContext<SchemaRecipe> = {
    '@context': 'https://schema.org',
    '@type': 'Recipe',
    name: recipe.title,
    recipeYield: `${version.servings} servings`,
    recipeIngredient: version.lines.map((l) => l.input),
    nutrition: nutritionInformation(version.perServing),
    dateCreated: recipe.createdAt.toISOString(),
    version: String(version.number),
  };
  if (recipe.notes) doc.description = recipe.notes;
  if (steps.length) doc.recipeInstructions = steps.map((text) => ({ '@type': 'HowToStep', text }));
  return doc;
}
