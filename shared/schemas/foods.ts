import { z } from 'zod';

export const foodSearchQuerySchema = z.object({
  q: z.string({ message: 'q is required.' }).trim().min(1, { message: 'q needs at least one character.' }).max(200, { message: 'q is at most 200 characters.' }),
  limit: z.coerce.number({ message: 'limit must be a number.' }).int().min(1, { message: 'limit is at least 1.' }).max(50, { message: 'limit is at most 50.' }).default(10),
});

export const foodIdParamSchema = z.object({
  id: z.coerce.number({ message: 'id must be a number.' }).int({ message: 'id must be a whole number.' }).positive({ message: 'id must be positive.' }),
});
