/** `npm run bench`: speed and memory figures, printed. Targets live here, not in timed tests. */
import { resolveDatabaseUrl } from './database-url';
import { runServerBench } from '../tests/bench/server-bench';
import { rssMb, startBenchServer } from '../tests/bench/bench-server';
import { runBrowserBench } from '../tests/bench/browser-bench';
import { runHttpAnalyzeBench } from '../tests/bench/http-analyze-bench';
import { machineLoad, printLoad, runLoad, scenarios, signInCookie } from '../tests/bench/load-bench';

const db = await resolveDatabaseUrl('postgres', Number(process.env.PG_PORT ?? 54329), 'hearthswap');
// --http-only: the serving process's analysis latency alone (SKIP_BUILD=1 keeps the last client build)
const httpOnly = process.argv.includes('--http-only');
if (!httpOnly) {
  console.log('== Server: analysis, search, start-up, memory, isolation of the solver ==');
  await runServerBench(db.url);
}
if (process.argv.includes('--server-only')) {
  db.stop();
  process.exit(0);
}
const benches: [string, string, string][] = [
  ['Matching', '../tests/bench/matching-bench', 'runMatchingBench'],
  ['Hand-labelled lines: acceptable food and grams, tuning and held-out halves', '../tests/bench/labelled-lines-bench', 'runLabelledLinesBench'],
  ['Rewrite solver (javascript-lp-solver vs HiGHS)', '../tests/bench/rewrite-bench', 'runRewriteBench'],
];
for (const [title, file, fn] of httpOnly ? [] : benches) {
  console.log(`\n== ${title} ==`);
  const mod = (await import(file)) as Record<string, () => Promise<void>>;
  await mod[fn]();
}

console.log('\n== Serving process: compiled server under node, memory, first visit in Chromium, load mix ==');
const server = await startBenchServer({ LIMIT_ANONYMOUS_COMPUTE_PER_MIN: '100000000', LIMIT_USER_COMPUTE_PER_MIN: '100000000', HEARTHSWAP_QUIET: '1' }, db.url);
try {
  await new Promise((r) => setTimeout(r, 2_000));
  console.log(`serving process RSS after start: ${rssMb(server.pid).toFixed(0)} MB (goal ≤ 350 MB); ${machineLoad()}`);
  const cookie = await signInCookie(server.url);
  await runHttpAnalyzeBench(server.url, cookie, server.pid);
  if (!httpOnly) {
    await runBrowserBench(server.url);
    const mix = scenarios(cookie).at(-1)!;
    printLoad(await runLoad(server.url, server.pid, mix, 20));
    console.log(`(npm run bench:load runs every load scenario; ${machineLoad()})`);
  }
} finally {
  await server.stop();
}
db.stop();
process.exit(0);
