import { nutrientsForGrams } from '../nutrition';
import type { PlanChoice } from './read-plan';
import { activeTargets } from './targets';
import type { Change, ChangePurpose, RewriteObjective, Targets } from './types';

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

/**
 * One entry per line whose food or grams changed, saying what it does per serving and which
 * target it serves. A change that moves no target nutrient the right way is there for the dish's
 * volume (when its own volume changed) or for the objective.
 */
export function explainChanges(
  before: PlanChoice[],
  after: PlanChoice[],
  targets: Targets,
  servings: number,
  objective: RewriteObjective,
  volumeRangeMl: [number, number],
): Change[] {
  const rows = activeTargets(targets).map((t) => t.row);
  // When the dish ends at a volume bound, a line that moves the other way helps keep it there.
  const dishVolume = after.reduce((s, c) => s + c.volumeMl, 0);
  const atCeiling = dishVolume >= volumeRangeMl[1] * (1 - 1e-6);
  const atFloor = dishVolume <= volumeRangeMl[0] * (1 + 1e-6);
  const changes: Change[] = [];
  before.forEach((was, i) => {
    const now = after[i];
    const swapped = now.food !== was.food;
    if (!swapped && Math.abs(now.grams - was.grams) <= SAME_GRAMS * Math.max(1, was.grams)) return;
    const b = nutrientsForGrams(was.food.per100g, was.grams);
    const a = nutrientsForGrams(now.food.per100g, now.grams);
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
    const volumeDelta = now.volumeMl - was.volumeMl;
    const keepsVolume = (atCeiling && volumeDelta <= -0.5) || (atFloor && volumeDelta >= 0.5);
    if (keepsVolume || (serves.length === 0 && Math.abs(volumeDelta) >= 0.5)) serves.push('volume');
    if (serves.length === 0) serves.push('objective');
    const what = swapped
      ? `Swap ${was.food.name} for ${now.food.name}`
      : `${now.grams > was.grams ? 'More' : 'Less'} ${was.food.name}`;
    const amounts = `(${grams(was.grams)} → ${grams(now.grams)})`;
    const per = effects.length ? `: ${listed(effects)} per serving` : '';
    const volumeNote = `keep the dish's volume (${signed(volumeDelta, 0, 'mL')})`;
    const why =
      serves[0] === 'objective'
        ? `for the ${objective === 'closest' ? 'closest match' : objective === 'max-protein' ? 'most protein' : 'fewest calories'}`
        : servedLabels.length === 0
          ? `to ${volumeNote}`
          : `for ${listed(servedLabels)}${serves.includes('volume') ? ` and to ${volumeNote}` : ''}`;
    const approval = swapped ? now.food.approved : undefined;
    const change: Change = {
      line: was.line.line.index,
      from: { foodId: was.food.foodId, name: was.food.name },
      to: { foodId: now.food.foodId, name: now.food.name },
      gramsBefore: was.grams,
      gramsAfter: now.grams,
      swapped,
      serves,
      reason: `${what} ${amounts}${per}, ${why}${approval ? `; a swap approved by ${approval.by}` : ''}.`,
    };
    if (approval) {
      change.approvedBy = approval.by;
      if (approval.note) change.note = approval.note;
    }
    changes.push(change);
  });
  return changes;
}
