/**
 * Whole-word term matching on food names, shared by the role and diet rules.
 * Names and terms are compared lowercase with punctuation and hyphens turned into spaces,
 * so "part-skim" matches the term "part skim". A term ending in * matches a word prefix.
 */

/** A name prepared once for many term tests. */
export interface NameText {
  /** " cheese mozzarella part skim milk " — lowercase words with a space on each side */
  text: string;
  words: Set<string>;
}

export function normalizeWords(name: string): string {
  return name
    .toLowerCase()
    .replace(/[’`']/g, '')
    .replace(/[^a-z0-9%]+/g, ' ')
    .trim();
}

// the role and diet rules read the same name one after the other: keep the last few
const recent = new Map<string, NameText>();

export function nameText(name: string): NameText {
  const hit = recent.get(name);
  if (hit) return hit;
  const words = normalizeWords(name);
  const prepared = { text: ` ${words} `, words: new Set(words.split(' ')) };
  if (recent.size >= 8) recent.delete(recent.keys().next().value as string);
  recent.set(name, prepared);
  return prepared;
}

/** The first comma-separated segment of a name: the food's head noun. */
export function headText(name: string): NameText {
  return nameText(name.split(',')[0] ?? '');
}

export interface TermMatcher {
  test(name: NameText): boolean;
  /** the name with every match of these terms blanked out */
  remove(name: NameText): NameText;
}

const NEVER: TermMatcher = { test: () => false, remove: (n) => n };

/** Compiles a term list: single words by set lookup, phrases by substring, prefixes by startsWith. */
export function compileTerms(terms: readonly string[] | undefined): TermMatcher {
  const singles = new Set<string>();
  const phrases: string[] = [];
  const prefixes: string[] = [];
  const prefixPhrases: RegExp[] = [];
  for (const raw of terms ?? []) {
    const prefix = raw.endsWith('*');
    const words = normalizeWords(prefix ? raw.slice(0, -1) : raw);
    if (!words) continue;
    const multi = words.includes(' ');
    if (prefix && multi) prefixPhrases.push(new RegExp(` ${words}[a-z0-9%]* `));
    else if (prefix) prefixes.push(words);
    else if (multi) phrases.push(` ${words} `);
    else singles.add(words);
  }
  if (!singles.size && !phrases.length && !prefixes.length && !prefixPhrases.length) return NEVER;
  // longest first so that removing "peanut butter" happens before any shorter overlap
  phrases.sort((a, b) => b.length - a.length);
  const phrasesByFirstWord = new Map<string, string[]>();
  for (const p of phrases) {
    const first = p.trim().split(' ')[0];
    phrasesByFirstWord.set(first, [...(phrasesByFirstWord.get(first) ?? []), p]);
  }

  const test = (n: NameText): boolean => {
    for (const w of n.words) {
      if (singles.has(w)) return true;
      for (const p of prefixes) if (w.startsWith(p)) return true;
      const candidates = phrasesByFirstWord.get(w);
      if (candidates) for (const p of candidates) if (n.text.includes(p)) return true;
    }
    for (const re of prefixPhrases) if (re.test(n.text)) return true;
    return false;
  };
  const remove = (n: NameText): NameText => {
    if (!test(n)) return n;
    let text = n.text;
    for (const re of prefixPhrases) text = text.replace(new RegExp(re.source, 'g'), ' ');
    for (const p of phrases) if (text.includes(p)) text = text.split(p).join(' ');
    const kept = text
      .trim()
      .split(/ +/)
      .filter((w) => w && !singles.has(w) && !prefixes.some((p) => w.startsWith(p)));
    return { text: ` ${kept.join(' ')} `, words: new Set(kept) };
  };
  return { test, remove };
}
