import { ROLES, type Role } from '../../../shared/food';
import type { CustomFoodInput } from '../../../shared/schemas/coaching';
import { readNumber } from '../../lib/read-number';

/** The label form as typed: every number is text until it is checked. */
export interface LabelFoodValues {
  name: string;
  servingSizeG: string;
  servingSizeMl: string;
  kcal: string;
  proteinG: string;
  fatG: string;
  satFatG: string;
  carbsG: string;
  fiberG: string;
  sugarG: string;
  sodiumMg: string;
  /** '' lets the server pick roles from the name */
  role: string;
}

export type LabelFoodField = keyof LabelFoodValues;
export type LabelFoodErrors = Partial<Record<LabelFoodField, string>>;

export function emptyLabelFood(): LabelFoodValues {
  return {
    name: '',
    servingSizeG: '',
    servingSizeMl: '',
    kcal: '',
    proteinG: '',
    fatG: '',
    satFatG: '',
    carbsG: '',
    fiberG: '',
    sugarG: '',
    sodiumMg: '',
    role: '',
  };
}

// The server's upper limits (customFoodSchema in shared/schemas/coaching.ts).
const LIMITS: Record<Exclude<LabelFoodField, 'name' | 'role'>, number> = {
  servingSizeG: 5_000,
  servingSizeMl: 5_000,
  kcal: 5_000,
  proteinG: 1_000,
  fatG: 1_000,
  satFatG: 1_000,
  carbsG: 1_000,
  fiberG: 1_000,
  sugarG: 1_000,
  sodiumMg: 50_000,
};

const REQUIRED = new Set<LabelFoodField>(['proteinG', 'fatG', 'carbsG']);

export type LabelFoodResult = { ok: true; input: CustomFoodInput } | { ok: false; errors: LabelFoodErrors };

/** Checks the label as typed and builds POST /api/foods; blank optional amounts are left out. */
export function labelFoodInput(values: LabelFoodValues): LabelFoodResult {
  const errors: LabelFoodErrors = {};
  const numbers: Partial<Record<keyof typeof LIMITS, number>> = {};

  const name = values.name.trim().replace(/\s+/g, ' ');
  if (name.length < 2) errors.name = 'Name the food as you want to find it, e.g. "Light shredded mozzarella".';
  else if (name.length > 200) errors.name = 'Keep the name to 200 characters.';

  for (const field of Object.keys(LIMITS) as (keyof typeof LIMITS)[]) {
    const value = readNumber(values[field]);
    if (value === undefined) {
      if (REQUIRED.has(field)) errors[field] = 'Enter the amount from the label (0 if it says 0).';
      continue;
    }
    if (Number.isNaN(value)) errors[field] = 'Enter a number.';
    else if (value < 0) errors[field] = 'Cannot be negative.';
    else if (value > LIMITS[field]) errors[field] = `At most ${LIMITS[field].toLocaleString('en-US')}.`;
    else if ((field === 'servingSizeG' || field === 'servingSizeMl') && value === 0) errors[field] = 'A serving is more than 0.';
    else numbers[field] = value;
  }
  if (!errors.servingSizeG && !errors.servingSizeMl && numbers.servingSizeG === undefined && numbers.servingSizeMl === undefined) {
    errors.servingSizeG = 'Give the serving size in grams, millilitres or both.';
  }
  if (numbers.satFatG !== undefined && numbers.fatG !== undefined && numbers.satFatG > numbers.fatG) {
    errors.satFatG = 'Saturated fat is part of the total fat, so it cannot be more.';
  }
  const sugarsOverCarbs = numbers.sugarG !== undefined && numbers.carbsG !== undefined && numbers.sugarG > numbers.carbsG;
  if (sugarsOverCarbs) errors.sugarG = 'Sugars are part of the carbohydrate, so they cannot be more.';

  const role = values.role;
  if (role && !(ROLES as readonly string[]).includes(role)) errors.role = 'Choose one of the roles listed.';

  if (Object.keys(errors).length > 0) return { ok: false, errors };
  const input: CustomFoodInput = {
    name,
    proteinG: numbers.proteinG ?? 0,
    fatG: numbers.fatG ?? 0,
    carbsG: numbers.carbsG ?? 0,
  };
  for (const field of ['servingSizeG', 'servingSizeMl', 'kcal', 'satFatG', 'fiberG', 'sugarG', 'sodiumMg'] as const) {
    if (numbers[field] !== undefined) input[field] = numbers[field];
  }
  if (role) input.roles = [role as Role];
  return { ok: true, input };
}

/** Server field names are the form's own; anything else stays for the form-level message. */
export function labelFoodErrorsFrom(fieldErrors: Record<string, string>): LabelFoodErrors {
  const errors: LabelFoodErrors = {};
  const known = new Set(Object.keys(emptyLabelFood()));
  for (const [key, message] of Object.entries(fieldErrors)) {
    const field = key === 'roles' ? 'role' : key.split('.')[0];
    if (known.has(field)) errors[field as LabelFoodField] ??= message;
  }
  return errors;
}
