/**
 * A line's text read once per engine: parsed and matched to a catalogue food, remembered by its text.
 * Both steps depend only on the text and the engine's catalogue matcher (custom foods are matched
 * apart, per viewer), so the same line in the next request, the rewrite or a saved version reads the
 * same. A recipe sent again (the Kitchen analyses as the cook types) skips both steps.
 * Entries are frozen: every reader shares them.
 */
import { LRUCache } from 'lru-cache';
import { parseLine, type ParsedLine } from '../../shared/parse-line';
import { matchLine, type LineMatch } from '../matching/match-line';
import type { WeighedLine } from '../matching/weigh-line';
import type { CatalogueFood } from '../../shared/food';
import type { FoodEngine } from './food-engine';

export interface LineReading {
  readonly parsed: ParsedLine;
  readonly match: LineMatch;
}

/** About 0.8 KB of heap each (measured over 5,000 real lines): about 4 MB per engine when full. */
export const REMEMBERED_LINES = 5_000;
/** Real ingredient lines stay well under this; longer text is read every time, never kept. */
const MAX_REMEMBERED_CHARS = 500;

const readings = new WeakMap<object, LRUCache<string, LineReading>>();
const weighings = new WeakMap<LineReading, WeighedLine>();

/** The engine's parse and catalogue match of `input`, from memory when this engine read it before. */
export function readLine(engine: Pick<FoodEngine<CatalogueFood>, 'matcher'>, input: string): LineReading {
  if (input.length > MAX_REMEMBERED_CHARS) return read(engine, input);
  let cache = readings.get(engine);
  if (!cache) {
    cache = new LRUCache<string, LineReading>({ max: REMEMBERED_LINES });
    readings.set(engine, cache);
  }
  let reading = cache.get(input);
  if (!reading) {
    reading = frozen(read(engine, input));
    cache.set(input, reading);
  }
  return reading;
}

/**
 * The weighing of a reading's own catalogue food, remembered with the reading: it depends only on the
 * parse, that food and its engine's portions, and an SR28 food never changes while its engine lives.
 * Another food (pinned by the cook, their own from a label) is weighed by `weigh` every time.
 */
export function weighReading(reading: LineReading, food: CatalogueFood | null, weigh: () => WeighedLine): WeighedLine {
  if (!food || food !== reading.match.food || food.source !== 'usda-sr28') return weigh();
  let weighed = weighings.get(reading);
  if (!weighed) {
    weighed = weigh();
    Object.freeze(weighed.warnings);
    weighings.set(reading, Object.freeze(weighed));
  }
  return weighed;
}

function read(engine: Pick<FoodEngine<CatalogueFood>, 'matcher'>, input: string): LineReading {
  const parsed = parseLine(input);
  return { parsed, match: matchLine(engine.matcher, parsed, input) };
}

/** Freezes the reading's own objects and arrays; the catalogue foods it names belong to the engine and stay as they are. */
function frozen(reading: LineReading): LineReading {
  freezeTree(reading.parsed);
  for (const value of Object.values(reading.match)) if (Array.isArray(value)) Object.freeze(value);
  Object.freeze(reading.match);
  return Object.freeze(reading);
}

function freezeTree(value: unknown): void {
  if (value === null || typeof value !== 'object' || Object.isFrozen(value)) return;
  for (const inner of Object.values(value)) freezeTree(inner);
  Object.freeze(value);
}
