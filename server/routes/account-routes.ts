import { Router } from 'express';
import { changeNameInputSchema, deleteAccountInputSchema } from '../../shared/account/account-changes.ts';
import { preferencesSchema } from '../../shared/account/preferences.ts';
import type { AccountDeletion } from '../account/delete-account.ts';
import type { AccountUseCases } from '../account/account-use-cases.ts';
import { parseInput } from '../http/validate.ts';
import { currentUser, requireUser } from '../http/session.ts';

/** /api/account: the signed-in user's own account. The e-mail address changes through better-auth's /change-email (a link to the new address). */
export function accountRoutes(account: AccountUseCases, deletion: AccountDeletion, sessionCookies: () => Promise<string[]>): Router {
  const router = Router();
  router.use(requireUser);
  router.get('/', async (_req, res) => {
    res.json(await account.getAccount(currentUser(res).id));
  });
  router.patch('/', async (req, res) => {
    const { name } = parseInput(changeNameInputSchema, req.body);
    res.json(await account.changeName(currentUser(res).id, name));
  });
  router.patch('/preferences', async (req, res) => {
    const preferences = parseInput(preferencesSchema, req.body);
    res.json(await account.updatePreferences(currentUser(res).id, preferences));
  });
  router.post('/delete', async (req, res) => {
    const { password } = parseInput(deleteAccountInputSchema, req.body);
    await deletion.deleteAccount(currentUser(res), password);
    // The session went with the account; the browser forgets its cookies too.
    for (const name of await sessionCookies()) res.clearCookie(name, { path: '/' });
    res.json({ deleted: true });
  });
  return router;
}
