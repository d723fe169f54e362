import { Router } from 'express';
import { fromNodeHeaders } from 'better-auth/node';
import { adminUserChangeSchema, adminUserQuerySchema } from '../../shared/account/account.ts';
import type { AdminUseCases } from '../admin/admin-use-cases.ts';
import { parseInput } from '../http/validate.ts';
import { currentUser, requireRole } from '../http/session.ts';

export function adminRoutes(admin: AdminUseCases): Router {
  const router = Router();
  router.use(requireRole('admin'));
  router.get('/users', async (req, res) => {
    res.json(await admin.listUsers(parseInput(adminUserQuerySchema, req.query)));
  });
  router.patch('/users/:id', async (req, res) => {
    const change = parseInput(adminUserChangeSchema, req.body);
    res.json(await admin.changeUser(currentUser(res).id, req.params.id, change, fromNodeHeaders(req.headers)));
  });
  return router;
}
