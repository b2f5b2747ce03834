import ruleFile from '../../data/substitution-rules.json';
import type { CatalogueFood, Portion } from '../../shared/food';
import { parseRuleFile, type PerPiece, type SubstitutionRule } from '../../shared/culinary/rule-schema';
import type { RuleRef } from '../../shared/rewrite/types';

/** A rule target with its quantity settled against the catalogue. */
export type ResolvedTarget = { kind: 'food'; food: CatalogueFood; massRatio: number } | { kind: 'own-food-role'; role: string; massRatio: number };

export interface ResolvedRule {
  rule: SubstitutionRule;
  targets: ResolvedTarget[];
  ref: RuleRef;
  /** grams of one piece of the written food, for a per-piece rule (one large egg: 50 g) */
  pieceGrams?: number;
}

let parsed: SubstitutionRule[] | null = null;

/** data/substitution-rules.json, checked by its zod schema once. */
export function substitutionRules(): SubstitutionRule[] {
  parsed ??= parseRuleFile(ruleFile);
  return parsed;
}

function unitGrams(portion: Portion) {
  return portion.grams / portion.amount;
}

/**
 * Grams of one `measure` of a food from its SR28 household portions: a portion whose measure text
 * starts with the word first ("large" before "extra large"), then one naming it anywhere ("piece, roll").
 */
export function gramsPerMeasure(food: Pick<CatalogueFood, 'portions'>, measure: string): number | null {
  const m = measure.toLowerCase();
  const word = new RegExp(`\\b${m.replace(/[.*+?^${}()|[\]\\]/g, '\\$&')}`, 'i');
  const hit = food.portions.find((p) => p.measure.toLowerCase().startsWith(m)) ?? food.portions.find((p) => word.test(p.measure));
  return hit && hit.amount > 0 && hit.grams > 0 ? unitGrams(hit) : null;
}

/** The mass ratio of a per-piece rule: count × grams of the target's measure ÷ grams of one piece written. */
export function perPieceMassRatio(perPiece: PerPiece, fromFood: Pick<CatalogueFood, 'portions'>, toFood: Pick<CatalogueFood, 'portions'>): number | null {
  const from = gramsPerMeasure(fromFood, perPiece.fromMeasure);
  const to = gramsPerMeasure(toFood, perPiece.toMeasure);
  return from && to ? (perPiece.count * to) / from : null;
}

function normalised(s: string) {
  return s
    .toLowerCase()
    .replace(/[^a-z0-9%]+/g, ' ')
    .trim();
}

/**
 * Every rule's targets looked up in the catalogue by NDB number, each checked to be the food the rule
 * names, with per-piece ratios computed from SR28 portions. A missing or different target is a bug in
 * the rule file and throws.
 */
export function resolveRules(bySourceId: ReadonlyMap<string, CatalogueFood>, rules: readonly SubstitutionRule[] = substitutionRules()): ResolvedRule[] {
  return rules.map((rule) => {
    const targets: ResolvedTarget[] = rule.targets.map((t) => {
      if ('ownFoodRole' in t) {
        if (!rule.quantity || !('massRatio' in rule.quantity)) throw new Error(`rule ${rule.id}: own foods need a massRatio`);
        return { kind: 'own-food-role', role: t.ownFoodRole, massRatio: rule.quantity.massRatio };
      }
      const food = bySourceId.get(t.ndb);
      if (!food) throw new Error(`rule ${rule.id}: target ${t.ndb} is not in the catalogue`);
      if (!normalised(food.name).startsWith(normalised(t.name))) throw new Error(`rule ${rule.id}: target ${t.ndb} is “${food.name}”, not “${t.name}”`);
      const q = rule.quantity!;
      let massRatio: number;
      if ('massRatio' in q) massRatio = q.massRatio;
      else {
        const from = bySourceId.get(q.perPiece.fromNdb);
        const ratio = from ? perPieceMassRatio(q.perPiece, from, food) : null;
        if (!ratio)
          throw new Error(`rule ${rule.id}: no SR28 portion gives ${q.perPiece.fromMeasure} of ${q.perPiece.fromNdb} or ${q.perPiece.toMeasure} of ${t.ndb}`);
        massRatio = ratio;
      }
      return { kind: 'food', food, massRatio };
    });
    const ref: RuleRef = { id: rule.id, label: rule.label, why: rule.why };
    if (rule.note) ref.note = rule.note;
    if (rule.cautions?.length) ref.cautions = [...rule.cautions];
    const q = rule.quantity;
    const reference = q && 'perPiece' in q ? bySourceId.get(q.perPiece.fromNdb) : undefined;
    const pieceGrams = q && 'perPiece' in q && reference ? gramsPerMeasure(reference, q.perPiece.fromMeasure) : null;
    return pieceGrams ? { rule, targets, ref, pieceGrams } : { rule, targets, ref };
  });
}

const resolvedByCatalogue = new WeakMap<object, ResolvedRule[]>();

/** resolveRules once per catalogue (the food engine's foods array is the key). */
export function resolvedRulesFor(foods: readonly CatalogueFood[]): ResolvedRule[] {
  let hit = resolvedByCatalogue.get(foods);
  if (!hit) {
    const bySourceId = new Map<string, CatalogueFood>();
    for (const f of foods) if (f.source === 'usda-sr28') bySourceId.set(f.sourceId, f);
    hit = resolveRules(bySourceId);
    resolvedByCatalogue.set(foods, hit);
  }
  return hit;
}
