import { Router } from 'express';
import { printerProfileInputSchema } from '../../shared/print/printer-profile.ts';
import { parseInput } from '../http/validate.ts';
import { currentUser, requireUser } from '../http/session.ts';
import type { PrinterProfileUseCases } from '../printer-profiles/printer-profile-use-cases.ts';

// Unknown keys (userId, isDefault) are refused rather than dropped, as the preferences route does.
const createSchema = printerProfileInputSchema.strict();
const changeSchema = printerProfileInputSchema
  .partial()
  .strict()
  .refine((change) => Object.values(change).some((value) => value !== undefined), 'Give a name, measuredXMm or measuredYMm');

/** The signed-in maker's printer profiles; another maker's id answers 404, as a missing one does. */
export function printerProfileRoutes(profiles: PrinterProfileUseCases): Router {
  const router = Router();
  router.use(requireUser);
  router.get('/', async (_req, res) => {
    res.json(await profiles.listProfiles(currentUser(res).id));
  });
  router.post('/', async (req, res) => {
    const input = parseInput(createSchema, req.body);
    res.status(201).json(await profiles.createProfile(currentUser(res).id, input));
  });
  router.patch('/:id', async (req, res) => {
    const change = parseInput(changeSchema, req.body);
    res.json(await profiles.updateProfile(currentUser(res).id, req.params.id, change));
  });
  router.post('/:id/default', async (req, res) => {
    res.json(await profiles.setDefaultProfile(currentUser(res).id, req.params.id));
  });
  router.delete('/:id', async (req, res) => {
    await profiles.deleteProfile(currentUser(res).id, req.params.id);
    res.status(204).end();
  });
  return router;
}
