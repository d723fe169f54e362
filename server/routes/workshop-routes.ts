import { Router, type Response } from 'express';
import { z } from 'zod';
import { paperPreferenceSchema } from '../../shared/account/preferences.ts';
import { createBurnInputSchema } from '../../shared/burns/burn-schema.ts';
import { WORKSHOP_CAPACITY_MAX, createWorkshopInputSchema, invitationsInputSchema, joinWorkshopInputSchema, updateWorkshopInputSchema } from '../../shared/workshops/workshop-schema.ts';
import { currentUser, requireRole, requireUser } from '../http/session.ts';
import { parseInput } from '../http/validate.ts';
import { busy, type RenderPool } from '../render/render-pool.ts';
import type { WorkshopUseCases } from '../workshops/workshop-use-cases.ts';

const kitQuerySchema = z.object({ paper: paperPreferenceSchema.optional() });
const classPackQuerySchema = kitQuerySchema.extend({ builds: z.coerce.number().int().min(1).max(WORKSHOP_CAPACITY_MAX).optional() });
/** A member's burn: the version is the kit's, never chosen. */
const workshopBurnInputSchema = createBurnInputSchema.omit({ version: true });

/** An abandoned download stops its render. */
function abandonedWith(res: Response): AbortSignal {
  const controller = new AbortController();
  res.on('close', () => {
    if (!res.writableFinished) controller.abort();
  });
  return controller.signal;
}

/**
 * /api/workshops: instructors (and admins) create and run them; members see theirs. Anyone not in
 * a workshop is answered 404 for it, as for one that does not exist.
 */
export function workshopRoutes(workshops: WorkshopUseCases, pool: RenderPool): Router {
  const router = Router();
  const viewer = (res: Response) => currentUser(res);

  router.get('/', requireUser, async (_req, res) => {
    res.json(await workshops.list(viewer(res)));
  });
  router.post('/', requireRole('instructor', 'admin'), async (req, res) => {
    res.status(201).json(await workshops.create(viewer(res), parseInput(createWorkshopInputSchema, req.body)));
  });
  router.post('/join', requireUser, async (req, res) => {
    const { workshop, joined } = await workshops.join(viewer(res), parseInput(joinWorkshopInputSchema, req.body));
    res.status(joined ? 201 : 200).json(workshop);
  });
  router.get('/:id', requireUser, async (req, res) => {
    res.json(await workshops.get(viewer(res), req.params.id as string));
  });
  router.patch('/:id', requireUser, async (req, res) => {
    res.json(await workshops.update(viewer(res), req.params.id as string, parseInput(updateWorkshopInputSchema, req.body)));
  });
  router.delete('/:id', requireUser, async (req, res) => {
    await workshops.remove(viewer(res), req.params.id as string);
    res.status(204).end();
  });
  router.post('/:id/invitations', requireUser, async (req, res) => {
    res.status(201).json(await workshops.invite(viewer(res), req.params.id as string, parseInput(invitationsInputSchema, req.body)));
  });
  router.delete('/:id/members/:userId', requireUser, async (req, res) => {
    await workshops.removeMember(viewer(res), req.params.id as string, req.params.userId as string);
    res.status(204).end();
  });
  router.get('/:id/kit.pdf', requireUser, async (req, res) => {
    if (pool.full) throw busy();
    const { paper } = parseInput(kitQuerySchema, req.query);
    const result = await workshops.kitPdf(viewer(res), req.params.id as string, paper, abandonedWith(res));
    res.attachment(result.fileName).set({ 'Content-Type': 'application/pdf', 'X-Sheet-Count': String(result.sheets), 'Cache-Control': 'private, no-store' });
    res.end(Buffer.from(result.bytes));
  });
  router.get('/:id/class-pack.pdf', requireUser, async (req, res) => {
    if (pool.full) throw busy();
    const query = parseInput(classPackQuerySchema, req.query);
    const result = await workshops.classPack(viewer(res), req.params.id as string, query, abandonedWith(res));
    res.attachment(result.fileName).set({ 'Content-Type': 'application/pdf', 'X-Page-Count': String(result.pages), 'Cache-Control': 'private, no-store' });
    res.end(Buffer.from(result.bytes));
  });
  router.post('/:id/send-kit', requireUser, async (req, res) => {
    res.json(await workshops.sendKit(viewer(res), req.params.id as string));
  });
  router.get('/:id/burns', requireUser, async (req, res) => {
    res.json(await workshops.burns(viewer(res), req.params.id as string));
  });
  router.post('/:id/burns', requireUser, async (req, res) => {
    res.status(201).json(await workshops.logBurn(viewer(res), req.params.id as string, parseInput(workshopBurnInputSchema, req.body)));
  });
  return router;
}
