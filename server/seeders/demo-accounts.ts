import { User } from '../models';
import { hashPassword } from '../services/users';
import type { UserRole } from '../../shared/schemas/auth';

/** Demo sign-ins for development; documented in the README; never seeded in production. */
export const DEMO_ACCOUNTS: { email: string; password: string; displayName: string; role: UserRole }[] = [
  { email: 'admin@hearthswap.test', password: 'hearthswap-demo-admin', displayName: 'Demo Admin', role: 'admin' },
  { email: 'coach@hearthswap.test', password: 'hearthswap-demo-coach', displayName: 'Coach Marlo Quill', role: 'coach' },
  { email: 'cook@hearthswap.test', password: 'hearthswap-demo-cook', displayName: 'Wren Tally', role: 'cook' },
];

export async function seedDemoAccounts() {
  let created = 0;
  for (const account of DEMO_ACCOUNTS) {
    const existing = await User.findOne({ where: { email: account.email } });
    if (existing) continue;
    await User.create({
      email: account.email,
      passwordHash: await hashPassword(account.password),
      displayName: account.displayName,
      role: account.role,
    });
    created++;
  }
  return created;
}
