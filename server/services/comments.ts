import { Op, QueryTypes } from 'sequelize';
import { User, VersionComment, type Recipe, type RecipeVersion } from '../models';
import { mailTemplates, type Mailer } from '../mail';
import type { UnreadComments, VersionComment as VersionCommentView } from '../../shared/schemas/comments';

export async function listComments(versionId: number): Promise<VersionCommentView[]> {
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

export interface CommentMailContext {
  mailer: Mailer;
  appUrl: string;
  /** where a mail that could not be sent is reported; the comment is kept either way */
  log?: (message: string, error: unknown) => void;
}

/**
 * Saves a comment. A comment by someone other than the version's owner (their coach) counts as
 * unread for the owner and is mailed to them; the owner writing on a version has read it.
 */
export async function addComment(recipe: Recipe, version: RecipeVersion, author: User, body: string, mail: CommentMailContext) {
  const comment = await VersionComment.create({ recipeVersionId: version.id, authorId: author.id, body });
  if (author.id === recipe.ownerId) {
    await markCommentsRead(recipe, version, author);
    return comment;
  }
  const owner = await User.findByPk(recipe.ownerId);
  if (!owner) return comment;
  const link = `${mail.appUrl.replace(/\/$/, '')}/recipes/${recipe.id}?version=${version.number}#comments`;
  const content = mailTemplates.newComment({
    ownerName: owner.displayName,
    authorName: author.displayName,
    recipeTitle: recipe.title,
    versionNumber: version.number,
    body,
    link,
  });
  try {
    await mail.mailer.send({ to: owner.email, ...content });
  } catch (error) {
    // The comment is saved and the badge shows it; a mail server that is away must not undo that.
    (mail.log ?? console.error)('Comment: could not mail the recipe owner:', error);
  }
  return comment;
}

/** The owner opened the thread: every comment by others on this version is read. Others reading change nothing. */
export async function markCommentsRead(recipe: Recipe, version: RecipeVersion, viewer: User) {
  if (viewer.id !== recipe.ownerId) return 0;
  const [count] = await VersionComment.update(
    { ownerReadAt: new Date() },
    { where: { recipeVersionId: version.id, ownerReadAt: null, authorId: { [Op.ne]: viewer.id } } },
  );
  return count;
}

export async function unreadComments(viewer: User): Promise<UnreadComments> {
  const rows = await VersionComment.sequelize!.query<{ recipe_id: number; title: string; number: number; unread: number }>(
    `SELECT r.id AS recipe_id, r.title, v.number, count(*)::int AS unread
       FROM version_comments c
       JOIN recipe_versions v ON v.id = c.recipe_version_id
       JOIN recipes r ON r.id = v.recipe_id
      WHERE r.owner_id = :viewer AND r.deleted_at IS NULL AND c.author_id <> :viewer AND c.owner_read_at IS NULL
      GROUP BY r.id, r.title, v.number
      ORDER BY r.id, v.number`,
    { replacements: { viewer: viewer.id }, type: QueryTypes.SELECT },
  );
  const recipes = new Map<number, UnreadComments['recipes'][number]>();
  for (const row of rows) {
    const entry = recipes.get(row.recipe_id) ?? { recipeId: row.recipe_id, title: row.title, unread: 0, versions: [] };
    entry.unread += row.unread;
    entry.versions.push({ number: row.number, unread: row.unread });
    recipes.set(row.recipe_id, entry);
  }
  const list = [...recipes.values()];
  return { total: list.reduce((sum, r) => sum + r.unread, 0), recipes: list };
}
