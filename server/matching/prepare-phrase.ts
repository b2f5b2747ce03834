/**
 * Phrase preparation, the matcher's first step: a food phrase becomes weighted search terms over the
 * catalogue's words. The food is named before the first comma; abbreviations are expanded and
 * misspelled words corrected; each food word weighs its inverse document frequency, the head word
 * (the last food word, or the last before "of", "in" or "with") counting double and piece words
 * ("sprigs", "fillets") little; synonyms satisfy a term at a discount.
 */
import type { FoodIndex } from './food-index';
import { STATE_WORDS } from './food-index';
import { CONTRADICTIONS, PHRASE_ABBREVIATIONS, PIECE_WORDS, PREPARATION_WORDS, STOP_WORDS, SYNONYMS, withoutParentheticals, words } from './normalise-phrase';
import type { SpellingCorrector } from './spelling';

/** Weight of a word the catalogue does not know: a brand or an adjective, worth about a common word. */
const UNKNOWN_WORD_WEIGHT = 3;
const HEAD_WORD_FACTOR = 2;
const SYNONYM_FACTOR = 0.85;
const PIECE_WORD_FACTOR = 0.3;
const MAX_TERMS = 30;

export interface Term {
  word: string;
  /** word ids that satisfy the term, best first, with how much a hit through each counts */
  alternatives: { id: number; factor: number }[];
  weight: number;
}

export interface PreparedQuery {
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
  asks: { canned: boolean; frozen: boolean; dried: boolean; cured: boolean; baby: boolean };
  /** words read as another catalogue word ("mascarpone → macaroni"), with the least closeness among them */
  corrected: string[];
  closeness: number;
}

export function isContentWord(w: string): boolean {
  if (PREPARATION_WORDS.has(w) || STOP_WORDS.has(w)) return false;
  const c = w.charCodeAt(0);
  return !(c >= 48 && c <= 57 && /^\d+$/.test(w));
}

/** Words that "whole" names a food with: whole milk, whole wheat, whole grain, whole egg. */
const WHOLE_FOODS = new Set(['milk', 'wheat', 'grain', 'egg', 'fat', 'milkfat', 'kernel']);

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

/** The phrase preparer over one catalogue index and its spelling corrector. */
export function createPhrasePreparer(index: FoodIndex, speller: SpellingCorrector): (phrase: string) => PreparedQuery {
  return function prepare(phrase: string): PreparedQuery {
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
    const corrected: string[] = [];
    let namedEnd = 0;
    for (const [i, w] of raw.entries()) {
      if (i === namedUpTo) namedEnd = all.length;
      if (index.wordId.has(w) || !isContentWord(w) || PIECE_WORDS.has(w)) {
        all.push(w);
        closeness.push(1);
        continue;
      }
      const fixed = speller.correct(w);
      if (fixed) {
        for (const c of fixed.words) {
          all.push(c);
          closeness.push(fixed.closeness);
        }
        // Two words run together ("breadcrumb") are the same words, not another food.
        if (fixed.words.join('') !== w) corrected.push(`${w} → ${fixed.words.join(' ')}`);
      } else {
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
      // "whole cloves", "1 whole onion": uncut, not another food (an egg, a frozen whole onion);
      // "whole milk", "whole wheat", "whole grain" are foods of their own.
      if (w === 'whole' && !WHOLE_FOODS.has(all[i + 1] ?? '')) return;
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
      cured: wordSet.has('salted') || wordSet.has('smoked') || wordSet.has('cured') || wordSet.has('salt'),
      baby: wordSet.has('babyfood') || wordSet.has('infant'),
    };
    const leastCloseness = closeness.reduce((m, c) => Math.min(m, c), 1);
    return { all, content, terms, totalWeight, headAt, hasState, wordSet, contradictions, termBits, asks, corrected, closeness: leastCloseness };
  };
}
