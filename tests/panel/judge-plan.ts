/**
 * Judges a rewrite plan line by line against the panel's labels (comfort-recipes.ts), as a cook would:
 * a line that is unchanged is fine; a changed line must be one of the swaps or the scaling its label
 * accepts. A partly swapped line (the original food keeps part of the grams) must keep the original
 * food, stay within the swap's share, and the substitute's grams per gram replaced must be in the band.
 * The development set's labels (tests/dev-set/comfort-dev-labels.ts) are judged the same way.
 */
import type { PanelLine, PanelRecipe, PanelSwap } from './comfort-recipes';

export interface JudgedFood {
  id: number;
  name: string;
}

export interface JudgedPlanLine {
  index: number;
  food: JudgedFood;
  grams: number;
}

export interface LineVerdict {
  line: number;
  text: string;
  kind: 'unchanged' | 'scaled' | 'swapped' | 'partial' | 'dropped';
  ok: boolean;
  detail: string;
}

const SAME_GRAMS = 0.005;

/** a rewrite answer's plan lines (`before.lines`, `after.lines`) as the judge reads them */
export const toJudgedLines = (lines: { index: number; food: { id: number; name: string }; grams: number }[]): JudgedPlanLine[] =>
  lines.map((l) => ({ index: l.index, food: { id: l.food.id, name: l.food.name }, grams: l.grams }));

function within(value: number, [lo, hi]: [number, number], slack = 1e-6) {
  return value >= lo - slack && value <= hi + slack;
}

function fmt(n: number) {
  return Math.round(n * 10) / 10;
}

function matchingSwap(label: PanelLine, foodName: string): PanelSwap[] {
  return (label.swaps ?? []).filter((s) => new RegExp(s.to, 'i').test(foodName));
}

/** Every recipe line's verdict; `before` and `after` are the plan lines of one rewrite answer. A panel recipe or any labelled recipe (the development set's). */
export function judgePlan(recipe: Pick<PanelRecipe, 'id' | 'lines'>, before: JudgedPlanLine[], after: JudgedPlanLine[]): LineVerdict[] {
  const verdicts: LineVerdict[] = [];
  for (const written of before) {
    const label = recipe.lines[written.index];
    if (!label) throw new Error(`${recipe.id}: plan line ${written.index} has no label`);
    const parts = after.filter((l) => l.index === written.index);
    const original = parts.find((p) => p.food.id === written.food.id);
    const others = parts.filter((p) => p.food.id !== written.food.id);
    const base = { line: written.index, text: label.text };

    if (parts.length === 0) {
      verdicts.push({ ...base, kind: 'dropped', ok: false, detail: `${written.food.name} ${fmt(written.grams)} g is missing from the plan` });
      continue;
    }
    if (others.length === 0 && original) {
      const ratio = original.grams / written.grams;
      if (Math.abs(ratio - 1) <= SAME_GRAMS) {
        verdicts.push({ ...base, kind: 'unchanged', ok: true, detail: '' });
      } else {
        const ok = label.scale !== undefined && within(ratio, label.scale);
        verdicts.push({
          ...base,
          kind: 'scaled',
          ok,
          detail: `${written.food.name}: ${fmt(written.grams)} g → ${fmt(original.grams)} g (×${ratio.toFixed(2)}; accepted ${label.scale ? `×${label.scale[0]}–${label.scale[1]}` : 'none: stays as written'})`,
        });
      }
      continue;
    }
    if (others.length > 1) {
      verdicts.push({
        ...base,
        kind: 'swapped',
        ok: false,
        detail: `split between ${others.length} substitutes: ${others.map((o) => o.food.name).join('; ')}`,
      });
      continue;
    }
    const sub = others[0];
    const keptGrams = original?.grams ?? 0;
    const replaced = written.grams - keptGrams;
    const share = replaced / written.grams;
    const ratio = replaced > 0 ? sub.grams / replaced : Infinity;
    const kind = original ? 'partial' : 'swapped';
    const fits = matchingSwap(label, sub.food.name);
    const ok = replaced > 0 && fits.some((s) => within(ratio, s.ratio, 0.005) && share <= (s.maxShare ?? 1) + 0.01);
    const why =
      fits.length === 0
        ? 'not a substitute a cook accepts here'
        : `accepted ×${fits.map((s) => `${s.ratio[0]}–${s.ratio[1]} up to ${Math.round((s.maxShare ?? 1) * 100)} %`).join(' or ')}`;
    verdicts.push({
      ...base,
      kind,
      ok,
      detail:
        `${written.food.name} ${fmt(written.grams)} g → ` +
        (original ? `${fmt(keptGrams)} g kept + ` : '') +
        `${sub.food.name} ${fmt(sub.grams)} g (×${ratio.toFixed(2)} of ${fmt(replaced)} g replaced, ${Math.round(share * 100)} % of the line; ${why})`,
    });
  }
  return verdicts;
}

export interface PanelScore {
  rewrites: number;
  plans: number;
  acceptablePlans: number;
  changedLines: number;
  acceptableChangedLines: number;
}

export function emptyScore(): PanelScore {
  return { rewrites: 0, plans: 0, acceptablePlans: 0, changedLines: 0, acceptableChangedLines: 0 };
}

export function addToScore(score: PanelScore, verdicts: LineVerdict[] | null) {
  score.rewrites += 1;
  if (!verdicts) return;
  score.plans += 1;
  const changed = verdicts.filter((v) => v.kind !== 'unchanged');
  score.changedLines += changed.length;
  score.acceptableChangedLines += changed.filter((v) => v.ok).length;
  if (changed.every((v) => v.ok)) score.acceptablePlans += 1;
}

export function describeScore(name: string, s: PanelScore) {
  const pct = (a: number, b: number) => (b === 0 ? 'n/a' : `${((100 * a) / b).toFixed(1)} %`);
  return (
    `${name}: ${s.plans}/${s.rewrites} rewrites are plans (${pct(s.plans, s.rewrites)}); ` +
    `${s.acceptablePlans}/${s.plans} plans acceptable as a whole (${pct(s.acceptablePlans, s.plans)}); ` +
    `${s.acceptableChangedLines}/${s.changedLines} changed lines acceptable (${pct(s.acceptableChangedLines, s.changedLines)})`
  );
}
