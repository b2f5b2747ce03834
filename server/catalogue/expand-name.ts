import abbreviations from '../../data/abbreviations.json';

/**
 * Readable names from SR28 short names: "CHEESE,MOZZARELLA,PART SKIM MILK" →
 * "Cheese, mozzarella, part skim milk". Rules live in data/abbreviations.json.
 */
export interface AbbreviationTable {
  /** multi-token or punctuated abbreviations, matched before single words: "RED FAT" → "reduced fat" */
  phrases: Record<string, string>;
  /** an ambiguous word read one way when the name contains any of the cues: STK → "stick" beside MARGARINE */
  contextual: { word: string; cues: string[]; then: string }[];
  /** regular expressions (source, flags 'g') with replacement text, for shapes a table cannot list */
  patterns: { match: string; replace: string }[];
  /** single abbreviated words: CKD → "cooked" */
  words: Record<string, string>;
  /** words and phrases written with capitals in the readable name: "New Zealand" */
  properCase: string[];
}

const TOKEN = "[A-Z0-9]+(?:['\\-.][A-Z0-9]+)*(?:'S)?";

function escapeRegex(s: string): string {
  return s.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');
}

function phraseSource(phrase: string): string {
  const body = phrase.trim().split(/\s+/).map(escapeRegex).join('\\s+');
  const lead = /^[A-Z0-9]/.test(phrase) ? "(?<![A-Z0-9'])" : '';
  const tail = /[A-Z0-9]$/.test(phrase) ? "(?![A-Z0-9'])" : '';
  return `${lead}${body}${tail}`;
}

export interface NameExpander {
  (sourceName: string): string;
}

export function createNameExpander(table: AbbreviationTable): NameExpander {
  const phrases = Object.entries(table.phrases).sort((a, b) => b[0].length - a[0].length);
  const phraseMap = new Map(phrases.map(([k, v]) => [k.replace(/\s+/g, ' '), v]));
  const phraseAlternation = phrases.map(([k]) => phraseSource(k)).join('|') || '(?!)';
  const scanner = new RegExp(`(${phraseAlternation})|(${TOKEN})`, 'g');
  const words = new Map(Object.entries(table.words).map(([k, v]) => [k.toUpperCase(), v]));
  const contextual = new Map<string, { cues: string[]; then: string }[]>();
  for (const rule of table.contextual) {
    const list = contextual.get(rule.word) ?? [];
    list.push({ cues: rule.cues.map((c) => c.toUpperCase()), then: rule.then });
    contextual.set(rule.word, list);
  }
  const patterns = table.patterns.map((p) => ({ re: new RegExp(p.match, 'g'), replace: p.replace }));
  const proper = table.properCase
    .slice()
    .sort((a, b) => b.length - a.length)
    .map((p) => ({ lower: p.toLowerCase(), re: new RegExp(`(?<![a-z0-9'])${escapeRegex(p.toLowerCase())}(?![a-z0-9])`, 'g'), to: p }));

  return (sourceName: string): string => {
    const upper = sourceName.toUpperCase().replace(/\s+/g, ' ').trim();
    // patterns and phrases write lowercase text, which the word pass (uppercase only) leaves alone
    let text = upper;
    for (const p of patterns) text = text.replace(p.re, p.replace);
    text = text.replace(scanner, (m: string, phrase: string | undefined, token: string | undefined) => {
      if (phrase) return phraseMap.get(phrase.replace(/\s+/g, ' ')) ?? m.toLowerCase();
      const word = token ?? m;
      const rules = contextual.get(word);
      if (rules) for (const r of rules) if (r.cues.some((c) => upper.includes(c))) return r.then;
      return words.get(word) ?? word.toLowerCase();
    });
    text = text
      .toLowerCase()
      .replace(/\s+,/g, ',')
      .replace(/,(?=\S)/g, ', ')
      .replace(/\s{2,}/g, ' ')
      .trim();
    for (const p of proper) if (text.includes(p.lower)) text = text.replace(p.re, p.to);
    return text.charAt(0).toUpperCase() + text.slice(1);
  };
}

export const expandName: NameExpander = createNameExpander(abbreviations as AbbreviationTable);
