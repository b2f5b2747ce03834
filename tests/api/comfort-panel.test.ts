/**
 * The comfort-food panel (tests/panel/comfort-recipes.ts): every recipe × every objective rewritten
 * for +30 % protein and −20 % kcal per serving against the recipe as written, each plan judged line
 * by line as a cook would. Prints every offending change, and the figures for the 'tune' and
 * 'held-out' halves separately.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { createTestApp, type TestApp } from '../helpers/test-app';
import { COMFORT_PANEL, type PanelRecipe } from '../panel/comfort-recipes';
import { addToScore, describeScore, emptyScore, judgePlan, type JudgedPlanLine, type LineVerdict, type PanelScore } from '../panel/judge-plan';

const OBJECTIVES = ['closest', 'max-protein', 'min-kcal'] as const;

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(async () => {
  await t.close();
});

interface Outcome {
  recipe: PanelRecipe;
  objective: (typeof OBJECTIVES)[number];
  status: number;
  verdicts: LineVerdict[] | null;
  message?: string;
}

const toJudged = (lines: { index: number; food: { id: number; name: string }; grams: number }[]): JudgedPlanLine[] =>
  lines.map((l) => ({ index: l.index, food: { id: l.food.id, name: l.food.name }, grams: l.grams }));

async function rewriteAll(): Promise<Outcome[]> {
  const outcomes: Outcome[] = [];
  for (const recipe of COMFORT_PANEL) {
    const text = recipe.lines.map((l) => l.text).join('\n');
    const analysed = (await request(t.app).post('/api/analyze').send({ text, servings: recipe.servings }).expect(200)).body;
    const targets = { proteinMinG: analysed.perServing.proteinG * 1.3, kcalMax: analysed.perServing.kcal * 0.8 };
    for (const objective of OBJECTIVES) {
      const res = await request(t.app).post('/api/rewrite').send({ text, servings: recipe.servings, targets, objective });
      if (res.status === 200) {
        outcomes.push({ recipe, objective, status: 200, verdicts: judgePlan(recipe, toJudged(res.body.before.lines), toJudged(res.body.after.lines)) });
      } else {
        outcomes.push({ recipe, objective, status: res.status, verdicts: null, message: res.body?.error?.message });
      }
    }
  }
  return outcomes;
}

describe('comfort-food panel: would a cook cook these plans?', () => {
  // Issue 10 asks for ≥ 90 % of changed lines and ≥ 80 % of plans acceptable with ≥ 2/3 of rewrites
  // answered by a plan. Measured when the rules landed: 90.5 % of lines, 73 % of plans, 45 % plans
  // (many recipes cannot reach +30 % protein with the rules a cook accepts). Until the bar is
  // met, this test holds the floors reached so far, so a change can only keep or raise them.
  it('holds the floors reached so far: ≥ 90 % of changed lines and ≥ 70 % of plans acceptable, ≥ 40 % of rewrites answered by a plan', async () => {
    const outcomes = await rewriteAll();
    const scores: Record<string, PanelScore> = { tune: emptyScore(), 'held-out': emptyScore(), all: emptyScore() };
    const report: string[] = [];
    for (const o of outcomes) {
      addToScore(scores[o.recipe.half], o.verdicts);
      addToScore(scores.all, o.verdicts);
      if (!o.verdicts) {
        report.push(`  ${o.recipe.id} [${o.objective}] no plan (${o.status}): ${o.message}`);
        continue;
      }
      for (const v of o.verdicts.filter((x) => !x.ok)) report.push(`  ✗ ${o.recipe.id} [${o.objective}] line ${v.line} "${v.text}": ${v.detail}`);
    }
    console.log(
      [
        'Comfort-food panel',
        describeScore('tune', scores.tune),
        describeScore('held-out', scores['held-out']),
        describeScore('all', scores.all),
        'Offending changes and refusals:',
        ...report,
      ].join('\n'),
    );
    // Only a plan or an honest refusal: never a server error or a solver that gave up.
    expect(outcomes.filter((o) => o.status !== 200 && o.status !== 422).map((o) => `${o.recipe.id} ${o.objective}: ${o.status} ${o.message}`)).toEqual([]);
    const all = scores.all;
    expect(all.plans / all.rewrites).toBeGreaterThanOrEqual(0.4);
    expect(all.acceptablePlans / all.plans).toBeGreaterThanOrEqual(0.7);
    expect(all.acceptableChangedLines / Math.max(1, all.changedLines)).toBeGreaterThanOrEqual(0.9);
  }, 300_000);
});
