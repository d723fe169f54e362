import { Router } from 'express';
import type { DesignLibrary } from '../library/design-library.ts';

/**
 * A shared design, read by anyone holding the link; no session needed. Unknown and revoked
 * tokens are both 404. Nothing is cached, so a revoked link stops working at once.
 */
export function sharedDesignRoutes(library: Pick<DesignLibrary, 'getSharedDesign'>): Router {
  const router = Router();
  router.get('/:token', async (req, res) => {
    const shared = await library.getSharedDesign(req.params.token);
    res.set({ 'Cache-Control': 'no-store', 'X-Robots-Tag': 'noindex' }).json(shared);
  });
  return router;
}
