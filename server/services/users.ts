import bcrypt from 'bcryptjs';
import { UniqueConstraintError, type Transaction } from 'sequelize';
import { User } from '../models';
import { conflict, notFound } from '../lib/http-error';
import type { RegisterInput, UpdateMeInput, UserRole } from '../../shared/schemas/auth';

export type { User };

export const BCRYPT_COST = 11;

export async function hashPassword(password: string) {
  return bcrypt.hash(password, BCRYPT_COST);
}

export async function createUser(input: RegisterInput | (Omit<RegisterInput, 'role'> & { role: UserRole }), transaction?: Transaction) {
  try {
    return await User.create(
      {
        email: input.email,
        passwordHash: await hashPassword(input.password),
        displayName: input.displayName,
        role: input.role,
      },
      { transaction },
    );
  } catch (error) {
    if (error instanceof UniqueConstraintError) {
      throw conflict('An account with this e-mail already exists.', { fieldErrors: { email: ['Already registered.'] } });
    }
    throw error;
  }
}

// A fixed hash so that an unknown e-mail costs as much time as a wrong password.
const DUMMY_HASH = bcrypt.hashSync('not-a-real-password', BCRYPT_COST);

export async function verifyCredentials(email: string, password: string): Promise<User | null> {
  const user = await User.findOne({ where: { email } });
  const ok = await bcrypt.compare(password, user?.passwordHash ?? DUMMY_HASH);
  return user && ok ? user : null;
}

export async function updateProfile(userId: number, input: UpdateMeInput) {
  const user = await User.findByPk(userId);
  if (!user) throw notFound('Account not found.');
  if (input.displayName !== undefined) user.displayName = input.displayName;
  if (input.unitSystem !== undefined) user.unitSystem = input.unitSystem;
  await user.save();
  return user;
}

export async function listUsers() {
  return User.findAll({ order: [['id', 'ASC']] });
}

export async function setRole(userId: number, role: UserRole) {
  const user = await User.findByPk(userId);
  if (!user) throw notFound('No user with that id.');
  user.role = role;
  await user.save();
  return user;
}
