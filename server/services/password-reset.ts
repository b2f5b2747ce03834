import { PasswordReset, User } from '../models';
import { hashToken, newToken } from './tokens';
import { hashPassword } from './users';
import { mailTemplates, type Mailer } from '../mail';
import { HttpError } from '../lib/http-error';

const RESET_HOURS = 2;

/** Always answers the same way, whether or not the address has an account. */
export async function requestPasswordReset(email: string, mail: { mailer: Mailer; appUrl: string }) {
  const user = await User.findOne({ where: { email } });
  if (!user) return;
  const { token, hash } = newToken();
  const expiresAt = new Date(Date.now() + RESET_HOURS * 60 * 60 * 1000);
  await PasswordReset.create({ userId: user.id, tokenHash: hash, expiresAt });
  const link = `${mail.appUrl.replace(/\/$/, '')}/reset-password/${token}`;
  await mail.mailer.send({ to: email, ...mailTemplates.passwordReset({ displayName: user.displayName, link, expiresAt }) });
}

export async function confirmPasswordReset(token: string, password: string) {
  const reset = await PasswordReset.findOne({ where: { tokenHash: hashToken(token) } });
  if (!reset) throw new HttpError(404, 'not_found', 'This reset link is not valid.');
  if (reset.usedAt) throw new HttpError(410, 'reset_used', 'This reset link has already been used. Ask for a new one.');
  if (reset.expiresAt.getTime() < Date.now()) throw new HttpError(410, 'reset_expired', 'This reset link has expired. Ask for a new one.');
  const [updated] = await PasswordReset.update({ usedAt: new Date() }, { where: { id: reset.id, usedAt: null } });
  if (updated !== 1) throw new HttpError(410, 'reset_used', 'This reset link has already been used.');
  await User.update({ passwordHash: await hashPassword(password) }, { where: { id: reset.userId } });
}
