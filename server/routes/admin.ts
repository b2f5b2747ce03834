import { Router } from 'express';
import { z } from 'zod';
import { updateRoleSchema } from '../../shared/schemas/auth';
import { parse } from '../middleware/validate';
import { requireRole } from '../middleware/auth';
import { listUsers, setRole } from '../services/users';

const idParam = z.object({ id: z.coerce.number({ message: 'id must be a number.' }).int().positive() });

export function adminRouter() {
  const router = Router();
  router.use(requireRole('admin'));
  router.get('/users', async (_req, res) => {
    const users = await listUsers();
    res.json({ users: users.map((u) => u.toPublic()) });
  });
  router.patch('/users/:id', async (req, res) => {
    const { id } = parse(idParam, req.params);
    const { role } = parse(updateRoleSchema, req.body);
    const user = await setRole(id, role);
    res.json(user.toPublic());
  });
  return router;
}
