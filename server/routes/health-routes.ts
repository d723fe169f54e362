import { Router } from 'express';
import type { Database } from '../db/database.ts';

export function healthRoutes(database: Database, version: string): Router {
  const router = Router();
  router.get('/', async (_req, res) => {
    const reachable = await database.ping();
    res.status(reachable ? 200 : 503).json({
      status: reachable ? 'ok' : 'degraded',
      database: { kind: database.kind, reachable },
      version,
      uptimeSeconds: Math.round(process.uptime()),
    });
  });
  return router;
}
