import { z } from 'zod';
import { ROLES } from '../food';

const email = z
  .string({ message: 'Enter an e-mail address.' })
  .trim()
  .toLowerCase()
  .pipe(z.email({ message: 'Enter a valid e-mail address.' }));

export const SWAP_STATUSES = ['draft', 'published'] as const;

const swapFields = {
  fromFoodId: z.number({ message: 'fromFoodId must be a food id.' }).int().positive().nullable().optional(),
  fromRole: z.enum(ROLES, { message: 'fromRole must be one of the culinary roles.' }).nullable().optional(),
  toFoodId: z.number({ message: 'toFoodId must be a food id.' }).int().positive(),
  volumeRatio: z
    .number({ message: 'volumeRatio must be a number.' })
    .gt(0, { message: 'volumeRatio must be above 0.' })
    .max(4, { message: 'volumeRatio is at most 4.' })
    .optional(),
  note: z.string().max(2_000, { message: 'note is at most 2,000 characters.' }).optional(),
  tags: z.array(z.string().trim().min(1).max(40)).max(20, { message: 'At most 20 tags.' }).optional(),
  status: z.enum(SWAP_STATUSES, { message: 'status is draft or published.' }).optional(),
};

export const createSwapSchema = z
  .object(swapFields)
  .refine((v) => (v.fromFoodId != null) !== (v.fromRole != null), { message: 'Give either fromFoodId or fromRole, not both.', path: ['fromFoodId'] });

export const updateSwapSchema = z.object({ ...swapFields, toFoodId: swapFields.toFoodId.optional() }).partial();

export const invitationSchema = z.object({ email });
export const tokenParam = z.object({ token: z.string().regex(/^[A-Za-z0-9_-]{20,100}$/, { message: 'This invitation link is not valid.' }) });

const perMeal = z.object({
  kcal: z.number({ message: 'perMeal.kcal must be a number.' }).positive().max(5_000),
  proteinG: z.number({ message: 'perMeal.proteinG must be a number.' }).min(0).max(300),
});
export const clientTargetsSchema = z.object({
  perMeal,
  kcalPerDay: z.number().positive().max(10_000).optional(),
  proteinGPerDay: z.number().min(0).max(600).optional(),
  mealsPerDay: z.number().int().min(1).max(8).optional(),
  fiberMinG: z.number().min(0).max(200).optional(),
  sodiumMaxMg: z.number().min(0).max(20_000).optional(),
  note: z.string().max(2_000).optional(),
});
export type ClientTargets = z.infer<typeof clientTargetsSchema>;

export const commentSchema = z.object({
  body: z
    .string({ message: 'Write a comment.' })
    .trim()
    .min(1, { message: 'Write a comment.' })
    .max(4_000, { message: 'A comment is at most 4,000 characters.' }),
});

export const passwordResetRequestSchema = z.object({ email });
export const passwordResetConfirmSchema = z.object({
  token: z.string().regex(/^[A-Za-z0-9_-]{20,100}$/, { message: 'This reset link is not valid.' }),
  password: z.string().min(10, { message: 'Use at least 10 characters.' }).max(200),
});

/** A custom food from a package label: the schema of `POST /api/foods` (shared/schemas/foods.ts). */
export { labelFoodSchema as customFoodSchema, type LabelFoodInput as CustomFoodInput } from './foods';
