import { Router } from 'express';
import { z } from 'zod';
import { parse } from '../middleware/validate';
import { requireRole } from '../middleware/auth';
import type { OutboxResponse } from '../../shared/schemas/outbox';
import type { StoredMail } from '../mail';

export const outboxQuery = z.object({ limit: z.coerce.number().int().min(1).max(500).default(100) });

/** The development outbox: what the fake SMTP server kept, newest first, for admins. */
export function outboxRouter(outbox: (limit: number) => Promise<StoredMail[]>) {
  const router = Router();
  router.get('/', requireRole('admin'), async (req, res) => {
    const { limit } = parse(outboxQuery, req.query);
    res.json({ messages: await outbox(limit) } satisfies OutboxResponse);
  });
  return router;
}
