import express, { Router, type RequestHandler } from 'express';
import { z } from 'zod';
import {
  createDesignInputSchema,
  designListQuerySchema,
  saveVersionInputSchema,
  updateDesignInputSchema,
} from '../../shared/library/library-schemas.ts';
import { currentUser, requireUser } from '../http/session.ts';
import { parseInput } from '../http/validate.ts';
import type { DesignLibrary } from '../library/design-library.ts';

/** A design document is a few kB; anything far larger is refused with 413 before parsing. */
export const DESIGN_BODY_LIMIT = '256kb';

/**
 * The design routes' own JSON parser. app.ts mounts it ahead of the general 1 MB parser, which
 * then leaves the already-read body alone.
 */
export function designBodyParser(): RequestHandler {
  return express.json({ limit: DESIGN_BODY_LIMIT });
}

// Postgres integer columns hold up to 2^31 - 1; a larger number could never name a version.
const versionParamsSchema = z.object({ number: z.coerce.number().int().min(1).max(2 ** 31 - 1) });

/** The signed-in maker's design library; another maker's design id answers 404, as a missing one does. */
export function designRoutes(library: DesignLibrary): Router {
  const router = Router();
  router.use(requireUser);
  const owner = (res: express.Response) => currentUser(res).id;

  router.get('/', async (req, res) => {
    res.json(await library.listDesigns(owner(res), parseInput(designListQuerySchema, req.query)));
  });
  router.post('/', async (req, res) => {
    res.status(201).json(await library.createDesign(owner(res), parseInput(createDesignInputSchema, req.body)));
  });
  router.get('/:id', async (req, res) => {
    res.json(await library.getDesign(owner(res), req.params.id));
  });
  router.patch('/:id', async (req, res) => {
    res.json(await library.updateDesign(owner(res), req.params.id, parseInput(updateDesignInputSchema, req.body)));
  });
  router.delete('/:id', async (req, res) => {
    await library.deleteDesign(owner(res), req.params.id);
    res.status(204).end();
  });
  router.post('/:id/duplicate', async (req, res) => {
    res.status(201).json(await library.duplicateDesign(owner(res), req.params.id));
  });
  router.post('/:id/printed', async (req, res) => {
    res.json(await library.markPrinted(owner(res), req.params.id));
  });
  router.post('/:id/share', async (req, res) => {
    res.json(await library.shareDesign(owner(res), req.params.id));
  });
  router.delete('/:id/share', async (req, res) => {
    res.json(await library.unshareDesign(owner(res), req.params.id));
  });

  router.get('/:id/versions', async (req, res) => {
    res.json(await library.listVersions(owner(res), req.params.id));
  });
  router.post('/:id/versions', async (req, res) => {
    res.status(201).json(await library.saveVersion(owner(res), req.params.id, parseInput(saveVersionInputSchema, req.body)));
  });
  router.get('/:id/versions/:number', async (req, res) => {
    const { number } = parseInput(versionParamsSchema, req.params);
    res.json(await library.getVersion(owner(res), req.params.id, number));
  });
  router.post('/:id/versions/:number/restore', async (req, res) => {
    const { number } = parseInput(versionParamsSchema, req.params);
    res.status(201).json(await library.restoreVersion(owner(res), req.params.id, number));
  });
  return router;
}
