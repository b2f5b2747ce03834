import { QueryTypes, type Sequelize, type Transaction } from 'sequelize';
import bcrypt from 'bcryptjs';
import type { S3Config } from '../config';
import { Recipe, User } from '../models';
import { orphanFoodsUsedByOthers } from '../models/food-table';
import { HttpError, notFound } from '../lib/http-error';
import { hashPassword } from './users';
import { removePhoto } from './photo-storage';

function wrongPassword(field: 'currentPassword' | 'password') {
  return new HttpError(400, 'validation_error', `${field}: that is not your current password.`, { fieldErrors: { [field]: ['Not your current password.'] } });
}

async function checkPassword(userId: number, password: string, field: 'currentPassword' | 'password') {
  const user = await User.findByPk(userId);
  if (!user) throw notFound('Account not found.');
  if (!(await bcrypt.compare(password, user.passwordHash))) throw wrongPassword(field);
  return user;
}

/** Ends every session of the account except `keepSessionId` (none kept when null). */
async function endSessions(sequelize: Sequelize, userId: number, keepSessionId: string | null, transaction?: Transaction) {
  await sequelize.query(`DELETE FROM "session" WHERE "sess"->'passport'->>'user' = :userId AND "sid" <> :keep`, {
    replacements: { userId: String(userId), keep: keepSessionId ?? '' },
    type: QueryTypes.DELETE,
    transaction,
  });
}

/** A new password needs the current one; every other session of the account ends, this one stays. */
export async function changePassword(sequelize: Sequelize, userId: number, currentPassword: string, newPassword: string, keepSessionId: string | null) {
  await checkPassword(userId, currentPassword, 'currentPassword');
  const passwordHash = await hashPassword(newPassword);
  await sequelize.transaction(async (transaction) => {
    await User.update({ passwordHash }, { where: { id: userId }, transaction });
    await endSessions(sequelize, userId, keepSessionId, transaction);
  });
}

/**
 * Deletes the account, its recipes (with their versions, comments and photos), foods, swaps,
 * invitations, targets and every session. A label food that someone else's saved version uses is
 * kept, hidden and ownerless, so that version keeps its numbers. A coach's clients are unlinked
 * (users.coach_id is ON DELETE SET NULL); a client's link to their coach ends with their targets.
 */
export async function deleteAccount(sequelize: Sequelize, s3: S3Config | null, userId: number, password: string) {
  await checkPassword(userId, password, 'password');
  const photoKeys = await sequelize.transaction(async (transaction) => {
    const recipes = await Recipe.findAll({ where: { ownerId: userId }, attributes: ['photoKey'], transaction });
    await orphanFoodsUsedByOthers(sequelize, transaction, userId);
    await endSessions(sequelize, userId, null, transaction);
    await User.destroy({ where: { id: userId }, transaction });
    return recipes.map((r) => r.photoKey).filter((k): k is string => k !== null);
  });
  await Promise.all(photoKeys.map((key) => removePhoto(s3, key)));
}
