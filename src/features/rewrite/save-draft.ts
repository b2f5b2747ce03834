/** What "Save to my recipe book" sends: the recipe as written (version 1) and the rewrite (version 2). */
import type { LineInput } from '../../../shared/schemas/analyze';
import type { RewriteRequest, TargetsInput } from '../../../shared/schemas/rewrite';
import { commonFoodName, rewrittenLineText, writtenFoodName } from '../../../shared/rewritten-line-text';
import { orderedChanges } from './rewrite-words';
import type { RewriteAnswer } from './rewrite-types';
import { countOf } from '../../lib/words';

export type WrittenLine = { input: string; foodId?: number; grams?: number };
export type RewrittenLine = { food: { id: number; name: string }; grams: number; input?: string } | { input: string };

export interface RewriteDraft {
  title: string;
  servings: number;
  /** the lines as the cook wrote them, pinned to the foods and grams the rewrite started from */
  originalLines: WrittenLine[];
  /** the rewrite in recipe order; a line it could not read is kept as written */
  rewrittenLines: RewrittenLine[];
  targets: TargetsInput;
  /** one line for the recipe's timeline */
  note: string;
}

const NOTE_MAX = 2_000;

/** The food a version 1 line keeps: the one the rewrite read it as, so the book shows the same "before". */
export function originalLinesOf(request: RewriteRequest, answer: RewriteAnswer): WrittenLine[] {
  const read = new Map(answer.before.lines.map((l) => [l.index, l]));
  return (request.lines ?? []).map((line: LineInput, index) => {
    const plan = read.get(index);
    return plan ? { input: line.input, foodId: plan.food.id, grams: plan.grams } : { input: line.input };
  });
}

function wholeGrams(g: number): string {
  return g >= 10 ? String(Math.round(g)) : String(Math.round(g * 10) / 10);
}

/**
 * The rewrite in recipe order, each line in the cook's words when `written` (the lines as the cook
 * wrote them, by index) is given: their measure, rescaled where the grams changed, with the new
 * food's common name where a swap changed it ("2 cups shredded reduced-fat cheddar"). A line shared
 * between its food and a substitute is saved as two readable lines, the original part first.
 * Without the written text a shared line says which line it shares ("227 g … — shares line 2 with …").
 */
export function rewrittenLinesOf(answer: RewriteAnswer, written: readonly string[] = []): RewrittenLine[] {
  const parts = new Map<number, number>();
  for (const l of answer.after.lines) parts.set(l.index, (parts.get(l.index) ?? 0) + 1);
  const before = new Map(answer.before.lines.map((l) => [l.index, l]));
  const rows: { index: number; line: RewrittenLine }[] = [
    ...answer.after.lines.map((l) => {
      const line: RewrittenLine = { food: { id: l.food.id, name: l.food.name }, grams: l.grams };
      const text = written[l.index];
      const was = before.get(l.index);
      if (text && was) {
        const change = answer.changes.find((c) => c.line === l.index && c.to.id === l.food.id);
        const sameFood = was.food.id === l.food.id;
        line.input = rewrittenLineText(text, was.grams, l.grams, sameFood ? null : commonFoodName(l.food, change?.rule?.label));
      } else if ((parts.get(l.index) ?? 0) > 1) {
        const other = answer.after.lines.find((o) => o.index === l.index && o !== l);
        line.input = `${wholeGrams(l.grams)} g ${l.food.name} — shares line ${l.index + 1} with ${other?.food.name ?? 'a substitute'}`;
      }
      return { index: l.index, line };
    }),
    ...answer.skippedLines.map((s) => ({ index: s.line, line: { input: s.input } })),
  ];
  return rows.sort((a, b) => a.index - b.index).map((r) => r.line);
}

/**
 * "Lighter rewrite: ground beef → part lean ground turkey. 1 amount adjusted.": each swap in the cook's words, the food as their
 * line names it (`written`, by line index) and the new food's common name, as the rewritten lines say them.
 */
export function rewriteNote(answer: RewriteAnswer, written: readonly string[] = []): string {
  const changes = orderedChanges(answer.changes);
  const fromName = (c: RewriteAnswer['changes'][number]) => (written[c.line] && writtenFoodName(written[c.line])) || commonFoodName(c.from);
  const swaps = changes.filter((c) => c.swapped).map((c) => `${fromName(c)} → ${c.partial ? 'part ' : ''}${commonFoodName(c.to, c.rule?.label)}`);
  const amounts = changes.filter((c) => !c.swapped).length;
  const parts = [swaps.length > 0 ? swaps.join('; ') : 'No swaps', amounts > 0 ? `${countOf(amounts, 'amount')} adjusted` : ''].filter(Boolean);
  const note = `Lighter rewrite: ${parts.join('. ')}.`;
  return note.length > NOTE_MAX ? `${note.slice(0, NOTE_MAX - 1)}…` : note;
}

export function rewriteDraft(title: string, request: RewriteRequest, answer: RewriteAnswer): RewriteDraft {
  const written = (request.lines ?? []).map((l) => l.input);
  return {
    title: title.trim(),
    servings: request.servings,
    originalLines: originalLinesOf(request, answer),
    rewrittenLines: rewrittenLinesOf(answer, written),
    targets: request.targets,
    note: rewriteNote(answer, written),
  };
}
