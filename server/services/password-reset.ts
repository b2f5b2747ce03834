import { QueryTypes, type Sequelize } from 'sequelize';
import { PasswordReset, User } from '../models';
import { hashToken, newToken } from './tokens';
import { hashPassword } from './users';
import { mailTemplates, type Mailer } from '../mail';
import { HttpError } from '../lib/http-error';

const RESET_HOURS = 2;

/**
 * Starts the reset off the request path: the caller answers at once and in the same time whether
 * or not the address has an account; the look-up, the token and the mail happen afterwards.
 */
export function requestPasswordResetInBackground(
  email: string,
  mail: { mailer: Mailer; appUrl: string },
  log: (message: string, error: unknown) => void = console.error,
) {
  setImmediate(() => {
    requestPasswordReset(email, mail).catch((error) => log('Password reset: could not send the mail:', error));
  });
}

export async function requestPasswordReset(email: string, mail: { mailer: Mailer; appUrl: string }) {
  const user = await User.findOne({ where: { email } });
  if (!user) return;
  const { token, hash } = newToken();
  const expiresAt = new Date(Date.now() + RESET_HOURS * 60 * 60 * 1000);
  await PasswordReset.create({ userId: user.id, tokenHash: hash, expiresAt });
  const link = `${mail.appUrl.replace(/\/$/, '')}/reset-password/${token}`;
  await mail.mailer.send({ to: email, ...mailTemplates.passwordReset({ displayName: user.displayName, link, expiresAt }) });
}

/**
 * Sets the new password, voids every other reset link of the account and ends every session of
 * it except `keepSessionId` (the session confirming, when it is the account's own).
 */
export async function confirmPasswordReset(sequelize: Sequelize, token: string, password: string, keepSessionId: string | null) {
  const passwordHash = await hashPassword(password);
  await sequelize.transaction(async (transaction) => {
    const reset = await PasswordReset.findOne({ where: { tokenHash: hashToken(token) }, transaction, lock: transaction.LOCK.UPDATE });
    if (!reset) throw new HttpError(404, 'not_found', 'This reset link is not valid.');
    if (reset.usedAt) throw new HttpError(410, 'reset_used', 'This reset link has already been used. Ask for a new one.');
    if (reset.expiresAt.getTime() < Date.now()) throw new HttpError(410, 'reset_expired', 'This reset link has expired. Ask for a new one.');
    await PasswordReset.update({ usedAt: new Date() }, { where: { userId: reset.userId, usedAt: null }, transaction });
    await User.update({ passwordHash }, { where: { id: reset.userId }, transaction });
    await sequelize.query(`DELETE FROM "session" WHERE "sess"->'passport'->>'user' = :userId AND "sid" <> :keep`, {
      replacements: { userId: String(reset.userId), keep: keepSessionId ?? '' },
      type: QueryTypes.DELETE,
      transaction,
    });
  });
}
