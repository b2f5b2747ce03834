import { Router } from 'express';
import { commentSchema } from '../../shared/schemas/coaching';
import { versionParam } from '../../shared/schemas/recipes';
import { parse } from '../middleware/validate';
import { requireAuth } from '../middleware/auth';
import { addComment, listComments, markCommentsRead, unreadComments, type CommentMailContext } from '../services/comments';
import { findReadableRecipe, getVersion } from '../services/recipes';
import type { CommentsResponse } from '../../shared/schemas/comments';

/** Comments live on a version: the owner and the owner's coach read and write them. */
export function commentsRouter(mail: CommentMailContext) {
  const router = Router({ mergeParams: true });
  router.use(requireAuth);
  const params = versionParam;
  router.get('/', async (req, res) => {
    const { id, number } = parse(params, req.params);
    const version = await getVersion(await findReadableRecipe(req.user!, id), number);
    res.json({ comments: await listComments(version.id) } satisfies CommentsResponse);
  });
  router.post('/', async (req, res) => {
    const { id, number } = parse(params, req.params);
    const { body } = parse(commentSchema, req.body);
    const recipe = await findReadableRecipe(req.user!, id);
    const version = await getVersion(recipe, number);
    await addComment(recipe, version, req.user!, body, mail);
    res.status(201).json({ comments: await listComments(version.id) } satisfies CommentsResponse);
  });
  // Explicit, not a side effect of GET: a prefetch or the coach reading must not clear the owner's badge.
  router.post('/read', async (req, res) => {
    const { id, number } = parse(params, req.params);
    const recipe = await findReadableRecipe(req.user!, id);
    await markCommentsRead(recipe, await getVersion(recipe, number), req.user!);
    res.json(await unreadComments(req.user!));
  });
  return router;
}

/** GET /api/comments/unread: the signed-in cook's unread comments, for the badges. */
export function unreadCommentsRouter() {
  const router = Router();
  router.use(requireAuth);
  router.get('/unread', async (req, res) => {
    res.json(await unreadComments(req.user!));
  });
  return router;
}
