import { LINE_FUNCTION_WORDS } from '../culinary/infer-dish';
import { nutrientsForGrams, sumNutrients } from '../nutrition';
import { commonFoodName } from '../rewritten-line-text';
import type { CandidateSlot } from './line-slots';
import type { LineChoice } from './read-plan';
import { activeTargets } from './targets';
import type { Candidate, Change, ChangePurpose, RewriteObjective, Targets } from './types';

const SAME_GRAMS = 1e-6;

function signed(value: number, digits: number, unit: string): string {
  const text = Math.abs(value).toFixed(digits);
  return `${value < 0 ? '−' : '+'}${text}${unit === 'kcal' ? ' kcal' : ` ${unit}`}`;
}

function grams(g: number): string {
  return `${g.toFixed(g < 10 ? 1 : 0)} g`;
}

function listed(items: string[]): string {
  return items.length <= 1 ? items.join('') : `${items.slice(0, -1).join(', ')} and ${items[items.length - 1]}`;
}

/** "1:1 by weight", "0.75:1 by weight": grams of the substitute per gram of the written food. */
export function ratioWords(ratio: number): string {
  const text = Number(ratio.toFixed(2)).toString();
  return `${text}:1 by weight`;
}

const SHARES: [number, string][] = [
  [1 / 4, 'a quarter'],
  [1 / 3, 'a third'],
  [1 / 2, 'half'],
  [2 / 3, 'two thirds'],
  [3 / 4, 'three quarters'],
];

/** "half", "a third", "40 %" of a line. */
export function shareWords(share: number): string {
  const named = SHARES.find(([value]) => Math.abs(share - value) < 0.005);
  return named ? named[1] : `${Math.round(share * 100)} %`;
}

function percent(factor: number): string {
  return `${Math.round(factor * 100)}`;
}

/**
 * A food as the cook says it, as the rest of the rewrite names it: a catalogue food by its common name
 * (a rule's target by the rule's own words), a cook's own food and a food of unknown origin by their names.
 */
function cookName(food: Candidate, ruleLabel?: string): string {
  return food.source === 'usda-sr28' ? commonFoodName({ name: food.name, source: food.source }, ruleLabel) : food.name;
}

/** What rule a swap follows, as the cook reads it: the rule's own label, or the coach's swap and its ratio. */
function ruleText(swap: CandidateSlot, from: string, gramsPerGramReplaced: number): string {
  const { rule, approved, band } = swap.candidate;
  const name = cookName(swap.candidate);
  if (rule && !approved) {
    // a rule band reaching past the line tolerance (more of a lean main protein) says how far it went
    const off = Math.abs(gramsPerGramReplaced / swap.ratio - 1) > 0.1 + 1e-9;
    return band && off ? `${rule.label} (here ×${gramsPerGramReplaced.toFixed(2)} by weight; the rule allows ×${band[0]}–${band[1]} of its ratio)` : rule.label;
  }
  if (approved) return `${name} for ${from}, ${ratioWords(swap.ratio)}, a swap approved by ${approved.by}`;
  return `${name} for ${from}, ${ratioWords(swap.ratio)}`;
}

/**
 * One entry per line whose food or grams changed, saying what it does per serving, the rule it
 * follows and the target it serves. A change that moves no target nutrient the right way is there
 * for the dish's volume (when its own volume changed) or for the objective.
 */
export function explainChanges(
  before: LineChoice[],
  after: LineChoice[],
  targets: Targets,
  servings: number,
  objective: RewriteObjective,
  volumeRangeMl: [number, number],
): Change[] {
  const rows = activeTargets(targets).map((t) => t.row);
  const volumeOf = (c: LineChoice) => c.parts.reduce((s, p) => s + p.volumeMl, 0);
  // When the dish ends at a volume bound, a line that moves the other way helps keep it there.
  const dishVolume = after.reduce((s, c) => s + volumeOf(c), 0);
  const atCeiling = dishVolume >= volumeRangeMl[1] * (1 - 1e-6);
  const atFloor = dishVolume <= volumeRangeMl[0] * (1 + 1e-6);
  const changes: Change[] = [];
  before.forEach((choice, i) => {
    const was = choice.parts[0];
    const now = after[i];
    const swap = now.swap;
    const added = now.parts[now.parts.length - 1];
    if (!swap && Math.abs(added.grams - was.grams) <= SAME_GRAMS * Math.max(1, was.grams)) return;
    const partial = swap !== null && now.parts.length === 2;
    const b = nutrientsForGrams(was.food.per100g, was.grams);
    const a = sumNutrients(now.parts.map((p) => nutrientsForGrams(p.food.per100g, p.grams)));
    const effects: string[] = [];
    const serves: ChangePurpose[] = [];
    const servedLabels: string[] = [];
    for (const row of rows) {
      const delta = (a[row.key] - b[row.key]) / servings;
      const digits = row.unit === 'g' ? 1 : 0;
      if (Math.abs(delta) < 0.5 * 10 ** -digits) continue;
      effects.push(`${signed(delta, digits, row.unit)} ${row.unit === 'kcal' ? '' : `${row.nutrient} `}`.trim());
      if (row.sense === 'min' ? delta > 0 : delta < 0) {
        serves.push(row.target);
        servedLabels.push(`the ${row.label}`);
      }
    }
    const volumeDelta = volumeOf(now) - was.volumeMl;
    const keepsVolume = (atCeiling && volumeDelta <= -0.5) || (atFloor && volumeDelta >= 0.5);
    if (keepsVolume || (serves.length === 0 && Math.abs(volumeDelta) >= 0.5)) serves.push('volume');
    if (serves.length === 0) serves.push('objective');
    const from = choice.line.line.writtenName ?? cookName(was.food);
    const to = cookName(added.food, swap?.candidate.rule?.label);
    let what: string;
    if (!swap) {
      const [lo, hi] = choice.line.line.keepScale ?? [1, 1];
      const role = choice.line.line.role;
      const keepRule = choice.line.original.rule;
      const may = `${keepRule ? `${keepRule.label}: ` : ''}${role ? `as ${LINE_FUNCTION_WORDS[role] ?? role} it` : 'it'} may use ${percent(lo)}–${percent(hi)} % of the written amount`;
      what = `${added.grams > was.grams ? 'More' : 'Less'} ${from} (${grams(was.grams)} → ${grams(added.grams)}; ${may})`;
    } else if (partial) {
      const kept = now.parts[0].grams;
      what = `Replace ${shareWords(swap.share)} of the ${from} with ${grams(added.grams)} ${to} (${grams(kept)} of the ${grams(was.grams)} kept) — ${ruleText(swap, from, added.grams / (was.grams - kept))}`;
    } else {
      what = `Swap ${grams(was.grams)} ${from} for ${grams(added.grams)} ${to} — ${ruleText(swap, from, added.grams / was.grams)}`;
    }
    const per = effects.length ? `: ${listed(effects)} per serving` : '';
    const volumeNote = `keep the dish's volume (${signed(volumeDelta, 0, 'mL')})`;
    const why =
      serves[0] === 'objective'
        ? `for the ${objective === 'closest' ? 'closest match' : objective === 'max-protein' ? 'most protein' : 'fewest calories'}`
        : servedLabels.length === 0
          ? `to ${volumeNote}`
          : `for ${listed(servedLabels)}${serves.includes('volume') ? ` and to ${volumeNote}` : ''}`;
    const approval = swap?.candidate.approved;
    // a line only scaled follows the rule that let its written food move (keepScale), and shows its note
    const rule = swap ? swap.candidate.rule : choice.line.original.rule;
    const change: Change = {
      line: choice.line.line.index,
      from: { foodId: was.food.foodId, name: was.food.name },
      to: { foodId: added.food.foodId, name: added.food.name },
      gramsBefore: was.grams,
      gramsAfter: added.grams,
      swapped: swap !== null,
      serves,
      reason: `${what}${per}, ${why}.`,
    };
    if (partial) {
      change.partial = true;
      change.keptGrams = now.parts[0].grams;
    }
    if (rule) change.rule = rule;
    if (approval) change.approvedBy = approval.by;
    const note = approval?.note ?? rule?.note;
    if (note) change.note = note;
    changes.push(change);
  });
  return changes;
}
