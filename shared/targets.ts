import type { ActivityLevel, EstimateTargetsInput, Goal, Sex, TargetEstimate } from './schemas/targets';

/**
 * Mifflin–St Jeor resting energy (Am J Clin Nutr 1990;51:241–7):
 * 10·kg + 6.25·cm − 5·years, then +5 for men and −161 for women.
 */
export const MIFFLIN_SEX_CONSTANT: Record<Sex, number> = { male: 5, female: -161 };

export function mifflinStJeorBmr(sex: Sex, weightKg: number, heightCm: number, ageYears: number): number {
  return 10 * weightKg + 6.25 * heightCm - 5 * ageYears + MIFFLIN_SEX_CONSTANT[sex];
}

/**
 * Multipliers from resting to total daily energy: the usual Harris–Benedict-style activity factors.
 * Common practice; values from memory, not from the 1990 paper.
 */
export const ACTIVITY_FACTORS: Record<ActivityLevel, number> = {
  sedentary: 1.2,
  light: 1.375,
  moderate: 1.55,
  very: 1.725,
  extra: 1.9,
};

/** Share of total daily energy added or removed for the goal. Common practice. */
export const GOAL_ENERGY_ADJUSTMENT: Record<Goal, number> = { lose: -0.2, maintain: 0, gain: 0.1 };

/**
 * Protein per kg of body weight per day. The ISSN position stand (Jäger et al. 2017) gives
 * 1.4–2.0 g/kg/day for most active people and higher intakes during an energy deficit to keep lean
 * mass, hence the highest value for losing. Hearthswap never goes past 2.2 g/kg (common practice).
 */
export const PROTEIN_G_PER_KG: Record<Goal, number> = { lose: 2.0, maintain: 1.6, gain: 1.8 };
export const PROTEIN_G_PER_KG_RANGE = { min: 1.4, max: 2.2 } as const;

/** Daily intakes below these are commonly followed only under supervision (common practice, from memory). */
export const SUPERVISED_KCAL_FLOOR: Record<Sex, number> = { male: 1500, female: 1200 };

/** At or above this BMI, protein by total body weight runs high (common practice). */
export const PROTEIN_BY_WEIGHT_BMI_LIMIT = 30;

export const ALWAYS_CAUTIONS: readonly string[] = [
  'These targets are estimates for healthy adults, not medical advice. Real needs differ from person to person; adjust them by how body weight trends over a few weeks.',
  'Anyone with a medical condition such as kidney disease or diabetes, anyone pregnant or breastfeeding, anyone with an eating disorder now or in the past, and anyone under 18 should set targets with a physician or registered dietitian.',
];

/** Expects input already parsed by `estimateTargetsSchema`. Numbers are unrounded; round for display. */
export function estimateTargets(input: EstimateTargetsInput): TargetEstimate {
  const bmrKcal = mifflinStJeorBmr(input.sex, input.weightKg, input.heightCm, input.ageYears);
  const tdeeKcal = bmrKcal * ACTIVITY_FACTORS[input.activity];
  const kcalPerDay = tdeeKcal * (1 + GOAL_ENERGY_ADJUSTMENT[input.goal]);
  const proteinGPerKg = PROTEIN_G_PER_KG[input.goal];
  const proteinGPerDay = proteinGPerKg * input.weightKg;

  const cautions = [...ALWAYS_CAUTIONS];
  const floor = SUPERVISED_KCAL_FLOOR[input.sex];
  if (kcalPerDay < floor) {
    cautions.push(
      `This comes to less than ${floor.toLocaleString('en-US')} kcal a day, an intake usually followed only with a physician or registered dietitian.`,
    );
  }
  const bmi = input.weightKg / (input.heightCm / 100) ** 2;
  if (bmi >= PROTEIN_BY_WEIGHT_BMI_LIMIT) {
    cautions.push('Protein counted per kg of total body weight runs high at this weight; a coach may base it on a goal weight instead.');
  }

  return {
    bmrKcal,
    tdeeKcal,
    kcalPerDay,
    proteinGPerDay,
    proteinGPerKg,
    perMeal: { kcal: kcalPerDay / input.mealsPerDay, proteinG: proteinGPerDay / input.mealsPerDay },
    cautions,
  };
}
