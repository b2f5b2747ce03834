/**
 * Form schemas. Sign-in and sign-up use the server's own request schemas, so the
 * browser checks exactly what the server will; the account form reuses their pieces.
 */
import { z } from 'zod';
import { changePasswordSchema, deleteAccountSchema, loginSchema, registerSchema, UNIT_SYSTEMS } from '../../../shared/schemas/auth';

export { changePasswordSchema, loginSchema, registerSchema };
export type { ChangePasswordInput, LoginInput, RegisterInput } from '../../../shared/schemas/auth';

/** Shown as a hint; the rule itself lives in the shared schema. */
export const PASSWORD_MIN_LENGTH = 10;

export const accountSchema = z.object({
  displayName: registerSchema.shape.displayName,
  unitSystem: z.enum(UNIT_SYSTEMS, { error: 'Choose US measures or metric.' }),
});

export type AccountInput = z.infer<typeof accountSchema>;

export const deleteAccountFormSchema = deleteAccountSchema.extend({
  understood: z.boolean().refine((v) => v, { error: 'Tick this to confirm.' }),
});
export type DeleteAccountFormInput = z.infer<typeof deleteAccountFormSchema>;
