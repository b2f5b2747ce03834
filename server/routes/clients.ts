import { Router } from 'express';
import type { Sequelize } from 'sequelize';
import { clientTargetsSchema, invitationSchema } from '../../shared/schemas/coaching';
import { idParam } from '../../shared/schemas/recipes';
import { parse } from '../middleware/validate';
import { requireRole } from '../middleware/auth';
import { clientVersions, listClients, removeClient } from '../services/clients';
import { setClientTargets } from '../services/client-targets';
import { inviteClient, listInvitations, revokeInvitation } from '../services/invitations';
import type { Mailer } from '../mail';
import type { ClientsResponse, ClientVersionsResponse, SavedClientTargets, SentInvitation } from '../../shared/schemas/clients';
import { bodyStatsSchema } from '../../shared/schemas/body-stats';
import { getBodyStats, saveBodyStats } from '../services/body-stats';

export interface MailContext {
  mailer: Mailer;
  appUrl: string;
}

export function clientsRouter(sequelize: Sequelize, mail: MailContext) {
  const router = Router();
  router.use(requireRole('coach'));
  router.get('/', async (req, res) => {
    res.json({ clients: await listClients(req.user!), invitations: await listInvitations(req.user!) } satisfies ClientsResponse);
  });
  router.post('/invitations', async (req, res) => {
    const { email } = parse(invitationSchema, req.body);
    const { invitation, renewed } = await inviteClient(sequelize, req.user!, email, mail);
    const sent: SentInvitation = { id: invitation.id, email: invitation.email, status: 'pending', expiresAt: invitation.expiresAt.toISOString(), renewed };
    res.status(renewed ? 200 : 201).json(sent);
  });
  router.delete('/invitations/:id', async (req, res) => {
    const { id } = parse(idParam, req.params);
    await revokeInvitation(req.user!, id);
    res.status(204).end();
  });
  router.delete('/:id', async (req, res) => {
    const { id } = parse(idParam, req.params);
    await removeClient(req.user!, id);
    res.status(204).end();
  });
  router.put('/:id/targets', async (req, res) => {
    const { id } = parse(idParam, req.params);
    const targets = parse(clientTargetsSchema, req.body);
    res.json({ clientId: id, targets: await setClientTargets(req.user!, id, targets) } satisfies SavedClientTargets);
  });
  router.get('/:id/body-stats', async (req, res) => {
    const { id } = parse(idParam, req.params);
    res.json(await getBodyStats(req.user!, id));
  });
  router.put('/:id/body-stats', async (req, res) => {
    const { id } = parse(idParam, req.params);
    const stats = parse(bodyStatsSchema, req.body);
    res.json(await saveBodyStats(req.user!, id, stats));
  });
  router.get('/:id/versions', async (req, res) => {
    const { id } = parse(idParam, req.params);
    res.json({ versions: await clientVersions(req.user!, id) } satisfies ClientVersionsResponse);
  });
  return router;
}
