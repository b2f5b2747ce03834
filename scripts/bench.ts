/** `npm run bench`: speed and memory figures, printed. Targets live here, not in timed tests. */
import { resolveDatabaseUrl } from './database-url';
import { runServerBench } from '../tests/bench/server-bench';

const db = await resolveDatabaseUrl('postgres', Number(process.env.PG_PORT ?? 54329), 'hearthswap');
console.log('== Server: analysis, search, start-up, memory, isolation of the solver ==');
await runServerBench(db.url);
const benches: [string, string, string][] = [
  ['Matching', '../tests/bench/matching-bench', 'runMatchingBench'],
  ['Hand-labelled lines: acceptable food and grams, tuning and held-out halves', '../tests/bench/labelled-lines-bench', 'runLabelledLinesBench'],
  ['Rewrite solver (javascript-lp-solver vs HiGHS)', '../tests/bench/rewrite-bench', 'runRewriteBench'],
];
for (const [title, file, fn] of benches) {
  console.log(`\n== ${title} ==`);
  const mod = (await import(file)) as Record<string, () => Promise<void>>;
  await mod[fn]();
}
db.stop();
process.exit(0);
