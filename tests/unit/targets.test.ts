import { describe, expect, it } from 'vitest';
import { ACTIVITY_LEVELS, GOALS, estimateTargetsSchema, type EstimateTargetsInput } from '../../shared/schemas/targets';
import { ACTIVITY_FACTORS, PROTEIN_G_PER_KG, estimateTargets, mifflinStJeorBmr } from '../../shared/targets';

const man: EstimateTargetsInput = { sex: 'male', ageYears: 30, heightCm: 180, weightKg: 80, activity: 'moderate', goal: 'lose', mealsPerDay: 4 };
const woman: EstimateTargetsInput = { sex: 'female', ageYears: 25, heightCm: 165, weightKg: 60, activity: 'light', goal: 'maintain', mealsPerDay: 3 };

describe('Mifflin–St Jeor resting energy', () => {
  it('man 80 kg, 180 cm, 30 y → 1780 kcal', () => {
    // Mifflin–St Jeor (Am J Clin Nutr 1990;51:241–7): 10·80 + 6.25·180 − 5·30 + 5 = 1780
    expect(mifflinStJeorBmr('male', 80, 180, 30)).toBeCloseTo(1780, 10);
    expect(estimateTargets(man).bmrKcal).toBeCloseTo(1780, 10);
  });

  it('woman 60 kg, 165 cm, 25 y → 1345.25 kcal, unrounded', () => {
    // Mifflin–St Jeor (Am J Clin Nutr 1990;51:241–7): 10·60 + 6.25·165 − 5·25 − 161 = 1345.25
    expect(mifflinStJeorBmr('female', 60, 165, 25)).toBeCloseTo(1345.25, 10);
    expect(estimateTargets(woman).bmrKcal).toBeCloseTo(1345.25, 10);
  });

  it('men and women of the same build differ by 166 kcal', () => {
    // Mifflin–St Jeor (Am J Clin Nutr 1990;51:241–7): +5 for men, −161 for women
    expect(mifflinStJeorBmr('male', 70, 170, 40) - mifflinStJeorBmr('female', 70, 170, 40)).toBeCloseTo(166, 10);
  });
});

describe('activity and goal arithmetic', () => {
  it('moderate, losing: 1780 × 1.55 × 0.8', () => {
    const result = estimateTargets(man);
    // activity factor 1.55 (Harris–Benedict-style multiplier, common practice, from memory); −20 % to lose (common practice)
    expect(result.tdeeKcal).toBeCloseTo(1780 * 1.55, 9);
    expect(result.kcalPerDay).toBeCloseTo(1780 * 1.55 * 0.8, 9);
    expect(result.kcalPerDay).toBeCloseTo(2207.2, 9);
  });

  it('light, maintaining: 1345.25 × 1.375 with no change; gaining adds 10 %', () => {
    // activity factor 1.375 (common practice, from memory); +10 % to gain (common practice)
    expect(estimateTargets(woman).kcalPerDay).toBeCloseTo(1345.25 * 1.375, 9);
    expect(estimateTargets({ ...woman, goal: 'gain' }).kcalPerDay).toBeCloseTo(1345.25 * 1.375 * 1.1, 9);
  });

  it('every activity level scales resting energy by its factor, and energy rises with activity', () => {
    for (const activity of ACTIVITY_LEVELS) {
      expect(estimateTargets({ ...man, activity, goal: 'maintain' }).tdeeKcal).toBeCloseTo(1780 * ACTIVITY_FACTORS[activity], 9);
    }
    const tdees = ACTIVITY_LEVELS.map((activity) => estimateTargets({ ...man, activity }).tdeeKcal);
    expect([...tdees].sort((a, b) => a - b)).toEqual(tdees);
  });
});

describe('protein', () => {
  it('stays within 1.4–2.2 g/kg for every goal and scales with body weight', () => {
    // ISSN position stand (Jäger et al. 2017): 1.4–2.0 g/kg/day for active people; 2.2 is Hearthswap's ceiling (common practice)
    for (const goal of GOALS) {
      const result = estimateTargets({ ...man, goal });
      expect(result.proteinGPerKg).toBeGreaterThanOrEqual(1.4);
      expect(result.proteinGPerKg).toBeLessThanOrEqual(2.2);
      expect(result.proteinGPerKg).toBe(PROTEIN_G_PER_KG[goal]);
      expect(result.proteinGPerDay).toBeCloseTo(result.proteinGPerKg * 80, 9);
    }
  });

  it('is highest while losing', () => {
    // ISSN position stand (Jäger et al. 2017): higher intakes help keep lean mass during an energy deficit
    const byGoal = Object.fromEntries(GOALS.map((goal) => [goal, estimateTargets({ ...man, goal }).proteinGPerKg]));
    expect(byGoal.lose).toBeGreaterThan(byGoal.maintain);
    expect(byGoal.lose).toBeGreaterThan(byGoal.gain);
    expect(estimateTargets(man).proteinGPerDay).toBeCloseTo(2.0 * 80, 9);
  });
});

describe('per meal', () => {
  it('divides the day by mealsPerDay', () => {
    for (const mealsPerDay of [1, 3, 4, 8]) {
      const result = estimateTargets({ ...man, mealsPerDay });
      expect(result.perMeal.kcal).toBeCloseTo(result.kcalPerDay / mealsPerDay, 9);
      expect(result.perMeal.proteinG).toBeCloseTo(result.proteinGPerDay / mealsPerDay, 9);
    }
    // 1780 × 1.55 × 0.8 / 4 and 2.0 × 80 / 4
    expect(estimateTargets(man).perMeal).toEqual({ kcal: expect.closeTo(551.8, 9), proteinG: expect.closeTo(40, 9) });
  });
});

describe('cautions', () => {
  it('always say the estimate is for healthy adults and who needs a professional', () => {
    const text = estimateTargets(woman).cautions.join(' ');
    expect(text).toMatch(/healthy adults/);
    expect(text).toMatch(/physician or registered dietitian/);
    expect(text).toMatch(/pregnan/);
    expect(text).toMatch(/eating disorder/);
    expect(text).toMatch(/under 18/);
    expect(text).toMatch(/medical condition/);
  });

  it('flag a very low intake and protein by weight at a high BMI', () => {
    // 45 kg, 150 cm, 60 y, sedentary, losing: (450 + 937.5 − 300 − 161) × 1.2 × 0.8 ≈ 889 kcal
    const small = estimateTargets({ sex: 'female', ageYears: 60, heightCm: 150, weightKg: 45, activity: 'sedentary', goal: 'lose', mealsPerDay: 3 });
    expect(small.kcalPerDay).toBeCloseTo((450 + 937.5 - 300 - 161) * 1.2 * 0.8, 9);
    expect(small.cautions.some((c) => c.includes('1,200 kcal'))).toBe(true);
    expect(estimateTargets(woman).cautions).toHaveLength(2);
    // BMI 130 / 1.8² ≈ 40
    expect(estimateTargets({ ...man, weightKg: 130 }).cautions.some((c) => /goal weight/.test(c))).toBe(true);
  });
});

describe('estimateTargetsSchema', () => {
  const refusal = (patch: Partial<Record<keyof EstimateTargetsInput, unknown>>) => {
    const result = estimateTargetsSchema.safeParse({ ...man, ...patch });
    expect(result.success).toBe(false);
    return result.error!.issues;
  };

  it('accepts the worked examples and the range edges', () => {
    expect(estimateTargetsSchema.parse(man)).toEqual(man);
    expect(estimateTargetsSchema.safeParse({ ...woman, ageYears: 18, heightCm: 230, weightKg: 35, mealsPerDay: 8 }).success).toBe(true);
    expect(estimateTargetsSchema.safeParse({ ...woman, ageYears: 100, heightCm: 120, weightKg: 300, mealsPerDay: 1 }).success).toBe(true);
  });

  it('refuses age 15 and sends minors to a professional', () => {
    const [issue] = refusal({ ageYears: 15 });
    expect(issue.path).toEqual(['ageYears']);
    expect(issue.message).toMatch(/ageYears/);
    expect(issue.message).toMatch(/18 to 100/);
    expect(issue.message).toMatch(/physician or registered dietitian/);
  });

  it('refuses height 50, weight 500 and mealsPerDay 0 with the field and range', () => {
    expect(refusal({ heightCm: 50 })[0]).toMatchObject({ path: ['heightCm'], message: expect.stringMatching(/heightCm.*120 to 230 cm/) });
    expect(refusal({ weightKg: 500 })[0]).toMatchObject({ path: ['weightKg'], message: expect.stringMatching(/weightKg.*35 to 300 kg/) });
    expect(refusal({ mealsPerDay: 0 })[0]).toMatchObject({ path: ['mealsPerDay'], message: expect.stringMatching(/mealsPerDay.*1 to 8/) });
  });

  it('refuses fractions where whole numbers are needed, strings, and unknown choices', () => {
    expect(refusal({ ageYears: 30.5 })[0].path).toEqual(['ageYears']);
    expect(refusal({ mealsPerDay: 2.5 })[0].message).toMatch(/mealsPerDay must be a whole number/);
    expect(refusal({ weightKg: '80' })[0].message).toMatch(/weightKg/);
    expect(refusal({ sex: 'other' })[0].message).toMatch(/sex must be male or female/);
    expect(refusal({ activity: 'athlete' })[0].message).toMatch(/activity must be one of/);
    expect(refusal({ goal: 'bulk' })[0].message).toMatch(/goal must be one of/);
  });
});
