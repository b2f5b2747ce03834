import { createHash, randomBytes } from 'node:crypto';
import { Op, type Sequelize } from 'sequelize';
import { ClientTarget, Invitation, Recipe, RecipeVersion, Swap, User, VersionComment } from '../models';
import type { ClientTargets } from '../../shared/schemas/coaching';
import type { Role } from '../../shared/food';
import type { FoodEngine } from './food-engine';
import type { ApprovedSwap } from './candidates';
import { foodSummary } from './foods';
import { HttpError, badRequest, forbidden, notFound } from '../lib/http-error';
import { mailTemplates, type Mailer } from '../mail';

export const INVITATION_DAYS = 7;

export function newToken() {
  const token = randomBytes(24).toString('base64url');
  return { token, hash: hashToken(token) };
}

export function hashToken(token: string) {
  return createHash('sha256').update(token).digest('hex');
}

// --- swaps -------------------------------------------------------------------------------------

export function swapView(engine: FoodEngine, swap: Swap) {
  const from = swap.fromFoodId ? engine.byId.get(swap.fromFoodId) : undefined;
  const to = engine.byId.get(swap.toFoodId);
  return {
    id: swap.id,
    coachId: swap.coachId,
    fromFood: from ? foodSummary(from) : null,
    fromRole: swap.fromRole,
    toFood: to ? { ...foodSummary(to), kcalPer100g: to.per100g.kcal, proteinPer100g: to.per100g.proteinG } : null,
    volumeRatio: swap.volumeRatio,
    note: swap.note,
    tags: swap.tags,
    status: swap.status,
    updatedAt: swap.updatedAt.toISOString(),
  };
}

function checkFoodVisible(engine: FoodEngine, coach: User, id: number, field: string) {
  const food = engine.byId.get(id);
  const visible = food && (food.source === 'usda-sr28' || food.ownerId === coach.id);
  if (!visible) throw badRequest(`${field}: no food ${id} that you can use.`, { fieldErrors: { [field]: ['Unknown food.'] } });
}

export async function listSwapsFor(viewer: User) {
  if (viewer.role === 'coach') return Swap.findAll({ where: { coachId: viewer.id }, order: [['updatedAt', 'DESC']] });
  if (!viewer.coachId) return [];
  return Swap.findAll({ where: { coachId: viewer.coachId, status: 'published' }, order: [['updatedAt', 'DESC']] });
}

export async function createSwap(
  engine: FoodEngine,
  coach: User,
  input: { fromFoodId?: number | null; fromRole?: Role | null; toFoodId: number; volumeRatio?: number; note?: string; tags?: string[]; status?: 'draft' | 'published' },
) {
  if (input.fromFoodId) checkFoodVisible(engine, coach, input.fromFoodId, 'fromFoodId');
  checkFoodVisible(engine, coach, input.toFoodId, 'toFoodId');
  if (input.fromFoodId && input.fromFoodId === input.toFoodId) throw badRequest('toFoodId: a swap goes to a different food.', { fieldErrors: { toFoodId: ['Same as fromFoodId.'] } });
  return Swap.create({
    coachId: coach.id,
    fromFoodId: input.fromFoodId ?? null,
    fromRole: input.fromRole ?? null,
    toFoodId: input.toFoodId,
    volumeRatio: input.volumeRatio ?? 1,
    note: input.note ?? '',
    tags: input.tags ?? [],
    status: input.status ?? 'draft',
  });
}

async function ownSwap(coach: User, id: number) {
  const swap = await Swap.findOne({ where: { id, coachId: coach.id } });
  if (!swap) throw notFound('No swap with that id in your library.');
  return swap;
}

export async function updateSwap(engine: FoodEngine, coach: User, id: number, input: Partial<{ fromFoodId: number | null; fromRole: Role | null; toFoodId: number; volumeRatio: number; note: string; tags: string[]; status: 'draft' | 'published' }>) {
  const swap = await ownSwap(coach, id);
  if (input.toFoodId !== undefined) checkFoodVisible(engine, coach, input.toFoodId, 'toFoodId');
  if (input.fromFoodId) checkFoodVisible(engine, coach, input.fromFoodId, 'fromFoodId');
  const next = {
    fromFoodId: input.fromFoodId !== undefined ? input.fromFoodId : swap.fromFoodId,
    fromRole: input.fromRole !== undefined ? input.fromRole : swap.fromRole,
  };
  if ((next.fromFoodId != null) === (next.fromRole != null)) throw badRequest('fromFoodId: a swap starts from either a food or a role.', { fieldErrors: { fromFoodId: ['Give either fromFoodId or fromRole.'] } });
  Object.assign(swap, Object.fromEntries(Object.entries(input).filter(([, v]) => v !== undefined)));
  await swap.save();
  return swap;
}

export async function deleteSwap(coach: User, id: number) {
  const swap = await ownSwap(coach, id);
  await swap.destroy();
}

/** The published swaps of the viewer's coach, as the rewrite's candidate builder reads them. */
export async function publishedSwapsForClient(viewer: User | null): Promise<ApprovedSwap[]> {
  if (!viewer?.coachId) return [];
  const coach = await User.findByPk(viewer.coachId);
  if (!coach) return [];
  const swaps = await Swap.findAll({ where: { coachId: coach.id, status: 'published' } });
  return swaps.map((s) => ({
    fromFoodId: s.fromFoodId ?? undefined,
    fromRole: (s.fromRole as Role | null) ?? undefined,
    toFoodId: s.toFoodId,
    volumeRatio: s.volumeRatio,
    note: s.note || undefined,
    coachName: coach.displayName,
  }));
}

// --- invitations and clients ------------------------------------------------------------------

export async function inviteClient(coach: User, email: string, mail: { mailer: Mailer; appUrl: string }) {
  const existing = await User.findOne({ where: { email } });
  if (existing?.coachId === coach.id) throw new HttpError(409, 'conflict', `${email} is already your client.`);
  if (existing && existing.role !== 'cook') throw badRequest('email: only cook accounts can join a coach.', { fieldErrors: { email: ['Not a cook account.'] } });
  const { token, hash } = newToken();
  const expiresAt = new Date(Date.now() + INVITATION_DAYS * 24 * 60 * 60 * 1000);
  const invitation = await Invitation.create({ coachId: coach.id, email, tokenHash: hash, expiresAt });
  const link = `${mail.appUrl.replace(/\/$/, '')}/invitations/${token}`;
  const content = mailTemplates.invitation({ coachName: coach.displayName, link, expiresAt });
  await mail.mailer.send({ to: email, ...content });
  return invitation;
}

export function invitationStatus(inv: Invitation): 'pending' | 'accepted' | 'expired' | 'revoked' {
  if (inv.revokedAt) return 'revoked';
  if (inv.acceptedAt) return 'accepted';
  if (inv.expiresAt.getTime() < Date.now()) return 'expired';
  return 'pending';
}

export async function listInvitations(coach: User) {
  const list = await Invitation.findAll({ where: { coachId: coach.id }, order: [['createdAt', 'DESC']], limit: 200 });
  return list.map((i) => ({ id: i.id, email: i.email, status: invitationStatus(i), expiresAt: i.expiresAt.toISOString(), createdAt: i.createdAt.toISOString() }));
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

export async function describeInvitation(token: string) {
  const inv = await usableInvitation(token);
  const coach = await User.findByPk(inv.coachId);
  return { coachName: coach?.displayName ?? 'A coach', email: inv.email, expiresAt: inv.expiresAt.toISOString() };
}

export async function acceptInvitation(sequelize: Sequelize, viewer: User, token: string) {
  return sequelize.transaction(async (transaction) => {
    const inv = await usableInvitation(token);
    await Invitation.findOne({ where: { id: inv.id }, transaction, lock: transaction.LOCK.UPDATE });
    if (viewer.role !== 'cook') throw forbidden('Only a cook account can join a coach. Sign in with your cook account.');
    if (inv.email.trim().toLowerCase() !== viewer.email.trim().toLowerCase()) {
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
    const coach = await User.findByPk(inv.coachId, { transaction });
    return { coachId: inv.coachId, coachName: coach?.displayName ?? '' };
  });
}

export async function listClients(coach: User) {
  const clients = await User.findAll({ where: { coachId: coach.id }, order: [['displayName', 'ASC']] });
  const targets = await ClientTarget.findAll({ where: { clientId: clients.map((c) => c.id) } });
  const byClient = new Map(targets.map((t) => [t.clientId, t.targets]));
  return clients.map((c) => ({ id: c.id, displayName: c.displayName, email: c.email, targets: byClient.get(c.id) ?? null }));
}

async function ownClient(coach: User, clientId: number) {
  const client = await User.findOne({ where: { id: clientId, coachId: coach.id } });
  if (!client) throw notFound('No client with that id.');
  return client;
}

export async function removeClient(coach: User, clientId: number) {
  const client = await ownClient(coach, clientId);
  client.coachId = null;
  await client.save();
  await ClientTarget.destroy({ where: { clientId } });
}

export async function leaveCoach(viewer: User) {
  if (!viewer.coachId) return;
  await ClientTarget.destroy({ where: { clientId: viewer.id } });
  await User.update({ coachId: null }, { where: { id: viewer.id } });
}

export async function setClientTargets(coach: User, clientId: number, targets: ClientTargets) {
  await ownClient(coach, clientId);
  await ClientTarget.upsert({ clientId, coachId: coach.id, targets });
  return targets;
}

export async function myCoach(viewer: User, engine: FoodEngine) {
  if (!viewer.coachId) return { coach: null, targets: null, swaps: [] };
  const coach = await User.findByPk(viewer.coachId);
  const target = await ClientTarget.findByPk(viewer.id);
  const swaps = await Swap.findAll({ where: { coachId: viewer.coachId, status: 'published' }, order: [['updatedAt', 'DESC']] });
  return {
    coach: coach ? { id: coach.id, displayName: coach.displayName } : null,
    targets: target?.targets ?? null,
    swaps: swaps.map((s) => swapView(engine, s)),
  };
}

export async function clientVersions(coach: User, clientId: number) {
  await ownClient(coach, clientId);
  const recipes = await Recipe.findAll({ where: { ownerId: clientId, deletedAt: null } });
  if (recipes.length === 0) return [];
  const versions = await RecipeVersion.findAll({
    where: { recipeId: { [Op.in]: recipes.map((r) => r.id) } },
    order: [['createdAt', 'DESC']],
    limit: 50,
  });
  const titles = new Map(recipes.map((r) => [r.id, r.title]));
  const comments = await VersionComment.count({ where: { recipeVersionId: versions.map((v) => v.id) }, group: ['recipe_version_id'] });
  const countBy = new Map((comments as unknown as { recipe_version_id: number; count: number }[]).map((c) => [c.recipe_version_id, Number(c.count)]));
  return versions.map((v) => ({
    recipeId: v.recipeId,
    recipeTitle: titles.get(v.recipeId) ?? '',
    number: v.number,
    kind: v.kind,
    perServing: v.perServing,
    note: v.note,
    comments: countBy.get(v.id) ?? 0,
    createdAt: v.createdAt.toISOString(),
  }));
}

// --- comments on versions ----------------------------------------------------------------------

export async function listComments(versionId: number) {
  const comments = await VersionComment.findAll({ where: { recipeVersionId: versionId }, order: [['createdAt', 'ASC']] });
  const authors = await User.findAll({ where: { id: [...new Set(comments.map((c) => c.authorId))] } });
  const names = new Map(authors.map((a) => [a.id, { name: a.displayName, role: a.role }]));
  return comments.map((c) => ({
    id: c.id,
    body: c.body,
    author: { id: c.authorId, displayName: names.get(c.authorId)?.name ?? '', role: names.get(c.authorId)?.role ?? 'cook' },
    createdAt: c.createdAt.toISOString(),
  }));
}

export async function addComment(versionId: number, author: User, body: string) {
  return VersionComment.create({ recipeVersionId: versionId, authorId: author.id, body });
}
