/**
 * Match a recipe's food phrase to a catalogue food (PRODUCT.md "The computation", step 2).
 *
 * Order: the curated alias table (the whole phrase, then the best alias inside it), then a weighted
 * word search over the catalogue names. Every index is built once, in createFoodMatcher:
 * - an inverted index word → foods, so a query only touches foods that share a word with it;
 * - word weights (inverse document frequency), the phrase's last food word counting double
 *   (English puts the head noun last: "boneless chicken *thighs*");
 * - fuse.js over the vocabulary, for misspelled words ("mozarella").
 * Candidates are ranked by how much of the phrase they cover, how little their name adds, and
 * whether they are the plain form a recipe means (raw over cooked, base foods over baby foods or
 * mixed dishes). Brand-named and restaurant foods are never matched automatically.
 */
import type { CatalogueFood } from '../../shared/food';
import { recordFallback } from '../../shared/fallbacks';
import { aliasVocabulary, buildAliasIndex, containedAliases, DEFAULT_ALIASES, type AliasIndex, type AliasTable } from './alias-index';
import {
  buildFoodIndex,
  FLAG_BABY,
  FLAG_BRANDED,
  FLAG_CANNED,
  FLAG_DRIED,
  FLAG_FROZEN,
  FLAG_MIXED_DISH,
  FLAG_RAW,
  FLAG_REGIONAL,
  FLAG_SNACK,
  FLAG_STATE,
  STATE_WORDS,
  VARIANT_WORDS,
  type FoodIndex,
  type IndexedFood,
} from './food-index';
import { CONTRADICTIONS, PHRASE_ABBREVIATIONS, PIECE_WORDS, PREPARATION_WORDS, STOP_WORDS, SYNONYMS, withoutParentheticals, words } from './normalise-phrase';
import { createSpellingCorrector, type SpellingCorrector } from './spelling';

/** A match scoring under this comes back with `food: null` (its alternatives are still given). */
export const MATCH_CONFIDENCE_FLOOR = 0.45;

/** Confidence of a phrase that is exactly an alias. */
const ALIAS_EXACT_CONFIDENCE = 1;
/** The best a fuzzy match or a partial alias can score: below an exact alias. */
const MAX_PARTIAL_CONFIDENCE = 0.95;
/** An alias that covers part of the phrase is trusted this much more than a name that covers as much. */
const ALIAS_PARTIAL_BOOST = 1.15;
const ALIAS_WITHOUT_HEAD_FACTOR = 0.8;
/** Weight of a word the catalogue does not know: a brand or an adjective, worth about a common word. */
const UNKNOWN_WORD_WEIGHT = 3;
const HEAD_WORD_FACTOR = 2;
const SYNONYM_FACTOR = 0.85;
const PIECE_WORD_FACTOR = 0.3;
const CANDIDATES_SCORED = 60;
/** Foods covering less than this share of the best food's coverage are not scored. */
const CANDIDATE_SHARE = 0.45;
const MAX_TERMS = 30;
const DEFAULT_ALTERNATIVES = 5;
/** Under this, a phrase joined with "and" or commas is tried part by part. */
const WEAK_MATCH = 0.6;
const REMEMBERED_MATCHES = 20_000;
/** A part after the first one of "A, B and C" is trusted this much less than the first. */
const LATER_PART_FACTOR = 0.65;

export type MatchVia = 'alias' | 'fuzzy' | 'none';

export interface FoodMatch {
  food: CatalogueFood | null;
  /** 0..1 */
  confidence: number;
  /** the next best foods, the matched one left out */
  alternatives: CatalogueFood[];
  via: MatchVia;
  /** words of the phrase the catalogue does not know ("xanthan gum" → ["xanthan"]) */
  unknownWords: string[];
}

export interface MatchOptions {
  /** how many alternatives to return (default 5) */
  alternatives?: number;
}

export interface FoodSearchHit {
  food: CatalogueFood;
  /** 0..1 */
  score: number;
}

export interface FoodMatcher {
  match(phrase: string, opts?: MatchOptions): FoodMatch;
  search(query: string, limit?: number): FoodSearchHit[];
  /** alias phrases whose food is missing from (or branded in) this catalogue */
  readonly skippedAliases: readonly string[];
}

interface Term {
  word: string;
  /** word ids that satisfy the term, best first, with how much a hit through each counts */
  alternatives: { id: number; factor: number }[];
  weight: number;
}

interface PreparedQuery {
  /** every word, preparation words included: for the alias table */
  all: string[];
  /** food words only */
  content: string[];
  terms: Term[];
  totalWeight: number;
  /** index in `all` of the last food word */
  headAt: number;
  hasState: boolean;
  wordSet: Set<string>;
  /** per asked word that some names contradict: the word's own id and the contradicting ids */
  contradictions: { own: number | undefined; against: number[] }[];
  /** word id → bits of the terms it satisfies */
  termBits: Map<number, number>;
  asks: { canned: boolean; frozen: boolean; dried: boolean; baby: boolean };
}

interface Ranked {
  position: number;
  score: number;
}

interface Coverage {
  /** share of the query's weight the name covers, 0..1 */
  coverage: number;
  /** extra weight of the name words the query matched */
  matchedExtra: number;
  headMatched: boolean;
}

const EXTRA_WORD_PENALTY = 0.08;
const CONTRADICTION_FACTOR = 0.6;
/** A partial alias whose food lacks a modifier the phrase asks for ("*whole* buttermilk"). */
const UNMET_MODIFIER_FACTOR = 0.5;
/** Foods like the alias food ("Rice, …, cooked" beside "Rice, …, raw") gain up to this much. */
const SIBLING_BOOST = 0.25;
/** How alike two names must be (shared words over all words) to be versions of one food. */
const MIN_SIBLING_SIMILARITY = 0.15;
/** A sibling chosen for an alias that lacked a modifier is trusted a little less than the alias. */
const SIBLING_SWAP_FACTOR = 0.9;
const SIBLINGS_LOOKED_AT = 60;

/** Words that change which version of a food is meant; an alias must not drop them. */
const MODIFIER_WORDS = new Set([
  ...VARIANT_WORDS,
  ...STATE_WORDS,
  'canned',
  'frozen',
  'dried',
  'dry',
  'raw',
  'skim',
  'unsalted',
  'salted',
  'lean',
  'sweetened',
  'unsweetened',
  'smoked',
  'instant',
]);

function isContentWord(w: string): boolean {
  if (PREPARATION_WORDS.has(w) || STOP_WORDS.has(w)) return false;
  const c = w.charCodeAt(0);
  return !(c >= 48 && c <= 57 && /^\d+$/.test(w));
}

/** Words after which the food has been named: "juice *of* lemon", "capers *in* brine", "tomatoes *with* chilies". */
const HEAD_BEFORE = new Set(['of', 'in', 'with']);

/**
 * Index of the phrase's head word: its last food word, or the last one before "of", "in" or "with";
 * a piece word ("fresh basil *leaves*", "*head* of garlic") gives way to the food word beside it.
 */
function headWordAt(all: string[]): number {
  const contentAt = all.flatMap((w, i) => (isContentWord(w) ? [i] : []));
  if (contentAt.length === 0) return -1;
  const cut = all.findIndex((w) => HEAD_BEFORE.has(w));
  const before = cut > 0 ? contentAt.filter((i) => i < cut) : [];
  const after = cut > 0 ? contentAt.filter((i) => i > cut) : contentAt;
  const pick = (list: number[]) => {
    if (list.length === 0) return -1;
    const last = list[list.length - 1];
    return PIECE_WORDS.has(all[last]) && list.length > 1 ? list[list.length - 2] : last;
  };
  if (before.length && !(before.length === 1 && PIECE_WORDS.has(all[before[0]]))) return pick(before);
  return pick(after.length ? after : contentAt);
}

function expandAbbreviations(ws: string[]): string[] {
  const out: string[] = [];
  for (const w of ws) {
    const expansion = PHRASE_ABBREVIATIONS[w];
    if (expansion === undefined) out.push(w);
    else if (expansion !== '') out.push(...words(expansion));
  }
  return out;
}

export function createFoodMatcher(foods: CatalogueFood[], aliasTable: AliasTable | Record<string, string> = DEFAULT_ALIASES): FoodMatcher {
  const table: AliasTable = isAliasTable(aliasTable) ? aliasTable : { aliases: aliasTable };
  const index: FoodIndex = buildFoodIndex(foods, aliasVocabulary(table));
  const aliases: AliasIndex = buildAliasIndex(table, index);
  const speller: SpellingCorrector = createSpellingCorrector(index.wordText);
  const acc = new Float64Array(index.foods.length);
  const extraAcc = new Float64Array(index.foods.length);
  const mask = new Uint32Array(index.foods.length);
  const touched = new Uint32Array(index.foods.length);
  const remembered = new Map<string, FoodMatch>();

  function prepare(phrase: string): PreparedQuery {
    // "instant oatmeal, dry": the food is named before the first comma.
    const segments = withoutParentheticals(phrase).split(/[,;]/);
    const raw: string[] = [];
    let namedUpTo = 0;
    for (const segment of segments) {
      raw.push(...expandAbbreviations(words(segment)));
      if (namedUpTo === 0) namedUpTo = raw.length;
    }
    const all: string[] = [];
    const closeness: number[] = [];
    let namedEnd = 0;
    for (const [i, w] of raw.entries()) {
      if (i === namedUpTo) namedEnd = all.length;
      if (index.wordId.has(w) || !isContentWord(w) || PIECE_WORDS.has(w)) {
        all.push(w);
        closeness.push(1);
        continue;
      }
      const fixed = speller.correct(w);
      if (fixed)
        for (const c of fixed.words) {
          all.push(c);
          closeness.push(fixed.closeness);
        }
      else {
        all.push(w);
        closeness.push(1);
      }
    }
    if (namedUpTo >= raw.length) namedEnd = all.length;
    const headAt = headWordAt(all.slice(0, namedEnd).some(isContentWord) ? all.slice(0, namedEnd) : all);
    const terms: Term[] = [];
    const seen = new Set<string>();
    const content: string[] = [];
    all.forEach((w, i) => {
      if (!isContentWord(w)) return;
      content.push(w);
      if (seen.has(w) || terms.length >= MAX_TERMS) return;
      seen.add(w);
      const alternatives: Term['alternatives'] = [];
      const id = index.wordId.get(w);
      let weight = UNKNOWN_WORD_WEIGHT;
      if (id !== undefined && index.postings[id].length > 0) {
        alternatives.push({ id, factor: closeness[i] });
        weight = index.idf[id];
      }
      for (const s of SYNONYMS[w] ?? []) {
        const sid = index.wordId.get(s);
        if (sid !== undefined && sid !== id && index.postings[sid].length > 0) {
          alternatives.push({ id: sid, factor: SYNONYM_FACTOR * closeness[i] });
          if (weight === UNKNOWN_WORD_WEIGHT) weight = index.idf[sid];
        }
      }
      if (i === headAt) weight *= HEAD_WORD_FACTOR;
      // "thyme *sprigs*", "cod *fillets*": the piece says little about which food it is.
      else if (PIECE_WORDS.has(w)) weight *= PIECE_WORD_FACTOR;
      terms.push({ word: w, alternatives, weight });
    });
    // The head may repeat an earlier word ("chicken breast chicken"): its weight already doubled.
    const totalWeight = terms.reduce((s, t) => s + t.weight, 0);
    const wordSet = new Set(all);
    const hasState = all.some((w) => STATE_WORDS.has(w));
    const contradictions: PreparedQuery['contradictions'] = [];
    for (const w of wordSet) {
      const against = (CONTRADICTIONS[w] ?? []).map((c) => index.wordId.get(c)).filter((id): id is number => id !== undefined);
      if (against.length) contradictions.push({ own: index.wordId.get(w), against });
    }
    const termBits = new Map<number, number>();
    for (let j = 0; j < terms.length; j++) for (const alt of terms[j].alternatives) termBits.set(alt.id, (termBits.get(alt.id) ?? 0) | (1 << j));
    const asks = {
      canned: wordSet.has('canned'),
      frozen: wordSet.has('frozen'),
      dried: wordSet.has('dried') || wordSet.has('dry'),
      baby: wordSet.has('babyfood') || wordSet.has('infant'),
    };
    return { all, content, terms, totalWeight, headAt, hasState, wordSet, contradictions, termBits, asks };
  }

  /** How one food covers the query: share of the query's weight, extra weight matched, head matched. */
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

  /** Foods ranked for a prepared query; branded ones only when `allowBranded`. */
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
      if ((allowBranded || !index.foods[p].food.branded) && acc[p] > maxAcc) maxAcc = acc[p];
    }
    const floor = maxAcc * CANDIDATE_SHARE;
    let pool: number[] = [];
    for (let i = 0; i < touchedCount; i++) {
      const p = touched[i];
      if (acc[p] >= floor && acc[p] > 0 && (allowBranded || !index.foods[p].food.branded)) pool.push(p);
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

  function exactAlias(q: PreparedQuery): number | null {
    const keys = [q.all.join(' '), q.all.filter((w) => !PREPARATION_WORDS.has(w)).join(' '), q.content.join(' ')];
    for (const k of keys) {
      const hit = aliases.exact.get(k);
      if (hit) return hit.position;
    }
    return null;
  }

  /**
   * The alias inside the phrase that covers most of it ("part skim ricotta" in "part-skim ricotta
   * cheese" rather than "ricotta cheese"), scored like a name match but trusted a little more.
   */
  function bestPartialAlias(q: PreparedQuery, ranked: Ranked[]): Ranked | null {
    const withoutPrep = q.all.filter((w) => !PREPARATION_WORDS.has(w));
    const hits = [...containedAliases(aliases, q.all), ...containedAliases(aliases, withoutPrep)];
    let best: Ranked | null = null;
    for (const hit of hits) {
      const aliasWords = new Set(hit.entry.words);
      const f = index.foods[hit.entry.position];
      let covered = 0;
      const unmet: Term[] = [];
      const residual: Term[] = [];
      const contradicted = new Set(
        q.contradictions.filter((c) => (c.own === undefined || !f.tokens.has(c.own)) && c.against.some((id) => f.tokens.has(id))).map((c) => c.own),
      );
      for (const t of q.terms) {
        const inFood = t.alternatives.some((a) => f.tokens.has(a.id));
        if (aliasWords.has(t.word)) covered += t.weight;
        else if (MODIFIER_WORDS.has(t.word) && !inFood) unmet.push(t);
        else if (t.alternatives.length && contradicted.has(t.alternatives[0].id)) unmet.push(t);
        else if (!inFood && t.alternatives.length && !PIECE_WORDS.has(t.word) && index.extraWeight[t.alternatives[0].id] > 0) residual.push(t);
      }
      const aliasCoverage = q.totalWeight > 0 ? covered / q.totalWeight : 0;
      const own = scoreFood(f, q, coverageOf(f, q));
      let score = Math.min(MAX_PARTIAL_CONFIDENCE, Math.max(own, aliasCoverage) * ALIAS_PARTIAL_BOOST);
      // "whipped cream cheese" is cream cheese: an alias holding the head word beats one beside it.
      if (q.headAt >= 0 && !aliasWords.has(q.all[q.headAt])) score *= ALIAS_WITHOUT_HEAD_FACTOR;
      let position = hit.entry.position;
      if (unmet.length || residual.length) {
        // A version of the alias food that has what the phrase adds: "whole buttermilk", "cooked jasmine
        // rice", "chicken sausage links". It keeps every word the alias food matched ("toasted pita bread"
        // may become toasted pita, never toasted raisin bread), has every missing modifier, and at
        // least one other added word when no modifier is missing.
        const kept = q.terms.filter((t) => t.alternatives.some((a) => f.tokens.has(a.id)));
        const needed = [...kept, ...unmet];
        let sibling: { position: number; extra: number; similarity: number } | null = null;
        for (const r of ranked) {
          const g = index.foods[r.position];
          if (r.position === position || !needed.every((t) => t.alternatives.some((a) => g.tokens.has(a.id)))) continue;
          if (!sameForm(f, g, q)) continue;
          const extra = residual.filter((t) => t.alternatives.some((a) => g.tokens.has(a.id))).length;
          if (unmet.length === 0 && extra === 0) continue;
          const sim = similarity(f, g);
          if (sim < MIN_SIBLING_SIMILARITY) continue;
          if (!sibling || extra > sibling.extra || (extra === sibling.extra && sim > sibling.similarity)) {
            sibling = { position: r.position, extra, similarity: sim };
          }
        }
        if (sibling) {
          position = sibling.position;
          score *= SIBLING_SWAP_FACTOR;
        } else if (unmet.length) score *= UNMET_MODIFIER_FACTOR;
      }
      if (!best || score > best.score) best = { position, score };
    }
    return best;
  }

  /** False when `b` is another form of `a` ("tortilla chips" beside "tortillas") the phrase did not ask for. */
  function sameForm(a: IndexedFood, b: IndexedFood, q: PreparedQuery): boolean {
    const changed = b.flags & ~a.flags & (FLAG_SNACK | FLAG_BABY | FLAG_MIXED_DISH);
    if (changed) return false;
    for (const id of b.forms) if (!a.tokens.has(id) && !q.wordSet.has(index.wordText[id])) return false;
    return true;
  }

  function similarity(a: IndexedFood, b: IndexedFood): number {
    let shared = 0;
    for (const id of b.tokens) if (a.tokens.has(id)) shared++;
    return shared / (a.tokens.size + b.tokens.size - shared || 1);
  }

  /** Re-rank toward foods whose names share most words with the alias food. */
  function boostSiblings(ranked: Ranked[], aliasPosition: number): void {
    const a = index.foods[aliasPosition];
    for (const r of ranked) r.score *= 1 + SIBLING_BOOST * similarity(a, index.foods[r.position]);
    ranked.sort((x, y) => y.score - x.score || x.position - y.position);
  }

  function matchOne(phrase: string, wanted: number): FoodMatch {
    const q = prepare(phrase);
    if (q.content.length === 0 && q.all.length === 0) return { food: null, confidence: 0, alternatives: [], via: 'none', unknownWords: [] };
    const unknownWords = q.terms.filter((t) => t.alternatives.length === 0 && !aliases.vocabulary.has(t.word)).map((t) => t.word);
    const ranked = rank(q, false, Math.max(wanted + 2, SIBLINGS_LOOKED_AT));
    const alternativesWithout = (position: number | null) =>
      ranked
        .filter((r) => r.position !== position)
        .slice(0, wanted)
        .map((r) => index.foods[r.position].food);

    const exact = exactAlias(q);
    if (exact !== null) {
      return { food: index.foods[exact].food, confidence: ALIAS_EXACT_CONFIDENCE, alternatives: alternativesWithout(exact), via: 'alias', unknownWords: [] };
    }

    const partial = bestPartialAlias(q, ranked);
    if (partial) boostSiblings(ranked, partial.position);
    const best = ranked[0];
    const bestScore = best ? Math.min(MAX_PARTIAL_CONFIDENCE, best.score) : 0;
    if (partial && partial.score >= bestScore && partial.score >= MATCH_CONFIDENCE_FLOOR) {
      return {
        food: index.foods[partial.position].food,
        confidence: partial.score,
        alternatives: alternativesWithout(partial.position),
        via: 'alias',
        unknownWords,
      };
    }
    if (best && bestScore >= MATCH_CONFIDENCE_FLOOR) {
      return { food: index.foods[best.position].food, confidence: bestScore, alternatives: alternativesWithout(best.position), via: 'fuzzy', unknownWords };
    }
    return { food: null, confidence: bestScore, alternatives: alternativesWithout(null), via: 'none', unknownWords };
  }

  function match(phrase: string, opts: MatchOptions = {}): FoodMatch {
    const wanted = Math.max(0, Math.min(50, Math.floor(opts.alternatives ?? DEFAULT_ALTERNATIVES)));
    const text = typeof phrase === 'string' ? phrase : '';
    const key = `${wanted}\u0000${text}`;
    const hit = remembered.get(key);
    if (hit) return { ...hit, alternatives: [...hit.alternatives], unknownWords: [...hit.unknownWords] };
    let result: FoodMatch;
    try {
      result = matchOne(text, wanted);
      if (!(result.via === 'alias' && result.confidence >= ALIAS_EXACT_CONFIDENCE)) {
        // "soy sauce or tamari", "chicken or vegetable stock", "thyme leaves and tender stems":
        // the best of the choices, the whole phrase winning ties, then the first choice.
        const splitAnd = result.confidence < WEAK_MATCH;
        const first = splitAnd ? firstPart(text) : null;
        for (const part of choicesIn(text, splitAnd)) {
          const alt = matchOne(part, wanted);
          // "canned plum tomatoes, juices reserved, and tomatoes": a later part is a note, not the food.
          if (first !== null && part !== first && !orChoice(text, part)) alt.confidence *= LATER_PART_FACTOR;
          if (alt.food && alt.confidence >= MATCH_CONFIDENCE_FLOOR && alt.confidence > result.confidence) result = alt;
        }
      }
    } catch (error) {
      recordFallback('food-match', error);
      result = { food: null, confidence: 0, alternatives: [], via: 'none', unknownWords: [] };
    }
    if (remembered.size >= REMEMBERED_MATCHES) remembered.clear();
    remembered.set(key, result);
    return { ...result, alternatives: [...result.alternatives], unknownWords: [...result.unknownWords] };
  }

  function search(query: string, limit = 10): FoodSearchHit[] {
    const n = Math.max(0, Math.min(100, Math.floor(Number.isFinite(limit) ? limit : 10)));
    if (n === 0 || typeof query !== 'string') return [];
    try {
      const q = prepare(query);
      const namesBrand = q.terms.some((t) => t.alternatives.some((a) => index.brandedOnly[a.id] === 1));
      const out: FoodSearchHit[] = [];
      const exact = exactAlias(q);
      if (exact !== null) out.push({ food: index.foods[exact].food, score: 1 });
      for (const r of rank(q, namesBrand, n + 1)) {
        if (r.position === exact) continue;
        out.push({ food: index.foods[r.position].food, score: Math.min(MAX_PARTIAL_CONFIDENCE, r.score) });
      }
      return out.slice(0, n);
    } catch (error) {
      recordFallback('food-search', error);
      return [];
    }
  }

  return { match, search, skippedAliases: aliases.skipped };
}

/**
 * The foods a phrase offers as choices: "A or B", "A and B", "A/B". With "or", a head word written
 * once belongs to each: "chicken or vegetable stock" → "chicken stock", "vegetable stock".
 * "and" splits only when asked: "macaroni and cheese" is one food.
 */
export function choicesIn(text: string, splitAnd = true): string[] {
  const out: string[] = [];
  const orParts = text
    .split(/\s+or\s+|\s*\/\s*/i)
    .map((p) => p.trim())
    .filter(Boolean);
  if (orParts.length > 1) {
    const last = orParts[orParts.length - 1].split(/\s+/);
    const head = last[last.length - 1];
    for (let i = 0; i < orParts.length; i++) {
      const n = orParts[i].split(/\s+/).length;
      if (i < orParts.length - 1 && last.length >= 2 && n <= 2 && !orParts[i].endsWith(head)) out.push(`${orParts[i]} ${head}`);
      out.push(orParts[i]);
    }
  }
  if (splitAnd)
    for (const p of text
      .split(/\s+and\s+|\s*,\s*/i)
      .map((x) => x.trim())
      .filter(Boolean))
      out.push(p);
  return [...new Set(out)].filter((p) => p !== text);
}

/** The first part of "A, B and C". */
function firstPart(text: string): string {
  return text.split(/\s+and\s+|\s*,\s*/i)[0].trim();
}

/** True when `part` is one of the "or" choices of `text`. */
function orChoice(text: string, part: string): boolean {
  return /\s+or\s+|\//i.test(text) && choicesIn(text, false).includes(part);
}

function isAliasTable(t: AliasTable | Record<string, string>): t is AliasTable {
  return typeof (t as AliasTable).aliases === 'object' && (t as AliasTable).aliases !== null;
}
