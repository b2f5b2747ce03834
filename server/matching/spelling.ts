/**
 * Misspelled recipe words ("mozarella", "brocoli", "parmesean") found in the catalogue's vocabulary
 * with fuse.js. The vocabulary is split by first letter and length so that one look-up searches a few
 * hundred words, not every word of every name; a look-up is remembered.
 */
import Fuse from 'fuse.js';

export interface SpellingMatch {
  /** the word as the catalogue writes it; two words when the recipe ran them together */
  words: string[];
  /** 0..1, 1 for an exact word */
  closeness: number;
}

export interface SpellingCorrector {
  correct(word: string): SpellingMatch | null;
}

/** Fuse's score above which a word is not taken as a misspelling (0 is exact, 1 anything). */
const MAX_FUSE_SCORE = 0.3;
const MIN_WORD_LENGTH = 4;
/** A misspelling adds or drops at most this many letters. */
const MAX_LENGTH_CHANGE = 2;
const REMEMBERED = 5000;

export function createSpellingCorrector(vocabulary: Iterable<string>): SpellingCorrector {
  const known = new Set<string>();
  const buckets = new Map<string, string[]>();
  for (const w of vocabulary) {
    if (!/^[a-z]{3,}$/.test(w) || known.has(w)) continue;
    known.add(w);
    const key = bucketKey(w[0], w.length);
    const list = buckets.get(key) ?? [];
    list.push(w);
    buckets.set(key, list);
  }
  const fuses = new Map<string, Fuse<string>>();
  for (const [key, list] of buckets) {
    fuses.set(key, new Fuse(list, { includeScore: true, threshold: MAX_FUSE_SCORE, ignoreLocation: true, minMatchCharLength: 3 }));
  }
  const remembered = new Map<string, SpellingMatch | null>();

  function lookUp(word: string): SpellingMatch | null {
    // Two known words run together: "breadcrumb", "cornstarch" where the catalogue writes two.
    for (let i = 3; i <= word.length - 3; i++) {
      const a = word.slice(0, i);
      const b = word.slice(i);
      if (known.has(a) && known.has(b)) return { words: [a, b], closeness: 0.9 };
    }
    let best: SpellingMatch | null = null;
    // Short words change by one letter at most: "crown" is not a misspelled "crowder".
    const change = word.length <= 6 ? 1 : MAX_LENGTH_CHANGE;
    for (let len = word.length - change; len <= word.length + change; len++) {
      const fuse = fuses.get(bucketKey(word[0], len));
      if (!fuse) continue;
      for (const r of fuse.search(word, { limit: 4 })) {
        const score = r.score ?? 1;
        if (score > MAX_FUSE_SCORE) continue;
        const closeness = 1 - score;
        if (!best || closeness > best.closeness) best = { words: [r.item], closeness };
      }
    }
    return best;
  }

  return {
    correct(word: string): SpellingMatch | null {
      if (known.has(word)) return { words: [word], closeness: 1 };
      if (word.length < MIN_WORD_LENGTH || !/^[a-z]+$/.test(word)) return null;
      if (remembered.has(word)) return remembered.get(word) ?? null;
      const found = lookUp(word);
      if (remembered.size >= REMEMBERED) remembered.clear();
      remembered.set(word, found);
      return found;
    },
  };
}

function bucketKey(letter: string, length: number): string {
  return `${letter}${length}`;
}
