/**
 * What a household measure says: "cup, shredded" is a volume with a preparation, "medium (2-1/2" dia)"
 * a size with a diameter, "stalk, large (11"-12" long)" a piece with a size, "3 oz" a mass.
 */
import { CM_PER_INCH, normaliseUnit, unitKind } from '../../shared/units';
import { singular } from './singular';

export type SizeWord = 'extra-small' | 'small' | 'medium' | 'large' | 'extra-large' | 'jumbo';

export interface MeasureInfo {
  kind: 'volume' | 'mass' | 'count';
  /** canonical unit id (units.ts) of a volume or mass measure */
  unit: string | null;
  size: SizeWord | null;
  /** singular words outside parentheses, the unit and size words left out: "stalk", "tortilla", "slice" */
  pieces: string[];
  /** preparation stems after a volume unit: "cup, chopped or diced" → ["chop", "dice"] */
  qualifiers: string[];
  /** diameter range in inches, from "(approx 7-8" dia)" or "(2-1/2" dia)" */
  diameter: { lo: number; hi: number } | null;
  /** a label serving ("NLEA serving"), not a household piece */
  serving: boolean;
}

const LABEL_SERVING_WORDS = new Set(['serving', 'nlea', 'per', 'approximate', 'weight']);

/** Participles and plurals of the words household measures use, to one stem. */
const STEMS: Record<string, string> = {
  chopped: 'chop',
  chop: 'chop',
  diced: 'dice',
  dice: 'dice',
  minced: 'mince',
  mince: 'mince',
  cubed: 'cube',
  cube: 'cube',
  shredded: 'shred',
  shred: 'shred',
  grated: 'grate',
  grate: 'grate',
  sliced: 'slice',
  slice: 'slice',
  crumbled: 'crumble',
  crumble: 'crumble',
  mashed: 'mash',
  mash: 'mash',
  melted: 'melt',
  melt: 'melt',
  packed: 'pack',
  pack: 'pack',
  unpacked: 'unpack',
  sifted: 'sift',
  unsifted: 'unsift',
  whipped: 'whip',
  whip: 'whip',
  pureed: 'puree',
  puree: 'puree',
  halved: 'half',
  half: 'half',
  quartered: 'quarter',
  section: 'section',
  strip: 'strip',
  crushed: 'crush',
  flaked: 'flake',
  flake: 'flake',
  piece: 'piece',
  floret: 'floret',
  spear: 'spear',
  chunk: 'chunk',
  slivered: 'sliver',
  sliver: 'sliver',
  ground: 'ground',
  whole: 'whole',
  cooked: 'cook',
  raw: 'raw',
  drained: 'drain',
  thawed: 'thaw',
  frozen: 'frozen',
  canned: 'canned',
  fluid: 'fluid',
  ring: 'ring',
  julienned: 'strip',
  torn: 'piece',
};

/** The stem of a preparation word, or the singular word when it has none. */
export function stem(word: string): string {
  const w = singular(word.toLowerCase());
  return STEMS[w] ?? STEMS[word.toLowerCase()] ?? w;
}

/** "2-1/2" → 2.5, "1/2" → 0.5, "7" → 7. */
function inches(text: string): number | null {
  const mixed = /^(\d+)-(\d+)\/(\d+)$/.exec(text);
  if (mixed) return Number(mixed[1]) + Number(mixed[2]) / Number(mixed[3]);
  const frac = /^(\d+)\/(\d+)$/.exec(text);
  if (frac) return Number(frac[1]) / Number(frac[2]);
  const n = Number(text);
  return Number.isFinite(n) ? n : null;
}

const NUMBER = String.raw`(\d+-\d+\/\d+|\d+\/\d+|\d+(?:\.\d+)?)`;
const DIAMETER = new RegExp(`${NUMBER}"?(?:\\s*(?:-|to)\\s*${NUMBER})?\\s*(?:"|''|in\\b|inch(?:es)?)?\\s*(?:dia\\b|diameter)`, 'i');

/** A size word of a measure or of a parsed line ("lg", "extra large", "x-large"). */
export function sizeWordOf(text: string | null | undefined): SizeWord | null {
  if (!text) return null;
  const t = text.toLowerCase();
  if (/\bextra[- ]?small\b/.test(t)) return 'extra-small';
  if (/\bextra[- ]?large\b|\bx-large\b|\bxl\b/.test(t)) return 'extra-large';
  if (/\bjumbo\b/.test(t)) return 'jumbo';
  const unit = normaliseUnit(t.trim());
  if (unit === 'large' || unit === 'medium' || unit === 'small' || unit === 'jumbo') return unit;
  if (unit === 'extra-large') return 'extra-large';
  if (/\blarge\b/.test(t)) return 'large';
  if (/\bmedium\b/.test(t)) return 'medium';
  if (/\bsmall\b/.test(t)) return 'small';
  return null;
}

/** Inches in a written size: "8-inch", "8 inch", '8"', "20 cm". */
export function inchesOf(text: string | null | undefined): number | null {
  if (!text) return null;
  // "1/2-inch", "1 1/2-inch": a fraction of an inch, never the "2" of its denominator.
  const frac = /(?:(\d+)\s+)?(\d+)\/(\d+)\s*-?\s*(?:inch(?:es)?|in\b|")/i.exec(text);
  if (frac && Number(frac[3]) > 0) return Number(frac[1] ?? 0) + Number(frac[2]) / Number(frac[3]);
  const m = /(\d+(?:\.\d+)?)\s*-?\s*(inch(?:es)?|in\b|"|cm|centimet(?:er|re)s?)/i.exec(text);
  if (!m) return null;
  const n = Number(m[1]);
  if (!Number.isFinite(n) || n <= 0) return null;
  return /^c/i.test(m[2]) ? n / CM_PER_INCH : n;
}

const parsedMeasures = new Map<string, MeasureInfo>();
const REMEMBERED_MEASURES = 20_000;

/** What a measure text says; the same text is read once. */
export function parseMeasure(measure: string): MeasureInfo {
  const known = parsedMeasures.get(measure);
  if (known) return known;
  const info = readMeasure(measure);
  if (parsedMeasures.size >= REMEMBERED_MEASURES) parsedMeasures.clear();
  parsedMeasures.set(measure, info);
  return info;
}

function readMeasure(measure: string): MeasureInfo {
  const text = measure.toLowerCase().replace(/\s+/g, ' ').trim();
  const parens = [...text.matchAll(/\(([^)]*)\)?/g)].map((m) => m[1] ?? '');
  const main = text
    .replace(/\([^)]*\)?/g, ' ')
    .replace(/\s+/g, ' ')
    .trim();
  const ws = main.split(/[\s,]+/).filter((w) => w && !/^\d/.test(w));

  let unit: string | null = null;
  let kind: MeasureInfo['kind'] = 'count';
  let rest = ws;
  for (const n of [2, 1]) {
    if (ws.length < n) continue;
    const u = normaliseUnit(ws.slice(0, n).join(' '));
    const k = unitKind(u);
    if (u && (k === 'volume' || k === 'mass')) {
      unit = u;
      kind = k;
      rest = ws.slice(n);
      break;
    }
  }
  const size = sizeWordOf(main);
  const sizeWords = new Set(['extra', 'small', 'medium', 'large', 'jumbo', 'x-large', 'extra-large', 'extra-small']);
  const content = rest.filter((w) => !sizeWords.has(w) && !['or', 'and', 'of', 'a', 'the', 'yields', 'approx', 'about'].includes(w));
  const qualifiers = kind === 'volume' ? content.map(stem) : [];
  // "1 roll 1 serving": the roll is the piece; a bare "1 serving" or "1 NLEA serving" names none.
  const pieces = kind === 'count' ? content.map((w) => singular(w)).filter((w) => !LABEL_SERVING_WORDS.has(w)) : [];

  let diameter: MeasureInfo['diameter'] = null;
  for (const p of [...parens, main]) {
    const m = DIAMETER.exec(p);
    if (!m) continue;
    const lo = inches(m[1]);
    const hi = m[2] ? inches(m[2]) : lo;
    if (lo !== null && hi !== null) diameter = { lo: Math.min(lo, hi), hi: Math.max(lo, hi) };
    break;
  }
  const serving = /\bnlea\b|\bserving\b/.test(text) && pieces.length === 0;
  return { kind, unit, size, pieces, qualifiers, diameter, serving };
}
