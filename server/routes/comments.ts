import { Router } from 'express';
import { commentSchema } from '../../shared/schemas/coaching';
import { versionParam } from '../../shared/schemas/recipes';
import { parse } from '../middleware/validate';
import { requireAuth } from '../middleware/auth';
import { addComment, listComments } from '../services/comments';
import { findReadableRecipe, getVersion } from '../services/recipes';
import type { CommentsResponse } from '../../shared/schemas/comments';

/** Comments live on a version: the owner and the owner's coach read and write them. */
export function commentsRouter() {
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
    const version = await getVersion(await findReadableRecipe(req.user!, id), number);
    await addComment(version.id, req.user!, body);
    res.status(201).json({ comments: await listComments(version.id) } satisfies CommentsResponse);
  });
  return router;
}
