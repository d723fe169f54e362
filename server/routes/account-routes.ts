import { Router } from 'express';
import { preferencesSchema } from '../../shared/account/preferences.ts';
import type { AccountUseCases } from '../account/account-use-cases.ts';
import { parseInput } from '../http/validate.ts';
import { currentUser, requireUser } from '../http/session.ts';

export function accountRoutes(account: AccountUseCases): Router {
  const router = Router();
  router.use(requireUser);
  router.get('/', async (_req, res) => {
    res.json(await account.getAccount(currentUser(res).id));
  });
  router.patch('/preferences', async (req, res) => {
    const preferences = parseInput(preferencesSchema, req.body);
    res.json(await account.updatePreferences(currentUser(res).id, preferences));
  });
  return router;
}
