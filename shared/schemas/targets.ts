import { z } from 'zod';

export const SEXES = ['male', 'female'] as const;
export const ACTIVITY_LEVELS = ['sedentary', 'light', 'moderate', 'very', 'extra'] as const;
export const GOALS = ['lose', 'maintain', 'gain'] as const;

export type Sex = (typeof SEXES)[number];
export type ActivityLevel = (typeof ACTIVITY_LEVELS)[number];
export type Goal = (typeof GOALS)[number];

export const TARGET_LIMITS = {
  ageYears: { min: 18, max: 100 },
  heightCm: { min: 120, max: 230 },
  weightKg: { min: 35, max: 300 },
  mealsPerDay: { min: 1, max: 8 },
} as const;

const ADULTS_ONLY = 'Estimates here are for adults; for anyone under 18 ask a physician or registered dietitian.';

function rangedNumber(field: keyof typeof TARGET_LIMITS, unit: string, options: { integer: boolean; note?: string }) {
  const { min, max } = TARGET_LIMITS[field];
  const kind = options.integer ? 'a whole number' : 'a number';
  const message = `${field} must be ${kind} from ${min} to ${max}${unit}.${options.note ? ` ${options.note}` : ''}`;
  const base = z.number({ message });
  return (options.integer ? base.int({ message }) : base).min(min, { message }).max(max, { message });
}

export const estimateTargetsSchema = z.object({
  sex: z.enum(SEXES, { message: 'sex must be male or female (the estimate has one constant for each).' }),
  ageYears: rangedNumber('ageYears', ' years', { integer: true, note: ADULTS_ONLY }),
  heightCm: rangedNumber('heightCm', ' cm', { integer: false }),
  weightKg: rangedNumber('weightKg', ' kg', { integer: false }),
  activity: z.enum(ACTIVITY_LEVELS, { message: 'activity must be one of sedentary, light, moderate, very or extra.' }),
  goal: z.enum(GOALS, { message: 'goal must be one of lose, maintain or gain.' }),
  mealsPerDay: rangedNumber('mealsPerDay', '', { integer: true }),
});

export type EstimateTargetsInput = z.infer<typeof estimateTargetsSchema>;

export interface TargetEstimate {
  bmrKcal: number;
  tdeeKcal: number;
  kcalPerDay: number;
  proteinGPerDay: number;
  proteinGPerKg: number;
  perMeal: { kcal: number; proteinG: number };
  cautions: string[];
}
