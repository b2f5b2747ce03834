/** The signed-in person as GET /api/auth/me returns them (the server's PublicUser). */
import type { PublicUser, UnitSystem, UserRole } from '../../shared/schemas/auth';

export type { UnitSystem, UserRole };
export type User = PublicUser;

export const DEFAULT_UNIT_SYSTEM: UnitSystem = 'us';

export const ROLE_LABELS: Record<UserRole, string> = {
  cook: 'Home cook',
  coach: 'Coach',
  admin: 'Administrator',
};

/** The person's measure preference; an older session without one gets US measures. */
export function unitSystemOf(user: User | null | undefined): UnitSystem {
  return user?.unitSystem ?? DEFAULT_UNIT_SYSTEM;
}
