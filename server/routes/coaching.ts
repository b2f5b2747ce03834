import { Router } from 'express';
import type { Sequelize } from 'sequelize';
import { z } from 'zod';
import {
  clientTargetsSchema,
  commentSchema,
  createSwapSchema,
  invitationSchema,
  tokenParam,
  updateSwapSchema,
} from '../../shared/schemas/coaching';
import { estimateTargetsSchema } from '../../shared/schemas/targets';
import { estimateTargets } from '../../shared/targets';
import { idParam, versionParam } from '../../shared/schemas/recipes';
import { parse } from '../middleware/validate';
import { requireAuth, requireRole } from '../middleware/auth';
import { getFoodEngine } from '../services/food-engine';
import * as coaching from '../services/coaching';
import { findReadableRecipe, getVersion } from '../services/recipes';
import type { Mailer } from '../mail';

export interface MailContext {
  mailer: Mailer;
  appUrl: string;
}

export function swapsRouter(sequelize: Sequelize) {
  const router = Router();
  router.use(requireAuth);
  const engine = () => getFoodEngine(sequelize);
  router.get('/', async (req, res) => {
    const e = await engine();
    res.json({ swaps: (await coaching.listSwapsFor(req.user!)).map((s) => coaching.swapView(e, s)) });
  });
  router.post('/', requireRole('coach'), async (req, res) => {
    const input = parse(createSwapSchema, req.body);
    const e = await engine();
    res.status(201).json(coaching.swapView(e, await coaching.createSwap(e, req.user!, input)));
  });
  router.patch('/:id', requireRole('coach'), async (req, res) => {
    const { id } = parse(idParam, req.params);
    const input = parse(updateSwapSchema, req.body);
    const e = await engine();
    res.json(coaching.swapView(e, await coaching.updateSwap(e, req.user!, id, input)));
  });
  router.post('/:id/publish', requireRole('coach'), async (req, res) => {
    const { id } = parse(idParam, req.params);
    const e = await engine();
    res.json(coaching.swapView(e, await coaching.updateSwap(e, req.user!, id, { status: 'published' })));
  });
  router.post('/:id/unpublish', requireRole('coach'), async (req, res) => {
    const { id } = parse(idParam, req.params);
    const e = await engine();
    res.json(coaching.swapView(e, await coaching.updateSwap(e, req.user!, id, { status: 'draft' })));
  });
  router.delete('/:id', requireRole('coach'), async (req, res) => {
    const { id } = parse(idParam, req.params);
    await coaching.deleteSwap(req.user!, id);
    res.status(204).end();
  });
  return router;
}

export function clientsRouter(sequelize: Sequelize, mail: MailContext) {
  const router = Router();
  router.use(requireRole('coach'));
  router.get('/', async (req, res) => {
    res.json({ clients: await coaching.listClients(req.user!), invitations: await coaching.listInvitations(req.user!) });
  });
  router.post('/invitations', async (req, res) => {
    const { email } = parse(invitationSchema, req.body);
    const inv = await coaching.inviteClient(req.user!, email, mail);
    res.status(201).json({ id: inv.id, email: inv.email, status: coaching.invitationStatus(inv), expiresAt: inv.expiresAt.toISOString() });
  });
  router.delete('/invitations/:id', async (req, res) => {
    const { id } = parse(idParam, req.params);
    await coaching.revokeInvitation(req.user!, id);
    res.status(204).end();
  });
  router.delete('/:id', async (req, res) => {
    const { id } = parse(idParam, req.params);
    await coaching.removeClient(req.user!, id);
    res.status(204).end();
  });
  router.put('/:id/targets', async (req, res) => {
    const { id } = parse(idParam, req.params);
    const targets = parse(clientTargetsSchema, req.body);
    res.json({ clientId: id, targets: await coaching.setClientTargets(req.user!, id, targets) });
  });
  router.get('/:id/versions', async (req, res) => {
    const { id } = parse(idParam, req.params);
    res.json({ versions: await coaching.clientVersions(req.user!, id) });
  });
  return router;
}

export function invitationsRouter(sequelize: Sequelize) {
  const router = Router();
  router.get('/:token', async (req, res) => {
    const { token } = parse(tokenParam, req.params);
    res.json(await coaching.describeInvitation(token));
  });
  router.post('/:token/accept', requireAuth, async (req, res) => {
    const { token } = parse(tokenParam, req.params);
    res.json(await coaching.acceptInvitation(sequelize, req.user!, token));
  });
  return router;
}

export function myCoachRouter(sequelize: Sequelize) {
  const router = Router();
  router.use(requireAuth);
  router.get('/', async (req, res) => {
    res.json(await coaching.myCoach(req.user!, await getFoodEngine(sequelize)));
  });
  router.delete('/', async (req, res) => {
    await coaching.leaveCoach(req.user!);
    res.status(204).end();
  });
  return router;
}

export function targetsRouter() {
  const router = Router();
  router.post('/estimate', (req, res) => {
    res.json(estimateTargets(parse(estimateTargetsSchema, req.body)));
  });
  return router;
}

/** Comments live on a version: the owner and the owner's coach read and write them. */
export function commentsRouter() {
  const router = Router({ mergeParams: true });
  router.use(requireAuth);
  const params = versionParam;
  router.get('/', async (req, res) => {
    const { id, number } = parse(params, req.params);
    const version = await getVersion(await findReadableRecipe(req.user!, id), number);
    res.json({ comments: await coaching.listComments(version.id) });
  });
  router.post('/', async (req, res) => {
    const { id, number } = parse(params, req.params);
    const { body } = parse(commentSchema, req.body);
    const version = await getVersion(await findReadableRecipe(req.user!, id), number);
    await coaching.addComment(version.id, req.user!, body);
    res.status(201).json({ comments: await coaching.listComments(version.id) });
  });
  return router;
}

export const outboxQuery = z.object({ limit: z.coerce.number().int().min(1).max(500).default(100) });
