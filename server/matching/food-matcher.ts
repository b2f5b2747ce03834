/**
 * Match a recipe's food phrase to a catalogue food (PRODUCT.md "The computation", step 2).
 *
 * Order: the curated alias table (the whole phrase, then the best alias inside it), then a weighted
 * word search over the catalogue names. This file is the front: it builds the indexes once and keeps
 * the cache of answers; the steps live beside it:
 * - prepare-phrase.ts: the phrase as weighted terms (head word double, misspellings corrected);
 * - rank-foods.ts: the inverted index walk and the scoring of candidate foods;
 * - alias-resolution.ts: exact and partial aliases, and the version of an alias food a modifier asks for.
 * A phrase joined with "or", "and" or commas is also tried part by part. Brand-named and restaurant
 * foods are never matched automatically. Anything thrown inside is a counted, logged fallback
 * (shared/fallbacks.ts), never a silent default.
 */
import type { CatalogueFood } from '../../shared/food';
import { recordFallback } from '../../shared/fallbacks';
import { aliasVocabulary, buildAliasIndex, DEFAULT_ALIASES, type AliasIndex, type AliasTable } from './alias-index';
import { createAliasResolver, MAX_PARTIAL_CONFIDENCE } from './alias-resolution';
import { buildFoodIndex, STATE_WORDS, type FoodIndex } from './food-index';
import { words } from './normalise-phrase';
import { createPhrasePreparer } from './prepare-phrase';
import { createFoodRanker } from './rank-foods';
import { createSpellingCorrector } from './spelling';

/** A match scoring under this comes back with `food: null` (its alternatives are still given). */
export const MATCH_CONFIDENCE_FLOOR = 0.45;

/** Confidence of a phrase that is exactly an alias. */
const ALIAS_EXACT_CONFIDENCE = 1;
const DEFAULT_ALTERNATIVES = 5;
/** Under this, a phrase joined with "and" or commas is tried part by part. */
const WEAK_MATCH = 0.6;
const REMEMBERED_MATCHES = 20_000;
/** A part after the first one of "A, B and C" is trusted this much less than the first. */
const LATER_PART_FACTOR = 0.65;
/** How many ranked foods an alias looks through for the version of its food a modifier asks for. */
const SIBLINGS_LOOKED_AT = 60;

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
  /** words read as another catalogue word, as "written → read" ("mozarella → mozzarella") */
  corrected: string[];
  /** false when a name match's leading words are not in the phrase ("potato starch" → "Bread, …, potato extract") */
  nameHeadMatched: boolean;
  /** the alias phrase whose food SR28 lacks, when the food only stands in for it ("pancetta" → bacon) */
  standIn: string | null;
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

const noMatch = (): FoodMatch => ({
  food: null,
  confidence: 0,
  alternatives: [],
  via: 'none',
  unknownWords: [],
  corrected: [],
  nameHeadMatched: false,
  standIn: null,
});

export function createFoodMatcher(foods: CatalogueFood[], aliasTable: AliasTable | Record<string, string> = DEFAULT_ALIASES): FoodMatcher {
  const table: AliasTable = isAliasTable(aliasTable) ? aliasTable : { aliases: aliasTable };
  const index: FoodIndex = buildFoodIndex(foods, aliasVocabulary(table));
  const aliases: AliasIndex = buildAliasIndex(table, index);
  const prepare = createPhrasePreparer(index, createSpellingCorrector(index.wordText));
  const ranker = createFoodRanker(index);
  const resolver = createAliasResolver(aliases, index, ranker);
  const remembered = new Map<string, FoodMatch>();
  const rememberedParts = new Map<string, FoodMatch>();

  function matchOne(phrase: string, wanted: number): FoodMatch {
    const q = prepare(phrase);
    if (q.content.length === 0 && q.all.length === 0) return noMatch();
    const unknownWords = q.terms.filter((t) => t.alternatives.length === 0 && !aliases.vocabulary.has(t.word)).map((t) => t.word);
    const ranked = ranker.rank(q, false, Math.max(wanted + 2, SIBLINGS_LOOKED_AT));
    const alternativesWithout = (position: number | null) =>
      ranked
        .filter((r) => r.position !== position)
        .slice(0, wanted)
        .map((r) => index.foods[r.position].food);

    const exact = resolver.exactAlias(q);
    if (exact !== null) {
      // "mascarpone" read as "macaroni" is no exact alias: it is trusted as far as the reading is close.
      const confidence = q.corrected.length ? Math.min(MAX_PARTIAL_CONFIDENCE, q.closeness) : ALIAS_EXACT_CONFIDENCE;
      return {
        food: index.foods[exact.position].food,
        confidence,
        alternatives: alternativesWithout(exact.position),
        via: 'alias',
        unknownWords: [],
        corrected: q.corrected,
        nameHeadMatched: true,
        standIn: exact.standIn,
      };
    }

    const partial = resolver.bestPartialAlias(q, ranked);
    if (partial) resolver.boostSiblings(ranked, partial.position);
    const best = ranked[0];
    const bestScore = best ? Math.min(MAX_PARTIAL_CONFIDENCE, best.score) : 0;
    if (partial && partial.score >= bestScore && partial.score >= MATCH_CONFIDENCE_FLOOR) {
      return {
        food: index.foods[partial.position].food,
        confidence: partial.score,
        alternatives: alternativesWithout(partial.position),
        via: 'alias',
        unknownWords,
        corrected: q.corrected,
        nameHeadMatched: true,
        standIn: partial.standIn,
      };
    }
    if (best && bestScore >= MATCH_CONFIDENCE_FLOOR) {
      const f = index.foods[best.position];
      return {
        food: f.food,
        confidence: bestScore,
        alternatives: alternativesWithout(best.position),
        via: 'fuzzy',
        unknownWords,
        corrected: q.corrected,
        nameHeadMatched: ranker.coverageOf(f, q).headMatched,
        standIn: null,
      };
    }
    return {
      food: null,
      confidence: bestScore,
      alternatives: alternativesWithout(null),
      via: 'none',
      unknownWords,
      corrected: q.corrected,
      nameHeadMatched: false,
      standIn: null,
    };
  }

  /** One choice of a phrase ("salt" of "salt and pepper"): the same choices come back line after line. */
  function matchPart(part: string, wanted: number): FoodMatch {
    const key = `${wanted}\u0000${part}`;
    let found = rememberedParts.get(key);
    if (!found) {
      found = matchOne(part, wanted);
      if (rememberedParts.size >= REMEMBERED_MATCHES) rememberedParts.clear();
      rememberedParts.set(key, found);
    }
    return copyOf(found);
  }

  function match(phrase: string, opts: MatchOptions = {}): FoodMatch {
    const wanted = Math.max(0, Math.min(50, Math.floor(opts.alternatives ?? DEFAULT_ALTERNATIVES)));
    const text = typeof phrase === 'string' ? phrase : '';
    const key = `${wanted}\u0000${text}`;
    const hit = remembered.get(key);
    if (hit) return copyOf(hit);
    let result: FoodMatch;
    try {
      result = matchOne(text, wanted);
      if (!(result.via === 'alias' && result.confidence >= ALIAS_EXACT_CONFIDENCE)) {
        // "soy sauce or tamari", "chicken or vegetable stock", "thyme leaves and tender stems":
        // the best of the choices, the whole phrase winning ties, then the first choice.
        const splitAnd = result.confidence < WEAK_MATCH;
        const first = splitAnd ? firstPart(text) : null;
        for (const part of choicesIn(text, splitAnd)) {
          const alt = matchPart(part, wanted);
          // "canned plum tomatoes, juices reserved, and tomatoes": a later part is a note, not the food.
          if (first !== null && part !== first && !orChoice(text, part)) alt.confidence *= LATER_PART_FACTOR;
          if (alt.food && alt.confidence >= MATCH_CONFIDENCE_FLOOR && alt.confidence > result.confidence) result = alt;
        }
      }
    } catch (error) {
      recordFallback('food-match', error);
      result = noMatch();
    }
    if (remembered.size >= REMEMBERED_MATCHES) remembered.clear();
    remembered.set(key, result);
    return copyOf(result);
  }

  function search(query: string, limit = 10): FoodSearchHit[] {
    const n = Math.max(0, Math.min(100, Math.floor(Number.isFinite(limit) ? limit : 10)));
    if (n === 0 || typeof query !== 'string') return [];
    try {
      const q = prepare(query);
      const namesBrand = q.terms.some((t) => t.alternatives.some((a) => index.brandedOnly[a.id] === 1));
      const out: FoodSearchHit[] = [];
      const exact = resolver.exactAlias(q)?.position ?? null;
      if (exact !== null) out.push({ food: index.foods[exact].food, score: 1 });
      for (const r of ranker.rank(q, namesBrand, n + 1)) {
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

/** Words that describe the food written after them, never a food alone in a choice ("dry or sweet vermouth"). */
export const DESCRIBING_WORDS = new Set([
  'black',
  'white',
  'brown',
  'red',
  'green',
  'yellow',
  'golden',
  'purple',
  'orange',
  'dry',
  'dried',
  'fresh',
  'frozen',
  'canned',
  'sweet',
  'light',
  'dark',
  'hot',
  'mild',
  'medium',
  'large',
  'small',
  'smoked',
  'salted',
  'unsalted',
  'sweetened',
  'unsweetened',
  'whole',
  'raw',
  'cooked',
  'distilled',
  'regular',
  'plain',
  'low-fat',
  'lowfat',
  'nonfat',
]);

/**
 * The foods a phrase offers as choices: "A or B", "A and B", "A/B". With "or", a head word written
 * once belongs to each: "chicken or vegetable stock" → "chicken stock", "vegetable stock".
 * "and" splits only when asked: "macaroni and cheese" is one food.
 */
export function choicesIn(text: string, splitAnd = true): string[] {
  const out: string[] = [];
  const state = leadingState(
    text
      .split(/\s+or\s+|\s*\/\s*/i)
      .map((p) => p.trim())
      .filter(Boolean),
  );
  const orParts = state.parts;
  if (orParts.length > 1) {
    const last = orParts[orParts.length - 1].split(/\s+/);
    const head = last[last.length - 1];
    for (let i = 0; i < orParts.length; i++) {
      const n = orParts[i].split(/\s+/).length;
      const shared = i < orParts.length - 1 && last.length >= 2 && n <= 2 && !orParts[i].endsWith(head);
      if (shared) out.push(state.withState(`${orParts[i]} ${head}`));
      // "green or Puy lentils", "distilled or spring water": a describing word alone is no food.
      if (!(shared && n === 1 && DESCRIBING_WORDS.has(orParts[i].toLowerCase()))) out.push(state.withState(orParts[i]));
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

/**
 * "cooked jasmine or other white rice": a state written once, before the first choice, is every
 * choice's. Returns the choices without it and a function that gives it back to each way of a choice.
 */
export function leadingState(parts: string[]): { parts: string[]; withState: (way: string) => string } {
  const state = parts.length > 1 ? words(parts[0])[0] : undefined;
  const first = parts[0]?.replace(/^\W*\S+\s*/, '') ?? '';
  // "dried barberries or currants": a kept form written before a named first choice is every choice's
  // (but "fresh or dried curry leaves" offers two forms, and "dried apricots or fresh figs" says each).
  const form = state !== undefined && FORM_WORDS.has(state) && first !== '';
  if (state === undefined || !(STATE_WORDS.has(state) || form)) return { parts, withState: (way) => way };
  return {
    parts: first ? [first, ...parts.slice(1)] : parts.slice(1),
    withState: (way) => (words(way).some((w) => w === state || (form && FORM_WORDS.has(w))) ? way : `${state} ${way}`),
  };
}

/** Forms a food is kept in, each another SR28 food: "Currants, zante, dried" beside "Currants, red and white, raw". */
const FORM_WORDS = new Set(['dried', 'fresh', 'frozen', 'canned', 'smoked']);

function copyOf(m: FoodMatch): FoodMatch {
  return { ...m, alternatives: [...m.alternatives], unknownWords: [...m.unknownWords], corrected: [...m.corrected] };
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
