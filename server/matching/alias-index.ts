/**
 * The curated alias table (data/aliases.json): recipe phrases → SR28 NDB numbers, keyed by their
 * normalised words so that "Part-Skim Mozzarella" finds "part skim mozzarella".
 */
import aliasFile from '../../data/aliases.json';
import type { FoodIndex } from './food-index';
import { words } from './normalise-phrase';

/** The file's shape: `aliases` maps a phrase to a five-digit NDB number. */
export interface AliasTable {
  aliases: Record<string, string>;
  /** phrases that stand for their food only as the whole phrase, never inside a longer one */
  exactOnly?: string[];
  /** phrases SR28 has no food for, mapped to the nearest one: matched, and flagged for checking */
  standIns?: string[];
}

export const DEFAULT_ALIASES: AliasTable = aliasFile as AliasTable;

export interface AliasEntry {
  words: string[];
  /** position of the food in the index */
  position: number;
  /** the phrase's food is not in SR28: this is the nearest one (the phrase, for the warning) */
  standIn: string | null;
}

export interface AliasIndex {
  exact: Map<string, AliasEntry>;
  /** entries by their first word, longest first */
  byFirstWord: Map<string, AliasEntry[]>;
  /** every word an alias uses */
  vocabulary: Set<string>;
  /** phrases whose NDB number is not an unbranded food of this catalogue */
  skipped: string[];
}

export interface AliasHit {
  entry: AliasEntry;
  start: number;
  end: number;
}

export function aliasKey(phrase: string): string {
  return words(phrase).join(' ');
}

export function aliasVocabulary(table: AliasTable): Set<string> {
  const out = new Set<string>();
  for (const phrase of Object.keys(table.aliases)) for (const w of words(phrase)) out.add(w);
  return out;
}

export function buildAliasIndex(table: AliasTable, index: FoodIndex): AliasIndex {
  const exact = new Map<string, AliasEntry>();
  const byFirstWord = new Map<string, AliasEntry[]>();
  const skipped: string[] = [];
  const exactOnly = new Set((table.exactOnly ?? []).map(aliasKey));
  const standIns = new Set((table.standIns ?? []).map(aliasKey));
  for (const [phrase, ndb] of Object.entries(table.aliases)) {
    const position = index.positionBySourceId.get(ndb);
    const ws = words(phrase);
    if (position === undefined || index.foods[position].food.branded || ws.length === 0) {
      skipped.push(phrase);
      continue;
    }
    const key = ws.join(' ');
    const entry: AliasEntry = { words: ws, position, standIn: standIns.has(key) ? phrase : null };
    if (!exact.has(key)) exact.set(key, entry);
    if (exactOnly.has(key)) continue;
    const list = byFirstWord.get(ws[0]) ?? [];
    list.push(entry);
    byFirstWord.set(ws[0], list);
  }
  for (const list of byFirstWord.values()) list.sort((a, b) => b.words.length - a.words.length);
  return { exact, byFirstWord, vocabulary: aliasVocabulary(table), skipped };
}

/** Aliases whose words occur, in order and side by side, in `phrase`. */
export function containedAliases(aliases: AliasIndex, phrase: string[]): AliasHit[] {
  const hits: AliasHit[] = [];
  for (let i = 0; i < phrase.length; i++) {
    const list = aliases.byFirstWord.get(phrase[i]);
    if (!list) continue;
    for (const entry of list) {
      const n = entry.words.length;
      if (i + n > phrase.length) continue;
      let ok = true;
      for (let k = 1; k < n; k++) {
        if (phrase[i + k] !== entry.words[k]) {
          ok = false;
          break;
        }
      }
      if (ok) hits.push({ entry, start: i, end: i + n - 1 });
    }
  }
  return hits;
}
