import { ROLES, type Portion, type Role } from '../../shared/food';
import { ML_PER_CUP, ML_PER_FL_OZ, ML_PER_GALLON, ML_PER_PINT, ML_PER_QUART, ML_PER_TBSP, ML_PER_TSP } from '../../shared/units';
import roleDensities from '../../data/role-densities.json';

/** US customary volume units in mL, exact by definition (NIST Handbook 44, Appendix C; one table in shared/units.ts). */
export const ML_PER_UNIT = {
  cup: ML_PER_CUP,
  tbsp: ML_PER_TBSP,
  tsp: ML_PER_TSP,
  flOz: ML_PER_FL_OZ,
  pint: ML_PER_PINT,
  quart: ML_PER_QUART,
  gallon: ML_PER_GALLON,
  liter: 1000,
  ml: 1,
} as const;

/** A density outside these bounds (g/mL) is a data slip, not a food. */
export const DENSITY_BOUNDS = { min: 0.05, max: 2.0 } as const;

const UNIT_PATTERNS: [RegExp, number][] = [
  [/^(?:cups?|c)\b/, ML_PER_UNIT.cup],
  [/^(?:tbsp|tablespoons?|tbs)\b/, ML_PER_UNIT.tbsp],
  [/^(?:tsp|teaspoons?)\b/, ML_PER_UNIT.tsp],
  [/^(?:fl\.? ?oz|fluid ounces?)\b/, ML_PER_UNIT.flOz],
  [/^(?:pints?|pt)\b/, ML_PER_UNIT.pint],
  [/^(?:quarts?|qt)\b/, ML_PER_UNIT.quart],
  [/^(?:gallons?|gal)\b/, ML_PER_UNIT.gallon],
  [/^(?:liters?|litres?|l)\b/, ML_PER_UNIT.liter],
  [/^(?:ml|milliliters?|millilitres?)\b/, ML_PER_UNIT.ml],
];

/**
 * mL in one unit of a portion's measure ("cup, shredded" → 236.59), or null when it is not a volume.
 * A "cubic inch" portion is a solid block of cheese or ham, not the loose volume a recipe measures,
 * so it does not count as a volume here.
 */
export function mlPerMeasure(measure: string): number | null {
  const m = measure.trim().toLowerCase();
  for (const [re, ml] of UNIT_PATTERNS) if (re.test(m)) return ml;
  return null;
}

/** grams per mL from the first volume portion with a plausible result, or null. */
export function densityFromPortions(portions: readonly Portion[]): number | null {
  for (const p of portions) {
    const ml = mlPerMeasure(p.measure);
    if (ml === null || !(p.amount > 0) || !(p.grams > 0)) continue;
    const d = p.grams / (p.amount * ml);
    if (d >= DENSITY_BOUNDS.min && d <= DENSITY_BOUNDS.max) return d;
  }
  return null;
}

const defaults = roleDensities as unknown as Record<Role, number>;
for (const role of ROLES) {
  const d = defaults[role];
  if (typeof d !== 'number' || d < DENSITY_BOUNDS.min || d > DENSITY_BOUNDS.max)
    throw new Error(`data/role-densities.json: missing or implausible density for role "${role}"`);
}

/** The default density of the first of the food's roles (roles are in ROLES order, most specific first). */
export function roleDefaultDensity(roles: readonly Role[]): number {
  return defaults[roles[0] ?? 'other'];
}

export function foodDensity(portions: readonly Portion[], roles: readonly Role[]): { densityGPerMl: number; densitySource: 'portion' | 'role-default' } {
  const fromPortion = densityFromPortions(portions);
  if (fromPortion !== null) return { densityGPerMl: fromPortion, densitySource: 'portion' };
  return { densityGPerMl: roleDefaultDensity(roles), densitySource: 'role-default' };
}
