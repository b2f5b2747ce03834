/**
 * Alias resolution, the matcher's third step: the curated alias table (data/aliases.json) read
 * against a prepared phrase. A whole-phrase alias is exact; an alias inside the phrase ("part skim
 * ricotta" in "part-skim ricotta cheese") is scored like a name match but trusted a little more, and
 * when the phrase adds a modifier the alias food lacks ("*whole* buttermilk"), a version of the alias
 * food that has it is chosen, or the alias loses confidence.
 */
import { containedAliases, type AliasEntry, type AliasIndex } from './alias-index';
import {
  FLAG_BABY,
  FLAG_CANNED,
  FLAG_FROZEN,
  FLAG_MIXED_DISH,
  FLAG_SNACK,
  FLAG_STATE,
  STATE_WORDS,
  VARIANT_WORDS,
  type FoodIndex,
  type IndexedFood,
} from './food-index';
import { PIECE_WORDS, PREPARATION_WORDS } from './normalise-phrase';
import type { PreparedQuery, Term } from './prepare-phrase';
import type { FoodRanker, Ranked } from './rank-foods';

/** The best a fuzzy match or a partial alias can score: below an exact alias. */
export const MAX_PARTIAL_CONFIDENCE = 0.95;
/** An alias that covers part of the phrase is trusted this much more than a name that covers as much. */
const ALIAS_PARTIAL_BOOST = 1.15;
const ALIAS_WITHOUT_HEAD_FACTOR = 0.8;
/** A partial alias whose food lacks a modifier the phrase asks for ("*whole* buttermilk"). */
const UNMET_MODIFIER_FACTOR = 0.5;
/** Foods like the alias food ("Rice, …, cooked" beside "Rice, …, raw") gain up to this much. */
const SIBLING_BOOST = 0.25;
/** How alike two names must be (shared words over all words) to be versions of one food. */
const MIN_SIBLING_SIMILARITY = 0.15;
/**
 * States that are not raw. SR28 often names the raw food without the word ("Almonds", "Pumpkin and
 * squash seed kernels, dried"): "raw" asks only that the alias food be none of these.
 */
const UNPROCESSED = FLAG_STATE | FLAG_CANNED | FLAG_FROZEN;
/** A sibling chosen for an alias that lacked a modifier is trusted a little less than the alias. */
const SIBLING_SWAP_FACTOR = 0.9;

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

/** Words that join a food to what it is packed or served in. */
const MEDIUM_WORDS = new Set(['with', 'in']);

/** A partial alias's food, scored; `standIn` names the phrase when the food only stands in for it. */
export interface AliasMatch extends Ranked {
  standIn: string | null;
}

export interface AliasResolver {
  /** The food of an alias that is the whole phrase (all words, without preparation words, or food words only). */
  exactAlias(q: PreparedQuery): AliasEntry | null;
  /** The alias inside the phrase that covers most of it, scored; `ranked` offers the versions of its food. */
  bestPartialAlias(q: PreparedQuery, ranked: Ranked[]): AliasMatch | null;
  /** Re-rank toward foods whose names share most words with the alias food. */
  boostSiblings(ranked: Ranked[], aliasPosition: number): void;
}

export function createAliasResolver(aliases: AliasIndex, index: FoodIndex, ranker: FoodRanker): AliasResolver {
  function exactAlias(q: PreparedQuery): AliasEntry | null {
    const keys = [q.all.join(' '), q.all.filter((w) => !PREPARATION_WORDS.has(w)).join(' ')];
    // "crushed pineapple with juice" is pineapple in its juice, not "pineapple juice": filler words
    // are left out only when none of them joins a food to what it is packed in.
    if (!q.all.some((w) => MEDIUM_WORDS.has(w))) keys.push(q.content.join(' '));
    for (const k of keys) {
      const hit = aliases.exact.get(k);
      if (hit) return hit;
    }
    return null;
  }

  function bestPartialAlias(q: PreparedQuery, ranked: Ranked[]): AliasMatch | null {
    const withoutPrep = q.all.filter((w) => !PREPARATION_WORDS.has(w));
    const hits = [...containedAliases(aliases, q.all), ...containedAliases(aliases, withoutPrep)];
    let best: AliasMatch | null = null;
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
        // "cobs of corn", "basil leaves": a piece word the alias lacks says how the food comes, not which food.
        if (aliasWords.has(t.word) || (PIECE_WORDS.has(t.word) && !inFood)) covered += t.weight;
        else if (t.word === 'raw' && !inFood && (f.flags & UNPROCESSED) === 0) continue;
        else if (MODIFIER_WORDS.has(t.word) && !inFood) unmet.push(t);
        else if (t.alternatives.length && contradicted.has(t.alternatives[0].id)) unmet.push(t);
        else if (!inFood && t.alternatives.length && !PIECE_WORDS.has(t.word) && index.extraWeight[t.alternatives[0].id] > 0) residual.push(t);
      }
      const aliasCoverage = q.totalWeight > 0 ? covered / q.totalWeight : 0;
      const own = ranker.scoreFood(f, q, ranker.coverageOf(f, q));
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
        const keptIds = kept.flatMap((t) => t.alternatives.filter((a) => f.tokens.has(a.id)).map((a) => a.id));
        let sibling: { position: number; extra: number; similarity: number } | null = null;
        for (const r of ranked) {
          const g = index.foods[r.position];
          if (r.position === position || !needed.every((t) => t.alternatives.some((a) => g.tokens.has(a.id)))) continue;
          // A version keeps every word of the food the phrase matched: "pepitas" matched "pumpkin" and
          // "seed" of "Pumpkin and squash seed kernels, dried", so "Pumpkin, raw" is no version of it.
          if (!keptIds.every((id) => g.tokens.has(id))) continue;
          // …nor cooks it: "raw unsalted pecans" are not "Pecans, dry roasted, without salt".
          if (g.flags & FLAG_STATE && !(f.flags & FLAG_STATE) && !q.hasState) continue;
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
      if (!best || score > best.score) best = { position, score, standIn: hit.entry.standIn };
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

  function boostSiblings(ranked: Ranked[], aliasPosition: number): void {
    const a = index.foods[aliasPosition];
    for (const r of ranked) r.score *= 1 + SIBLING_BOOST * similarity(a, index.foods[r.position]);
    ranked.sort((x, y) => y.score - x.score || x.position - y.position);
  }

  return { exactAlias, bestPartialAlias, boostSiblings };
}

function similarity(a: IndexedFood, b: IndexedFood): number {
  let shared = 0;
  for (const id of b.tokens) if (a.tokens.has(id)) shared++;
  return shared / (a.tokens.size + b.tokens.size - shared || 1);
}
