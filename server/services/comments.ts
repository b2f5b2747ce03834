import { User, VersionComment } from '../models';
import type { VersionComment as VersionCommentView } from '../../shared/schemas/comments';

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

export async function addComment(versionId: number, author: User, body: string) {
  return VersionComment.create({ recipeVersionId: versionId, authorId: author.id, body });
}
