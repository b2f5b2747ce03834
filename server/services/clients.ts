import { Op } from 'sequelize';
import { ClientBodyStats, ClientTarget, Recipe, RecipeVersion, User, VersionComment } from '../models';
import { notFound } from '../lib/http-error';
import type { Client, ClientVersion } from '../../shared/schemas/clients';

export async function listClients(coach: User): Promise<Client[]> {
  const clients = await User.findAll({ where: { coachId: coach.id }, order: [['displayName', 'ASC']] });
  const targets = await ClientTarget.findAll({ where: { clientId: clients.map((c) => c.id) } });
  const byClient = new Map(targets.map((t) => [t.clientId, t.targets]));
  return clients.map((c) => ({ id: c.id, displayName: c.displayName, email: c.email, targets: byClient.get(c.id) ?? null }));
}

export async function ownClient(coach: User, clientId: number) {
  const client = await User.findOne({ where: { id: clientId, coachId: coach.id } });
  if (!client) throw notFound('No client with that id.');
  return client;
}

export async function removeClient(coach: User, clientId: number) {
  const client = await ownClient(coach, clientId);
  client.coachId = null;
  await client.save();
  await ClientTarget.destroy({ where: { clientId } });
  await ClientBodyStats.destroy({ where: { clientId } });
}

export async function clientVersions(coach: User, clientId: number): Promise<ClientVersion[]> {
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
