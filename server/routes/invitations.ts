import { Router } from 'express';
import type { Sequelize } from 'sequelize';
import { tokenParam } from '../../shared/schemas/coaching';
import { parse } from '../middleware/validate';
import { requireAuth } from '../middleware/auth';
import { acceptInvitation, describeInvitation } from '../services/invitations';

export function invitationsRouter(sequelize: Sequelize) {
  const router = Router();
  router.get('/:token', async (req, res) => {
    const { token } = parse(tokenParam, req.params);
    res.json(await describeInvitation(token));
  });
  router.post('/:token/accept', requireAuth, async (req, res) => {
    const { token } = parse(tokenParam, req.params);
    res.json(await acceptInvitation(sequelize, req.user!, token));
  });
  return router;
}
