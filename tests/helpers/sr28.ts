/**
 * Readers for the raw USDA SR28 files in ../shared/reference/usda-sr28/
 * (USDA National Nutrient Database for Standard Reference, Release 28, slightly revised, May 2016).
 * Format: fields separated by `^`, text wrapped in `~`, CRLF line ends, Latin-1.
 */
import { readFileSync } from 'node:fs';
import path from 'node:path';

export const SR28_DIR = path.resolve(process.cwd(), '../shared/reference/usda-sr28');

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

/** Rows of an SR28 file as arrays of unwrapped text fields. */
export function readSr28File(name: string): string[][] {
  const hit = cache.get(name);
  if (hit) return hit;
  const text = readFileSync(path.join(SR28_DIR, name), 'latin1');
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
