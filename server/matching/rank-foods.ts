/**
 * Ranking, the matcher's second step: the catalogue foods a prepared phrase may mean, best first.
 * An inverted index (word → foods) means a query only touches foods sharing a word with it. Foods
 * are scored by how much of the phrase's weight they cover (squared), how little their names add,
 * and whether they are the plain form a recipe means (raw over cooked, base foods over baby foods or
 * mixed dishes); a name that contradicts an asked word ("sweet" against "unsweetened") loses.
 */
import {
  FLAG_BABY,
  FLAG_BRANDED,
  FLAG_CANNED,
  FLAG_CURED,
  FLAG_DRIED,
  FLAG_FROZEN,
  FLAG_MIXED_DISH,
  FLAG_RAW,
  FLAG_REGIONAL,
  FLAG_SNACK,
  FLAG_STATE,
  type FoodIndex,
  type IndexedFood,
} from './food-index';
import type { PreparedQuery } from './prepare-phrase';

const CANDIDATES_SCORED = 60;
/** Foods covering less than this share of the best food's coverage are not scored. */
const CANDIDATE_SHARE = 0.45;
const EXTRA_WORD_PENALTY = 0.08;
const CONTRADICTION_FACTOR = 0.6;

export interface Ranked {
  position: number;
  score: number;
}

export interface Coverage {
  /** share of the query's weight the name covers, 0..1 */
  coverage: number;
  /** extra weight of the name words the query matched */
  matchedExtra: number;
  headMatched: boolean;
}

export interface FoodRanker {
  /** Foods ranked for a prepared query, at most `limit`; branded ones only when `allowBranded`. */
  rank(q: PreparedQuery, allowBranded: boolean, limit: number): Ranked[];
  /** How one food covers the query: share of the query's weight, extra weight matched, head matched. */
  coverageOf(f: IndexedFood, q: PreparedQuery): Coverage;
  scoreFood(f: IndexedFood, q: PreparedQuery, c: Coverage): number;
}

/** A ranker over one catalogue index; its scratch arrays are reused by every call (one call at a time). */
export function createFoodRanker(index: FoodIndex): FoodRanker {
  const acc = new Float64Array(index.foods.length);
  const extraAcc = new Float64Array(index.foods.length);
  const mask = new Uint32Array(index.foods.length);
  const touched = new Uint32Array(index.foods.length);
  // Read in the hot loop for every food a query touches: a flat array beats a walk to each food object.
  const branded = Uint8Array.from(index.foods, (f) => (f.food.branded ? 1 : 0));

  function coverageOf(f: IndexedFood, q: PreparedQuery): Coverage {
    let covered = 0;
    let matchedExtra = 0;
    let bits = 0;
    for (let j = 0; j < q.terms.length; j++) {
      const t = q.terms[j];
      for (const alt of t.alternatives) {
        if (f.tokens.has(alt.id)) {
          covered += t.weight * alt.factor;
          matchedExtra += index.extraWeight[alt.id];
          bits |= 1 << j;
          break;
        }
      }
    }
    return { coverage: q.totalWeight > 0 ? covered / q.totalWeight : 0, matchedExtra, headMatched: headMatched(f, q, bits) };
  }

  /** True when every word of the food's first name segment is one the query asked for. */
  function headMatched(f: IndexedFood, q: PreparedQuery, bits: number): boolean {
    if (f.head.length === 0) return false;
    for (const id of f.head) if (((q.termBits.get(id) ?? 0) & bits) === 0) return false;
    return true;
  }

  function scoreFood(f: IndexedFood, q: PreparedQuery, c: Coverage): number {
    const extra = Math.max(0, f.extraTotal - c.matchedExtra);
    let s = (c.coverage * c.coverage) / (1 + EXTRA_WORD_PENALTY * extra);
    const flags = f.flags;
    if (flags & FLAG_STATE && !q.hasState) s *= 0.85;
    if (flags & FLAG_RAW && !q.hasState) s *= 1.05;
    if (flags & FLAG_CANNED && !q.asks.canned) s *= 0.93;
    if (flags & FLAG_FROZEN && !q.asks.frozen) s *= 0.93;
    if (flags & FLAG_DRIED && !q.asks.dried) s *= 0.95;
    if (flags & FLAG_CURED && !q.asks.cured) s *= 0.93;
    if (flags & FLAG_BABY && !q.asks.baby) s *= 0.4;
    if (flags & FLAG_MIXED_DISH) s *= 0.85;
    if (flags & FLAG_REGIONAL) s *= 0.75;
    if (flags & FLAG_SNACK) s *= 0.9;
    if (flags & FLAG_BRANDED) s *= 0.85;
    if (c.headMatched) s *= 1.1;
    for (const k of q.contradictions) {
      if (k.own !== undefined && f.tokens.has(k.own)) continue;
      let hit = false;
      for (const id of k.against) if (f.tokens.has(id)) hit = true;
      if (hit) {
        s *= CONTRADICTION_FACTOR;
        break;
      }
    }
    return s;
  }

  function rank(q: PreparedQuery, allowBranded: boolean, limit: number): Ranked[] {
    if (q.terms.length === 0 || q.totalWeight <= 0) return [];
    let touchedCount = 0;
    for (let j = 0; j < q.terms.length; j++) {
      const t = q.terms[j];
      const bit = 1 << j;
      for (const alt of t.alternatives) {
        const list = index.postings[alt.id];
        const gain = t.weight * alt.factor;
        const extraGain = index.extraWeight[alt.id];
        for (let k = 0; k < list.length; k++) {
          const p = list[k];
          const m = mask[p];
          if (m & bit) continue;
          if (m === 0) touched[touchedCount++] = p;
          mask[p] = m | bit;
          acc[p] += gain;
          extraAcc[p] += extraGain;
        }
      }
    }
    // Only foods covering a good share of what the best one covers can rank near the top.
    let maxAcc = 0;
    for (let i = 0; i < touchedCount; i++) {
      const p = touched[i];
      if ((allowBranded || branded[p] === 0) && acc[p] > maxAcc) maxAcc = acc[p];
    }
    const floor = maxAcc * CANDIDATE_SHARE;
    let pool: number[] = [];
    for (let i = 0; i < touchedCount; i++) {
      const p = touched[i];
      if (acc[p] >= floor && acc[p] > 0 && (allowBranded || branded[p] === 0)) pool.push(p);
    }
    if (pool.length > CANDIDATES_SCORED) {
      pool.sort((a, b) => acc[b] - acc[a] || a - b);
      pool = pool.slice(0, CANDIDATES_SCORED);
    }
    const ranked: Ranked[] = [];
    for (const p of pool) {
      const f = index.foods[p];
      const c: Coverage = { coverage: acc[p] / q.totalWeight, matchedExtra: extraAcc[p], headMatched: headMatched(f, q, mask[p]) };
      ranked.push({ position: p, score: scoreFood(f, q, c) });
    }
    for (let i = 0; i < touchedCount; i++) {
      const p = touched[i];
      acc[p] = 0;
      extraAcc[p] = 0;
      mask[p] = 0;
    }
    ranked.sort(byScore);
    return ranked.slice(0, limit);
  }

  function byScore(a: Ranked, b: Ranked): number {
    return b.score - a.score || index.foods[a.position].wordCount - index.foods[b.position].wordCount || a.position - b.position;
  }

  return { rank, coverageOf, scoreFood };
}
