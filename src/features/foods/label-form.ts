import { z } from 'zod';
import { labelFoodSchema, type LabelFoodInput, type LabelScanFields, type MyFood } from '../../../shared/schemas/foods';
import { readNumber } from '../../lib/read-number';

/** The label form as typed: every number is text until it is checked. */
export interface LabelFormValues {
  name: string;
  servingSizeG: string;
  servingSizeMl: string;
  servingLabel: string;
  kcal: string;
  fatG: string;
  satFatG: string;
  carbsG: string;
  fiberG: string;
  sugarG: string;
  proteinG: string;
  sodiumMg: string;
  barcode: string;
  /** '' lets the server judge the role from the name */
  role: string;
}

export type LabelFormField = keyof LabelFormValues;

export const EMPTY_LABEL_FORM: LabelFormValues = {
  name: '',
  servingSizeG: '',
  servingSizeMl: '',
  servingLabel: '',
  kcal: '',
  fatG: '',
  satFatG: '',
  carbsG: '',
  fiberG: '',
  sugarG: '',
  proteinG: '',
  sodiumMg: '',
  barcode: '',
  role: '',
};

const optionalNumber = z.string().transform((text, ctx) => {
  const n = readNumber(text);
  if (Number.isNaN(n)) {
    ctx.addIssue({ code: 'custom', message: 'Enter a number.' });
    return z.NEVER;
  }
  return n;
});

const requiredNumber = z.string().transform((text, ctx) => {
  const n = readNumber(text);
  if (n === undefined || Number.isNaN(n)) {
    ctx.addIssue({ code: 'custom', message: n === undefined ? 'Copy it from the label (0 if it says 0).' : 'Enter a number.' });
    return z.NEVER;
  }
  return n;
});

function defined<T extends object>(o: T): T {
  return Object.fromEntries(Object.entries(o).filter(([, v]) => v !== undefined && v !== '')) as T;
}

/**
 * Text → `POST /api/foods`, then the server's own schema (shared/schemas/foods.ts): the same physical
 * limits and messages on both sides, each error on the field it names.
 */
export const labelFormSchema = z
  .object({
    name: z.string(),
    servingSizeG: optionalNumber,
    servingSizeMl: optionalNumber,
    servingLabel: z.string(),
    kcal: optionalNumber,
    fatG: requiredNumber,
    satFatG: optionalNumber,
    carbsG: requiredNumber,
    fiberG: optionalNumber,
    sugarG: optionalNumber,
    proteinG: requiredNumber,
    sodiumMg: optionalNumber,
    barcode: z.string(),
    role: z.string(),
  })
  .transform(
    ({ role, ...v }) =>
      defined({ ...v, name: v.name.trim(), servingLabel: v.servingLabel.trim(), barcode: v.barcode.trim(), roles: role ? [role] : undefined }) as z.input<
        typeof labelFoodSchema
      >,
  )
  .pipe(labelFoodSchema);

function text(n: number | null | undefined) {
  return n === null || n === undefined ? '' : String(n);
}

/** A scan fills what it read and leaves what the cook already typed where it read nothing. */
export function valuesFromScan(current: LabelFormValues, fields: LabelScanFields): LabelFormValues {
  const next = { ...current };
  for (const key of ['servingSizeG', 'servingSizeMl', 'kcal', 'fatG', 'satFatG', 'carbsG', 'fiberG', 'sugarG', 'proteinG', 'sodiumMg'] as const) {
    if (fields[key] !== null) next[key] = text(fields[key]);
  }
  if (fields.servingLabel) next.servingLabel = fields.servingLabel;
  return next;
}

export function valuesFromFood(food: MyFood): LabelFormValues {
  const p = food.label;
  return {
    name: food.name,
    servingSizeG: text(p.servingSizeG),
    servingSizeMl: text(p.servingSizeMl),
    servingLabel: p.servingLabel ?? '',
    kcal: text(p.kcal),
    fatG: text(p.fatG),
    satFatG: text(p.satFatG),
    carbsG: text(p.carbsG),
    fiberG: text(p.fiberG),
    sugarG: text(p.sugarG),
    proteinG: text(p.proteinG),
    sodiumMg: text(p.sodiumMg),
    barcode: food.barcode ?? '',
    role: food.roles[0] ?? '',
  };
}

export type { LabelFoodInput };
