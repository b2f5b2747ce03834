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
      table[i * cols + j] =
        a[i] === b[j] ? table[(i + 1) * cols + j + 1] + 1 : Math.max(table[(i + 1) * cols + j], table[i * cols + j + 1]);
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

/**
 * Lines of two versions side by side. Ingredients kept in both line up first; between two kept
 * ingredients, lines that left and lines that arrived pair up in order as swaps (a rewrite swaps a
 * line's food in place), and whatever is left over was removed or added.
 */
export function compareLines(before: VersionLine[], after: VersionLine[]): LineChange[] {
  const pairs = commonPairs(before.map(identity), after.map(identity));
  const changes: LineChange[] = [];
  let i = 0;
  let j = 0;

  const flushGap = (untilI: number, untilJ: number) => {
    const gone = before.slice(i, untilI);
    const arrived = after.slice(j, untilJ);
    const paired = Math.min(gone.length, arrived.length);
    for (let k = 0; k < paired; k++) changes.push({ kind: 'swapped', before: gone[k], after: arrived[k] });
    for (const line of gone.slice(paired)) changes.push({ kind: 'removed', before: line, after: null });
    for (const line of arrived.slice(paired)) changes.push({ kind: 'added', before: null, after: line });
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

/** How many lines changed in any way. */
export function changedLineCount(changes: LineChange[]): number {
  return changes.filter((c) => c.kind !== 'same').length;
}
