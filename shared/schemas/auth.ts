import { z } from 'zod';

export const ROLES_USER = ['cook', 'coach', 'admin'] as const;
export type UserRole = (typeof ROLES_USER)[number];

export const UNIT_SYSTEMS = ['us', 'metric'] as const;
export type UnitSystem = (typeof UNIT_SYSTEMS)[number];

const email = z
  .string()
  .trim()
  .toLowerCase()
  .pipe(z.email({ message: 'Enter a valid e-mail address.' }))
  .pipe(z.string().max(254));
const password = z
  .string({ message: 'Enter a password.' })
  .min(10, { message: 'Use at least 10 characters.' })
  .max(200, { message: 'Use at most 200 characters.' });
const displayName = z
  .string({ message: 'Enter a display name.' })
  .trim()
  .min(1, { message: 'Enter a display name.' })
  .max(80, { message: 'Use at most 80 characters.' });

export const registerSchema = z.object({
  email,
  password,
  displayName,
  role: z.enum(['cook', 'coach'], { message: 'Choose cook or coach.' }),
  /** sign-up from a coach's invitation link: the account must use the invited address, and is linked at once */
  invitationToken: z
    .string()
    .regex(/^[A-Za-z0-9_-]{20,100}$/, { message: 'This invitation link is not valid.' })
    .optional(),
});
export type RegisterInput = z.infer<typeof registerSchema>;

export const loginSchema = z.object({
  email,
  password: z.string({ message: 'Enter your password.' }).min(1, { message: 'Enter your password.' }).max(200),
});
export type LoginInput = z.infer<typeof loginSchema>;

export const updateMeSchema = z
  .object({
    displayName: displayName.optional(),
    unitSystem: z.enum(UNIT_SYSTEMS, { message: 'Choose us or metric.' }).optional(),
  })
  .strict();
export type UpdateMeInput = z.infer<typeof updateMeSchema>;

/** `POST /api/auth/password`: the current password proves it is the account's owner. */
export const changePasswordSchema = z.object({
  currentPassword: z.string({ message: 'Enter your current password.' }).min(1, { message: 'Enter your current password.' }).max(200),
  newPassword: password,
});
export type ChangePasswordInput = z.infer<typeof changePasswordSchema>;

/** `DELETE /api/auth/me`: the password again, so a borrowed signed-in browser cannot delete the account. */
export const deleteAccountSchema = z.object({
  password: z.string({ message: 'Enter your password.' }).min(1, { message: 'Enter your password.' }).max(200),
});

export const updateRoleSchema = z.object({ role: z.enum(ROLES_USER, { message: 'Choose cook, coach or admin.' }) });

export interface PublicUser {
  id: number;
  email: string;
  displayName: string;
  role: UserRole;
  coachId: number | null;
  unitSystem: UnitSystem;
}
