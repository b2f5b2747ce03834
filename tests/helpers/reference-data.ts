/**
 * The one way tests, benchmarks and derivation scripts read the published reference data carried in
 * tests/reference/ (sources and licences in tests/reference/README.md). Paths are resolved from this
 * file, so a clone in any folder, run from any working directory, finds them.
 *
 * - USDA SR28 (National Nutrient Database for Standard Reference, Release 28, slightly revised, May 2016):
 *   readFoodDes, readWeights, readNutData / nutDataByFood, readFoodGroups. The large files are stored
 *   gzipped (`FOOD_DES.txt.gz`…) and unzipped here; format: fields separated by `^`, text wrapped in `~`,
 *   CRLF line ends, Latin-1.
 * - Labelled ingredient lines (ingredient-parser project, MIT): readLabelledLines, and labelledHalves for
 *   a fixed tuning half and a held-out half that nothing may be tuned on.
 * - The Stigler diet problem (Stigler 1945): readStigler.
 */
import { existsSync, readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { gunzipSync } from 'node:zlib';
import { parse as parseCsv } from 'csv-parse/sync';

export const REFERENCE_DIR = fileURLToPath(new URL('../reference/', import.meta.url));

/** A file under tests/reference/, read from `<name>.gz` when only the compressed copy is kept. */
export function readReferenceFile(name: string): Buffer {
  const plain = REFERENCE_DIR + name;
  if (existsSync(plain)) return readFileSync(plain);
  const zipped = `${plain}.gz`;
  if (existsSync(zipped)) return gunzipSync(readFileSync(zipped));
  throw new Error(`tests/reference/${name} is missing (neither ${name} nor ${name}.gz)`);
}

export interface FoodDesRow {
  ndbNo: string;
  fdGrpCd: string;
  longDesc: string;
  shrtDesc: string;
  comName: string;
  manufacName: string;
  survey: string;
  refDesc: string;
  refuse: number | null;
  sciName: string;
  nFactor: number | null;
  proFactor: number | null;
  fatFactor: number | null;
  choFactor: number | null;
}

export interface NutDataRow {
  ndbNo: string;
  nutrNo: string;
  nutrVal: number;
}

export interface WeightRow {
  ndbNo: string;
  seq: number;
  amount: number;
  msreDesc: string;
  gmWgt: number;
}

export interface FdGroupRow {
  fdGrpCd: string;
  fdGrpDesc: string;
}

const cache = new Map<string, string[][]>();

/** Rows of an SR28 file (e.g. 'FOOD_DES.txt') as arrays of unwrapped text fields. */
export function readSr28File(name: string): string[][] {
  const hit = cache.get(name);
  if (hit) return hit;
  const text = readReferenceFile(`usda-sr28/${name}`).toString('latin1');
  const rows = text
    .split(/\r?\n/)
    .filter((line) => line.length > 0)
    .map((line) => line.split('^').map((f) => (f.startsWith('~') && f.endsWith('~') && f.length >= 2 ? f.slice(1, -1) : f)));
  cache.set(name, rows);
  return rows;
}

function num(v: string | undefined): number | null {
  if (v === undefined || v.trim() === '') return null;
  const n = Number(v);
  return Number.isFinite(n) ? n : null;
}

export function readFoodDes(): FoodDesRow[] {
  return readSr28File('FOOD_DES.txt').map((f) => ({
    ndbNo: f[0],
    fdGrpCd: f[1],
    longDesc: f[2],
    shrtDesc: f[3],
    comName: f[4],
    manufacName: f[5],
    survey: f[6],
    refDesc: f[7],
    refuse: num(f[8]),
    sciName: f[9],
    nFactor: num(f[10]),
    proFactor: num(f[11]),
    fatFactor: num(f[12]),
    choFactor: num(f[13]),
  }));
}

export function readNutData(): NutDataRow[] {
  return readSr28File('NUT_DATA.macros.txt').map((f) => ({
    ndbNo: f[0],
    nutrNo: f[1],
    nutrVal: Number(f[2]),
  }));
}

/** NUT_DATA as ndb → nutrient number → value. */
export function nutDataByFood(): Map<string, Map<string, number>> {
  const out = new Map<string, Map<string, number>>();
  for (const r of readNutData()) {
    let m = out.get(r.ndbNo);
    if (!m) out.set(r.ndbNo, (m = new Map()));
    m.set(r.nutrNo, r.nutrVal);
  }
  return out;
}

export function readWeights(): WeightRow[] {
  return readSr28File('WEIGHT.txt').map((f) => ({
    ndbNo: f[0],
    seq: Number(f[1]),
    amount: Number(f[2]),
    msreDesc: f[3],
    gmWgt: Number(f[4]),
  }));
}

export function readFoodGroups(): FdGroupRow[] {
  return readSr28File('FD_GROUP.txt').map((f) => ({ fdGrpCd: f[0], fdGrpDesc: f[1] }));
}

/** Words of a food name for comparing names: lowercase, split on anything but letters and digits, plural "s" dropped. */
export function nameWords(name: string): Set<string> {
  const out = new Set<string>();
  for (const raw of name.toLowerCase().split(/[^a-z0-9]+/)) {
    if (!raw) continue;
    out.add(raw.length > 3 && raw.endsWith('s') && !raw.endsWith('ss') ? raw.slice(0, -1) : raw);
  }
  return out;
}

/** Share of the distinct words of an SR28 Long_Desc that a readable name also contains (0..1). */
export function longDescCoverage(name: string, longDesc: string): number {
  const want = nameWords(longDesc);
  if (want.size === 0) return 1;
  const have = nameWords(name);
  let hit = 0;
  for (const w of want) if (have.has(w)) hit++;
  return hit / want.size;
}

/** One labelled line of tastecooking-2024.csv; quantities write fractions as `#1$2` and mixed numbers as `1#1$4`. */
export interface LabelledLine {
  input: string;
  name: string;
  quantity: string;
  unit: string;
  size: string;
  preparation: string;
  comment: string;
  purpose: string;
}

let labelledLines: LabelledLine[] | undefined;

/** The 6,320 labelled ingredient lines, in file order. */
export function readLabelledLines(): LabelledLine[] {
  labelledLines ??= parseCsv(readReferenceFile('ingredient-lines/tastecooking-2024.csv').toString('utf8'), {
    columns: true,
    skip_empty_lines: true,
  }) as LabelledLine[];
  return labelledLines;
}

/** FNV-1a 32-bit: a stable hash, so each line's half never changes between runs or machines. */
function fnv1a(text: string): number {
  let h = 0x811c9dc5;
  for (let i = 0; i < text.length; i++) {
    h ^= text.charCodeAt(i);
    h = Math.imul(h, 0x01000193);
  }
  return h >>> 0;
}

/**
 * Items split into a tuning half and a held-out half by a hash of their key. Tune only on `tuning`;
 * report figures for both halves.
 */
export function labelledHalves<T>(items: readonly T[], key: (item: T) => string): { tuning: T[]; heldOut: T[] } {
  const tuning: T[] = [];
  const heldOut: T[] = [];
  for (const item of items) (fnv1a(key(item)) % 2 === 0 ? tuning : heldOut).push(item);
  return { tuning, heldOut };
}

export interface StiglerReference {
  source: string;
  nutrients: { name: string; dailyMinimum: number }[];
  commodities: { name: string; perDollar: number[] }[];
  expected: { dailyCostDollars: number; annualCostDollars: number; basis: string[] };
}

/** G. J. Stigler, "The Cost of Subsistence", Journal of Farm Economics 27(2), 1945: 77 commodities, 9 nutrients. */
export function readStigler(): StiglerReference {
  return JSON.parse(readReferenceFile('stigler-1945.json').toString('utf8')) as StiglerReference;
}
