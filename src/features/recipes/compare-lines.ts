import type { VersionDetail } from '../../../shared/schemas/recipes';

export type VersionLine = VersionDetail['lines'][number];

/** What happened to one ingredient between two versions. */
export type LineChangeKind = 'same' | 'more' | 'less' | 'swapped' | 'added' | 'removed';

export interface LineChange {
  kind: LineChangeKind;
  before: VersionLine | null;
  after: VersionLine | null;
}

/** Lines are the same ingredient when they use the same catalogue food, or (unmatched) read the same. */
function identity(line: VersionLine): string {
  return line.foodId != null ? `food:${line.foodId}` : `text:${line.input.trim().toLowerCase().replace(/\s+/g, ' ')}`;
}

/** Differences smaller than what the page shows (whole grams from 10 g, tenths below) are no change. */
function gramsChange(before: number, after: number): 'same' | 'more' | 'less' {
  const tolerance = before >= 10 ? 0.5 : 0.05;
  if (Math.abs(after - before) < tolerance) return 'same';
  return after > before ? 'more' : 'less';
}

/** Index pairs of the longest common run of ingredients, in order. */
function commonPairs(a: string[], b: string[]): Array<[number, number]> {
  const rows = a.length + 1;
  const cols = b.length + 1;
  const table = new Uint16Array(rows * cols);
  for (let i = a.length - 1; i >= 0; i--) {
    for (let j = b.length - 1; j >= 0; j--) {
      table[i * cols + j] = a[i] === b[j] ? table[(i + 1) * cols + j + 1] + 1 : Math.max(table[(i + 1) * cols + j], table[i * cols + j + 1]);
    }
  }
  const pairs: Array<[number, number]> = [];
  let i = 0;
  let j = 0;
  while (i < a.length && j < b.length) {
    if (a[i] === b[j]) {
      pairs.push([i, j]);
      i++;
      j++;
    } else if (table[(i + 1) * cols + j] >= table[i * cols + j + 1]) i++;
    else j++;
  }
  return pairs;
}

/** Words of a food's name that say what it is, not how it is sold or cooked. */
const PLAIN_WORDS = new Set([
  'raw',
  'cooked',
  'dry',
  'fat',
  'lean',
  'meat',
  'with',
  'and',
  'without',
  'the',
  'plain',
  'ready',
  'serve',
  'added',
  'salt',
  'enriched',
  'unenriched',
  'prepared',
  'frozen',
  'canned',
  'fresh',
  'regular',
  'commercial',
]);

function nameWords(line: VersionLine): Set<string> {
  const name = (line.foodName ?? line.input).toLowerCase();
  return new Set(name.split(/[^a-z]+/).filter((w) => w.length >= 3 && !PLAIN_WORDS.has(w)));
}

function shareAWord(a: VersionLine, b: VersionLine): boolean {
  const words = nameWords(a);
  for (const w of nameWords(b)) if (words.has(w)) return true;
  return false;
}

export interface CompareOptions {
  /**
   * The newer version was made from the older one line by line (a rewrite against its parent):
   * a line that changed food was swapped in place.
   */
  inPlace?: boolean;
}

/**
 * Lines of two versions side by side. Ingredients kept in both line up first. Between two kept
 * ingredients, a line that left and a line that arrived count as one swap when the newer version
 * was rewritten line by line from the older, or else when their foods share a word ("Cheese,
 * ricotta" → "Cheese, cottage"); whatever is left over was removed or added.
 */
export function compareLines(before: VersionLine[], after: VersionLine[], options: CompareOptions = {}): LineChange[] {
  const pairs = commonPairs(before.map(identity), after.map(identity));
  const changes: LineChange[] = [];
  let i = 0;
  let j = 0;

  const flushGap = (untilI: number, untilJ: number) => {
    const gone = before.slice(i, untilI);
    const arrived = after.slice(j, untilJ);
    const taken = new Set<number>();
    for (const [k, line] of gone.entries()) {
      const match = options.inPlace ? (k < arrived.length ? k : -1) : arrived.findIndex((candidate, m) => !taken.has(m) && shareAWord(line, candidate));
      if (match >= 0) {
        taken.add(match);
        changes.push({ kind: 'swapped', before: line, after: arrived[match] });
      } else changes.push({ kind: 'removed', before: line, after: null });
    }
    for (const [m, line] of arrived.entries()) if (!taken.has(m)) changes.push({ kind: 'added', before: null, after: line });
    i = untilI;
    j = untilJ;
  };

  for (const [pi, pj] of pairs) {
    flushGap(pi, pj);
    changes.push({ kind: gramsChange(before[pi].grams, after[pj].grams), before: before[pi], after: after[pj] });
    i = pi + 1;
    j = pj + 1;
  }
  flushGap(before.length, after.length);
  return changes;
}

/** Whether `after` was rewritten line by line from `before`, so swaps sit in place. */
export function rewrittenInPlace(before: Pick<VersionDetail, 'number' | 'lines'>, after: Pick<VersionDetail, 'kind' | 'parentNumber' | 'lines'>): boolean {
  return after.kind === 'rewrite' && after.parentNumber === before.number && after.lines.length === before.lines.length;
}

/** How many lines changed in any way. */
export function changedLineCount(changes: LineChange[]): number {
  return changes.filter((c) => c.kind !== 'same').length;
}
