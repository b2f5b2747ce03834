/** The recipe on the Kitchen page as lines the cook can pin, and the pure edits made to them. */
import type { AnalyzedLine, LineInput } from '../../../shared/schemas/analyze';
import type { LineFunction } from '../../../shared/culinary/types';

/** A line of the recipe with a key that stays with it while lines are added and removed. */
export interface KitchenLine extends LineInput {
  key: string;
  /** what the cook says the line does, over Hearthswap's reading (sent with a rewrite, not an analysis) */
  role?: LineFunction;
}

let keyCounter = 0;

/** A key no other line on this page has. */
export function newLineKey(): string {
  keyCounter += 1;
  return `l${Date.now().toString(36)}${keyCounter.toString(36)}${Math.random().toString(36).slice(2, 6)}`;
}

/** The lines the server read from pasted text, nothing pinned yet. */
export function linesFromAnalysis(lines: readonly Pick<AnalyzedLine, 'input'>[], makeKey: () => string = newLineKey): KitchenLine[] {
  return lines.map((line) => ({ key: makeKey(), input: line.input }));
}

/** The lines as POST /api/analyze takes them: keys dropped, unset pins left out. */
export function lineInputs(lines: readonly KitchenLine[]): LineInput[] {
  return lines.map(({ input, foodId, grams }) => {
    const out: LineInput = { input };
    if (foodId !== undefined) out.foodId = foodId;
    if (grams !== undefined) out.grams = grams;
    return out;
  });
}

function edit(lines: readonly KitchenLine[], key: string, change: (line: KitchenLine) => KitchenLine): KitchenLine[] {
  return lines.map((line) => (line.key === key ? change(line) : line));
}

/** Pin a food to a line, or (null) let the server match it again. Grams the cook pinned stay pinned. */
export function withFood(lines: readonly KitchenLine[], key: string, foodId: number | null): KitchenLine[] {
  return edit(lines, key, ({ foodId: _drop, ...line }) => (foodId === null ? line : { ...line, foodId }));
}

/** Pin a weight to a line, or (null) weigh it from the line's own amount again. */
export function withGrams(lines: readonly KitchenLine[], key: string, grams: number | null): KitchenLine[] {
  return edit(lines, key, ({ grams: _drop, ...line }) => (grams === null ? line : { ...line, grams }));
}

/** Set what a line does in the dish, or (null) go back to Hearthswap's reading. */
export function withRole(lines: readonly KitchenLine[], key: string, role: LineFunction | null): KitchenLine[] {
  return edit(lines, key, ({ role: _drop, ...line }) => (role === null ? line : { ...line, role }));
}

/** The cook's line functions by position in the answered request, for the rewrite's `lineRoles`. */
export function lineRolesFor(lines: readonly KitchenLine[], answeredKeys: readonly string[]): Partial<Record<number, LineFunction>> {
  const byKey = new Map(lines.map((l) => [l.key, l.role]));
  const out: Partial<Record<number, LineFunction>> = {};
  answeredKeys.forEach((key, i) => {
    const role = byKey.get(key);
    if (role) out[i] = role;
  });
  return out;
}

export function withoutLine(lines: readonly KitchenLine[], key: string): KitchenLine[] {
  return lines.filter((line) => line.key !== key);
}

/** One string for a request, to tell whether an analysis still answers the lines on screen. */
export function requestSignature(lines: readonly LineInput[], servings: number): string {
  return JSON.stringify([servings, lineInputs(lines.map((l, i) => ({ ...l, key: String(i) })))]);
}
