import { ROLES, type CatalogueFood, type Role } from '../../shared/food';
import rolesJson from '../../data/roles.json';
import { compileTerms, headText, nameText, type NameText, type TermMatcher } from './name-terms';

/** What the rules read from a food. */
export type RoleInput = Pick<CatalogueFood, 'name' | 'foodGroup' | 'sourceId'> & { source?: CatalogueFood['source'] };

interface RoleRuleJson {
  role: string;
  groups?: string[];
  head?: string[];
  any?: string[];
  all?: string[];
  none?: string[];
  ndb?: string[];
  excludeNdb?: string[];
}

interface CompiledRule {
  role: Role;
  groups: Set<string> | null;
  head: TermMatcher | null;
  any: TermMatcher | null;
  all: TermMatcher[];
  none: TermMatcher | null;
  ndb: Set<string>;
  excludeNdb: Set<string>;
}

function asRole(value: string, where: string): Role {
  if (!(ROLES as readonly string[]).includes(value)) throw new Error(`data/roles.json: unknown role "${value}" in ${where}`);
  return value as Role;
}

function compileRule(rule: RoleRuleJson): CompiledRule {
  return {
    role: asRole(rule.role, 'rules'),
    groups: rule.groups?.length ? new Set(rule.groups) : null,
    head: rule.head?.length ? compileTerms(rule.head) : null,
    any: rule.any?.length ? compileTerms(rule.any) : null,
    all: (rule.all ?? []).map((t) => compileTerms([t])),
    none: rule.none?.length ? compileTerms(rule.none) : null,
    ndb: new Set(rule.ndb ?? []),
    excludeNdb: new Set(rule.excludeNdb ?? []),
  };
}

const rules = (rolesJson.rules as RoleRuleJson[]).map(compileRule);
const groupDefaults = new Map<string, Role>(
  Object.entries(rolesJson.groupDefaults as Record<string, string>).map(([g, r]) => [g, asRole(r, `groupDefaults.${g}`)]),
);

function ruleMatches(rule: CompiledRule, food: RoleInput, text: NameText, head: NameText): boolean {
  const usda = food.source !== 'custom';
  if (usda && rule.excludeNdb.has(food.sourceId)) return false;
  if (usda && rule.ndb.has(food.sourceId)) return true;
  // a rule that is only an NDB list says nothing about other foods
  if (!rule.groups && !rule.head && !rule.any && rule.all.length === 0 && !rule.none) return false;
  const namesSomething = rule.head !== null || rule.any !== null || rule.all.length > 0;
  // a custom food has no group: only rules that name words can speak for it
  if (food.foodGroup === '' && !namesSomething) return false;
  if (rule.groups && food.foodGroup !== '' && !rule.groups.has(food.foodGroup)) return false;
  if (rule.head && !rule.head.test(head)) return false;
  if (rule.any && !rule.any.test(text)) return false;
  for (const a of rule.all) if (!a.test(text)) return false;
  if (rule.none && rule.none.test(text)) return false;
  return true;
}

/** Every culinary role the food plays, in ROLES order; at least one ('other' when nothing fits). */
export function assignRoles(food: RoleInput): Role[] {
  const text = nameText(food.name);
  const head = headText(food.name);
  const found = new Set<Role>();
  for (const rule of rules) if (ruleMatches(rule, food, text, head)) found.add(rule.role);
  if (found.size === 0) found.add(groupDefaults.get(food.foodGroup) ?? 'other');
  return ROLES.filter((r) => found.has(r));
}
