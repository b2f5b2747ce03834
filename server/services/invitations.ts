import { Op, UniqueConstraintError, col, fn, where, type Sequelize, type Transaction } from 'sequelize';
import type { RegisterInput } from '../../shared/schemas/auth';
import { Invitation, User } from '../models';
import { HttpError, badRequest, forbidden, notFound } from '../lib/http-error';
import { mailTemplates, type Mailer } from '../mail';
import { hashToken, newToken } from './tokens';
import { createUser } from './users';
import type { Invitation as InvitationView, InvitationStatus } from '../../shared/schemas/clients';
import type { AcceptedInvitation, InvitationSummary } from '../../shared/schemas/invitations';

export const INVITATION_DAYS = 7;

/**
 * Sends an invitation, or renews the open one for this address: a coach who invites again expects
 * the client to get a working link, not a second invitation beside the first. A renewal replaces the
 * token (the earlier link stops working) and restarts the week. The partial unique index
 * invitations_open_per_address holds it under concurrency: the loser of a race renews instead.
 */
export async function inviteClient(sequelize: Sequelize, coach: User, email: string, mail: { mailer: Mailer; appUrl: string }) {
  const existing = await User.findOne({ where: { email } });
  if (existing?.coachId === coach.id) throw new HttpError(409, 'conflict', `${email} is already your client.`);
  if (existing && existing.role !== 'cook')
    throw badRequest('email: only cook accounts can join a coach.', { fieldErrors: { email: ['Not a cook account.'] } });
  const { token, hash } = newToken();
  const expiresAt = new Date(Date.now() + INVITATION_DAYS * 24 * 60 * 60 * 1000);
  const store = () =>
    sequelize.transaction(async (transaction) => {
      const open = await Invitation.findOne({
        where: { coachId: coach.id, acceptedAt: null, revokedAt: null, [Op.and]: [where(fn('lower', col('email')), email)] },
        transaction,
        lock: transaction.LOCK.UPDATE,
      });
      if (open) {
        await open.update({ tokenHash: hash, expiresAt }, { transaction });
        return { invitation: open, renewed: true };
      }
      return { invitation: await Invitation.create({ coachId: coach.id, email, tokenHash: hash, expiresAt }, { transaction }), renewed: false };
    });
  const stored = await store().catch((error: unknown) => {
    if (error instanceof UniqueConstraintError) return store();
    throw error;
  });
  const link = `${mail.appUrl.replace(/\/$/, '')}/invitations/${token}`;
  const content = mailTemplates.invitation({ coachName: coach.displayName, link, expiresAt });
  await mail.mailer.send({ to: email, ...content });
  return stored;
}

export function invitationStatus(inv: Invitation): InvitationStatus {
  if (inv.revokedAt) return 'revoked';
  if (inv.acceptedAt) return 'accepted';
  if (inv.expiresAt.getTime() < Date.now()) return 'expired';
  return 'pending';
}

export async function listInvitations(coach: User): Promise<InvitationView[]> {
  const list = await Invitation.findAll({ where: { coachId: coach.id }, order: [['createdAt', 'DESC']], limit: 200 });
  return list.map((i) => ({
    id: i.id,
    email: i.email,
    status: invitationStatus(i),
    expiresAt: i.expiresAt.toISOString(),
    createdAt: i.createdAt.toISOString(),
    // a renewal sends the open invitation again; nothing else changes a row before it closes
    sentAt: (i.acceptedAt || i.revokedAt ? i.createdAt : i.updatedAt).toISOString(),
  }));
}

export async function revokeInvitation(coach: User, id: number) {
  const inv = await Invitation.findOne({ where: { id, coachId: coach.id } });
  if (!inv) throw notFound('No invitation with that id.');
  if (!inv.acceptedAt) {
    inv.revokedAt = new Date();
    await inv.save();
  }
}

async function usableInvitation(token: string) {
  const inv = await Invitation.findOne({ where: { tokenHash: hashToken(token) } });
  if (!inv) throw notFound('This invitation link is not valid.');
  const status = invitationStatus(inv);
  if (status === 'accepted') throw new HttpError(410, 'invitation_used', 'This invitation has already been used. Ask your coach for a new one.');
  if (status === 'expired') throw new HttpError(410, 'invitation_expired', 'This invitation has expired. Ask your coach for a new one.');
  if (status === 'revoked') throw new HttpError(410, 'invitation_revoked', 'This invitation was withdrawn by the coach.');
  return inv;
}

export async function describeInvitation(token: string): Promise<InvitationSummary> {
  const inv = await usableInvitation(token);
  const coach = await User.findByPk(inv.coachId);
  return { coachName: coach?.displayName ?? 'A coach', email: inv.email, expiresAt: inv.expiresAt.toISOString() };
}

export async function acceptInvitation(sequelize: Sequelize, viewer: User, token: string): Promise<AcceptedInvitation> {
  return sequelize.transaction((transaction) => acceptWithin(transaction, viewer, token));
}

async function acceptWithin(transaction: Transaction, viewer: User, token: string): Promise<AcceptedInvitation> {
  const inv = await usableInvitation(token);
  await Invitation.findOne({ where: { id: inv.id }, transaction, lock: transaction.LOCK.UPDATE });
  if (viewer.role !== 'cook') throw forbidden('Only a cook account can join a coach. Sign in with your cook account.');
  if (!sameAddress(inv.email, viewer.email)) {
    throw new HttpError(
      403,
      'invitation_other_address',
      'This invitation was sent to a different e-mail address. Sign in with the account for that address, or ask your coach to invite the address you use here.',
    );
  }
  if (viewer.coachId && viewer.coachId !== inv.coachId) {
    throw new HttpError(409, 'conflict', 'You already have a coach. Leave them first on “My coach”, then open this link again.');
  }
  const [updated] = await Invitation.update(
    { acceptedAt: new Date(), acceptedBy: viewer.id },
    { where: { id: inv.id, acceptedAt: null, revokedAt: null }, transaction },
  );
  if (updated !== 1) throw new HttpError(410, 'invitation_used', 'This invitation has already been used.');
  await User.update({ coachId: inv.coachId }, { where: { id: viewer.id }, transaction });
  viewer.coachId = inv.coachId;
  const coach = await User.findByPk(inv.coachId, { transaction });
  return { coachId: inv.coachId, coachName: coach?.displayName ?? '' };
}

function sameAddress(a: string, b: string) {
  return a.trim().toLowerCase() === b.trim().toLowerCase();
}

function refusedField(field: 'email' | 'role', message: string) {
  return new HttpError(400, 'validation_failed', `${field}: ${message}`, { fieldErrors: { [field]: [message] }, formErrors: [] });
}

/**
 * Sign-up from an invitation link: the account takes the invited address (the link is bound to it)
 * and is a cook's; it is created and linked with the coach in one transaction, so either both
 * happen or neither.
 */
export async function registerFromInvitation(sequelize: Sequelize, input: RegisterInput, token: string) {
  const inv = await usableInvitation(token);
  if (input.role !== 'cook') throw refusedField('role', 'An invitation from a coach is for a cook account: choose “I cook for myself or my household”.');
  if (!sameAddress(inv.email, input.email)) {
    throw refusedField('email', `This invitation is for ${inv.email}. Sign up with that address, or ask your coach to invite the one you use.`);
  }
  return sequelize.transaction(async (transaction) => {
    const user = await createUser(input, transaction);
    const link = await acceptWithin(transaction, user, token);
    return { user, coachName: link.coachName };
  });
}
