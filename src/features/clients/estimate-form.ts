import { ACTIVITY_LEVELS, GOALS, SEXES, TARGET_LIMITS, type EstimateTargetsInput } from '../../../shared/schemas/targets';
import type { BodyStats } from '../../../shared/schemas/body-stats';
import { CM_PER_INCH, INCHES_PER_FOOT, KG_PER_POUND } from '../../../shared/units';
import { cmFromFeetInches, feetInchesFromCm, kgFromPounds, poundsFromKg, type BodyUnits } from './body-units';
import { numberText, readNumber } from '../../lib/read-number';

/** The estimator as typed. Height and weight are read in the units chosen. */
export interface EstimateValues {
  units: BodyUnits;
  sex: string;
  ageYears: string;
  heightCm: string;
  heightFeet: string;
  heightInches: string;
  weightKg: string;
  weightLb: string;
  activity: string;
  goal: string;
  mealsPerDay: string;
}

export type EstimateField = Exclude<keyof EstimateValues, 'units'> | 'height' | 'weight';
export type EstimateErrors = Partial<Record<EstimateField, string>>;

export function emptyEstimate(units: BodyUnits): EstimateValues {
  return {
    units,
    sex: '',
    ageYears: '',
    heightCm: '',
    heightFeet: '',
    heightInches: '',
    weightKg: '',
    weightLb: '',
    activity: 'moderate',
    goal: 'maintain',
    mealsPerDay: '3',
  };
}

export type EstimateResult = { ok: true; input: EstimateTargetsInput } | { ok: false; errors: EstimateErrors };

function feetAndInches(totalInches: number): string {
  const feet = Math.floor(totalInches / INCHES_PER_FOOT);
  const inches = totalInches - feet * INCHES_PER_FOOT;
  return inches ? `${feet} ft ${inches} in` : `${feet} ft`;
}

/** The estimate's limits in whole US measures that lie inside them. */
const US_HEIGHT_RANGE = `${feetAndInches(Math.ceil(TARGET_LIMITS.heightCm.min / CM_PER_INCH))} to ${feetAndInches(Math.floor(TARGET_LIMITS.heightCm.max / CM_PER_INCH))}`;
const US_WEIGHT_RANGE = `${Math.ceil(TARGET_LIMITS.weightKg.min / KG_PER_POUND)} to ${Math.floor(TARGET_LIMITS.weightKg.max / KG_PER_POUND)} lb`;

function inRange(value: number, limits: { min: number; max: number }) {
  return value >= limits.min && value <= limits.max;
}

/** Checks the stats against the estimate's limits (shared/schemas/targets.ts) and converts US measures. */
export function estimateInput(values: EstimateValues): EstimateResult {
  const errors: EstimateErrors = {};
  const sex = SEXES.find((s) => s === values.sex);
  if (!sex) errors.sex = 'Choose the sex the estimate should use.';
  const activity = ACTIVITY_LEVELS.find((a) => a === values.activity);
  if (!activity) errors.activity = 'Choose how active they are.';
  const goal = GOALS.find((g) => g === values.goal);
  if (!goal) errors.goal = 'Choose their goal.';

  const age = readNumber(values.ageYears);
  const { ageYears: ageLimits, heightCm: heightLimits, weightKg: weightLimits, mealsPerDay: mealLimits } = TARGET_LIMITS;
  if (age === undefined || Number.isNaN(age)) errors.ageYears = 'Enter their age in years.';
  else if (!Number.isInteger(age)) errors.ageYears = 'Enter whole years.';
  else if (age < ageLimits.min)
    errors.ageYears = 'These estimates are for adults. For anyone under 18, targets belong with a physician or registered dietitian.';
  else if (age > ageLimits.max) errors.ageYears = `Enter an age up to ${ageLimits.max}.`;

  let heightCm: number | undefined;
  if (values.units === 'metric') {
    const cm = readNumber(values.heightCm);
    if (cm === undefined || Number.isNaN(cm)) errors.height = 'Enter their height in centimetres.';
    else heightCm = cm;
  } else {
    const feet = readNumber(values.heightFeet);
    const inches = readNumber(values.heightInches) ?? 0;
    if (feet === undefined || Number.isNaN(feet) || Number.isNaN(inches) || feet < 0 || inches < 0 || inches >= 12) {
      errors.height = 'Enter their height in feet and inches (0 to 11.9 inches).';
    } else heightCm = cmFromFeetInches(feet, inches);
  }
  if (heightCm !== undefined && !inRange(heightCm, heightLimits)) {
    errors.height =
      values.units === 'metric' ? `Enter a height from ${heightLimits.min} to ${heightLimits.max} cm.` : `Enter a height from ${US_HEIGHT_RANGE}.`;
  }

  let weightKg: number | undefined;
  const weight = readNumber(values.units === 'metric' ? values.weightKg : values.weightLb);
  if (weight === undefined || Number.isNaN(weight))
    errors.weight = values.units === 'metric' ? 'Enter their weight in kilograms.' : 'Enter their weight in pounds.';
  else weightKg = values.units === 'metric' ? weight : kgFromPounds(weight);
  if (weightKg !== undefined && !inRange(weightKg, weightLimits)) {
    errors.weight =
      values.units === 'metric' ? `Enter a weight from ${weightLimits.min} to ${weightLimits.max} kg.` : `Enter a weight from ${US_WEIGHT_RANGE}.`;
  }

  const meals = readNumber(values.mealsPerDay);
  if (meals === undefined || Number.isNaN(meals) || !Number.isInteger(meals) || !inRange(meals, mealLimits)) {
    errors.mealsPerDay = `Enter a whole number of meals from ${mealLimits.min} to ${mealLimits.max}.`;
  }

  if (
    Object.keys(errors).length > 0 ||
    !sex ||
    !activity ||
    !goal ||
    age === undefined ||
    heightCm === undefined ||
    weightKg === undefined ||
    meals === undefined
  ) {
    return { ok: false, errors };
  }
  return { ok: true, input: { sex, ageYears: age, heightCm, weightKg, activity, goal, mealsPerDay: meals } };
}

/** The server names the field it refused; put its message where the coach typed it. */
export function estimateErrorsFrom(fieldErrors: Record<string, string>): EstimateErrors {
  const errors: EstimateErrors = {};
  for (const [key, message] of Object.entries(fieldErrors)) {
    const field: EstimateField | null =
      key === 'heightCm'
        ? 'height'
        : key === 'weightKg'
          ? 'weight'
          : ['sex', 'ageYears', 'activity', 'goal', 'mealsPerDay'].includes(key)
            ? (key as EstimateField)
            : null;
    if (field) errors[field] ??= message;
  }
  return errors;
}

/** The estimator filled with the body stats saved for the client, in the units the coach used. */
export function estimateValuesFrom(stats: BodyStats): EstimateValues {
  const { feet, inches } = feetInchesFromCm(stats.heightCm);
  return {
    units: stats.units,
    sex: stats.sex,
    ageYears: String(stats.ageYears),
    heightCm: numberText(stats.heightCm),
    heightFeet: String(feet),
    heightInches: numberText(inches),
    weightKg: numberText(stats.weightKg),
    weightLb: numberText(poundsFromKg(stats.weightKg)),
    activity: stats.activity,
    goal: stats.goal,
    mealsPerDay: String(stats.mealsPerDay),
  };
}
