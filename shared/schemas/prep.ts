import { z } from 'zod';

const portions = z.coerce
  .number({ message: 'portions must be a whole number from 1 to 100.' })
  .int({ message: 'portions must be a whole number from 1 to 100.' })
  .min(1, { message: 'portions must be at least 1.' })
  .max(100, { message: 'portions is at most 100.' });

export const prepQuerySchema = z.object({ portions });

export const shoppingListSchema = z.object({
  items: z
    .array(z.object({ recipeId: z.number().int().positive(), versionNumber: z.number().int().min(1), portions }))
    .min(1, { message: 'Add at least one version to shop for.' })
    .max(20, { message: 'At most 20 versions in one list.' }),
  unitSystem: z.enum(['us', 'metric']).optional(),
});

export type ShoppingListInput = z.output<typeof shoppingListSchema>;
